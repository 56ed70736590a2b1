package dev.sigmawalk.engine.evidence;

import java.util.Locale;
import java.util.Objects;

/**
 * Outcome of testing H0: the two series have the same measure (Method §9).
 *
 * @param measure what was compared
 * @param kernel the HAC kernel of the standard error
 * @param periods T, aligned periods used
 * @param first the measure of the first series (per period; divisor T)
 * @param second the measure of the second series
 * @param difference Δ̂ on the tested scale: first - second for Sharpe ratios, log(first/second)
 *        for variances
 * @param standardError HAC standard error of Δ̂ (delta method), >= 0
 * @param statistic Δ̂ / standardError; 0 when Δ̂ is 0
 * @param hacPValue two-sided normal p-value of the statistic, in [0, 1]
 * @param bootstrapPValue studentised circular block bootstrap p-value, in (0, 1]
 * @param bandwidth the HAC bandwidth S used, >= 0
 * @param blockLength the bootstrap's block length, >= 1
 * @param resamples the bootstrap's resample count, >= 1
 * @param lingering how far the influence series' autocorrelation exceeds what the bandwidth rule
 *        assumes ({@link LingeringDependence}); NaN where the series is too short to tell
 */
public record DifferenceTest(DifferenceMeasure measure, HacKernel kernel, int periods, double first, double second,
                             double difference, double standardError, double statistic, double hacPValue,
                             double bootstrapPValue, double bandwidth, int blockLength, int resamples,
                             double lingering) {
    public DifferenceTest {
        Objects.requireNonNull(measure, "measure");
        Objects.requireNonNull(kernel, "kernel");
        if (!Double.isFinite(first) || !Double.isFinite(second) || !Double.isFinite(difference)
                || !Double.isFinite(statistic)) {
            throw new IllegalArgumentException(measure.label() + " test: estimates (" + first + ", " + second
                    + "), difference (" + difference + ") and statistic (" + statistic + ") must be finite");
        }
        if (!(standardError >= 0) || Double.isInfinite(standardError)) {
            throw new IllegalArgumentException(measure.label() + " test: standard error (" + standardError
                    + ") must be finite and >= 0");
        }
        if (!(hacPValue >= 0 && hacPValue <= 1) || !(bootstrapPValue > 0 && bootstrapPValue <= 1)) {
            throw new IllegalArgumentException(measure.label() + " test: p-values (HAC " + hacPValue + ", bootstrap "
                    + bootstrapPValue + ") must be in [0, 1] and (0, 1]");
        }
        if (!(periods >= 1) || !(blockLength >= 1) || !(resamples >= 1) || !(bandwidth >= 0)) {
            throw new IllegalArgumentException(measure.label() + " test: periods (" + periods + "), block length ("
                    + blockLength + "), resamples (" + resamples + ") must be >= 1 and bandwidth (" + bandwidth + ") >= 0");
        }
    }

    /** A test without the check of lingering dependence. */
    public DifferenceTest(DifferenceMeasure measure, HacKernel kernel, int periods, double first, double second,
                          double difference, double standardError, double statistic, double hacPValue,
                          double bootstrapPValue, double bandwidth, int blockLength, int resamples) {
        this(measure, kernel, periods, first, second, difference, standardError, statistic, hacPValue, bootstrapPValue,
                bandwidth, blockLength, resamples, Double.NaN);
    }

    /**
     * Whether the influence series keeps more autocorrelation than the bandwidth rule covers, so
     * that the p-values may be too small (Method §9).
     */
    public boolean dependenceExceedsBandwidth() {
        return lingering > LingeringDependence.THRESHOLD;
    }

    /** A one-line account of how the p-values were obtained, for the tests file and report. */
    public String method() {
        String paper = measure == DifferenceMeasure.SHARPE_RATIO ? "Ledoit-Wolf (2008)" : "Ledoit-Wolf (2011)";
        return String.format(Locale.ROOT,
                "%s delta method, %s kernel HAC, bandwidth %.2f; studentised circular block bootstrap, block %d, %d resamples",
                paper, kernel.label(), bandwidth, blockLength, resamples);
    }
}
