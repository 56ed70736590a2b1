package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.EvidenceSpec;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Monte Carlo rejection rates at the 5 % level of every test the tool reports, shared by the
 * size-and-power benchmark ({@link SizeAndPower}) and the unit guard against gross size failures
 * ({@code SizeGuardTest}). Every draw comes from {@code new SplittableRandom(seed)} in a fixed
 * order, so a run is reproducible.
 */
final class RejectionRates {
    /** Nominal level. */
    static final double LEVEL = 0.05;
    /** Correlation of two compared portfolios' returns (high, as for portfolios of one market). */
    static final double PAIR_CORRELATION = 0.7;
    /** Per-period mean of the simulated returns, in units of their sd (a modest premium). */
    static final double MEAN = 0.1;

    private RejectionRates() {
    }

    /** Rejection rates of the three residual tests of Method §8. */
    record Residual(double lm, double lmAdj, double cd) {
    }

    /** Rejection rates of the difference tests of Method §9 on one pair. */
    record Difference(double sharpeHac, double sharpeBootstrap, double varianceHac, double varianceBootstrap,
                      double jobsonKorkie) {
    }

    /** Share of draws in which any member of the family was rejected: uncorrected and Romano-Wolf. */
    record Family(double uncorrected, double romanoWolf) {
    }

    /**
     * Residual tests on n assets over L rows: x = β m + e with β_i in [0.5, 1.5], market m and the
     * residuals e independent draws of the null model; under the alternative, residuals of each
     * group of nine assets share a shock with correlation {@code sectorCorrelation}.
     */
    static Residual residual(NullModel model, int assets, int length, double sectorCorrelation, int draws, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        List<String> ids = new ArrayList<>();
        int[] columns = new int[assets];
        for (int i = 0; i < assets; i++) {
            ids.add(String.format("X%03d", i));
            columns[i] = i;
        }
        double[] beta = new double[assets];
        for (int i = 0; i < assets; i++) {
            beta[i] = 0.5 + random.nextDouble();
        }
        int lm = 0;
        int adj = 0;
        int cd = 0;
        for (int k = 0; k < draws; k++) {
            double[] market = NullModel.NORMAL.series(random, length);
            double[] excess = new double[length * assets];
            double[][] sector = new double[(assets + 8) / 9][];
            for (int g = 0; g < sector.length; g++) {
                sector[g] = model.series(random, length);
            }
            double own = Math.sqrt(1 - sectorCorrelation);
            double shared = Math.sqrt(sectorCorrelation);
            for (int i = 0; i < assets; i++) {
                double[] e = model.series(random, length);
                for (int t = 0; t < length; t++) {
                    excess[t * assets + i] = beta[i] * market[t] + own * e[t] + shared * sector[i / 9][t];
                }
            }
            EstimationWindow w = new EstimationWindow(LocalDate.of(2000, 1, 31), length - 1, ids, columns, excess,
                    market, 12, null);
            ResidualDiagnostics d = ResidualCorrelations.of(w).diagnostics();
            lm += d.lmPValue() <= LEVEL ? 1 : 0;
            adj += d.lmAdjPValue() <= LEVEL ? 1 : 0;
            cd += d.cdPValue() <= LEVEL ? 1 : 0;
        }
        return new Residual((double) lm / draws, (double) adj / draws, (double) cd / draws);
    }

