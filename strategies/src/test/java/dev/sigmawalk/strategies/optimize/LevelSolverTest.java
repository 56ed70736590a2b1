package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The level t with Σ clamp((t − u_i)/d_i, lower_i, upper_i) = target, on hand-built cases. */
class LevelSolverTest {
    private static final double EXACT = 1e-15;

    /**
     * Projection of x = (0.5, 0.2, −0.1) onto {Σ w = 1, 0 ≤ w ≤ 1}: w = max(0, x + t). With all
     * three positive, 0.6 + 3t = 1 gives t = 0.4/3 and w3 = 0.0333… > 0, so the guess holds
     * (hand computation).
     */
    @Test
    void projection_interior_matchesHandLevel() {
        OptionalDouble t = LevelSolver.solve(new double[] {-0.5, -0.2, 0.1}, new double[] {1, 1, 1},
                new double[] {0, 0, 0}, new double[] {1, 1, 1}, 1);
        assertEquals(0.4 / 3, t.orElseThrow(), EXACT, "level");
    }

    /**
     * Projection of x = (2, 0, −3): only the first weight can be positive, w1 = min(1, 2 + t) = 1
     * needs t ≥ −1 while the second stays at 0 for t ≤ 0, so S is flat at 1 on [−1, 0]; any level
     * there is right (hand computation).
     */
    @Test
    void projection_flatPieceAtTarget_returnsALevelOnIt() {
        double[] u = {-2, 0, 3};
        double[] unit = {1, 1, 1};
        double[] lo = {0, 0, 0};
        double[] hi = {1, 1, 1};
        double t = LevelSolver.solve(u, unit, lo, hi, 1).orElseThrow();
        assertEquals(1, LevelSolver.sum(u, unit, lo, hi, t), EXACT, "S(t)");
        assertTrue(t >= -1 && t <= 0, "t = " + t);
    }

    /**
     * Weight 1 runs from −0.13 to the cap 1.13 that the budget implies when weight 2 sits at
     * −0.13; in floating point 1.13 + (−0.13) is 0.9999999999999999, so the level lies on weight
     * 2's rising piece just past its start, and S there must be 1 to rounding (hand computation).
     */
    @Test
    void capImpliedByBudget_givesLevelWithSumOne() {
        double[] u = {0.1, 10.3};
        double[] d = {0.3, 0.7};
        double[] lo = {-0.13, -0.13};
        double[] hi = {1.13, 1.13};
        double t = LevelSolver.solve(u, d, lo, hi, 1).orElseThrow();
        assertEquals(1, LevelSolver.sum(u, d, lo, hi, t), 1e-15, "S(t)");
    }

    /** Caps summing to 0.75 cannot reach 1 (hand computation): no level. */
    @Test
    void unreachableTarget_isEmpty() {
        OptionalDouble t = LevelSolver.solve(new double[] {0, 0, 0}, new double[] {1, 1, 1}, new double[] {0, 0, 0},
                new double[] {0.25, 0.25, 0.25}, 1);
        assertTrue(t.isEmpty(), "empty");
    }
}
