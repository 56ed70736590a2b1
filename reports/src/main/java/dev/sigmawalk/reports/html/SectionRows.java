package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.evidence.VolatilityByYear;
import dev.sigmawalk.engine.evidence.YearVolatility;
import dev.sigmawalk.engine.evidence.BiasStatistic;
import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.reports.charts.StyleBook;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/** The tables of the cost, honesty, concentration and shrinkage sections, one row per path. */
final class SectionRows {
    private final ReportData data;
    private final Map<PathResult, PathFacts> facts;
    private final StyleBook styles;

    SectionRows(ReportData data, Map<PathResult, PathFacts> facts, StyleBook styles) {
        this.data = data;
        this.facts = facts;
        this.styles = styles;
    }

    List<ReportView.CostRow> cost() {
        List<ReportView.CostRow> rows = new ArrayList<>();
        for (PathResult p : data.run().paths()) {
            PathFacts f = facts.get(p);
            rows.add(new ReportView.CostRow(p.strategy(), css(p), Words.periods(p.window()),
                    Formats.percent(data.summary(p).meanTurnover()), Formats.percent(f.totalCost()),
                    Formats.percent(f.annualCost()), Integer.toString(f.rebalances()), Long.toString(f.failures())));
        }
        return rows;
    }

    List<ReportView.HonestyRow> honesty() {
        List<ReportView.HonestyRow> rows = new ArrayList<>();
        for (PathResult p : data.run().paths()) {
            Summary s = data.summary(p);
            int n = facts.get(p).forecastRows();
            String band = Formats.NOT_APPLICABLE;
            String verdict = "not enough forecasts";
            Optional<BiasStatistic> stat = BiasStatistic.overForecastRows(p.gross(), data.run().riskFree(),
                    p.forecastVolatility());
            if (s.bias().isPresent() && stat.isPresent()) {
                // Both bands are shown; the verdict uses the kurtosis-adjusted one (Method §7).
                BiasStatistic b = stat.get();
                band = Formats.ratio(b.bandLow()) + " to " + Formats.ratio(b.bandHigh()) + " (normal); "
                        + Formats.ratio(b.robustLow()) + " to " + Formats.ratio(b.robustHigh()) + " (fat-tail adjusted)";
                double v = s.bias().getAsDouble();
                verdict = b.withinRobustBand() ? "inside the adjusted band"
                        : v > b.robustHigh() ? "risk understated" : "risk overstated";
            }
            String beyond = stat.map(b -> Formats.percent(b.shareBeyondTwo())).orElse(Formats.NOT_APPLICABLE);
            rows.add(new ReportView.HonestyRow(p.strategy(), css(p), Words.periods(p.window()),
                    Formats.percent(s.forecastVolatility()), Formats.percent(s.volatility()), Formats.ratio(s.bias()),
                    band, beyond, Integer.toString(n), verdict));
        }
        return rows;
    }

    /** "Year" and the strategies of {@code window}: the header of {@link #years}. */
    List<String> yearHeaders(int window) {
        List<String> h = new ArrayList<>();
        h.add("Year");
        for (PathResult p : data.paths(window)) {
            h.add(p.strategy());
        }
        return h;
    }

    /**
     * Per calendar year, realised ÷ forecast volatility of each strategy of {@code window}
     * ({@link VolatilityByYear}, on the rows that had a forecast); "n/a" where a strategy has fewer
     * than two such rows in that year.
     */
    List<ReportView.TextRow> years(int window) {
        List<PathResult> paths = data.paths(window);
        SortedMap<Integer, String[]> byYear = new TreeMap<>();
        for (int k = 0; k < paths.size(); k++) {
            for (YearVolatility y : yearVolatility(paths.get(k))) {
                String[] cells = byYear.computeIfAbsent(y.year(), year -> blank(paths.size()));
                cells[k] = Formats.ratio(y.ratio());
            }
        }
        List<ReportView.TextRow> rows = new ArrayList<>();
        for (Map.Entry<Integer, String[]> e : byYear.entrySet()) {
            List<String> cells = new ArrayList<>();
            cells.add(Integer.toString(e.getKey()));
            cells.addAll(Arrays.asList(e.getValue()));
            rows.add(new ReportView.TextRow(cells));
        }
        return rows;
    }

    private List<YearVolatility> yearVolatility(PathResult path) {
        double[] sigma = path.forecastVolatility();
        int n = 0;
        for (double s : sigma) {
            n += s > 0 ? 1 : 0;
        }
        if (n < 2) {
            return List.of();
        }
        LocalDate[] dates = new LocalDate[n];
        double[] gross = new double[n];
        double[] rf = new double[n];
        double[] forecast = new double[n];
        int k = 0;
        for (int t = 0; t < sigma.length; t++) {
            if (sigma[t] > 0) {
                dates[k] = data.run().dates()[t];
                gross[k] = path.gross()[t];
                rf[k] = data.run().riskFree()[t];
                forecast[k++] = sigma[t];
            }
        }
        return VolatilityByYear.of(dates, gross, rf, forecast, data.run().periodsPerYear());
    }

    private static String[] blank(int size) {
        String[] cells = new String[size];
        Arrays.fill(cells, Formats.NOT_APPLICABLE);
        return cells;
    }

    List<ReportView.ConcentrationRow> concentration() {
        List<ReportView.ConcentrationRow> rows = new ArrayList<>();
        for (PathResult p : data.run().paths()) {
            PathFacts f = facts.get(p);
            rows.add(new ReportView.ConcentrationRow(p.strategy(), css(p), Words.periods(p.window()),
                    Formats.oneDecimal(f.meanEligible()), Formats.oneDecimal(f.meanEffectiveHoldings()),
                    Formats.oneDecimal(f.minEffectiveHoldings()), Formats.percent(f.meanLargestWeight()),
                    Formats.percent(f.maxLargestWeight())));
        }
        return rows;
    }

    List<ReportView.ShrinkageRow> shrinkage() {
        List<ReportView.ShrinkageRow> rows = new ArrayList<>();
        for (PathResult p : data.run().paths()) {
            facts.get(p).shrinkage().ifPresent(r -> rows.add(new ReportView.ShrinkageRow(p.strategy(), css(p),
                    Words.periods(p.window()), Formats.ratio(r.mean()), Formats.ratio(r.min()), Formats.ratio(r.max()))));
        }
        return rows;
    }

    private String css(PathResult p) {
        return styles.family(p.strategy()).cssClass();
    }
}
