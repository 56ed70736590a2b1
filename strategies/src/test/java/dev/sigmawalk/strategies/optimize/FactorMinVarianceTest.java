package dev.sigmawalk.strategies.optimize;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Optional;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link FactorMinVariance} against the one-change-at-a-time primal loop
 * ({@link ActiveSetSolver#solvePrimal}) on the same Σ written out densely, on seeded random
 * factor forms: several factors with a correlated factor covariance, purely diagonal ones
 * (K = 0), zero specific variances, and the sample covariance of fewer rows than assets written
 * as a factor form (B the centred rows, Σ_F = I/(T−1), d = 0). Cases are drawn from fixed seeds.
 */
class FactorMinVarianceTest {
    private static final double SAME_WEIGHTS = 1e-12;
    private static final double KKT = 1e-9;
    /** A portfolio variance below this share of the mean asset variance is zero up to rounding. */
    private static final double ZERO_VARIANCE = 1e-14;

    private final SolverSettings settings = SolverSettings.standard();
    private final ActiveSetSolver dense = new ActiveSetSolver(settings);
    private final FactorMinVariance factor = new FactorMinVariance(settings);

    /**
     * K factors (0 to 6) with a random positive definite factor covariance, specific variances
     * in [0.0002, 0.004], long only with a cap; from a cold guess and warm-started from the
     * optimum's partition of a perturbed form. In half the cases a tenth of the specific
     * variances are 0, which can make a free block singular; the method may then decline
     * (the rule falls back to the dense solver), otherwise it must certify. Whatever it
     * certifies agrees with the dense primal loop. 60 cases, n from 2 to 150.
     */
    @ParameterizedTest
    @MethodSource("factorCases")
    void factorForm_matchesDensePrimalLoop(int n, long seed) {
        Random random = new Random(seed);
        int k = random.nextInt(7);
        boolean zeros = random.nextBoolean();
        FactorForm form = randomForm(random, n, k, zeros);
        double cap = Math.min(1, (1.2 + 4 * random.nextDouble()) / Math.min(n, 40));
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(hi, cap);
        if (n * cap < 1) {
            return;
        }
        String problem = " (n = " + n + ", K = " + k + ", seed " + seed + ", cap " + cap + ")";
        QuadraticProblem p = new QuadraticProblem(n, dense(form), new double[n], lo, hi);
        SolveOutcome.Optimal reference = assertInstanceOf(SolveOutcome.Optimal.class, dense.solvePrimal(p, null));
        Optional<SolveOutcome.Optimal> cold = factor.solve(form, lo, hi, null);
        assertTrue(zeros || cold.isPresent(), "certified from a cold guess" + problem);
        cold.ifPresent(c -> assertClose(reference.weights(), c.weights(), problem));
        BoundSide[] nearby = assertInstanceOf(SolveOutcome.Optimal.class,
                dense.solvePrimal(new QuadraticProblem(n, dense(perturbed(form, random)), new double[n], lo, hi), null))
                .sides();
        Optional<SolveOutcome.Optimal> warm = factor.solve(form, lo, hi, nearby);
        assertTrue(zeros || warm.isPresent(), "certified from the perturbed form's partition" + problem);
        warm.ifPresent(c -> assertClose(reference.weights(), c.weights(), problem));
        warm.ifPresent(c -> assertTrue(KktCheck.check(p, c.weights()).holds(KKT), "dense KKT check" + problem));
    }

    static Stream<Arguments> factorCases() {
        return cases(0xFAC7_0001L, 2, 150, 60);
    }

    /**
     * The sample covariance of T &lt; n rows as a factor form (rank T − 1): when the optimum is
     * unique the factor method, if it certifies an answer, gives the dense loop's weights; when a
     * long-only portfolio with no variance exists, only the objective 0 is determined. 30 cases,
     * n from 10 to 120.
     */
    @ParameterizedTest
    @MethodSource("sampleCases")
    void sampleCovarianceOfFewRows_asFactorForm_matchesDensePrimalLoop(int n, long seed) {
        Random random = new Random(seed);
        int periods = 4 + random.nextInt(n);
        double[] x = RandomProblems.returns(random, n, periods);
        double[] loadings = new double[n * periods];
        double[] mean = new double[n];
        for (int t = 0; t < periods; t++) {
            for (int i = 0; i < n; i++) {
                mean[i] += x[t * n + i] / periods;
            }
        }
        for (int t = 0; t < periods; t++) {
            for (int i = 0; i < n; i++) {
                loadings[i * periods + t] = x[t * n + i] - mean[i];
            }
        }
        double[] identity = new double[periods * periods];
        for (int t = 0; t < periods; t++) {
            identity[t * periods + t] = 1.0 / (periods - 1);
        }
        FactorForm form = form(periods, loadings, identity, new double[n]);
        double cap = Math.max(1.5 / n, 1.0 / Math.max(1, periods - 2)) * (1 + random.nextDouble());
        double[] lo = new double[n];
        double[] hi = new double[n];
        Arrays.fill(hi, Math.min(1, cap));
        String problem = " (n = " + n + ", T = " + periods + ", seed " + seed + ")";
        QuadraticProblem p = new QuadraticProblem(n, dense(form), new double[n], lo, hi);
        SolveOutcome reference = dense.solvePrimal(p, null);
        Optional<SolveOutcome.Optimal> ours = factor.solve(form, lo, hi, null);
        if (!(reference instanceof SolveOutcome.Optimal) || ours.isEmpty()) {
            return;
        }
        double[] r = ((SolveOutcome.Optimal) reference).weights();
        assertTrue(KktCheck.check(p, ours.get().weights()).holds(KKT), "dense KKT check" + problem);
        double floor = ZERO_VARIANCE * meanDiagonal(p);
        if (objective(p, r) <= floor) {
            assertTrue(objective(p, ours.get().weights()) <= floor, "zero variance" + problem);
            return;
        }
        assertClose(r, ours.get().weights(), problem);
    }

    static Stream<Arguments> sampleCases() {
        return cases(0xFAC7_0002L, 10, 120, 30);
    }

    /** Σ_ij = Σ_ab B_ia F_ab B_jb + d_i δ_ij, entry by entry (the definition, written out). */
    static double[] dense(FactorForm f) {
        int n = f.specificVariances().length;
        int k = f.factorCount();
        double[] b = f.loadings();
        double[] s = f.factorCovariance();
        double[] out = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double v = 0;
                for (int a = 0; a < k; a++) {
                    for (int e = 0; e < k; e++) {
                        v += b[i * k + a] * s[a * k + e] * b[j * k + e];
                    }
                }
                out[i * n + j] = v;
                out[j * n + i] = v;
            }
            out[i * n + i] += f.specificVariances()[i];
        }
        return out;
    }

    /** Loadings (0.2..1.5 on the first factor, N(0, 0.25) on the others), Σ_F = 1e-4 (GG'/K + I/2). */
    private static FactorForm randomForm(Random random, int n, int k, boolean zeros) {
        double[] b = new double[n * k];
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < k; a++) {
                b[i * k + a] = a == 0 ? 0.2 + 1.3 * random.nextDouble() : random.nextGaussian() * 0.5;
            }
        }
        double[] root = new double[k * k];
        for (int e = 0; e < root.length; e++) {
            root[e] = random.nextGaussian();
        }
        double[] sf = new double[k * k];
        for (int a = 0; a < k; a++) {
            for (int e = 0; e < k; e++) {
                double v = 0;
                for (int h = 0; h < k; h++) {
                    v += root[a * k + h] * root[e * k + h];
                }
                sf[a * k + e] = 1e-4 * (v / k + (a == e ? 0.5 : 0));
            }
        }
        for (int a = 0; a < k; a++) {
            for (int e = 0; e < a; e++) {
                sf[a * k + e] = sf[e * k + a];
            }
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = zeros && random.nextInt(10) == 0 && k > 0 ? 0 : 0.0002 + 0.0038 * random.nextDouble();
        }
        return form(k, b, sf, d);
    }

    /** The same form with loadings and specific variances moved by a few per cent. */
    private static FactorForm perturbed(FactorForm f, Random random) {
        double[] b = f.loadings().clone();
        for (int e = 0; e < b.length; e++) {
            b[e] *= 1 + 0.05 * random.nextGaussian();
        }
        double[] d = f.specificVariances().clone();
        for (int i = 0; i < d.length; i++) {
            d[i] *= 1 + 0.05 * random.nextDouble();
        }
        return form(f.factorCount(), b, f.factorCovariance(), d);
    }

    static FactorForm form(int k, double[] b, double[] sf, double[] d) {
        return new FactorForm() {
            @Override
            public int factorCount() {
                return k;
            }

            @Override
            public double[] loadings() {
                return b;
            }

            @Override
            public double[] factorCovariance() {
                return sf;
            }

            @Override
            public double[] specificVariances() {
                return d;
            }
        };
    }

    private static double meanDiagonal(QuadraticProblem p) {
        double s = 0;
        for (int i = 0; i < p.size(); i++) {
            s += p.q(i, i);
        }
        return s / p.size();
    }

    private static double objective(QuadraticProblem p, double[] w) {
        double[] g = KktCheck.gradient(p, w);
        double v = 0;
        for (int i = 0; i < w.length; i++) {
            v += 0.5 * w[i] * g[i];
        }
        return v;
    }

    private static void assertClose(double[] expected, double[] actual, String message) {
        assertEquals(expected.length, actual.length, "weight count" + message);
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], SAME_WEIGHTS, "weight " + i + message);
        }
    }

    private static Stream<Arguments> cases(long caseSeed, int minN, int maxN, int count) {
        SplittableRandom rng = new SplittableRandom(caseSeed);
        return IntStream.range(0, count).mapToObj(k -> Arguments.of(
                k == 0 ? minN : k == 1 ? maxN : rng.nextInt(minN, maxN + 1), rng.nextLong()));
    }
}
