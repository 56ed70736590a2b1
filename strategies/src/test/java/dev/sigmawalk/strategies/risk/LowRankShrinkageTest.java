package dev.sigmawalk.strategies.risk;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import org.junit.jupiter.api.Test;

/**
 * Shrinkage held as diagonal plus low rank, with the intensity's sums taken through the L×L
 * Gram matrix, against the dense O(L n²) implementation of the same estimators (Ledoit &amp; Wolf
 * 2003 for the single-index target, Ledoit &amp; Wolf 2004 JMVA for the identity).
 */
class LowRankShrinkageTest {
    /** The two sum orders agree to rounding; γ̂ and π̂ are differences, so a few digits go. */
    private static final double INTENSITY_TOL = 1e-12;
    /** Entries of Σ, relative to √(Σ_ii Σ_jj). */
    private static final double ENTRY_TOL = 1e-13;
    /** Agreement with numpy's pairwise sums: only summation order differs. */
    private static final double REFERENCE_TOL = 1e-10;
    private static final int[][] SHAPES = {{12, 40}, {30, 31}, {25, 200}, {60, 20}, {120, 15}, {16, 16}};

    /**
     * On seeded windows with L &lt; n, L = n and L &gt; n, the Gram forms of δ equal the dense
     * estimators' δ to 1e-12 relative, for both targets.
     */
    @Test
    void gramIntensity_matchesDenseIntensity_forEveryShape() {
        long seed = 41;
        for (int[] shape : SHAPES) {
            for (int rep = 0; rep < 3; rep++) {
                EstimationWindow w = Windows.simulated(seed++, shape[0], shape[1]);
                CentredWindow centred = new CentredWindow(w);
                CentredColumns cols = CentredColumns.of(centred);
                String label = "L = " + shape[0] + ", n = " + shape[1] + ", rep " + rep;
                double denseSi = new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).dense(w).shrinkage().orElseThrow();
                double denseId = new ShrinkageRiskModel(ShrinkageTarget.IDENTITY).dense(w).shrinkage().orElseThrow();
                assertTrue(denseSi > 0 && denseSi < 1, label + ": single-index δ " + denseSi + " not interior");
                Close.relative(denseSi, ShrinkageIntensity.singleIndexGram(centred, cols), INTENSITY_TOL,
                        label + " single-index δ");
                Close.relative(denseId, ShrinkageIntensity.identityGram(centred, cols), INTENSITY_TOL,
                        label + " identity δ");
            }
        }
    }

    /**
     * With L &lt; n the model hands on a {@link FactorCovariance} whose every entry equals the
     * dense estimate's to rounding.
     */
    @Test
    void lowRankEstimate_equalsDenseEstimate_entryByEntry() {
        for (ShrinkageTarget target : new ShrinkageTarget[] {ShrinkageTarget.SINGLE_INDEX, ShrinkageTarget.IDENTITY}) {
            EstimationWindow w = Windows.simulated(7, 20, 170);
            ShrinkageRiskModel model = new ShrinkageRiskModel(target);
            assertFalse(model.needsDenseMoments(20, 170), target + " declared it needs S");
            CovarianceEstimate low = model.estimate(w);
            assertInstanceOf(FactorCovariance.class, low, target + " estimate form");
            CovarianceEstimate dense = model.dense(Windows.simulated(7, 20, 170));
            Close.relative(dense.shrinkage().orElseThrow(), low.shrinkage().orElseThrow(), INTENSITY_TOL, target + " δ");
            int n = w.assetCount();
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double scale = Math.sqrt(dense.get(i, i) * dense.get(j, j));
                    double err = Math.abs(low.get(i, j) - dense.get(i, j)) / scale;
                    assertTrue(err <= ENTRY_TOL, target + " Σ_" + i + "," + j + ": " + low.get(i, j) + " vs "
                            + dense.get(i, j));
                }
            }
        }
    }

    /**
     * On a window of 20 rows and 60 assets, the low-rank form's δ against lowrank_values.json,
     * written by lowrank_shrinkage_check.py beside it: numpy, pair by pair from the definitions of
     * Ledoit &amp; Wolf (2003, appendix) for the single-index target and Ledoit &amp; Wolf (2004,
     * JMVA, section 3) for the scaled identity.
     */
    @Test
    void lowRankIntensity_matchesPairwiseNumpyReference() {
        for (ShrinkageTarget target : new ShrinkageTarget[] {ShrinkageTarget.SINGLE_INDEX, ShrinkageTarget.IDENTITY}) {
            EstimationWindow w = ReferenceData.window("lowrank_window.csv");
            CovarianceEstimate sigma = LowRankShrinkage.estimate(target, new CentredWindow(w));
            String key = target == ShrinkageTarget.SINGLE_INDEX ? "ledoit_wolf_single_index_delta_pairwise"
                    : "ledoit_wolf_identity_delta_pairwise";
            Close.relative(ReferenceData.value("lowrank_values.json", key), sigma.shrinkage().orElseThrow(),
                    REFERENCE_TOL, target + " δ");
        }
    }

    /**
     * With at least n/8 rows (where the low-rank forms' own work costs more than the dense
     * path, {@link SampleRank#lowRank}), or the constant-correlation target, the estimate stays dense.
     */
    @Test
    void denseWhereTheAlgebraOrTheShapeSaysSo() {
        EstimationWindow tall = Windows.simulated(3, 50, 20);
        assertInstanceOf(DenseCovariance.class, new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).estimate(tall));
        EstimationWindow middle = Windows.simulated(3, 30, 100);
        assertInstanceOf(DenseCovariance.class, new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX).estimate(middle));
        EstimationWindow edge = Windows.simulated(3, 20, 160);
        ShrinkageRiskModel si = new ShrinkageRiskModel(ShrinkageTarget.SINGLE_INDEX);
        assertTrue(si.needsDenseMoments(20, 160), "8L = n must stay dense");
        assertInstanceOf(DenseCovariance.class, si.estimate(edge));
        assertFalse(si.needsDenseMoments(20, 161), "8L < n must take the low-rank form");
        EstimationWindow wide = Windows.simulated(3, 20, 50);
        ShrinkageRiskModel cc = new ShrinkageRiskModel(ShrinkageTarget.CONSTANT_CORRELATION);
        assertTrue(cc.needsDenseMoments(20, 50), "constant correlation must ask for S");
        assertInstanceOf(DenseCovariance.class, cc.estimate(wide));
    }
}
