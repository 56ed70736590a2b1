package dev.sigmawalk.strategies.risk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.strategies.optimize.ActiveSetSolver;
import dev.sigmawalk.strategies.optimize.KktCheck;
import dev.sigmawalk.strategies.optimize.QuadraticProblem;
import dev.sigmawalk.strategies.optimize.SolveOutcome;
import dev.sigmawalk.strategies.optimize.SolverSettings;
import dev.sigmawalk.strategies.optimize.ZeroVarianceProjection;
import dev.sigmawalk.strategies.rules.MinVariance;
import dev.sigmawalk.strategies.rules.RuleInput;
import dev.sigmawalk.strategies.rules.RuleOutcome;
import dev.sigmawalk.strategies.rules.WarmStart;
import java.util.Arrays;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Long-only minimum variance on a sample matrix of fewer rows than assets, handed on as its
 * centred rows (positive semi-definite, Method §5): against scipy and the exact dense solver.
 */
class SemidefiniteMinVarianceTest {
    /** scipy's BFGS on the dual ends with constraint residuals of about 3e-10. */
    private static final double SCIPY_WEIGHTS = 1e-8;
    /** Objective values: both sides certified optima. */
    private static final double OBJECTIVE = 1e-10;

    /**
     * Independent symmetric returns, 10 rows, 60 assets, bounds [0, 0.05]: portfolios of zero
     * variance exist, and the one reported is the minimum-norm one, as scipy finds it from the
     * problem's dual (zero_variance_min_norm.csv, from semidefinite_check.py beside it); its sum
     * of squares is no larger than that of another zero-variance portfolio scipy's SLSQP finds
     * (zero_variance_other_norm.txt) or of the dense solver's optimum: the choice among optima
     * is the rule's, not the solver path's.
     */
    @Test
    void zeroVarianceOptimum_isTheMinimumNormOne() {
        EstimationWindow w = ReferenceData.window("zero_variance_window.csv");
        CovarianceEstimate sigma = SampleRiskModel.lowRank(w);
        assertInstanceOf(FactorCovariance.class, sigma);
        double[] got = solve(w, sigma, 0.05);
        double[] want = column("zero_variance_min_norm.csv");
        for (int i = 0; i < want.length; i++) {
            assertEquals(want[i], got[i], SCIPY_WEIGHTS, "w_" + i);
        }
        assertTrue(ZeroVarianceProjection.zeroVariance((FactorCovariance) sigma, got), "variance " + sigma.portfolioVariance(got));
        double other = Double.parseDouble(text("zero_variance_other_norm.txt").trim());
        assertTrue(norm(got) <= other, "norm " + norm(got) + " vs scipy's other optimum's " + other);
        double[] dense = denseOptimum(sigma, 0.05);
        assertTrue(norm(got) <= norm(dense) + 1e-15, "norm " + norm(got) + " vs dense optimum's " + norm(dense));
    }

    /**
     * Returns with a market factor, 12 rows, 40 assets, bounds [0, 0.1]: the minimum variance is
     * positive; the objective equals scipy's (positive_variance_value.txt) and the dense exact
     * solver's, and the KKT conditions of the dense problem hold.
     */
    @Test
    void positiveVarianceOptimum_matchesScipyAndTheDenseSolver() {
        EstimationWindow w = ReferenceData.window("positive_variance_window.csv");
        CovarianceEstimate sigma = SampleRiskModel.lowRank(w);
        double[] got = solve(w, sigma, 0.1);
        double value = sigma.portfolioVariance(got);
        Close.relative(Double.parseDouble(text("positive_variance_value.txt").trim()), value, 1e-9, "scipy objective");
        double[] dense = denseOptimum(sigma, 0.1);
        Close.relative(sigma.portfolioVariance(dense), value, OBJECTIVE, "dense objective");
        int n = got.length;
        double[] hi = new double[n];
        Arrays.fill(hi, 0.1);
        QuadraticProblem problem = new QuadraticProblem(n, sigma.dense(), new double[n], new double[n], hi);
        assertTrue(KktCheck.check(problem, got).holds(SolverSettings.standard().kktTolerance()), "KKT");
    }

    /**
     * Seeded windows with a market factor (L &lt; n): the factor-side answer has the dense
     * solver's objective to 1e-10 relative, and solving again from another warm start gives the
     * same weights bit for bit when the optimum is unique.
     */
    @Test
    void seededWideWindows_objectiveEqualsDense_andAnswerIsRepeatable() {
        for (int[] shape : new int[][] {{20, 120}, {40, 400}, {30, 31}, {12, 12}}) {
            EstimationWindow w = Windows.simulated(shape[0] * 7L + shape[1], shape[0], shape[1]);
            CovarianceEstimate sigma = SampleRiskModel.lowRank(w);
            double cap = 4.0 / shape[1];
            double[] got = solve(w, sigma, cap);
            double[] dense = denseOptimum(sigma, cap);
            String label = "L = " + shape[0] + ", n = " + shape[1];
            Close.relative(sigma.portfolioVariance(dense), sigma.portfolioVariance(got), OBJECTIVE, label);
            assertTrue(Arrays.equals(got, solve(w, sigma, cap)), label + ": not repeatable");
        }
    }

    private static double[] solve(EstimationWindow w, CovarianceEstimate sigma, double cap) {
        RuleOutcome out = new MinVariance(SolverSettings.standard())
                .apply(new RuleInput(w.assets(), sigma, null, Optional.of(new Bounds(0, cap))), new WarmStart());
        return assertInstanceOf(RuleOutcome.Chosen.class, out, String.valueOf(out)).weights();
    }

    private static double[] denseOptimum(CovarianceEstimate sigma, double cap) {
        int n = sigma.size();
        double[] hi = new double[n];
        Arrays.fill(hi, cap);
        SolveOutcome out = new ActiveSetSolver(SolverSettings.standard())
                .solve(new QuadraticProblem(n, sigma.dense().clone(), new double[n], new double[n], hi));
        return assertInstanceOf(SolveOutcome.Optimal.class, out, String.valueOf(out)).weights();
    }

    private static double norm(double[] w) {
        double s = 0;
        for (double v : w) {
            s += v * v;
        }
        return s;
    }

    private static double[] column(String file) {
        String[] lines = text(file).trim().split("\\R");
        double[] v = new double[lines.length - 1];
        for (int i = 1; i < lines.length; i++) {
            v[i - 1] = Double.parseDouble(lines[i].trim());
        }
        return v;
    }

    private static String text(String file) {
        return ReferenceData.text(file);
    }
}
