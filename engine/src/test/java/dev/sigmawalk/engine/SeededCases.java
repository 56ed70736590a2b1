package dev.sigmawalk.engine;

import java.util.SplittableRandom;

/** Draws for the seeded property-style tests of the engine. */
public final class SeededCases {
    private SeededCases() {
    }

    /**
     * A value in [lo, hi]: now and then an end itself, often a decimal with two places (so ties
     * and round numbers occur), otherwise any double.
     */
    public static double inRange(SplittableRandom rng, double lo, double hi) {
        int pick = rng.nextInt(20);
        if (pick == 0) {
            return lo;
        }
        if (pick == 1) {
            return hi;
        }
        if (pick < 10) {
            long cents = Math.round(lo * 100);
            return (cents + rng.nextLong(Math.round(hi * 100) - cents + 1)) / 100.0;
        }
        return lo + (hi - lo) * rng.nextDouble();
    }
}
