package dev.sigmawalk.reports.html;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.reports.charts.ModelFamily;
import dev.sigmawalk.reports.charts.StyleBook;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executor;
import java.util.stream.Collectors;

/**
 * Writes {@code report.html} (one self-contained file: inline CSS and SVG, no script, no web
 * address) and a PNG copy of every chart into a charts folder.
 *
 * <p>The page is rendered from the template {@code report.mustache}; every value is escaped by
 * the template except the SVG this class generated. Output depends only on the data: the same
 * data give byte-identical files.
 */
public final class ReportWriter {
    private static final String TEMPLATE = "report.mustache";

    private final Mustache template;

    public ReportWriter() {
        DefaultMustacheFactory factory = new DefaultMustacheFactory("dev/sigmawalk/reports/html");
        this.template = factory.compile(TEMPLATE);
    }

    /**
     * Writes the report and its charts on the calling thread.
     *
     * @param data what to report
     * @param htmlFile the report file to create or replace
     * @param chartsDir folder for the PNG copies (created when missing); the report refers to them
     *                  by this folder's name, relative to the report
     * @return the PNG files written, in page order
     */
    public List<Path> write(ReportData data, Path htmlFile, Path chartsDir) throws IOException {
        ReportPage page = assemble(data, chartsDir, Runnable::run);
        page.writeHtml(htmlFile);
        return page.pngs();
    }

    /**
     * Assembles the page, handing every chart to {@code workers}, which draw its SVG markup and
     * write its PNG copy while the caller goes on (the PDF can be laid out meanwhile); the files
     * are the same whichever executor draws them.
     *
     * @param chartsDir folder for the PNG copies (created when missing)
     * @param workers draw the charts ({@code Runnable::run}: at once, on the calling thread)
     */
    public ReportPage assemble(ReportData data, Path chartsDir, Executor workers) {
        FigureMaker maker = new FigureMaker(chartsDir, workers);
        ReportView view = view(data, maker);
        StringWriter page = new StringWriter(1 << 18);
        template.execute(page, view);
        return new ReportPage(page.toString(), maker.charts(), maker.written());
    }

    static ReportView view(ReportData data, FigureMaker maker) {
        StyleBook styles = Families.styles(data.study(), data.run());
        Map<PathResult, PathFacts> facts = new IdentityHashMap<>();
        for (PathResult p : data.run().paths()) {
            facts.put(p, PathFacts.of(p, data.run().periodsPerYear()));
        }
        Findings findings = new Findings(data, facts);
        SectionRows rows = new SectionRows(data, facts, styles);
        ChartSet charts = new ChartSet(data, styles, maker);
        int focus = findings.lowestVolatility().map(PathResult::window).orElse(data.windows().get(0));

        ReportView.Headline headline = new ReportView.Headline(findings.headline(), new AnswerMatrix(data, styles).both(),
                Untested.of(data), charts.growth(focus));
        List<Figure> costFigures = new ArrayList<>();
        costFigures.add(charts.byWindow("window-turnover", "Turnover by window length", "Turnover (% per rebalance)",
                true, s -> s.meanTurnover().orElse(Double.NaN), false));
        costFigures.addAll(charts.turnover(focus));
        ReportView.Cost cost = new ReportView.Cost(findings.cost(), rows.cost(), costFigures);
        List<ReportView.TextRow> years = rows.years(focus);
        List<ReportView.YearTable> yearTable = years.isEmpty() ? List.of()
                : List.of(new ReportView.YearTable("Year by year, " + focus + "-period window: realised volatility "
                        + "divided by forecast volatility (ratio; above 1, risk was understated that year)",
                        rows.yearHeaders(focus), years));
        ReportView.Honesty honesty = new ReportView.Honesty(findings.honesty(), rows.honesty(), yearTable,
                charts.forecasts(focus));
        List<Figure> concentrationFigures = new ArrayList<>(charts.effectiveHoldings(focus));
        concentrationFigures.addAll(charts.largestWeight(focus));
        ReportView.Concentration concentration = new ReportView.Concentration(findings.concentration(),
                rows.concentration(), concentrationFigures);
        List<ReportView.Shrinkage> shrinkage = new ArrayList<>();
        findings.shrinkage().ifPresent(answer -> shrinkage.add(new ReportView.Shrinkage(answer, rows.shrinkage(),
                charts.shrinkage().stream().toList())));
        List<Figure> windowFigures = new ArrayList<>();
        windowFigures.add(charts.byWindow("window-volatility", "Realised volatility by window length",
                "Annualised volatility (% a year)", true, Summary::volatility, true));
        windowFigures.add(charts.byWindow("window-sharpe", "Sharpe ratio by window length", "Sharpe ratio (annualised)",
                false, Summary::sharpe, true));
        ReportView.Windows windows = new ReportView.Windows(findings.windows(), windowFigures);
        return new ReportView(data.study().title(), subtitle(data, focus, charts.rollingSpan()), palette(),
                legend(data, styles), headline, StudySetup.of(data), HeadlineTable.of(data, styles), cost, honesty,
                concentration, shrinkage, windows, overTime(data, charts, focus),
                new EvidenceSections(data, maker).all(), SectorMap.of(data).stream().toList(), RunFacts.of(data),
                new FactorLoop(data, styles).section().stream().toList(), data.study().report().paper().spelling());
    }

