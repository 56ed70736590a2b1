package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.measures.Summary;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.reports.charts.StyleBook;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

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
            if (s.bias().isPresent() && n >= 1) {
                Band b = Band.of(n);
                band = Formats.ratio(b.low()) + " to " + Formats.ratio(b.high());
                double v = s.bias().getAsDouble();
                verdict = b.contains(v) ? "inside the band" : v > b.high() ? "risk understated" : "risk overstated";
            }
            rows.add(new ReportView.HonestyRow(p.strategy(), css(p), Words.periods(p.window()),
                    Formats.percent(s.forecastVolatility()), Formats.percent(s.volatility()), Formats.ratio(s.bias()),
                    band, Integer.toString(n), verdict));
        }
        return rows;
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
