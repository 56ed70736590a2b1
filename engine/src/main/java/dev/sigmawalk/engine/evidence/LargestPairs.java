package dev.sigmawalk.engine.evidence;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The k pairs with the largest correlation seen so far, in a bounded binary heap of primitives
 * whose head is the worst kept pair: O(log k) per pair that enters, nothing allocated per pair
 * looked at. The order is total (larger ρ first, then i, then j ascending), so the result does
 * not depend on the order in which pairs are offered.
 */
final class LargestPairs {
    private final int capacity;
    private final double[] value;
    private final int[] first;
    private final int[] second;
    private int size;

    LargestPairs(int capacity) {
        if (!(capacity >= 0)) {
            throw new IllegalArgumentException("pair count (" + capacity + ") must be >= 0");
        }
        this.capacity = capacity;
        value = new double[capacity];
        first = new int[capacity];
        second = new int[capacity];
    }

    /**
     * A pair with a smaller ρ cannot enter: −∞ while there is room, the worst kept ρ once full,
     * +∞ when nothing is kept. A pair whose ρ equals it may still enter on the (i, j) order.
     */
    double threshold() {
        if (capacity == 0) {
            return Double.POSITIVE_INFINITY;
        }
        return size < capacity ? Double.NEGATIVE_INFINITY : value[0];
    }

    void offer(double r, int i, int j) {
        if (size < capacity) {
            value[size] = r;
            first[size] = i;
            second[size] = j;
            up(size++);
        } else if (capacity > 0 && worse(0, r, i, j)) {
            value[0] = r;
            first[0] = i;
            second[0] = j;
            down(0);
        }
    }

    /** The kept pairs, best first, as named pairs with ρ clamped to [−1, 1]. */
    List<ResidualPair> pairs(List<String> assets) {
        Integer[] order = new Integer[size];
        Arrays.setAll(order, k -> k);
        Arrays.sort(order, (a, b) -> worse(a, value[b], first[b], second[b]) ? 1
                : worse(b, value[a], first[a], second[a]) ? -1 : 0);
        List<ResidualPair> out = new ArrayList<>(size);
        for (int k : order) {
            double r = Math.max(-1.0, Math.min(1.0, value[k]));
            out.add(new ResidualPair(assets.get(first[k]), assets.get(second[k]), r));
        }
        return out;
    }

    /** Whether kept entry k ranks below the pair (r, i, j). */
    private boolean worse(int k, double r, int i, int j) {
        if (value[k] != r) {
            return value[k] < r;
        }
        return first[k] != i ? first[k] > i : second[k] > j;
    }

    private void up(int k) {
        while (k > 0) {
            int parent = (k - 1) / 2;
            if (!worse(k, value[parent], first[parent], second[parent])) {
                return;
            }
            swap(k, parent);
            k = parent;
        }
    }

    private void down(int k) {
        while (true) {
            int worst = k;
            for (int c = 2 * k + 1; c <= 2 * k + 2 && c < size; c++) {
                if (worse(c, value[worst], first[worst], second[worst])) {
                    worst = c;
                }
            }
            if (worst == k) {
                return;
            }
            swap(k, worst);
            k = worst;
        }
    }

    private void swap(int a, int b) {
        double v = value[a];
        value[a] = value[b];
        value[b] = v;
        int f = first[a];
        first[a] = first[b];
        first[b] = f;
        int s = second[a];
        second[a] = second[b];
        second[b] = s;
    }
}
