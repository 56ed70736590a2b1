package dev.sigmawalk.engine.timeline;

/**
 * The rebalance rows of a study, shared by every window (Method §2). The weights chosen at
 * {@code rebalanceRows[j]} earn rows {@code rebalanceRows[j]+1 .. holdEnd(j)}; the out-of-sample
 * period is rows {@code firstRebalance()+1 .. lastRow}.
 *
 * @param rebalanceRows strictly increasing rows τ_0 < τ_1 < ..., each below {@code lastRow}
 * @param lastRow the last panel row the study uses
 */
public record Schedule(int[] rebalanceRows, int lastRow) {
    public Schedule {
        if (rebalanceRows.length == 0) {
            throw new IllegalArgumentException("a schedule needs at least one rebalance");
        }
        rebalanceRows = rebalanceRows.clone();
        for (int j = 0; j < rebalanceRows.length; j++) {
            if (j > 0 && rebalanceRows[j] <= rebalanceRows[j - 1]) {
                throw new IllegalArgumentException("rebalance rows must increase: " + rebalanceRows[j - 1]
                        + " then " + rebalanceRows[j]);
            }
            if (!(rebalanceRows[j] < lastRow)) {
                throw new IllegalArgumentException("rebalance row " + rebalanceRows[j]
                        + " leaves no row to hold before the last row " + lastRow);
            }
        }
    }

    public int count() {
        return rebalanceRows.length;
    }

    /** τ_j. */
    public int rebalanceRow(int j) {
        return rebalanceRows[j];
    }

    /** τ_0. */
    public int firstRebalance() {
        return rebalanceRows[0];
    }

    /** The last row held by the portfolio formed at rebalance j. */
    public int holdEnd(int j) {
        return j + 1 < rebalanceRows.length ? rebalanceRows[j + 1] : lastRow;
    }

    /** Number of out-of-sample rows. */
    public int outOfSampleRows() {
        return lastRow - rebalanceRows[0];
    }

    /** A copy of the rebalance rows. */
    @Override
    public int[] rebalanceRows() {
        return rebalanceRows.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Schedule s && s.lastRow == lastRow && java.util.Arrays.equals(s.rebalanceRows, rebalanceRows);
    }

    @Override
    public int hashCode() {
        return 31 * java.util.Arrays.hashCode(rebalanceRows) + lastRow;
    }

    @Override
    public String toString() {
        return "Schedule[" + rebalanceRows.length + " rebalances from row " + rebalanceRows[0] + ", last row " + lastRow + "]";
    }
}
