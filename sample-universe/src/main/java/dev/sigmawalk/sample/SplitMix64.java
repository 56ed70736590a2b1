package dev.sigmawalk.sample;

/**
 * A seeded stream of pseudo-random numbers: SplitMix64 (Steele, Lea &amp; Flood 2014, "Fast
 * splittable pseudorandom number generators", OOPSLA), the same recurrence and output mix as
 * {@code java.util.SplittableRandom} with its default gamma.
 *
 * <p>Written out here, with Gaussian draws from Marsaglia's polar method using {@link StrictMath},
 * so the committed files are reproduced bit for bit by any Java 17+ runtime on any processor,
 * whatever a future JDK does to its own generators. One instance is one stream, used by one
 * thread; it is mutable by nature and never shared.
 */
final class SplitMix64 {
    private static final long GOLDEN_GAMMA = 0x9e3779b97f4a7c15L;
    private static final double UNIT = 0x1.0p-53;

    private long state;
    private double spareGaussian;
    private boolean hasSpare;

    SplitMix64(long seed) {
        this.state = seed;
    }

    /**
     * An independent stream for one purpose, derived from a master seed and a stream number, so
     * that adding draws to one purpose never shifts the numbers of another.
     */
    static SplitMix64 stream(long seed, int streamNumber) {
        return new SplitMix64(mix64(seed ^ mix64(GOLDEN_GAMMA * (streamNumber + 1L))));
    }

    long nextLong() {
        state += GOLDEN_GAMMA;
        return mix64(state);
    }

    /** Uniform on [0, 1), 53 random bits. */
    double nextDouble() {
        return (nextLong() >>> 11) * UNIT;
    }

    /** Uniform integer in [lo, hi], both inclusive; by rejection, so without modulo bias. */
    int nextInt(int lo, int hi) {
        if (!(lo <= hi)) {
            throw new IllegalArgumentException("range [" + lo + ", " + hi + "] needs lo <= hi");
        }
        long span = (long) hi - lo + 1;
        long limit = Long.MAX_VALUE - Long.MAX_VALUE % span;
        long draw;
        do {
            draw = nextLong() >>> 1;
        } while (draw >= limit);
        return (int) (lo + draw % span);
    }

    /** Standard normal: Marsaglia's polar method, which yields two draws per accepted pair. */
    double nextGaussian() {
        if (hasSpare) {
            hasSpare = false;
            return spareGaussian;
        }
        double u;
        double v;
        double s;
        do {
            u = 2 * nextDouble() - 1;
            v = 2 * nextDouble() - 1;
            s = u * u + v * v;
        } while (s >= 1 || s == 0);
        double factor = StrictMath.sqrt(-2 * StrictMath.log(s) / s);
        spareGaussian = v * factor;
        hasSpare = true;
        return u * factor;
    }

    /** Stafford's "Mix13" finaliser, the output function of SplitMix64. */
    private static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
