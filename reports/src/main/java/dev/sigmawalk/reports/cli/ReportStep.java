package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.data.FileFingerprint;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.evidence.InputListSize;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.reports.html.DiagnosticsPoint;
import dev.sigmawalk.reports.html.InputFile;
import dev.sigmawalk.reports.html.ReportData;
import dev.sigmawalk.reports.html.ReportEvidence;
import dev.sigmawalk.reports.html.ReportPage;
import dev.sigmawalk.reports.html.ReportWriter;
import dev.sigmawalk.reports.pdf.ReportPdf;
import dev.sigmawalk.reports.html.RunRecord;
import dev.sigmawalk.reports.html.WindowDiagnostics;
import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;

/**
 * Assembles the report's input from a finished run and writes report.html, charts/ and report.pdf,
 * the charts drawn on the given workers.
 */
final class ReportStep {
    private ReportStep() {
    }

    /**
     * @param workers where the charts, the page and {@code besidePdf} run
     * @param besidePdf tasks that need nothing of the report (the walk's own CSV files): handed to
     *        the workers in this order after every chart, so they fill the cores the PDF's
     *        single-threaded layout leaves idle once the charts are drawn; the report is done
     *        when all of them are, and the first of them (in this order) that failed fails it
     */
    static void write(Path dir, Study study, StudyData data, RunResult<WindowEvidence> run, List<Summary> summaries,
                      List<Comparison> comparisons, List<String> warnings, Instant started,
                      Map<Integer, List<List<FactorDiagnostics>>> factorDiagnostics, Executor workers,
                      List<Runnable> besidePdf) {
        ReturnPanel panel = data.panel();
        List<InputFile> inputs = new ArrayList<>();
        for (FileFingerprint f : data.fingerprints()) {
            inputs.add(new InputFile(String.valueOf(f.path().getFileName()), f.sha256()));
        }
        RunRecord record = new RunRecord(VersionProvider.version(), inputs, panel.date(0),
                panel.date(panel.rows() - 1), panel.assetCount(), started, Instant.now(), warnings);
        ReportEvidence evidence = new ReportEvidence(diagnostics(run, study.walkForward().windows()),
                comparisons, Optional.of(new InputListSize(panel.assetCount())), flatten(factorDiagnostics));
        try {
            ReportPage page = new ReportWriter().assemble(new ReportData(study, run, summaries, record, evidence),
                    dir.resolve("charts"), workers);
            // The PDF is laid out while the workers draw the charts' SVG and PNG copies; it draws
            // each chart itself once that chart's worker is done with it. The page itself goes
            // to a worker, which waits there for the charts' markup while this thread lays out
            // the PDF (the charts were handed to the workers first, so none waits behind it).
            CompletableFuture<Void> html = CompletableFuture.runAsync(() -> {
                try {
                    page.writeHtml(dir.resolve("report.html"));
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot write the report", e);
                }
            }, workers);
            List<CompletableFuture<Void>> beside = new ArrayList<>();
            for (Runnable task : besidePdf) {
                beside.add(CompletableFuture.runAsync(task, workers));
            }
            ReportPdf.write(page.outline(), dir, page.charts(), dir.resolve("report.pdf"));
            Workers.await(html);
            beside.forEach(Workers::await);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the report", e);
        }
    }

    /** Per window, every rebalance's factor diagnostics in one list. */
    static Map<Integer, List<FactorDiagnostics>> flatten(Map<Integer, List<List<FactorDiagnostics>>> byWindow) {
        Map<Integer, List<FactorDiagnostics>> out = new LinkedHashMap<>();
        byWindow.forEach((w, rebalances) -> out.put(w, rebalances.stream().flatMap(List::stream).toList()));
        return out;
    }

    static List<WindowDiagnostics> diagnostics(RunResult<WindowEvidence> run, List<Integer> windows) {
        List<WindowDiagnostics> out = new ArrayList<>();
        for (int w : windows) {
            List<DiagnosticsPoint> points = new ArrayList<>();
            for (WindowEvidence e : run.probes().getOrDefault(w, List.of())) {
                e.diagnostics().ifPresent(d -> points.add(new DiagnosticsPoint(e.date(), d, e.largestPairs(), e.sectors())));
            }
            if (!points.isEmpty()) {
                out.add(new WindowDiagnostics(w, points));
            }
        }
        return out;
    }
}
