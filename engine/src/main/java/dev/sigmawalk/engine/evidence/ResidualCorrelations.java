package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.PriorityQueue;

/**
 * Correlations ρ_ij of the market-model residuals of one estimation window (Method §8), the
 * raw material of the single-index adequacy checks.
 *
 * <p>The residuals never need to be formed. With e_i = (x_i - x̄_i) - β_i (m - m̄) and
 * β_i = s_im / s_mm (least squares with an intercept, so every e_i has mean zero),
 * <pre>
 *   cov(e_i, e_j) = S_ij - β_j s_im - β_i s_jm + β_i β_j s_mm = S_ij - s_im s_jm / s_mm,
 *   d_i = cov(e_i, e_i) = S_ii - s_im² / s_mm,
 *   ρ_ij = cov(e_i, e_j) / √(d_i d_j),
 * </pre>
 * all from the window's shared moments (divisor L-1, which cancels in ρ). Cost O(n²).
 *
 * <p>Edge cases: fewer than two assets, a window shorter than 3 rows, a market variance that is
 * not positive, or an asset whose residual variance is not above 1e-12 of its total variance
 * (it moves exactly with the market, so ρ is undefined) are rejected with an
 * {@link IllegalArgumentException} naming the cause. Rounding can push |ρ| a hair past 1; it is
 * clamped to [-1, 1].
 */
public final class ResidualCorrelations {
    /** A residual variance below this share of the asset's variance counts as zero. */
    static final double RELATIVE_ZERO_VARIANCE = 1e-12;

    private final List<String> assets;
    private final int length;
    private final double[] correlation;
    private final PairSums sums;

    private ResidualCorrelations(List<String> assets, int length, double[] correlation, PairSums sums) {
        this.assets = assets;
        this.length = length;
        this.correlation = correlation;
        this.sums = sums;
    }

    /** The residual correlations of a window, from its shared {@link EstimationWindow#moments()}. */
    public static ResidualCorrelations of(EstimationWindow window) {
        return of(window.moments(), window.assets());
    }

    /**
     * The residual correlations from sample moments.
     *
     * @param moments the window's moments (S, s_im, s_mm, L)
     * @param assets asset ids in the moments' order
     */
    public static ResidualCorrelations of(WindowMoments moments, List<String> assets) {
        double[] residualSd = residualDeviations(moments, assets);
        int n = moments.assets();
        // The strict upper triangle, row by row: half the memory of the full matrix, written and
        // read in order.
        double[] rho = new double[n * (n - 1) / 2];
        PairSums sums = PairSums.of(moments, residualSd, rho);
        return new ResidualCorrelations(List.copyOf(assets), moments.length(), rho, sums);
    }

    /**
     * The statistics of {@link #diagnostics()} (with the mean |ρ|) in the same single pass over the
     * upper triangle of S, without storing the n(n-1)/2 correlations: for the rebalances that
     * need neither the largest pairs nor the sector means. The sums are taken in the same order,
     * so the result equals {@code of(moments, assets).diagnostics()} exactly.
     */
    public static ResidualDiagnostics diagnostics(WindowMoments moments, List<String> assets) {
        PairSums sums = PairSums.of(moments, residualDeviations(moments, assets), null);
        return sums.diagnostics(moments.assets(), moments.length());
    }

    /** √d_i for every asset, after the checks of the class comment. */
    private static double[] residualDeviations(WindowMoments moments, List<String> assets) {
        int n = moments.assets();
        if (assets.size() != n) {
            throw new IllegalArgumentException("asset ids (" + assets.size() + ") must match the moments' n (" + n + ")");
        }
        if (!(n >= 2)) {
            throw new IllegalArgumentException("residual correlations need >= 2 assets, got " + n);
        }
        if (!(moments.length() >= 3)) {
            throw new IllegalArgumentException("window length (" + moments.length() + ") must be >= 3 for market-model residuals");
        }
        double smm = moments.marketVariance();
        if (!(smm > 0) || Double.isInfinite(smm)) {
            throw new IllegalArgumentException("market variance (" + smm + ") must be finite and > 0");
        }
        double[] sim = moments.marketCovariance();
        double[] residualSd = new double[n];
        for (int i = 0; i < n; i++) {
            double sii = moments.covariance(i, i);
            double d = sii - sim[i] * sim[i] / smm;
            if (!(d > RELATIVE_ZERO_VARIANCE * sii) || Double.isInfinite(d)) {
                throw new IllegalArgumentException("asset '" + assets.get(i) + "' has residual variance " + d
                        + " of total " + sii + ": it must be finite and > 0 for a residual correlation");
            }
            residualSd[i] = Math.sqrt(d);
        }
        return residualSd;
    }

