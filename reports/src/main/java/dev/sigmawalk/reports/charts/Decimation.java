package dev.sigmawalk.reports.charts;


/**
 * Thins a long line for drawing without losing its peaks and troughs: the points are cut into
 * consecutive buckets of equal count, and each bucket keeps only its lowest and highest point (in
 * their original order), plus its first NaN so that gaps stay gaps. The first and last points are
 * always kept. A 900-pixel-wide chart cannot show more than about one point per pixel column
 * anyway, and a ten-year daily series would otherwise make every chart a quarter megabyte.
 */
public final class Decimation {
    private Decimation() {
    }

    /**
     * The indices to keep, ascending.
     *
     * @param y ordinates (NaN allowed)
     * @param maxPoints at most this many indices are returned (>= 4); all indices when y is not longer
     */
    public static int[] minMax(double[] y, int maxPoints) {
        if (!(maxPoints >= 4)) {
            throw new IllegalArgumentException("decimation limit (" + maxPoints + ") must be >= 4");
        }
        int n = y.length;
        if (n <= maxPoints) {
            int[] all = new int[n];
            for (int k = 0; k < n; k++) {
                all[k] = k;
            }
            return all;
        }
        // Up to three points a bucket (low, high, first NaN) plus the two ends, marked in a mask
        // and read back in index order: the ascending set of kept indices, without boxing.
        int buckets = (maxPoints - 2) / 3;
        boolean[] keep = new boolean[n];
        keep[0] = true;
        keep[n - 1] = true;
        for (int b = 0; b < buckets; b++) {
            int start = (int) ((long) b * n / buckets);
            int end = (int) ((long) (b + 1) * n / buckets);
            keepExtremes(y, start, end, keep);
        }
        int count = 0;
        for (boolean k : keep) {
            count += k ? 1 : 0;
        }
        int[] out = new int[count];
        for (int k = 0, at = 0; k < n; k++) {
            if (keep[k]) {
                out[at++] = k;
            }
        }
        return out;
    }

    private static void keepExtremes(double[] y, int start, int end, boolean[] keep) {
        int low = -1;
        int high = -1;
        int gap = -1;
        for (int k = start; k < end; k++) {
            if (Double.isNaN(y[k])) {
                gap = gap < 0 ? k : gap;
            } else {
                low = low < 0 || y[k] < y[low] ? k : low;
                high = high < 0 || y[k] > y[high] ? k : high;
            }
        }
        for (int k : new int[] {low, high, gap}) {
            if (k >= 0) {
                keep[k] = true;
            }
        }
    }
}
