package dev.sigmawalk.strategies.optimize;

/**
 * Tolerances and limits of the active-set solver, passed in explicitly.
 *
 * @param kktTolerance scaled tolerance of the final KKT verification (stationarity, feasibility,
 *                     multiplier signs); the scale is the largest |Σ_j Q_ij w_j| + |c_i|
 * @param dropTolerance a bound is released only when its scaled multiplier is below −dropTolerance;
 *                      far below kktTolerance so that the verification never sees a wrong sign
 * @param singularPivot a new Cholesky pivot d with d² ≤ singularPivot · (its diagonal entry) marks
 *                      the free block as singular
 * @param refactorEvery rebuild the Cholesky factor and the gradient from scratch after this many
 *                      rank-one updates, to stop rounding drift
 * @param maxIterations the solver gives up (Failed) after this many active-set changes
 */
public record SolverSettings(double kktTolerance, double dropTolerance, double singularPivot, int refactorEvery,
                             int maxIterations) {
    public SolverSettings {
        if (!(kktTolerance > 0 && kktTolerance < 1)) {
            throw new IllegalArgumentException("kkt tolerance (" + kktTolerance + ") must be in (0, 1)");
        }
        if (!(dropTolerance > 0 && dropTolerance <= kktTolerance)) {
            throw new IllegalArgumentException("drop tolerance (" + dropTolerance + ") must be in (0, kkt tolerance]");
        }
        if (!(singularPivot > 0 && singularPivot < 1)) {
            throw new IllegalArgumentException("singular pivot (" + singularPivot + ") must be in (0, 1)");
        }
        if (refactorEvery < 1) {
            throw new IllegalArgumentException("refactor interval (" + refactorEvery + ") must be >= 1");
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("iteration limit (" + maxIterations + ") must be >= 1");
        }
    }

    /**
     * KKT verified to 1e-9 scaled, bounds released below −1e-12 scaled, pivots below 1e-12 of
     * their diagonal treated as singular, refactorisation every 64 updates, at most 100 000
     * active-set changes.
     */
    public static SolverSettings standard() {
        return new SolverSettings(1e-9, 1e-12, 1e-12, 64, 100_000);
    }
}
