package dev.sigmawalk.engine.evidence;

import java.util.SplittableRandom;

/**
 * Studentised circular block bootstrap p-value for H0: f(v) = 0 (Ledoit &amp; Wolf 2008, §3.2;
 * circular blocks of Politis &amp; Romano 1992).
 *
 * <p>Each resample joins l = ⌊T/b⌋ blocks of b consecutive periods, each starting at a uniform
 * random period and wrapping past the end (so every period is equally likely to be drawn),
 * taking the pair (a_t, b_t) together to keep their dependence; the resample has T' = l·b
 * periods. Its standard error uses the block-bootstrap HAC of Götze &amp; Künsch (1996, Annals of Statistics 24), as
 * Ledoit &amp; Wolf do: with y*_t the resample's centred moment components and
 * ζ_j = b^{-1/2} Σ_{t in block j} y*_t,
 * <pre>
 *   Ψ* = (1/l) Σ_j ζ_j ζ_j',   s* = √(∇f(v*)' Ψ* ∇f(v*) / T'),   d*_m = |Δ*_m - Δ̂| / s*_m,
 * </pre>
 * and the p-value is (#{m : d*_m ≥ d̂} + 1) / (M + 1) with d̂ = |Δ̂| / s(Δ̂) the original
 * studentised statistic. A resample in which a series does not vary, or
 * whose s* is 0, gets d* = +∞ (it counts against rejection), so the p-value is conservative
 * there rather than undefined.
 *
 * <p>Draws come from {@code new SplittableRandom(seed)} in a fixed order: the same inputs and
 * seed give the same p-value bit for bit.
 */
final class StudentisedBlockBootstrap {
    private final DifferenceMeasure measure;
    private final int blockLength;
    private final int resamples;
    private final long seed;

    StudentisedBlockBootstrap(DifferenceMeasure measure, int blockLength, int resamples, long seed) {
        if (!(blockLength >= 1)) {
            throw new IllegalArgumentException("block length (" + blockLength + ") must be >= 1");
        }
        if (!(resamples >= 1)) {
            throw new IllegalArgumentException("resamples (" + resamples + ") must be >= 1");
        }
        this.measure = measure;
        this.blockLength = blockLength;
        this.resamples = resamples;
        this.seed = seed;
    }

    /**
     * @param a first series, length T with T / b >= 2
     * @param b second series, aligned with a
     * @param difference Δ̂ on the original data
     * @param observed d̂ = |Δ̂| / s(Δ̂) >= 0
     */
    double pValue(double[] a, double[] b, double difference, double observed) {
        int length = a.length;
        int blocks = length / blockLength;
        if (!(blocks >= 2)) {
            throw new IllegalArgumentException("block length (" + blockLength + ") must leave >= 2 blocks in "
                    + length + " periods");
        }
        int drawn = blocks * blockLength;
        CircularResample ra = new CircularResample(drawn);
        CircularResample rb = new CircularResample(drawn);
        int[] starts = new int[blocks];
        SplittableRandom random = new SplittableRandom(seed);
        int atLeast = 0;
        for (int m = 0; m < resamples; m++) {
            for (int j = 0; j < blocks; j++) {
                starts[j] = random.nextInt(length);
            }
            ra.draw(a, starts, blockLength);
            rb.draw(b, starts, blockLength);
            if (studentised(measure, ra.values(), rb.values(), CircularResample.moments(ra, rb), blockLength,
                    difference) >= observed) {
                atLeast++;
            }
        }
        return (atLeast + 1.0) / (resamples + 1.0);
    }

    /**
     * d* = |Δ* - Δ̂| / s* of one resample of ⌊T/b⌋ whole blocks of length b (the resample's length
     * is a multiple of b); +∞ where the resample is degenerate.
     */
    static double studentised(DifferenceMeasure measure, double[] ra, double[] rb, int blockLength,
                              double difference) {
        return studentised(measure, ra, rb, PairMoments.of(ra, rb, ra.length), blockLength, difference);
    }

    /** As {@link #studentised(DifferenceMeasure, double[], double[], int, double)} with v* already known. */
    static double studentised(DifferenceMeasure measure, double[] ra, double[] rb, PairMoments v, int blockLength,
                              double difference) {
        int drawn = ra.length;
        int blocks = drawn / blockLength;
        if (v.degenerate()) {
            return Double.POSITIVE_INFINITY;
        }
        double[] g = measure.gradient(v);
        double psi = 0;
        for (int j = 0; j < blocks; j++) {
            double zeta = 0;
            for (int k = j * blockLength; k < (j + 1) * blockLength; k++) {
                // ∇f · y*_t, accumulated over the block: the scalar ∇f'ζ_j √b.
                zeta += g[0] * (ra[k] - v.meanA()) + g[1] * (rb[k] - v.meanB())
                        + g[2] * (ra[k] * ra[k] - v.secondA()) + g[3] * (rb[k] * rb[k] - v.secondB());
            }
            psi += zeta * zeta / blockLength;
        }
        psi /= blocks;
        double standardError = Math.sqrt(psi / drawn);
        double distance = Math.abs(measure.difference(v) - difference);
        if (!(standardError > 0)) {
            return distance == 0 ? 0.0 : Double.POSITIVE_INFINITY;
        }
        return distance / standardError;
    }
}