    /**
     * Difference tests on T periods of a pair with equal mean and variance (the null); under the
     * alternative the first series is scaled to volatility {@code volatilityRatio} of the second
     * and its mean raised by {@code sharpeGain} of its sd (a per-period Sharpe ratio higher by that).
     * Bootstrap p-values count only on the first {@code bootstrapDraws} draws, with {@code resamples}
     * (the other draws run the bootstrap at its minimum of 100 resamples and ignore it).
     */
    static Difference difference(NullModel model, int periods, double volatilityRatio, double sharpeGain, int draws,
                                 int bootstrapDraws, int resamples, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        DifferenceTests hacOnly = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(100, seed, 0));
        int[] counts = new int[5];
        int bootstrapped = Math.max(1, bootstrapDraws);
        for (int k = 0; k < draws; k++) {
            double[][] p = model.pair(random, periods, PAIR_CORRELATION);
            double[] a = new double[periods];
            double[] b = new double[periods];
            for (int t = 0; t < periods; t++) {
                a[t] = volatilityRatio * (p[0][t] + MEAN + sharpeGain);
                b[t] = p[1][t] + MEAN;
            }
            boolean withBootstrap = k < bootstrapDraws;
            count(withBootstrap ? new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(resamples, seed + k, 0))
                    : hacOnly, a, b, withBootstrap, counts);
        }
        return rates(counts, draws, bootstrapped);
    }

    /** Adds the rejections at 5 % of every difference test of one draw to {@code counts}. */
    private static void count(DifferenceTests tests, double[] a, double[] b, boolean withBootstrap, int[] counts) {
        DifferenceTest sharpe = tests.sharpeRatio(a, b);
        DifferenceTest variance = tests.variance(a, b);
        counts[0] += sharpe.hacPValue() <= LEVEL ? 1 : 0;
        counts[2] += variance.hacPValue() <= LEVEL ? 1 : 0;
        if (withBootstrap) {
            counts[1] += sharpe.bootstrapPValue() <= LEVEL ? 1 : 0;
            counts[3] += variance.bootstrapPValue() <= LEVEL ? 1 : 0;
        }
        counts[4] += JobsonKorkieMemmel.test(a, b).pValue() <= LEVEL ? 1 : 0;
    }

    private static Difference rates(int[] counts, int draws, int bootstrapped) {
        return new Difference((double) counts[0] / draws, (double) counts[1] / bootstrapped,
                (double) counts[2] / draws, (double) counts[3] / bootstrapped, (double) counts[4] / draws);
    }

    /**
     * The difference tests when the two series do not share one volatility path, as in the
     * family's design below: a_t = ρ u_t + √(1 - ρ²) w_t, where u and the baseline b come from one
     * pair of the null model (one volatility path under GARCH) and w from another (its own path),
     * so both have variance 1, the same mean and the same Sharpe ratio, and under GARCH the
     * difference of their squares keeps the slowly decaying autocorrelation of volatility
     * clustering that a shared path cancels.
     *
     * @param blockLength the bootstrap's block length, 0 for the data-driven one (Method §9)
     */
    static Difference separatePaths(NullModel model, int periods, int draws, int bootstrapDraws, int resamples,
                                    int blockLength, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        DifferenceTests hacOnly = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(100, seed, blockLength));
        int[] counts = new int[5];
        int bootstrapped = Math.max(1, bootstrapDraws);
        double rest = Math.sqrt(1 - PAIR_CORRELATION * PAIR_CORRELATION);
        for (int k = 0; k < draws; k++) {
            double[][] p = model.pair(random, periods, PAIR_CORRELATION);
            double[][] q = model.pair(random, periods, PAIR_CORRELATION);
            double[] a = new double[periods];
            double[] b = new double[periods];
            for (int t = 0; t < periods; t++) {
                a[t] = PAIR_CORRELATION * p[0][t] + rest * q[1][t] + MEAN;
                b[t] = p[1][t] + MEAN;
            }
            boolean withBootstrap = k < bootstrapDraws;
            count(withBootstrap ? new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(resamples, seed + k,
                    blockLength)) : hacOnly, a, b, withBootstrap, counts);
        }
        return rates(counts, draws, bootstrapped);
    }

    /**
     * The family correction under the global null: {@code strategies} strategies, each compared with
     * one common baseline on both measures (2 × strategies tests, correlated through the baseline
     * and the shared volatility), as the report's family is. Family-wise error rate with and
     * without the Romano-Wolf correction.
     */
    static Family family(NullModel model, int periods, int strategies, int draws, int resamples, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int raw = 0;
        int corrected = 0;
        for (int k = 0; k < draws; k++) {
            double[][] base = model.pair(random, periods, PAIR_CORRELATION);
            double[] baseline = shifted(base[1]);
            List<double[]> others = new ArrayList<>();
            others.add(shifted(base[0]));
            while (others.size() < strategies) {
                double[][] more = model.pair(random, periods, PAIR_CORRELATION);
                // Each further strategy co-moves with the baseline through the first one's shocks.
                double[] s = new double[periods];
                for (int t = 0; t < periods; t++) {
                    s[t] = PAIR_CORRELATION * base[0][t] + Math.sqrt(1 - PAIR_CORRELATION * PAIR_CORRELATION) * more[1][t];
                }
                others.add(shifted(s));
            }
            DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(resamples, seed + k, 0));
            List<FamilyContrast> contrasts = new ArrayList<>();
            boolean anyRaw = false;
            for (double[] s : others) {
                for (DifferenceMeasure m : DifferenceMeasure.values()) {
                    DifferenceTest t = tests.compare(m, s, baseline);
                    anyRaw |= t.bootstrapPValue() <= LEVEL;
                    contrasts.add(new FamilyContrast(m, s, baseline, t));
                }
            }
            raw += anyRaw ? 1 : 0;
            double min = 1;
            for (double p : RomanoWolfStepdown.adjust(contrasts, resamples, seed + k)) {
                min = Math.min(min, p);
            }
            corrected += min <= LEVEL ? 1 : 0;
        }
        return new Family((double) raw / draws, (double) corrected / draws);
    }

    private static double[] shifted(double[] x) {
        double[] out = new double[x.length];
        for (int t = 0; t < x.length; t++) {
            out[t] = x[t] + MEAN;
        }
        return out;
    }
}
