package dev.sigmawalk.strategies.optimize;

import java.util.Arrays;
import java.util.HashSet;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Bounded minimum variance, minimise w'Σw s.t. Σ w = 1 and lower ≤ w ≤ upper, for a factor-form
 * Σ = B Σ_F B' + diag(d) ({@link FactorForm}) without the n×n matrix: the primal-dual active-set
 * method of {@link PrimalDualActiveSet} (Hintermüller, Ito &amp; Kunisch 2002), with every
 * product taken through the factors.
 *
 * <p>With C = B Σ_F (n×K, formed once in O(nK²)), Σ_ij = c_i'b_j + d_i δ_ij, so
 * <ul>
 *   <li>the gradient of ½w'Σw is g = C(B'w) + d∘w, O(nK) instead of O(n²);</li>
 *   <li>the pinned weights enter the free block's equations as C_F(B_B'w_B), O(nK);</li>
 *   <li>the free block itself, shifted by ρ11' as in {@link WorkingSet}, is built from the k free
 *       rows in O(k²K) and factored in O(k³/3): the side of the problem that is small, because a
 *       minimum-variance portfolio holds few assets.</li>
 * </ul>
 * The dual residual is scaled by an upper bound of max_i Σ_j |Σ_ij w_j|, namely
 * max_i (Σ_a |b_ia| (|Σ_F| (|B|'|w|))_a + d_i |w_i|), computable in O(nK + K²); it equals
 * {@link KktCheck#scale} for K ≤ 1 and is larger otherwise, so the check is never looser than the
 * dense one by more than that ratio.
 *
 * <p>The answer passes {@link KktCheck#check(double[], double[], double[], double[], double)};
 * when the method cannot certify one (a repeated partition, the step limit, a singular free
 * block, a failed check), {@link #solve} returns empty and the caller solves the dense problem
 * with {@link ActiveSetSolver}, which is always exact.
 */
public final class FactorMinVariance {
    private final SolverSettings settings;

    public FactorMinVariance(SolverSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /**
     * @param warm a previous partition of the same assets, or {@code null} for a cold guess (the
     *             assets of lowest variance free, as many as the caps need twice over)
     * @return the verified optimum, or empty when this method cannot certify one
     */
    public Optional<SolveOutcome.Optimal> solve(FactorForm form, double[] lower, double[] upper, BoundSide[] warm) {
        Objects.requireNonNull(form, "form");
        Run run = new Run(form, lower, upper, settings);
        BoundSide[] guess = warm != null && warm.length == lower.length ? warm : run.coldGuess();
        return Optional.ofNullable(run.from(guess));
    }

    /** The state of one solve. */
    private static final class Run {
        private final int n;
        private final int k;
        private final FactorProducts sigma;
        private final double[] lo;
        private final double[] hi;
        private final SolverSettings settings;
        private final double shift;
        private final double[] w;
        private final double[] g;
        private final BoundSide[] side;
        private final int[] free;
        private int freeCount;

        Run(FactorForm form, double[] lower, double[] upper, SolverSettings settings) {
            this.sigma = new FactorProducts(form);
            this.n = sigma.size();
            this.k = sigma.factorCount();
            if (lower.length != n || upper.length != n) {
                throw new IllegalArgumentException("factor form (n = " + n + ", K = " + k + ") and bounds ("
                        + lower.length + ", " + upper.length + ") do not match");
            }
            this.lo = lower;
            this.hi = upper;
            this.settings = settings;
            double trace = 0;
            for (int i = 0; i < n; i++) {
                trace += sigma.diagonal(i);
            }
            double rho = trace / n;
            this.shift = rho > 0 && Double.isFinite(rho) ? rho : 1;
            this.w = new double[n];
            this.g = new double[n];
            this.side = new BoundSide[n];
            this.free = new int[n];
        }

        private double diagonal(int i) {
            return sigma.diagonal(i);
        }

        private double entry(int i, int j) {
            return sigma.entry(i, j);
        }

        /** The lowest-variance assets free (twice as many as the caps need, at least 2), the rest at lower. */
        BoundSide[] coldGuess() {
            Integer[] order = new Integer[n];
            double[] variance = new double[n];
            double cap = Double.POSITIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                order[i] = i;
                variance[i] = diagonal(i);
                cap = Math.min(cap, hi[i] - lo[i]);
            }
            Arrays.sort(order, (x, y) -> variance[x] != variance[y] ? Double.compare(variance[x], variance[y])
                    : Integer.compare(x, y));
            int wanted = Double.isFinite(cap) && cap > 0 ? (int) Math.min(n, 2 * Math.ceil(1 / cap)) : n;
            wanted = Math.max(Math.min(n, 2), Math.min(wanted, n));
            BoundSide[] guess = new BoundSide[n];
            Arrays.fill(guess, BoundSide.LOWER);
            for (int r = 0; r < wanted; r++) {
                guess[order[r]] = BoundSide.FREE;
            }
            return guess;
        }

        SolveOutcome.Optimal from(BoundSide[] guess) {
            for (int i = 0; i < n; i++) {
                side[i] = PartitionUpdate.admissible(lo[i], hi[i], guess[i]);
            }
            Set<Long> seen = new HashSet<>();
            for (int step = 1; step <= PrimalDualActiveSet.MAX_STEPS; step++) {
                if (!seen.add(PartitionUpdate.fingerprint(side)) || !solveSubproblem()) {
                    return null;
                }
                gradient();
                double scale = scale();
                if (!PartitionUpdate.repartition(side, w, g, lo, hi, free, freeCount, -settings.dropTolerance() * scale)) {
                    KktReport report = KktCheck.check(w, g, lo, hi, scale);
                    if (!report.holds(settings.kktTolerance())) {
                        return null;
                    }
                    return new SolveOutcome.Optimal(w.clone(), side.clone(), step, report.budgetMultiplier(),
                            report.worst());
                }
            }
            return null;
        }

        /**
         * Pins the bound weights and solves the free ones from the shifted free block
         * Q̃_FF = Σ_FF + ρ11' (see {@link WorkingSet}): x = a + ν u with a = Q̃_FF⁻¹(−Σ_FB w_B),
         * u = Q̃_FF⁻¹1 and ν from 1'x = 1 − Σ w_B.
         */
        private boolean solveSubproblem() {
            freeCount = 0;
            for (int i = 0; i < n; i++) {
                if (side[i] == BoundSide.FREE) {
                    free[freeCount++] = i;
                }
            }
            CholeskyFactor factor = new CholeskyFactor(Math.max(1, freeCount));
            double[] column = new double[Math.max(1, freeCount)];
            int m = 0;
            for (int r = 0; r < freeCount; r++) {
                int i = free[r];
                for (int s = 0; s < m; s++) {
                    column[s] = entry(free[s], i) + shift;
                }
                if (factor.append(column, diagonal(i) + shift, settings.singularPivot())) {
                    free[m++] = i;
                } else if (Double.isFinite(lo[i]) || Double.isFinite(hi[i])) {
                    // The block would be singular with i free: pin i for this step; the update
                    // releases it again if its multiplier says so.
                    side[i] = Double.isFinite(lo[i]) ? BoundSide.LOWER : BoundSide.UPPER;
                } else {
                    return false;
                }
            }
            freeCount = m;
            if (m == 0) {
                return false;
            }
            double pinnedSum = 0;
            double[] pinnedWeights = new double[n];
            for (int i = 0; i < n; i++) {
                if (side[i] == BoundSide.FREE) {
                    continue;
                }
                double v = side[i] == BoundSide.LOWER ? lo[i] : hi[i];
                w[i] = v;
                pinnedWeights[i] = v;
                if (v != 0) {
                    pinnedSum += v;
                }
            }
            double[] exposure = sigma.exposures(pinnedWeights);
            double[] a = new double[m];
            double[] u = new double[m];
            for (int r = 0; r < m; r++) {
                a[r] = -sigma.throughFactors(free[r], exposure);
                u[r] = 1;
            }
            factor.solveInPlace(a);
            factor.solveInPlace(u);
            double nu = (1 - pinnedSum - WorkingSet.sum(a, m)) / WorkingSet.sum(u, m);
            for (int r = 0; r < m; r++) {
                double x = a[r] + nu * u[r];
                if (!Double.isFinite(x)) {
                    return false;
                }
                w[free[r]] = x;
            }
            return true;
        }

        /** g = C(B'w) + d∘w, O(nK). */
        private void gradient() {
            sigma.gradient(w, g);
        }

        private double scale() {
            return sigma.scale(w);
        }
    }
}
