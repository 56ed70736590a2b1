package dev.sigmawalk.engine.measures;

import java.util.Arrays;

/**
 * Plain statistics of return series. Means and standard deviations use two passes for accuracy;
 * standard deviations divide by N−1.
 */
public final class SeriesStats {
    private SeriesStats() {
    }

    /** Arithmetic mean; requires at least one value. */
    public static double mean(double[] x) {
        if (x.length == 0) {
            throw new IllegalArgumentException("mean of an empty series");
        }
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }

    /** Sample standard deviation, divisor N−1; requires at least two values. */
    public static double sd(double[] x) {
        return sd(x, 0, x.length);
    }

    /**
     * Sample standard deviation of {@code x[from..to)}, divisor N−1, with the sums taken in index
     * order exactly as {@link #sd(double[])} takes them over a copy of the range (the same value
     * bit for bit, without the copy); requires at least two values.
     */
    public static double sd(double[] x, int from, int to) {
        int n = to - from;
        if (n < 2) {
            throw new IllegalArgumentException("standard deviation needs at least 2 values, got " + n);
        }
        double sum = 0;
        for (int k = from; k < to; k++) {
            sum += x[k];
        }
        double m = sum / n;
        double s = 0;
        for (int k = from; k < to; k++) {
            double d = x[k] - m;
            s += d * d;
        }
        return Math.sqrt(s / (n - 1));
    }

    /** a − b element by element. */
    public static double[] minus(double[] a, double[] b) {
        if (a.length != b.length) {
            throw new IllegalArgumentException("series lengths differ: " + a.length + " and " + b.length);
        }
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i] - b[i];
        }
        return out;
    }

    /**
     * The first row whose return is −1 or below (−100 % or worse, possible with short positions
     * or leverage), where wealth W_t = Π_{s≤t}(1 + R_s) reaches 0 or goes below it; −1 when none.
     * From there the product is no longer wealth (a second such row would turn it positive
     * again), so the measures below take the wealth as gone: ruin.
     */
    public static int firstRuin(double[] r) {
        for (int i = 0; i < r.length; i++) {
            if (!(1 + r[i] > 0)) {
                return i;
            }
        }
        return -1;
    }

    /**
     * Largest peak-to-trough loss of wealth W_t = Π_{s≤t}(1 + R_s), with W = 1 just before the
     * first row: max_t (1 − W_t / max_{s≤t} W_s), as a positive fraction (0 when wealth never
     * falls); 1 (all of it) once wealth is gone ({@link #firstRuin}), never more.
     */
    public static double maxDrawdown(double[] r) {
        double wealth = 1;
        double peak = 1;
        double worst = 0;
        for (double v : r) {
            if (!(1 + v > 0)) {
                return 1;
            }
            wealth *= 1 + v;
            peak = Math.max(peak, wealth);
            worst = Math.max(worst, 1 - wealth / peak);
        }
        return worst;
    }

    /** Drawdown series 1 − W_t / max_{s≤t} W_s, one value per row; 1 from the row of ruin on. */
    public static double[] drawdowns(double[] r) {
        double[] out = new double[r.length];
        double wealth = 1;
        double peak = 1;
        for (int i = 0; i < r.length; i++) {
            if (!(1 + r[i] > 0)) {
                Arrays.fill(out, i, r.length, 1.0);
                return out;
            }
            wealth *= 1 + r[i];
            peak = Math.max(peak, wealth);
            out[i] = 1 - wealth / peak;
        }
        return out;
    }

    /**
     * Compound annual growth (Π(1 + R_t))^(p/N) − 1, using logs to avoid overflow; −1 (all of it
     * lost) once wealth is gone ({@link #firstRuin}), where the product is no longer wealth.
     */
    public static double cagr(double[] r, int periodsPerYear) {
        double logGrowth = 0;
        for (double v : r) {
            if (!(1 + v > 0)) {
                return -1;
            }
            logGrowth += Math.log1p(v);
        }
        return Math.expm1(logGrowth * periodsPerYear / r.length);
    }
}
