package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the sweep reads back from a finished point's folder. */
class PointFilesTest {
    private static final String SUMMARY = "strategy,window,periods,mean_return,volatility,sharpe,cagr,max_drawdown,"
            + "mean_turnover,tracking_error,information_ratio,forecast_volatility,bias\n";
    private static final String REBALANCES = "date,strategy,window,assets,turnover,cost,forecast_volatility,shrinkage,"
            + "missing_held,status,note\n";

    /**
     * A path whose every rebalance failed held cash throughout and is marked as never invested;
     * one ok rebalance is enough to count as invested; the market row always counts. The figures
     * are the summary's own, read back unchanged.
     */
    @Test
    void summary_marksThePathsThatNeverFormedAPortfolio(@TempDir Path folder) throws IOException {
        Files.writeString(folder.resolve("summary.csv"), SUMMARY
                + "cash,24,36,0.02,0.0,,0.02,0.0,0.0,0.15,,,\n"
                + "model,24,36,0.06,0.11,0.4,0.06,0.2,0.3,0.05,0.1,0.1,1.1\n"
                + "model,60,36,0.05,0.12,0.3,0.05,0.2,0.2,0.05,0.1,0.1,1.0\n"
                + "market,,36,0.07,0.15,0.3,0.07,0.3,,,,,\n");
        Files.writeString(folder.resolve("rebalances.csv"), REBALANCES
                + "2020-01-31,cash,24,72,0,0,,,0,failed,sample covariance singular\n"
                + "2020-04-30,cash,24,72,0,0,,,0,failed,sample covariance singular\n"
                + "2020-01-31,model,24,72,1,0.001,0.03,,0,failed,no portfolio\n"
                + "2020-04-30,model,24,72,0.2,0.0002,0.03,,0,ok,\n"
                + "2020-01-31,model,60,72,1,0.001,0.03,,0,ok,\n");
        GridPoint point = new GridPoint(1, "001", List.of("1"), folder, "");
        List<PointRow> rows = PointFiles.summary(point);
        assertEquals(4, rows.size());
        assertEquals(List.of(false, true, true, true), rows.stream().map(PointRow::invested).toList());
        assertEquals(List.of("cash", "model", "model", "market"), rows.stream().map(PointRow::strategy).toList());
        assertEquals(0.11, rows.get(1).volatility(), 0.0);
        assertEquals(Double.NaN, rows.get(3).bias(), 0.0);
    }
}
