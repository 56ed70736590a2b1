package dev.sigmawalk.engine.data;

import java.util.Arrays;

/**
 * Per-asset counts over a panel's returns that intake's checks and the coverage report need,
 * gathered in one pass in the panel's row-major order (one sweep through memory instead of one
 * column-strided sweep per check, which on a large panel costs more than parsing the file).
 */
final class PanelStats {
    /** Rows with a return, per asset. */
    final int[] present;
    /** First and last row with a return, per asset (-1 without any). */
    final int[] first;
    final int[] last;
    /** Returns above 1 in size, per asset. */
    final int[] beyondOne;
    /** Returns above {@code implausible}, per asset, and the first such row (-1 without any). */
    final int[] aboveImplausible;
    final int[] firstImplausible;
    /** Returns at or below {@code collapse}, per asset, and the first such row (-1 without any). */
    final int[] collapsed;
    final int[] firstCollapse;
    /**
     * The longest run of consecutive rows whose return is exactly 0, per asset, and the row that
     * ends it (-1 without any); a missing row ends a run. The first longest run is kept.
     */
    final int[] zeroRun;
    final int[] zeroRunEnd;
    /**
     * A hash of each asset's column, missing rows included (NaN hashes as itself), so that two
     * columns with equal hashes are the only candidates for being the same series.
     */
    final long[] columnHash;
    /** Returns above {@code large} in size over the whole panel, and the first one's row and asset. */
    long largeCount;
    int firstLargeRow = -1;
    int firstLargeAsset = -1;
    /** All returns present over the whole panel. */
    long presentCount;

    private PanelStats(int assets) {
        present = new int[assets];
        first = new int[assets];
        last = new int[assets];
        beyondOne = new int[assets];
        aboveImplausible = new int[assets];
        firstImplausible = new int[assets];
        collapsed = new int[assets];
        zeroRun = new int[assets];
        columnHash = new long[assets];
        zeroRunEnd = new int[assets];
        Arrays.fill(zeroRunEnd, -1);
        firstCollapse = new int[assets];
        Arrays.fill(firstCollapse, -1);
        Arrays.fill(first, -1);
        Arrays.fill(last, -1);
        Arrays.fill(firstImplausible, -1);
    }

    /**
     * @param implausible a return above which is counted as implausible
     * @param collapse a return at or below which is counted as a collapse
     * @param large a size above which a return counts toward the percent check
     */
    static PanelStats of(ReturnPanel panel, double implausible, double collapse, double large) {
        int n = panel.assetCount();
        PanelStats s = new PanelStats(n);
        double[] r = panel.rawReturns();
        int[] run = new int[n];
        for (int t = 0, at = 0; t < panel.rows(); t++) {
            for (int j = 0; j < n; j++, at++) {
                double v = r[at];
                s.columnHash[j] = s.columnHash[j] * 1_000_003 + Double.doubleToLongBits(v);
                if (v != v) {
                    run[j] = 0;
                    continue;
                }
                if (v == 0) {
                    if (++run[j] > s.zeroRun[j]) {
                        s.zeroRun[j] = run[j];
                        s.zeroRunEnd[j] = t;
                    }
                } else {
                    run[j] = 0;
                }
                s.present[j]++;
                if (s.first[j] < 0) {
                    s.first[j] = t;
                }
                s.last[j] = t;
                double size = Math.abs(v);
                if (size > 1) {
                    s.beyondOne[j]++;
                }
                if (v > implausible && s.aboveImplausible[j]++ == 0) {
                    s.firstImplausible[j] = t;
                }
                if (v <= collapse && s.collapsed[j]++ == 0) {
                    s.firstCollapse[j] = t;
                }
                if (size > large && s.largeCount++ == 0) {
                    s.firstLargeRow = t;
                    s.firstLargeAsset = j;
                }
            }
        }
        for (int j = 0; j < n; j++) {
            s.presentCount += s.present[j];
        }
        return s;
    }
}
