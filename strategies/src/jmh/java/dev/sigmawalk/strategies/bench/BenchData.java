package dev.sigmawalk.strategies.bench;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Supplier;

/**
 * Invented daily returns for the benchmarks: a market factor with 1 % daily volatility, betas
 * spread over 0.4-1.6, residual volatility 1-2.5 % a day of which a fifth is shared by the ten
 * assets of a sector, so the covariance looks like an equity universe's without being one. Every
 * asset has a return in every row. Seeded, so every run measures the same numbers.
 */
final class BenchData {
    /** Estimation window length of every benchmark, about four years of daily rows. */
    static final int WINDOW = 1000;
    /** Rows between rebalances, as in the end-to-end case. */
    static final int STEP = 21;

    private BenchData() {
    }

    static ReturnPanel panel(int rows, int n, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] beta = new double[n];
        double[] vol = new double[n];
        for (int i = 0; i < n; i++) {
            beta[i] = 0.4 + 1.2 * rng.nextDouble();
            vol[i] = 0.01 + 0.015 * rng.nextDouble();
        }
        int sectors = Math.max(1, n / 10);
        double[] r = new double[rows * n];
        double[] m = new double[rows];
        double[] rf = new double[rows];
        double[] shock = new double[sectors];
        for (int t = 0; t < rows; t++) {
            rf[t] = 0.0001;
            double f = 0.0002 + 0.01 * rng.nextGaussian();
            m[t] = rf[t] + f + 0.0005 * rng.nextGaussian();
            for (int s = 0; s < sectors; s++) {
                shock[s] = rng.nextGaussian();
            }
            for (int i = 0; i < n; i++) {
                double e = Math.sqrt(0.2) * shock[i % sectors] + Math.sqrt(0.8) * rng.nextGaussian();
                r[t * n + i] = rf[t] + beta[i] * f + vol[i] * e;
            }
        }
        LocalDate[] dates = new LocalDate[rows];
        for (int t = 0; t < rows; t++) {
            dates[t] = LocalDate.of(2001, 1, 1).plusDays(t);
        }
        List<String> ids = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            ids.add(String.format("B%04d", i));
        }
        return new ReturnPanel(dates, ids, r, m, rf, "bench-index", 252);
    }

    /** The window of every asset over rows endRow−length+1..endRow. */
    static EstimationWindow window(ReturnPanel p, int endRow, int length, Supplier<WindowMoments> moments) {
        int n = p.assetCount();
        double[] x = new double[length * n];
        double[] m = new double[length];
        int first = endRow - length + 1;
        for (int t = 0; t < length; t++) {
            double rf = p.riskFree(first + t);
            m[t] = p.market(first + t) - rf;
            for (int i = 0; i < n; i++) {
                x[t * n + i] = p.value(first + t, i) - rf;
            }
        }
        int[] cols = new int[n];
        for (int i = 0; i < n; i++) {
            cols[i] = i;
        }
        return new EstimationWindow(p.date(endRow), endRow, p.assets(), cols, x, m, p.periodsPerYear(), moments);
    }

    /** Every panel column, ascending. */
    static int[] allColumns(int n) {
        int[] cols = new int[n];
        for (int i = 0; i < n; i++) {
            cols[i] = i;
        }
        return cols;
    }
}
