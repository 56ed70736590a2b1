package dev.sigmawalk.strategies.optimize;

/**
 * The partition rules the primal-dual active-set solvers share ({@link PrimalDualActiveSet},
 * {@link FactorMinVariance}): which side a guessed start may take, the update of every bound at
 * once, and a hash that notices a step returning to an earlier partition.
 */
final class PartitionUpdate {
    private PartitionUpdate() {
    }

    /** The side a guess may take for weight i: a bound only when it is finite; fixed weights sit at lower. */
    static BoundSide admissible(double lo, double hi, BoundSide guessed) {
        if (lo == hi) {
            return BoundSide.LOWER;
        }
        if (guessed == BoundSide.LOWER && Double.isFinite(lo)) {
            return BoundSide.LOWER;
        }
        if (guessed == BoundSide.UPPER && Double.isFinite(hi)) {
            return BoundSide.UPPER;
        }
        return BoundSide.FREE;
    }

    /**
     * The update A⁺ = {i : z_i + c(lower_i − w_i) &gt; 0} of Hintermüller, Ito &amp; Kunisch (2002)
     * and its mirror for upper bounds, with z_i = g_i − ν: releases every pinned weight whose
     * multiplier is below −dropTolerance·scale and pins every free weight beyond a bound, with ν
     * the mean gradient over the free weights. Returns whether anything changed.
     */
    static boolean repartition(BoundSide[] side, double[] w, double[] g, double[] lo, double[] hi, int[] free,
                               int freeCount, double floor) {
        double nu = 0;
        for (int r = 0; r < freeCount; r++) {
            nu += g[free[r]];
        }
        nu /= freeCount;
        boolean changed = false;
        for (int i = 0; i < side.length; i++) {
            BoundSide now = side[i];
            BoundSide next = now;
            if (now == BoundSide.FREE) {
                if (w[i] < lo[i]) {
                    next = BoundSide.LOWER;
                } else if (w[i] > hi[i]) {
                    next = BoundSide.UPPER;
                }
            } else if (lo[i] < hi[i]) {
                double multiplier = now == BoundSide.LOWER ? g[i] - nu : nu - g[i];
                if (multiplier < floor) {
                    next = BoundSide.FREE;
                }
            }
            if (next != now) {
                side[i] = next;
                changed = true;
            }
        }
        return changed;
    }

    /** A 64-bit hash of the partition. */
    static long fingerprint(BoundSide[] side) {
        long h = 0x9E3779B97F4A7C15L;
        for (BoundSide s : side) {
            h = (h ^ s.ordinal()) * 0x100000001B3L;
            h ^= h >>> 29;
        }
        return h;
    }
}
