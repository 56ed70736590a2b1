package dev.sigmawalk.engine.study;

/**
 * The optional {@code evidence:} section: settings of the significance tests.
 *
 * @param resamples bootstrap resamples, from {@link #MIN_RESAMPLES} to {@link #MAX_RESAMPLES}
 * @param seed bootstrap seed; the same seed gives the same p-values
 * @param blockLength circular block length for the bootstrap; 0 = chosen from the data
 */
public record EvidenceSpec(int resamples, long seed, int blockLength) {
    public static final int DEFAULT_RESAMPLES = 2000;
    public static final long DEFAULT_SEED = 20_061_231L;
    /** Fewer resamples cannot resolve a p-value below 1/101, about 0.01. */
    public static final int MIN_RESAMPLES = 100;
    /**
     * More resamples only repeat every bootstrap test for precision no study needs: the Monte
     * Carlo error of a p-value at 10^6 resamples is below 0.0005 (common practice puts the
     * useful range at a few thousand).
     */
    public static final int MAX_RESAMPLES = 1_000_000;

    public EvidenceSpec {
        if (!(resamples >= MIN_RESAMPLES && resamples <= MAX_RESAMPLES)) {
            throw new IllegalArgumentException("evidence.resamples (" + resamples + ") must be in [" + MIN_RESAMPLES
                    + ", " + MAX_RESAMPLES + "]");
        }
        if (!(blockLength >= 0)) {
            throw new IllegalArgumentException("evidence.block_length (" + blockLength + ") must be >= 0");
        }
    }

    public static EvidenceSpec defaults() {
        return new EvidenceSpec(DEFAULT_RESAMPLES, DEFAULT_SEED, 0);
    }
}
