package dev.sigmawalk.engine.study;

/**
 * The optional {@code evidence:} section: settings of the significance tests.
 *
 * @param resamples bootstrap resamples (>= 100)
 * @param seed bootstrap seed; the same seed gives the same p-values
 * @param blockLength circular block length for the bootstrap; 0 = chosen from the data
 */
public record EvidenceSpec(int resamples, long seed, int blockLength) {
    public static final int DEFAULT_RESAMPLES = 2000;
    public static final long DEFAULT_SEED = 20_061_231L;

    public EvidenceSpec {
        if (!(resamples >= 100)) {
            throw new IllegalArgumentException("evidence.resamples (" + resamples + ") must be >= 100");
        }
        if (!(blockLength >= 0)) {
            throw new IllegalArgumentException("evidence.block_length (" + blockLength + ") must be >= 0");
        }
    }

    public static EvidenceSpec defaults() {
        return new EvidenceSpec(DEFAULT_RESAMPLES, DEFAULT_SEED, 0);
    }
}