    /**
     * Σ ρ_ij, Σ |ρ_ij| and Σ ρ_ij² over the pairs i &lt; j, summed while the correlations are made,
     * so that the statistics cost no second pass over S. Per pair
     * ρ_ij = (S_ij − s_im β_j) · (1/√d_i)(1/√d_j) with β_j = s_jm / s_mm: multiplications only.
     * Row i of S is copied into a buffer and its correlations made there by a loop whose arrays
     * all share the index j, which the JIT vectorises (it leaves a loop that reads S at a row
     * offset scalar); a second loop over the buffer, still in the cache, adds them up in four
     * interleaved partial sums so that the additions pipeline. The order is fixed, so the result
     * is the same on every run.
     */
    private record PairSums(double sum, double sumAbs, double sumSquares) {

        /** @param packed where to store the strict upper triangle row by row, or null not to keep it */
        static PairSums of(WindowMoments moments, double[] residualSd, double[] packed) {
            int n = moments.assets();
            double smm = moments.marketVariance();
            double[] sim = moments.marketCovariance();
            double[] s = moments.covariance();
            double[] beta = new double[n];
            double[] scale = new double[n];
            for (int i = 0; i < n; i++) {
                beta[i] = sim[i] / smm;
                scale[i] = 1.0 / residualSd[i];
            }
            double[] rho = new double[n];
            double[] row = new double[3];
            double sum = 0;
            double sumAbs = 0;
            double sumSquares = 0;
            int at = 0;
            for (int i = 0; i < n; i++) {
                int first = i + 1;
                System.arraycopy(s, i * n + first, rho, first, n - first);
                correlations(rho, first, sim[i], scale[i], scale, beta);
                if (packed != null) {
                    System.arraycopy(rho, first, packed, at, n - first);
                }
                sums(rho, first, row);
                sum += row[0];
                sumAbs += row[1];
                sumSquares += row[2];
                at += n - first;
            }
            return new PairSums(sum, sumAbs, sumSquares);
        }

        /**
         * ρ_ij for j ≥ first into rho[j], clamped to [−1, 1], from S_ij in rho[j] on entry:
         * (S_ij − s_im β_j) · (ui · scale_j), the order of operations of the definition above.
         */
        private static void correlations(double[] rho, int first, double si, double ui, double[] scale,
                                         double[] beta) {
            for (int j = first; j < rho.length; j++) {
                rho[j] = clamp((rho[j] - si * beta[j]) * (ui * scale[j]));
            }
        }

        /**
         * Sum, absolute sum and sum of squares of rho[first..] into sums[0..2], each in four
         * partial sums taken in the order j = first, first + 1, ... (term k of the row into partial
         * sum k mod 4, the rest after the last group of four into the first).
         */
        private static void sums(double[] rho, int first, double[] sums) {
            int n = rho.length;
            double r0 = 0;
            double r1 = 0;
            double r2 = 0;
            double r3 = 0;
            double a0 = 0;
            double a1 = 0;
            double a2 = 0;
            double a3 = 0;
            double q0 = 0;
            double q1 = 0;
            double q2 = 0;
            double q3 = 0;
            int j = first;
            for (; j + 4 <= n; j += 4) {
                double p0 = rho[j];
                double p1 = rho[j + 1];
                double p2 = rho[j + 2];
                double p3 = rho[j + 3];
                r0 += p0;
                r1 += p1;
                r2 += p2;
                r3 += p3;
                a0 += Math.abs(p0);
                a1 += Math.abs(p1);
                a2 += Math.abs(p2);
                a3 += Math.abs(p3);
                q0 += p0 * p0;
                q1 += p1 * p1;
                q2 += p2 * p2;
                q3 += p3 * p3;
            }
            for (; j < n; j++) {
                double p = rho[j];
                r0 += p;
                a0 += Math.abs(p);
                q0 += p * p;
            }
            sums[0] = (r0 + r1) + (r2 + r3);
            sums[1] = (a0 + a1) + (a2 + a3);
            sums[2] = (q0 + q1) + (q2 + q3);
        }

