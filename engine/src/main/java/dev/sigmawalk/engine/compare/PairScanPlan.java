package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.timeline.Schedule;
import java.util.Arrays;

/**
 * At which rebalances the residual statistics that need every pair (the mean |ρ| and the
 * largest pairs, Method §8) are computed. Every other statistic of Method §8 is a sum identity
 * and is computed at every rebalance. A window of at most {@link #largeFrom} − 1 assets scans
 * every pair at every rebalance; a larger one, whose scan costs L n(n−1)/2 multiply-adds, scans
 * at the first rebalance, every {@link #every}-th after it and the last, and the other
 * rebalances say "not computed" (empty cells) rather than show a stale or approximate number.
 */
public final class PairScanPlan {
    /** Windows with at least this many assets scan their pairs on the thinned schedule. */
    public static final int LARGE_FROM = 1_001;
    /** Rebalances between two scans of a large window: about a year of monthly rebalances. */
    public static final int EVERY = 12;

    private final int largeFrom;
    private final int every;
    private final int[] rebalanceRows;

    private PairScanPlan(int largeFrom, int every, int[] rebalanceRows) {
        if (!(largeFrom >= 2) || !(every >= 1)) {
            throw new IllegalArgumentException("a pair-scan plan needs a size threshold >= 2 (" + largeFrom
                    + ") and a spacing >= 1 (" + every + ")");
        }
        this.largeFrom = largeFrom;
        this.every = every;
        this.rebalanceRows = rebalanceRows;
    }

    /** Every pair at every rebalance, whatever the size. */
    public static PairScanPlan always() {
        return new PairScanPlan(Integer.MAX_VALUE, 1, new int[0]);
    }

    /** The study's plan: {@value #LARGE_FROM} assets and more scan every {@value #EVERY}th rebalance and the last. */
    public static PairScanPlan of(Schedule schedule) {
        return of(schedule, LARGE_FROM, EVERY);
    }

    /**
     * @param schedule the rebalance rows every window shares
     * @param largeFrom the asset count from which the thinned schedule applies
     * @param every rebalances between scans of a large window
     */
    public static PairScanPlan of(Schedule schedule, int largeFrom, int every) {
        return new PairScanPlan(largeFrom, every, schedule.rebalanceRows());
    }

    /** The asset count from which a window scans on the thinned schedule. */
    public int largeFrom() {
        return largeFrom;
    }

    /** Rebalances between two scans of a large window. */
    public int every() {
        return every;
    }

    /**
     * Whether the window ending at {@code endRow} with {@code assets} assets scans every pair: always
     * below the threshold; above it at rebalance j when j is a multiple of {@link #every} or the
     * last. A row that is not a rebalance of the schedule (a window cut by hand) is scanned.
     */
    public boolean scans(int endRow, int assets) {
        if (assets < largeFrom) {
            return true;
        }
        int j = Arrays.binarySearch(rebalanceRows, endRow);
        return j < 0 || j % every == 0 || j == rebalanceRows.length - 1;
    }
}
