package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import org.junit.jupiter.api.Test;

import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The one-pass sums behind the dense single-index shrinkage against the straightforward loops of
 * their definitions (Ledoit &amp; Wolf 2003, J. Empirical Finance, appendix: π̂, ρ̂ and γ̂ as sums
 * over all pairs (i, j) and rows t), on seeded simulated windows ({@link Windows#simulated}).
 */
class DenseSingleIndexShrinkageProperties {
    /** The same sums in another order: rounding only. */
    private static final double ROUNDING_TOL = 1e-12;
    /** Windows per property, drawn from a fixed seed. */
    private static final int CASES = 40;

    /**
     * Σ_ij s_ij², Σ_i s_ii², Σ_{i≠j} f_ij s_ij and Σ_ij (f_ij − s_ij)² from the upper triangle
     * equal the full double loops over the matrix F the single-index model builds
     * ({@link SingleIndexCovariance#dense()} with S_ii on the diagonal), for n from 1 to 23 (the
     * four-way unrolled loops meet every remainder).
     */
    @Test
    void targetSums_matchFullDoubleLoops() {
        SplittableRandom cases = new SplittableRandom(0x5EED_0101L);
        for (int c = 0; c < CASES; c++) {
            int n = 1 + cases.nextInt(23);
            int len = n + 2 + cases.nextInt(40);
            EstimationWindow w = Windows.simulated(cases.nextLong(1, 1_000_000), len, n);
            WindowMoments m = w.moments();
            double[] s = m.covariance();
            double[] f = target(m);
            double squares = 0;
            double diagonal = 0;
            double products = 0;
            double distance = 0;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double sij = s[i * n + j];
                    squares += sij * sij;
                    distance += (f[i * n + j] - sij) * (f[i * n + j] - sij);
                    if (i == j) {
                        diagonal += sij * sij;
                    } else {
                        products += f[i * n + j] * sij;
                    }
                }
            }
            SingleIndexCovariance si = SingleIndexCovariance.fit(m);
            SingleIndexTargetSums sums = SingleIndexTargetSums.of(s, n, si.marketVariance(), si.betas());
            String label = " (case " + c + ", n = " + n + ", L = " + len + ")";
            Close.relative(squares, sums.sampleSquares(), ROUNDING_TOL, "sum s^2" + label);
            Close.relative(diagonal, sums.diagonalSquares(), ROUNDING_TOL, "sum s_ii^2" + label);
            Close.relative(products, sums.targetTimesSample(), ROUNDING_TOL, "sum f s" + label);
            Close.relative(distance, sums.distance(), ROUNDING_TOL, "sum (f - s)^2" + label);
        }
    }

    /**
     * The split row sums ({@link CentredRowSums}) equal the per-row formulas they rearrange:
     * Σ_t ỹ_t Σ_i x̃_ti² (c_t − a_i x̃_ti), Σ_t ỹ_t² (c_t² − Σ_i a_i² x̃_ti²),
     * Σ_t (c_t² − Σ_i a_i² x̃_ti²), Σ_t (Σ_i x̃_ti²)², Σ_t Σ_i x̃_ti⁴ and Σ_t x̃_ti², with random
     * weights a_i, for n from 1 to 23.
     */
    @Test
    void rowSums_matchPerRowFormulas() {
        SplittableRandom cases = new SplittableRandom(0x5EED_0102L);
        for (int c = 0; c < CASES; c++) {
            int n = 1 + cases.nextInt(23);
            int len = 3 + cases.nextInt(60);
            CentredWindow w = new CentredWindow(Windows.simulated(cases.nextLong(1, 1_000_000), len, n));
            double[] a = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = cases.nextDouble() - 0.3;
            }
            double cross = 0;
            double market = 0;
            double target = 0;
            double norms = 0;
            double fourth = 0;
            double[] own = new double[n];
            double[] x = new double[n];
            for (int t = 0; t < len; t++) {
                double y = w.row(t, x);
                double ct = 0;
                double ownSq = 0;
                double q = 0;
                for (int i = 0; i < n; i++) {
                    ct += a[i] * x[i];
                    ownSq += a[i] * a[i] * x[i] * x[i];
                    q += x[i] * x[i];
                    fourth += x[i] * x[i] * x[i] * x[i];
                    own[i] += x[i] * x[i];
                }
                for (int i = 0; i < n; i++) {
                    cross += y * x[i] * x[i] * (ct - a[i] * x[i]);
                }
                market += y * y * (ct * ct - ownSq);
                target += ct * ct - ownSq;
                norms += q * q;
            }
            CentredRowSums rows = CentredRowSums.of(w, a);
            String label = " (case " + c + ", n = " + n + ", L = " + len + ")";
            double scale = norms;
            // The three cross terms can be near zero: compare them on the scale of Σ_t q_t² times the weights.
            double weight = 0;
            for (double ai : a) {
                weight += ai * ai;
            }
            double crossScale = scale * Math.sqrt(weight) * maxAbs(w);
            assertEquals(cross, rows.cross(), ROUNDING_TOL * crossScale, "cross" + label);
            assertEquals(market, rows.market(), ROUNDING_TOL * crossScale * maxAbs(w), "market" + label);
            assertEquals(target, rows.targetTimesSample(), ROUNDING_TOL * scale * weight, "target" + label);
            Close.relative(norms, rows.squaredNorms(), ROUNDING_TOL, "sum q^2" + label);
            Close.relative(fourth, rows.fourthPowers(), ROUNDING_TOL, "sum x^4" + label);
            Close.relative(own, rows.ownSquares(), ROUNDING_TOL, "sum x^2" + label);
        }
    }

    /**
     * The estimate is δF + (1 − δ)S entry for entry, bit for bit, with F the single-index model's
     * own dense matrix with S_ii on its diagonal (the paper's target) and δ the estimate's
     * intensity: the on-the-fly target rounds exactly like the stored one.
     */
    @Test
    void estimate_isTheConvexCombinationOfTargetAndSample() {
        SplittableRandom cases = new SplittableRandom(0x5EED_0103L);
        for (int c = 0; c < CASES; c++) {
            int n = 1 + cases.nextInt(23);
            int len = n + 2 + cases.nextInt(40);
            EstimationWindow w = Windows.simulated(cases.nextLong(1, 1_000_000), len, n);
            CovarianceEstimate est = new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).dense(w);
            double delta = est.shrinkage().orElseThrow();
            double[] f = target(w.moments());
            double[] s = w.moments().covariance();
            double[] sigma = est.dense();
            for (int k = 0; k < s.length; k++) {
                assertEquals(delta * f[k] + (1.0 - delta) * s[k], sigma[k], 0.0, "entry " + k + " of case " + c);
            }
        }
    }

    private static double[] target(WindowMoments m) {
        int n = m.assets();
        double[] f = SingleIndexCovariance.fit(m).dense().clone();
        for (int i = 0; i < n; i++) {
            f[i * n + i] = m.covariance(i, i);
        }
        return f;
    }

    private static double maxAbs(CentredWindow w) {
        double[] x = new double[w.assets()];
        double max = 0;
        for (int t = 0; t < w.length(); t++) {
            max = Math.max(max, Math.abs(w.row(t, x)));
            for (double v : x) {
                max = Math.max(max, Math.abs(v));
            }
        }
        return max;
    }
}