        /** Rounding can push |ρ| a hair past 1. */
        private static double clamp(double rho) {
            return Math.max(-1.0, Math.min(1.0, rho));
        }

        ResidualDiagnostics diagnostics(int n, int length) {
            return ResidualDiagnostics.fromSums(n, length, sum, sumSquares, sumAbs / (n * (n - 1) / 2));
        }
    }

    /** Asset ids, in the order of the indices used here. */
    public List<String> assets() {
        return assets;
    }

    /** n. */
    public int assetCount() {
        return assets.size();
    }

    /** L, the number of rows the residuals span. */
    public int length() {
        return length;
    }

    /** ρ_ij (1 on the diagonal). */
    public double correlation(int i, int j) {
        int n = assets.size();
        Objects.checkIndex(i, n);
        Objects.checkIndex(j, n);
        if (i == j) {
            return 1.0;
        }
        int a = Math.min(i, j);
        int b = Math.max(i, j);
        return correlation[rowStart(a, n) + (b - a - 1)];
    }

    /** Where row i's pairs (i, i+1..n-1) start in the packed upper triangle. */
    private static int rowStart(int i, int n) {
        return (int) ((long) i * (2L * n - i - 1) / 2);
    }

    /** The adequacy statistics of Method §8 (mean |ρ|, Breusch-Pagan LM, Pesaran CD). */
    public ResidualDiagnostics diagnostics() {
        return sums.diagnostics(assets.size(), length);
    }

    /**
     * The k pairs i &lt; j with the largest (signed) residual correlation, largest first; ties keep
     * the order (i, j) ascending, so the list is deterministic.
     *
     * @param k how many, >= 0; fewer are returned when there are fewer pairs
     */
    public List<ResidualPair> largestPairs(int k) {
        if (!(k >= 0)) {
            throw new IllegalArgumentException("pair count (" + k + ") must be >= 0");
        }
        int n = assets.size();
        // Keep the k best in a heap whose head is the worst kept: O(n² log k), no n² list.
        Comparator<int[]> better = Comparator.<int[]>comparingDouble(p -> correlation(p[0], p[1]))
                .thenComparing((p, q) -> p[0] != q[0] ? Integer.compare(q[0], p[0]) : Integer.compare(q[1], p[1]));
        PriorityQueue<int[]> kept = new PriorityQueue<>(Math.max(1, k), better);
        double worstKept = Double.NEGATIVE_INFINITY;
        int at = 0;
        for (int i = 0; i < n && k > 0; i++) {
            for (int j = i + 1; j < n; j++) {
                double r = correlation[at++];
                if (kept.size() < k) {
                    kept.add(new int[] {i, j});
                    if (kept.size() == k) {
                        worstKept = correlation(kept.peek()[0], kept.peek()[1]);
                    }
                } else if (r > worstKept) {
                    // Pairs come in ascending (i, j) order, so a later pair that only ties the
                    // worst kept one never beats it: comparing the correlations alone is exact.
                    kept.poll();
                    kept.add(new int[] {i, j});
                    worstKept = correlation(kept.peek()[0], kept.peek()[1]);
                }
            }
        }
        List<int[]> ordered = new ArrayList<>(kept);
        ordered.sort(better.reversed());
        List<ResidualPair> pairs = new ArrayList<>(ordered.size());
        for (int[] p : ordered) {
            pairs.add(new ResidualPair(assets.get(p[0]), assets.get(p[1]), correlation(p[0], p[1])));
        }
        return List.copyOf(pairs);
    }

    /**
     * Mean residual correlation within each sector and across sectors, to show whose residuals
     * co-move (a shared sector factor the single index misses).
     *
     * @param sectorOf sector of every asset id of this window
     */
    public SectorCoMovement bySector(Map<String, String> sectorOf) {
        Objects.requireNonNull(sectorOf, "sectorOf");
        return SectorCoMovement.of(this, sectorOf);
    }
}
