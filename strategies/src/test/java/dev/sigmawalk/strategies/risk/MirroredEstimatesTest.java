package dev.sigmawalk.strategies.risk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.DenseProof;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Which dense estimates promise a mirrored Σ ({@link DenseProof#mirrored()}, so that the dense
 * quadratic problem skips its symmetry proof) or a mirrored finite one, and that each promise
 * holds bit for bit.
 */
class MirroredEstimatesTest {

    /**
     * Seeded loop over simulated windows wider than a tile of the validation pass (n up to 90
     * against 64): the sample matrix of two-pass moments promises symmetry, single-index shrinkage
     * built from them symmetry and finiteness (its own write loop checks every value), and every
     * pair Σ_ij, Σ_ji is the same double.
     */
    @Test
    void sampleAndSingleIndexShrinkage_fromMirroredMoments_areMirroredBitForBit() {
        SplittableRandom cases = new SplittableRandom(23L);
        for (int trial = 0; trial < 12; trial++) {
            int n = 20 + cases.nextInt(71);
            int len = n + 10 + cases.nextInt(120);
            EstimationWindow window = Windows.simulated(cases.nextLong(1, 1_000_000), len, n);
            assertEquals(DenseProof.MIRRORED, window.moments().covarianceProof(), "trial " + trial);
            String where = "trial " + trial + " (n = " + n + ", L = " + len + ")";
            assertMirrored(DenseProof.MIRRORED, new SampleRiskModel().estimate(window), where + ", sample");
            assertMirrored(DenseProof.MIRRORED_FINITE, new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX)
                    .estimate(window), where + ", shrinkage to the single index");
        }
    }

    /**
     * The same models over moments handed in without a promise pass none on; the other dense
     * producers (constant-correlation and identity targets) and the factor forms promise nothing
     * either, so their matrices keep the full check.
     */
    @Test
    void otherProducers_promiseNothing() {
        EstimationWindow mirrored = Windows.simulated(5L, 80, 30);
        WindowMoments m = mirrored.moments();
        EstimationWindow handedIn = new EstimationWindow(mirrored.date(), mirrored.endRow(), mirrored.assets(),
                mirrored.columns(), mirrored.excessReturns(), mirrored.marketExcess(), 12,
                () -> new WindowMoments(m.assets(), m.length(), m.mean(), m.marketMean(), m.marketVariance(),
                        m.marketCovariance(), m.covariance()));
        assertEquals(DenseProof.UNPROVEN, new SampleRiskModel().estimate(handedIn).proof());
        assertEquals(DenseProof.UNPROVEN,
                new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).estimate(handedIn).proof());
        assertEquals(DenseProof.UNPROVEN,
                new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION).estimate(mirrored).proof());
        assertEquals(DenseProof.UNPROVEN, new ShrinkageRiskModel(ShrinkageTarget.IDENTITY).estimate(mirrored).proof());
        EstimationWindow wide = Windows.simulated(6L, 12, 120);
        CovarianceEstimate lowRank = new SampleRiskModel().estimate(wide);
        assertInstanceOf(FactorCovariance.class, lowRank);
        assertEquals(DenseProof.UNPROVEN, lowRank.proof());
        assertEquals(DenseProof.UNPROVEN, new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).estimate(wide).proof());
    }

    private static void assertMirrored(DenseProof expected, CovarianceEstimate estimate, String where) {
        assertInstanceOf(DenseCovariance.class, estimate, where);
        assertEquals(expected, estimate.proof(), where);
        int n = estimate.size();
        double[] s = estimate.dense();
        for (int k = 0; k < s.length; k++) {
            if (!Double.isFinite(s[k]) && expected == DenseProof.MIRRORED_FINITE) {
                throw new AssertionError(where + ": entry " + k + " is " + s[k] + " though promised finite");
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (Double.doubleToRawLongBits(s[i * n + j]) != Double.doubleToRawLongBits(s[j * n + i])) {
                    throw new AssertionError(where + ": Σ(" + i + "," + j + ") = " + s[i * n + j] + " but Σ(" + j
                            + "," + i + ") = " + s[j * n + i]);
                }
            }
        }
    }
}
