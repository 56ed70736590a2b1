package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.study.EvidenceSpec;

import java.util.Objects;

/**
 * Is a difference between two strategies real? Tests of equal Sharpe ratios (Ledoit &amp; Wolf
 * 2008, J. Empirical Finance 15, 850-859) and equal variances (Ledoit &amp; Wolf 2011, Wilmott
 * Magazine) on two aligned series, Method §9.
 *
 * <p>HAC test: Δ̂ = f(v̂), s(Δ̂) = √(∇f(v̂)' Ψ̂ ∇f(v̂) / T), where Ψ̂ is the kernel long-run
 * covariance ({@link LongRunCovariance}) of y_t = (a_t - μ̂_a, b_t - μ̂_b, a_t² - γ̂_a, b_t² - γ̂_b),
 * multiplied by the small-sample factor T/(T - 4) as Ledoit &amp; Wolf (2008, §3.1) do (from
 * memory); z = Δ̂ / s and p = P(|Z| &gt; |z|).
 *
 * <p>Bandwidth and block length are chosen from the scalar influence series of the statistic,
 * u_t = ∇f(v̂)' y_t (the delta-method linearisation of Δ̂, so s² = long-run variance of u / T):
 * the bandwidth is Andrews' (1991, Econometrica 59, §6) AR(1) plug-in rule applied to u alone,
 * which is his rule with the weights that target the one linear combination being estimated. A
 * unit change (every return times c) multiplies the components of y by c or c² but leaves u_t
 * unchanged, so bandwidth, block length and both p-values do not depend on units (Method §9);
 * plug-in rules on the vector y with equal weights do, because the squared-return components
 * outweigh the others by c² and their dependence decides the bandwidth.
 *
 * <p>Bootstrap test: {@link StudentisedBlockBootstrap} with the resamples, seed and block length
 * of the {@link EvidenceSpec}. Block length 0 means "from the data": Künsch (1989, Annals of
 * Statistics 17) shows the block bootstrap variance of a mean is to first order a Bartlett-kernel
 * estimate with bandwidth b, so b is Andrews' optimal Bartlett bandwidth of u_t, rounded, within
 * [1, ⌊T/4⌋] so there are at least four blocks. A given block length must leave at least two
 * blocks.
 *
 * <p>Edge cases: fewer than {@value #MIN_PERIODS} periods, non-finite values, or a series that
 * does not vary are rejected with {@link IllegalArgumentException}. A difference within
 * {@value #ZERO_DIFFERENCE} of the estimates' scale (identical or proportional series) is treated
 * as exactly zero: statistic 0 and both p-values 1, since no resample can be less extreme. A
 * non-zero difference with a zero standard error is rejected as degenerate.
 */
public final class DifferenceTests {
    /** Fewest aligned periods accepted. */
    public static final int MIN_PERIODS = 10;
    /** |Δ̂| at or below this times max(1, |first| + |second|) counts as zero. */
    public static final double ZERO_DIFFERENCE = 1e-12;
    /** Moments estimated in v: the r of Andrews' T/(T - r) factor. */
    private static final int MOMENTS = 4;

    private final HacKernel kernel;
    private final EvidenceSpec evidence;

    /**
     * @param kernel the HAC kernel of the standard errors
     * @param evidence resamples, seed and block length (0 = from the data) of the bootstrap
     */
    public DifferenceTests(HacKernel kernel, EvidenceSpec evidence) {
        this.kernel = Objects.requireNonNull(kernel, "kernel");
        this.evidence = Objects.requireNonNull(evidence, "evidence");
    }

    /** The bootstrap settings (resamples, seed, block length). */
    public EvidenceSpec evidence() {
        return evidence;
    }

    /** Equal Sharpe ratios of two aligned excess-return series. */
    public DifferenceTest sharpeRatio(double[] excessA, double[] excessB) {
        return compare(DifferenceMeasure.SHARPE_RATIO, excessA, excessB);
    }

