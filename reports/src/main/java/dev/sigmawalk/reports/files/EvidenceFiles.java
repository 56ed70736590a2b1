package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.compare.BaselineChoice;
import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.compare.WindowEvidence;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.JobsonKorkieTest;
import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import dev.sigmawalk.engine.evidence.SingleIndexEstimates;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Writes {@code diagnostics.csv}, {@code estimates.csv} and {@code tests.csv} (the README's output files). */
public final class EvidenceFiles {
    private EvidenceFiles() {
    }

    /**
     * {@code diagnostics.csv}: date,window,assets,mean_abs_residual_corr,lm_stat,lm_pvalue,cd_stat,
     * cd_pvalue,lm_adj_stat,lm_adj_pvalue, one row per window length per rebalance (windows in study
     * order). LM_adj cells are empty where the window is too short for it, and the mean |ρ| cell
     * where a large window's all-pairs statistics were not computed at that rebalance (Method §8).
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
     * {@code estimates.csv}: date,window,asset,alpha,beta,residual_variance, every eligible asset of
     * every rebalance and window (windows in study order, then dates, then the window's asset
     * order); α and the residual variance per period (Method §12). A rebalance whose market did not
     * vary has no rows.
     */
    public static void writeEstimates(Path file, Map<Integer, List<WindowEvidence>> byWindow, List<Integer> windows) {
        try (CsvWriter csv = new CsvWriter(file, "date", "window", "asset", "alpha", "beta", "residual_variance")) {
            CsvCell.Cache names = new CsvCell.Cache();
            for (int w : windows) {
                for (WindowEvidence e : byWindow.getOrDefault(w, List.of())) {
                    if (e.estimates().isEmpty()) {
                        continue;
                    }
                    SingleIndexEstimates est = e.estimates().get();
                    CsvCell start = CsvCell.of(e.date().toString()).then(CsvCell.integer(w));
                    List<String> assets = est.assets();
                    double[] alpha = est.alpha();
                    double[] beta = est.beta();
                    double[] residualVariance = est.residualVariance();
                    for (int i = 0; i < assets.size(); i++) {
                        csv.cell(start).cell(names.of(assets.get(i))).number(alpha[i]).number(beta[i])
                                .number(residualVariance[i]).end();
                    }
                }
            }
        }
    }

    /**
     * {@code tests.csv}: one row per compared pair, window and measure: strategy, baseline, window,
     * measure, the two estimates (per period), the difference, its standard error, the statistic,
     * the HAC and bootstrap p-values, the Holm-adjusted p-value across windows, the method, then
     * (added columns) the Jobson-Korkie/Memmel p-value (its own rows only) and the family p-value
     * (Romano-Wolf over every comparison the report chooses among, Method §9). Each p-value column
     * holds only what its name says; a cell that does not apply is empty. A strategy compared with
     * nothing gets one {@code not_compared} row whose method cell says why.
     */
    public static void writeTests(Path file, List<Comparison> comparisons, List<BaselineChoice> choices) {
        try (CsvWriter csv = new CsvWriter(file, "strategy", "baseline", "window", "measure", "estimate",
                "baseline_estimate", "difference", "standard_error", "statistic", "hac_pvalue", "bootstrap_pvalue",
                "holm_pvalue", "method", "jk_pvalue", "family_pvalue")) {
            for (Comparison c : comparisons) {
                c.sharpe().ifPresent(t -> row(csv, c, "sharpe_ratio", t, c.holmSharpe(), c.familySharpe()));
                c.variance().ifPresent(t -> row(csv, c, "variance", t, c.holmVariance(), c.familyVariance()));
                c.jobsonKorkie().ifPresent(t -> jobsonKorkie(csv, c, t));
                if (c.skipped().isPresent()) {
                    csv.text(c.strategy()).text(c.baseline()).integer(c.window()).text("not_run");
                    blanks(csv, 8);
                    csv.text(c.skipped().get()).empty().empty().end();
                }
            }
            for (BaselineChoice b : choices) {
                if (!b.compared()) {
                    csv.text(b.strategy()).empty().empty().text("not_compared");
                    blanks(csv, 8);
                    csv.text("no baseline: " + b.reason()).empty().empty().end();
                }
            }
        }
    }

    /** {@code tests.csv} when every strategy has a baseline (nothing to list as not compared). */
    public static void writeTests(Path file, List<Comparison> comparisons) {
        writeTests(file, comparisons, List.of());
    }

    private static void blanks(CsvWriter csv, int count) {
        for (int i = 0; i < count; i++) {
            csv.empty();
        }
    }

    private static void row(CsvWriter csv, Comparison c, String measure, DifferenceTest t, double holm, double family) {
        csv.text(c.strategy()).text(c.baseline()).integer(c.window()).text(measure).number(t.first())
                .number(t.second()).number(t.difference()).number(t.standardError()).number(t.statistic())
                .number(t.hacPValue()).number(t.bootstrapPValue()).number(holm).text(t.method()).empty()
                .number(family).end();
    }

    private static void jobsonKorkie(CsvWriter csv, Comparison c, JobsonKorkieTest t) {
        csv.text(c.strategy()).text(c.baseline()).integer(c.window()).text("sharpe_ratio_iid").number(t.sharpeA())
                .number(t.sharpeB()).number(t.sharpeA() - t.sharpeB()).empty().number(t.statistic())
                .empty().empty().empty()
                .text("Jobson-Korkie (1981) with Memmel (2003) correction, iid normal returns")
                .number(t.pValue()).empty().end();
    }
}
