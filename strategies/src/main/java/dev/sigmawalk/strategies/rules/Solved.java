package dev.sigmawalk.strategies.rules;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.FactorForm;
import dev.sigmawalk.strategies.optimize.SingleFactorForm;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;

/** Conversions shared by the rules: bounds to arrays, solver outcomes to rule outcomes. */
final class Solved {
    private Solved() {
    }

    /** Per-asset lower bounds (−∞ without bounds). */
    static double[] lower(RuleInput input) {
        double[] lo = new double[input.size()];
        Arrays.fill(lo, input.bounds().map(Bounds::lower).orElse(Double.NEGATIVE_INFINITY));
        return lo;
    }

    /** Per-asset upper bounds (+∞ without bounds). */
    static double[] upper(RuleInput input) {
        double[] hi = new double[input.size()];
        Arrays.fill(hi, input.bounds().map(Bounds::upper).orElse(Double.POSITIVE_INFINITY));
        return hi;
    }

    /**
     * Chosen with w'Σw for an optimum (remembering its partition), else NotFormed with the
     * rule's name and the solver's reason (forgetting the partition).
     */
    static RuleOutcome from(String rule, SolveOutcome outcome, RuleInput input, WarmStart warm, List<String> notes) {
        if (outcome instanceof SolveOutcome.Optimal) {
            SolveOutcome.Optimal optimal = (SolveOutcome.Optimal) outcome;
            warm.remember(input.assets(), optimal.sides());
            return chosen(optimal.weights(), input, notes);
        }
        warm.forget();
        String reason = outcome instanceof SolveOutcome.Infeasible
                ? ((SolveOutcome.Infeasible) outcome).reason()
                : ((SolveOutcome.Failed) outcome).reason();
        return new RuleOutcome.NotFormed(rule + ": " + reason);
    }

    /**
     * Chosen with forecast variance w'Σw; a rounding-negative value of a positive semi-definite
     * form (|v| at the level of machine epsilon) is reported as 0.
     */
    static RuleOutcome chosen(double[] weights, RuleInput input, List<String> notes) {
        double variance = input.covariance().portfolioVariance(weights);
        return new RuleOutcome.Chosen(weights, Math.max(0, variance), notes);
    }

    /**
     * Runs a rule's body, turning a rejected problem (for example a covariance that is not
     * symmetric, which {@code QuadraticProblem} refuses) into NotFormed with the rejection's
     * message rather than an exception that would stop the whole run.
     */
    static RuleOutcome guarded(String rule, Supplier<RuleOutcome> body) {
        try {
            return body.get();
        } catch (IllegalArgumentException e) {
            return new RuleOutcome.NotFormed(rule + ": " + e.getMessage());
        }
    }

    /**
     * As {@link #guarded(String, Supplier)} for a body whose problem was checked only by
     * {@link #unusableBeforeProblem}: a rejection caused by a non-finite entry of Σ is reported
     * naming that entry, as {@link #unusable} reports it.
     */
    static RuleOutcome guarded(String rule, RuleInput input, Supplier<RuleOutcome> body) {
        try {
            return body.get();
        } catch (IllegalArgumentException e) {
            RuleOutcome named = unusableEntry(rule, input);
            return named != null ? named : new RuleOutcome.NotFormed(rule + ": " + e.getMessage());
        }
    }

    /**
     * For rules that use expected returns: NotFormed when the input is unusable or carries no
     * expected returns; null when the rule may proceed.
     */
    static RuleOutcome unusableWithoutReturns(String rule, RuleInput input) {
        RuleOutcome none = unusable(rule, input);
        return none != null ? none : missingExpectedReturns(rule, input);
    }

    /** NotFormed when the rule needs expected returns and none were given; null otherwise. */
    static RuleOutcome missingExpectedReturns(String rule, RuleInput input) {
        return input.expectedReturns() == null
                ? new RuleOutcome.NotFormed(rule + ": expected returns are required but none were given")
                : null;
    }

    /**
     * NotFormed when there are no eligible assets or the covariance has a non-finite entry (the
     * solvers accept only finite matrices); null otherwise. O(n²) for a dense Σ; for a factor
     * form the factors are checked in O(nK) and the dense matrix is built only to name the
     * entry when one is not finite.
     */
    static RuleOutcome unusable(String rule, RuleInput input) {
        RuleOutcome before = unusableBeforeProblem(rule, input);
        boolean factors = input.covariance() instanceof FactorForm || input.covariance() instanceof SingleFactorForm;
        if (before != null || factors) {
            return before;
        }
        return unusableEntry(rule, input);
    }

    /**
     * As {@link #unusable}, except that a dense Σ's entries are left to the {@code QuadraticProblem}
     * the rule builds from it, whose one validation pass reads every entry anyway (unless the
     * producer proved them finite while writing them): one O(n²) pass fewer per dense problem. The rule must then run that problem inside
     * {@link #guarded(String, RuleInput, Supplier)}, which names the non-finite entry as
     * {@link #unusable} would.
     */
    static RuleOutcome unusableBeforeProblem(String rule, RuleInput input) {
        if (input.size() == 0) {
            return new RuleOutcome.NotFormed(rule + ": no eligible assets");
        }
        if (input.covariance() instanceof FactorForm) {
            FactorForm form = (FactorForm) input.covariance();
            return finite(form.loadings()) && finite(form.factorCovariance()) && finite(form.specificVariances())
                    ? null : unusableEntry(rule, input);
        }
        if (input.covariance() instanceof SingleFactorForm) {
            SingleFactorForm form = (SingleFactorForm) input.covariance();
            return Double.isFinite(form.factorVariance()) && finite(form.loadings())
                    && finite(form.specificVariances()) ? null : unusableEntry(rule, input);
        }
        return null;
    }

    private static boolean finite(double[] values) {
        for (double v : values) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }

    /** NotFormed naming the first non-finite entry of the dense Σ; null when there is none. */
    private static RuleOutcome unusableEntry(String rule, RuleInput input) {
        int n = input.size();
        double[] sigma = input.covariance().dense();
        for (int k = 0; k < sigma.length; k++) {
            if (!Double.isFinite(sigma[k])) {
                return new RuleOutcome.NotFormed(rule + ": covariance entry (" + input.assets().get(k / n) + ", "
                        + input.assets().get(k % n) + ") is " + sigma[k] + ", not a finite number");
            }
        }
        return null;
    }
}