    /** Equal variances of two aligned return series (tested on log σ_a² - log σ_b²). */
    public DifferenceTest variance(double[] returnsA, double[] returnsB) {
        return compare(DifferenceMeasure.VARIANCE, returnsA, returnsB);
    }

    /** Tests H0: f(v) = 0 for the given measure. */
    public DifferenceTest compare(DifferenceMeasure measure, double[] a, double[] b) {
        Objects.requireNonNull(measure, "measure");
        SeriesChecks.requireFinite("first series", a, MIN_PERIODS);
        SeriesChecks.requireFinite("second series", b, MIN_PERIODS);
        SeriesChecks.requireSameLength("first series", a, "second series", b);
        int length = a.length;
        PairMoments v = PairMoments.of(a, b, length);
        if (v.degenerate()) {
            throw new IllegalArgumentException(measure.label() + " test: both series must vary; variances are "
                    + v.varianceA() + " and " + v.varianceB());
        }
        double first = measure.estimate(v.meanA(), v.varianceA());
        double second = measure.estimate(v.meanB(), v.varianceB());
        double difference = measure.difference(v);
        double[][] y = v.centred(a, b);
        double[] gradient = measure.gradient(v);
        double[][] influence = {influence(y, gradient)};
        LongRunCovariance psi = LongRunCovariance.fixed(y, kernel, AndrewsBandwidth.of(influence, kernel));
        double quadratic = psi.quadraticForm(gradient) * length / (length - MOMENTS);
        double standardError = Math.sqrt(Math.max(0.0, quadratic) / length);
        int block = blockLength(influence);
        double lingering = LingeringDependence.of(influence[0]);
        if (Math.abs(difference) <= ZERO_DIFFERENCE * Math.max(1.0, Math.abs(first) + Math.abs(second))) {
            return new DifferenceTest(measure, kernel, length, first, second, 0.0, standardError, 0.0, 1.0, 1.0,
                    psi.bandwidth(), block, evidence.resamples(), lingering);
        }
        if (!(standardError > 0)) {
            throw new IllegalArgumentException(measure.label() + " test: difference " + difference
                    + " has a zero standard error; the pair is degenerate");
        }
        double statistic = difference / standardError;
        StudentisedBlockBootstrap bootstrap =
                new StudentisedBlockBootstrap(measure, block, evidence.resamples(), evidence.seed());
        double bootstrapP = bootstrap.pValue(a, b, difference, Math.abs(statistic));
        return new DifferenceTest(measure, kernel, length, first, second, difference, standardError, statistic,
                TailProbabilities.twoSidedNormal(statistic), bootstrapP, psi.bandwidth(), block, evidence.resamples(),
                lingering);
    }

    /**
     * u_t = ∇f' y_t, centred (its mean is already 0 up to rounding, since y is centred); the
     * unit-free series whose dependence the bandwidth and block length must capture.
     */
    static double[] influence(double[][] y, double[] gradient) {
        int length = y[0].length;
        double[] u = new double[length];
        double mean = 0;
        for (int t = 0; t < length; t++) {
            double s = 0;
            for (int c = 0; c < y.length; c++) {
                s += gradient[c] * y[c][t];
            }
            u[t] = s;
            mean += s;
        }
        mean /= length;
        for (int t = 0; t < length; t++) {
            u[t] -= mean;
        }
        return u;
    }

    /** The configured block length, or the data-driven one from the influence series. */
    int blockLength(double[][] influence) {
        int length = influence[0].length;
        if (evidence.blockLength() > 0) {
            if (!(length / evidence.blockLength() >= 2)) {
                throw new IllegalArgumentException("evidence.block_length (" + evidence.blockLength()
                        + ") must leave >= 2 blocks in " + length + " periods");
            }
            return evidence.blockLength();
        }
        long rounded = Math.round(AndrewsBandwidth.of(influence, HacKernel.BARTLETT));
        return (int) Math.max(1, Math.min(length / 4, rounded));
    }
}
