package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.JobsonKorkieTest;
import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Writes {@code diagnostics.csv} and {@code tests.csv} (CONTRACT.md "Output folder"). */
public final class EvidenceFiles {
    private EvidenceFiles() {
    }

    /**
     * {@code diagnostics.csv}: date,window,assets,mean_abs_residual_corr,lm_stat,lm_pvalue,cd_stat,
     * cd_pvalue,lm_adj_stat,lm_adj_pvalue, one row per window length per rebalance (windows in study
     * order). LM_adj cells are empty where the window is too short for it (Method §8).
     */
    public static void writeDiagnostics(Path file, Map<Integer, List<WindowEvidence>> byWindow, List<Integer> windows) {
        try (CsvWriter csv = new CsvWriter(file, "date", "window", "assets", "mean_abs_residual_corr", "lm_stat",
                "lm_pvalue", "cd_stat", "cd_pvalue", "lm_adj_stat", "lm_adj_pvalue")) {
            for (int w : windows) {
                for (WindowEvidence e : byWindow.getOrDefault(w, List.of())) {
                    csv.text(e.date().toString()).integer(w);
                    if (e.diagnostics().isPresent()) {
                        ResidualDiagnostics d = e.diagnostics().get();
                        csv.integer(d.assets()).number(d.meanAbsCorrelation()).number(d.lmStatistic())
                                .number(d.lmPValue()).number(d.cdStatistic()).number(d.cdPValue())
                                .number(d.lmAdjStatistic()).number(d.lmAdjPValue());
                    } else {
                        csv.empty().empty().empty().empty().empty().empty().empty().empty();
                    }
                    csv.end();
                }
            }
        }
    }

    /**
     * {@code tests.csv}: one row per compared pair, window and measure: strategy, baseline, window,
     * measure, the two estimates (per period), the difference, its standard error, the statistic,
     * the HAC and bootstrap p-values, the Holm-adjusted p-value across windows, and the method.
     */
    public static void writeTests(Path file, List<Comparison> comparisons) {
        try (CsvWriter csv = new CsvWriter(file, "strategy", "baseline", "window", "measure", "estimate",
                "baseline_estimate", "difference", "standard_error", "statistic", "hac_pvalue", "bootstrap_pvalue",
                "holm_pvalue", "method")) {
            for (Comparison c : comparisons) {
                c.sharpe().ifPresent(t -> row(csv, c, "sharpe_ratio", t, c.holmSharpe()));
                c.variance().ifPresent(t -> row(csv, c, "variance", t, c.holmVariance()));
                c.jobsonKorkie().ifPresent(t -> jobsonKorkie(csv, c, t));
                if (c.skipped().isPresent()) {
                    csv.text(c.strategy()).text(c.baseline()).integer(c.window()).text("not_run");
                    for (int i = 0; i < 8; i++) {
                        csv.empty();
                    }
                    csv.text(c.skipped().get()).end();
                }
            }
        }
    }

    private static void row(CsvWriter csv, Comparison c, String measure, DifferenceTest t, double holm) {
        csv.text(c.strategy()).text(c.baseline()).integer(c.window()).text(measure).number(t.first())
                .number(t.second()).number(t.difference()).number(t.standardError()).number(t.statistic())
                .number(t.hacPValue()).number(t.bootstrapPValue()).number(holm).text(t.method()).end();
    }

    private static void jobsonKorkie(CsvWriter csv, Comparison c, JobsonKorkieTest t) {
        csv.text(c.strategy()).text(c.baseline()).integer(c.window()).text("sharpe_ratio_iid").number(t.sharpeA())
                .number(t.sharpeB()).number(t.sharpeA() - t.sharpeB()).empty().number(t.statistic())
                .number(t.pValue()).empty().empty()
                .text("Jobson-Korkie (1981) with Memmel (2003) correction, iid normal returns").end();
    }
}
