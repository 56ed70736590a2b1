package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class ExactPairMomentsTest {
    /** Traces from orthonormal bases against explicit L×L matrices in numpy: rounding only. */
    private static final double NUMPY = 1e-11;
    private static final int LENGTH = 24;

    /**
     * Two different regressions over 24 rows, Z_i = [1, sin(t/3), t/10], Z_j = [1, cos(t/4)]:
     * tr(M_i M_j), tr((M_i M_j)²), μ_ij and v_ij with d_ij = √(21 · 22). Source: numpy 2.x with
     * explicit residual makers I - Z pinv(Z) and the Pesaran-Ullah-Yamagata (2008) formulas,
     * {@code lm_adj_traces.py} beside {@code lm_adj_traces.txt} in the test resources.
     */
    @Test
    void differentRegressions_matchExplicitNumpyMatrices() {
        ExactPairMoments m = ExactPairMoments.of(RegressorSpace.of(first()), RegressorSpace.of(second()));
        assertEquals(20.606494454781213, m.traceProduct(), NUMPY, "tr(MiMj)");
        assertEquals(20.36783552368036, m.traceProductSquared(), NUMPY, "tr((MiMj)^2)");
        assertEquals(0.9587008860918783, m.mean(), NUMPY, "mu");
        assertEquals(1.268915864005184, m.sd(), NUMPY, "v");
        ExactPairMoments swapped = ExactPairMoments.of(RegressorSpace.of(second()), RegressorSpace.of(first()));
        assertEquals(m.traceProduct(), swapped.traceProduct(), NUMPY, "tr(MiMj) = tr(MjMi)");
        assertEquals(m.traceProductSquared(), swapped.traceProductSquared(), NUMPY, "tr((MiMj)^2) symmetric");
    }

    /**
     * A common regression: μ = 1 and v² = 2(d-1)/(d+2) (Method §8, the paper's special case), here
     * d = 22, v = √1.75 = 1.3228756555322954 (numpy, same script), whether computed from the
     * bases or from the closed form.
     */
    @Test
    void commonRegression_reducesToClosedForm() {
        double[][] z = {first()[0], first()[1]};
        ExactPairMoments fromBases = ExactPairMoments.of(RegressorSpace.of(z), RegressorSpace.of(z));
        ExactPairMoments closed = ExactPairMoments.common(LENGTH, 2);
        for (ExactPairMoments m : new ExactPairMoments[] {fromBases, closed}) {
            assertEquals(22.0, m.traceProduct(), NUMPY);
            assertEquals(22.0, m.traceProductSquared(), NUMPY);
            assertEquals(1.0, m.mean(), NUMPY);
            assertEquals(1.3228756555322954, m.sd(), NUMPY);
        }
        assertEquals(Math.sqrt(2.0 * 21 / 24), closed.sd(), 1e-15);
    }

    /**
     * Our d_ij = √((L - k_i)(L - k_j)) for unequal regressor counts (not in the paper): with
     * independent normal errors the standardised indicator (d_ij ρ̂² - μ_ij) / v_ij must have mean
     * about 0 and variance about 1. 20,000 seeded draws; the standard error of the mean is about
     * 0.007 and that of the variance about 0.02 (moments of a fourth-power statistic), so the bands
     * below are several standard errors wide.
     */
    @Test
    void unequalRegressorCounts_standardisedIndicatorHasMeanZeroVarianceOne() {
        RegressorSpace qi = RegressorSpace.of(first());
        RegressorSpace qj = RegressorSpace.of(second());
        ExactPairMoments m = ExactPairMoments.of(qi, qj);
        java.util.SplittableRandom random = new java.util.SplittableRandom(20_080_105L);
        int draws = 20_000;
        double sum = 0;
        double squares = 0;
        for (int k = 0; k < draws; k++) {
            double[] ei = qi.residual(NullModel.NORMAL.series(random, LENGTH));
            double[] ej = qj.residual(NullModel.NORMAL.series(random, LENGTH));
            double z = m.standardise(correlation(ei, ej));
            sum += z;
            squares += z * z;
        }
        double mean = sum / draws;
        double variance = squares / draws - mean * mean;
        assertEquals(0.0, mean, 0.03, "mean of the standardised indicator");
        assertEquals(1.0, variance, 0.12, "variance of the standardised indicator");
    }

    /** ρ̂ of two least-squares residual vectors (their correlation about zero, as in the paper). */
    private static double correlation(double[] a, double[] b) {
        double ab = 0;
        double aa = 0;
        double bb = 0;
        for (int t = 0; t < a.length; t++) {
            ab += a[t] * b[t];
            aa += a[t] * a[t];
            bb += b[t] * b[t];
        }
        return ab / Math.sqrt(aa * bb);
    }

    @Test
    void tooFewDegreesOfFreedomOrDependentColumns_areRejected() {
        assertThrows(IllegalArgumentException.class, () -> ExactPairMoments.common(6, 2));
        double[] t = new double[LENGTH];
        double[] twice = new double[LENGTH];
        for (int i = 0; i < LENGTH; i++) {
            t[i] = i;
            twice[i] = 2.0 * i;
        }
        assertThrows(IllegalArgumentException.class, () -> RegressorSpace.of(new double[][] {t, twice}));
    }

    private static double[][] first() {
        double[][] z = new double[3][LENGTH];
        for (int t = 0; t < LENGTH; t++) {
            z[0][t] = 1;
            z[1][t] = Math.sin(t / 3.0);
            z[2][t] = t / 10.0;
        }
        return z;
    }

    private static double[][] second() {
        double[][] z = new double[2][LENGTH];
        for (int t = 0; t < LENGTH; t++) {
            z[0][t] = 1;
            z[1][t] = Math.cos(t / 4.0);
        }
        return z;
    }
}