    /**
     * Every window's charts over time, each in a folded section. The headline window's section is
     * open and holds what the topical sections do not already show (drawdown, trailing volatility);
     * every other window gets all of its charts.
     */
    private static List<ReportView.WindowCharts> overTime(ReportData data, ChartSet charts, int focus) {
        List<ReportView.WindowCharts> out = new ArrayList<>();
        for (int w : data.windows()) {
            List<Figure> figures = new ArrayList<>();
            if (w != focus) {
                figures.addAll(charts.growth(w));
            }
            figures.addAll(charts.drawdown(w));
            figures.addAll(charts.rollingVolatility(w));
            if (w != focus) {
                figures.addAll(charts.turnover(w));
                figures.addAll(charts.forecasts(w));
                figures.addAll(charts.effectiveHoldings(w));
                figures.addAll(charts.largestWeight(w));
            }
            String heading = Words.periods(w) + " window" + (w == focus
                    ? ": drawdown and trailing volatility (growth, turnover, forecasts and concentration of this "
                    + "window are in their sections)"
                    : ": growth, drawdown, volatility, turnover, forecasts and concentration");
            out.add(new ReportView.WindowCharts(w, heading, w == focus, figures));
        }
        return out;
    }

    private static String subtitle(ReportData data, int focus, int span) {
        return "Out-of-sample period " + RunFacts.period(data.run()) + ". The sections' charts over time show the "
                + focus + "-period window, the window of the lowest realised volatility in this history (whether"
                + " that edge is more than chance is said in the first section); every window's charts are "
                + "under \"Over time, window by window\". Trailing volatility uses " + span + " periods.";
    }

    private static List<ReportView.Swatch> palette() {
        List<ReportView.Swatch> out = new ArrayList<>();
        for (ModelFamily f : ModelFamily.values()) {
            out.add(new ReportView.Swatch(f.cssClass(), f.cssColour()));
        }
        return out;
    }

    private static List<ReportView.LegendEntry> legend(ReportData data, StyleBook styles) {
        List<String> names = new ArrayList<>(data.run().paths().stream().map(PathResult::strategy).distinct().toList());
        names.add(Families.MARKET);
        List<ReportView.LegendEntry> out = new ArrayList<>();
        for (ModelFamily f : ModelFamily.values()) {
            List<String> members = names.stream().filter(n -> styles.family(n) == f).collect(Collectors.toList());
            if (!members.isEmpty()) {
                out.add(new ReportView.LegendEntry(f.label(), f.cssClass(), String.join(", ", members)));
            }
        }
        return out;
    }
}
