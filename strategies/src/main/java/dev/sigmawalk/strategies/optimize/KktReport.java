package dev.sigmawalk.strategies.optimize;

/**
 * How far a candidate w is from satisfying the KKT conditions of a {@link QuadraticProblem}.
 *
 * @param primalResidual max(|Σ w_i − 1|, largest bound violation), in weight units
 * @param dualResidual half the gap by which no single budget multiplier ν fits the gradient g = Qw − c
 *                     (g_i = ν on interior weights, g_i ≥ ν at a lower bound, g_i ≤ ν at an upper
 *                     bound), divided by the gradient scale; 0 when some ν fits exactly
 * @param budgetMultiplier the ν in the middle of the feasible interval (0 when every weight is pinned)
 */
public record KktReport(double primalResidual, double dualResidual, double budgetMultiplier) {
    public KktReport {
        if (!(primalResidual >= 0) || !(dualResidual >= 0)) {
            throw new IllegalArgumentException("kkt residuals (" + primalResidual + ", " + dualResidual
                    + ") must be >= 0");
        }
    }

    /** The larger of the two residuals. */
    public double worst() {
        return Math.max(primalResidual, dualResidual);
    }

    /** Whether both residuals are within {@code tolerance}. */
    public boolean holds(double tolerance) {
        return worst() <= tolerance;
    }
}
