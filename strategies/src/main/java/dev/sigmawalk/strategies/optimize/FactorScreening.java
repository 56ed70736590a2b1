package dev.sigmawalk.strategies.optimize;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Bounded minimum variance for a factor form Σ = B Σ_F B' + diag(d), semi-definite allowed,
 * when every lower bound is 0: the exact dense solver ({@link ActiveSetSolver}) on a screened
 * subset of the assets, checked against the KKT conditions of the whole problem.
 *
 * <p>Every asset outside the subset S is held at its lower bound 0, so the subset's problem is
 * the whole problem with those weights fixed; its optimum w is optimal for the whole problem
 * exactly when each asset outside S satisfies g_i ≥ ν, with g = Σw = C(B'w) + d∘w taken
 * through the factors in O(nK) and ν the subset's budget multiplier. The check is
 * {@link KktCheck} on all n weights with the factor-side gradient scale of
 * {@link FactorMinVariance}. When it fails, the assets outside S that violate it most are added
 * and the subset solved again, warm-started; S only grows, so the rounds end.
 *
 * <p>A minimum-variance portfolio holds few assets (at most about L free ones for a sample
 * matrix of L rows, the rest at a bound), so S stays a small multiple of that and the dense
 * matrices are |S|×|S|, never n×n. The first S is the previous rebalance's held assets (when
 * given) plus the assets of lowest variance, as many as the caps need twice over (at least K + 2).
 */
public final class FactorScreening {
    /** Rounds of adding violators before giving up (the caller then solves the dense problem). */
    static final int MAX_ROUNDS = 12;

    private final SolverSettings settings;

    public FactorScreening(SolverSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /** Whether every lower bound is exactly 0, as the screening requires. */
    public static boolean applies(double[] lower) {
        for (double v : lower) {
            if (v != 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * @param warm a previous partition of the same assets, or {@code null}
     * @return the verified optimum, or empty when none was certified within {@link #MAX_ROUNDS}
     * @throws IllegalArgumentException when a lower bound is not 0 or the shapes disagree
     */
    public Optional<SolveOutcome.Optimal> solve(FactorForm form, double[] lower, double[] upper, BoundSide[] warm) {
        Objects.requireNonNull(form, "form");
        if (!applies(lower)) {
            throw new IllegalArgumentException("screening needs every lower bound to be 0");
        }
        FactorProducts products = new FactorProducts(form);
        int n = products.size();
        if (upper.length != n || lower.length != n) {
            throw new IllegalArgumentException("bounds (" + lower.length + ", " + upper.length
                    + ") must have length n (" + n + ")");
        }
        boolean[] chosen = firstSubset(products, upper, warm);
        BoundSide[] sides = warm != null && warm.length == n ? warm.clone() : null;
        for (int round = 1; round <= MAX_ROUNDS; round++) {
            int[] subset = members(chosen);
            SolveOutcome outcome = solveSubset(products, subset, upper, sides);
            if (!(outcome instanceof SolveOutcome.Optimal)) {
                return Optional.empty();
            }
            SolveOutcome.Optimal part = (SolveOutcome.Optimal) outcome;
            double[] w = new double[n];
            BoundSide[] full = new BoundSide[n];
            Arrays.fill(full, BoundSide.LOWER);
            for (int r = 0; r < subset.length; r++) {
                w[subset[r]] = part.weights()[r];
                full[subset[r]] = part.sides()[r];
            }
            double[] g = products.gradient(w);
            double scale = products.scale(w);
            KktReport report = KktCheck.check(w, g, lower, upper, scale);
            if (report.holds(settings.kktTolerance())) {
                return Optional.of(new SolveOutcome.Optimal(w, full, round, report.budgetMultiplier(), report.worst()));
            }
            if (!addViolators(chosen, g, part.budgetMultiplier(), scale, subset.length)) {
                return Optional.empty();
            }
            sides = full;
        }
        return Optional.empty();
    }

    /** The subset's problem, Q_S = Σ_SS dense, warm-started from the sides given. */
    private SolveOutcome solveSubset(FactorProducts products, int[] subset, double[] upper, BoundSide[] sides) {
        int m = subset.length;
        double[] q = products.block(subset);
        double[] hi = new double[m];
        BoundSide[] guess = sides == null ? null : new BoundSide[m];
        for (int r = 0; r < m; r++) {
            hi[r] = upper[subset[r]];
            if (guess != null) {
                guess[r] = sides[subset[r]];
            }
        }
        QuadraticProblem problem = new QuadraticProblem(m, q, new double[m], new double[m], hi);
        return new ActiveSetSolver(settings).solve(problem, guess);
    }

    /**
     * Adds to the subset the outside assets with g_i &lt; ν (beyond the KKT tolerance), most
     * negative g_i − ν first, at most a quarter of the subset's size (at least 16); false when none.
     */
    private boolean addViolators(boolean[] chosen, double[] g, double nu, double scale, int size) {
        List<Integer> violators = new ArrayList<>();
        double slack = 2 * settings.kktTolerance() * scale;
        for (int i = 0; i < chosen.length; i++) {
            if (!chosen[i] && g[i] < nu - slack) {
                violators.add(i);
            }
        }
        if (violators.isEmpty()) {
            return false;
        }
        violators.sort((a, b) -> g[a] != g[b] ? Double.compare(g[a], g[b]) : Integer.compare(a, b));
        int take = Math.min(violators.size(), Math.max(size / 4, 16));
        for (int r = 0; r < take; r++) {
            chosen[violators.get(r)] = true;
        }
        return true;
    }

    /** The warm start's assets off their lower bound, plus the lowest-variance assets. */
    private static boolean[] firstSubset(FactorProducts products, double[] upper, BoundSide[] warm) {
        int n = products.size();
        boolean[] chosen = new boolean[n];
        if (warm != null && warm.length == n) {
            for (int i = 0; i < n; i++) {
                chosen[i] = warm[i] != BoundSide.LOWER;
            }
        }
        double cap = Double.POSITIVE_INFINITY;
        Integer[] order = new Integer[n];
        double[] variance = new double[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
            variance[i] = products.diagonal(i);
            cap = Math.min(cap, upper[i]);
        }
        Arrays.sort(order, (x, y) -> variance[x] != variance[y] ? Double.compare(variance[x], variance[y])
                : Integer.compare(x, y));
        int wanted = Double.isFinite(cap) && cap > 0 ? (int) Math.min(n, 2 * Math.ceil(1 / cap)) : n;
        wanted = Math.max(Math.min(n, products.factorCount() + 2), wanted);
        for (int r = 0; r < Math.min(n, wanted); r++) {
            chosen[order[r]] = true;
        }
        return chosen;
    }

    private static int[] members(boolean[] chosen) {
        int count = 0;
        for (boolean c : chosen) {
            if (c) {
                count++;
            }
        }
        int[] out = new int[count];
        int k = 0;
        for (int i = 0; i < chosen.length; i++) {
            if (chosen[i]) {
                out[k++] = i;
            }
        }
        return out;
    }
}
