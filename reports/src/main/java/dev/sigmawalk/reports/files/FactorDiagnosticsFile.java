package dev.sigmawalk.reports.files;

import dev.sigmawalk.strategies.risk.FactorDiagnostics;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Writes {@code factor_diagnostics.csv} (Method §11: the Method §8 diagnostics on each factor model's residuals). */
public final class FactorDiagnosticsFile {
    private FactorDiagnosticsFile() {
    }

    /**
     * date,window,model,assets,mean_abs_residual_corr,lm_adj_stat,lm_adj_pvalue,cd_stat,cd_pvalue:
     * one row per rebalance, window and factor model (windows in study order, then dates, then
     * models in study order). LM_adj cells are empty where the window is too short for the
     * model's regressors; a rebalance whose window could not support a model has no row for it.
     *
     * @param byWindow per window length, per rebalance, the diagnostics of each factor model
     */
    public static void write(Path file, Map<Integer, List<List<FactorDiagnostics>>> byWindow, List<Integer> windows) {
        try (CsvWriter csv = new CsvWriter(file, "date", "window", "model", "assets", "mean_abs_residual_corr",
                "lm_adj_stat", "lm_adj_pvalue", "cd_stat", "cd_pvalue")) {
            for (int w : windows) {
                for (List<FactorDiagnostics> rebalance : byWindow.getOrDefault(w, List.of())) {
                    for (FactorDiagnostics d : rebalance) {
                        csv.text(d.date().toString()).integer(w).text(d.model()).integer(d.assets())
                                .number(d.meanAbsCorrelation());
                        if (d.lmAdj().isPresent()) {
                            csv.number(d.lmAdj().get().statistic()).number(d.lmAdj().get().pValue());
                        } else {
                            csv.empty().empty();
                        }
                        csv.number(d.cdStatistic()).number(d.cdPValue()).end();
                    }
                }
            }
        }
    }
}
