package dev.sigmawalk.engine.evidence;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;

/**
 * Family-wise adjusted p-values for a family of two-sided difference tests, by the studentised
 * stepdown method of Romano &amp; Wolf (2005, Econometrica 73, 1237-1282, Algorithm 4.1 with
 * studentised statistics), in the adjusted-p-value form of Romano &amp; Wolf (2016, Statistics
 * &amp; Probability Letters 113, 38-40). Method §9.
 *
 * <p>The bootstrap keeps the dependence between the comparisons: every resample draws one set of
 * circular block starts and applies it to every contrast (the same periods for all series, as in
 * {@link StudentisedBlockBootstrap}), so that d*_{s,m} = |Δ*_s - Δ̂_s| / s*_s of the contrasts s in
 * resample m come from the same resampled history. With the observed d̂_s = |Δ̂_s| / s(Δ̂_s)
 * sorted descending, d̂_(1) ≥ … ≥ d̂_(S),
 * <pre>
 *   p̃_(j) = (#{m : max_{k ≥ j} d*_{(k),m} ≥ d̂_(j)} + 1) / (M + 1),   then   p̃_(j) ← max(p̃_(j), p̃_(j-1)),
 * </pre>
 * which rejects H_(j) exactly when the stepdown procedure at level α does. Every adjusted value
 * is at least the contrast's own bootstrap p-value with the same resamples and at most 1.
 *
 * <p>One block length serves the whole family: the largest of the members' own block lengths
 * (each chosen from its influence series, or the configured one), so that the most persistent
 * comparison keeps its dependence. All series must have the same length T with ⌊T/b⌋ ≥ 2. Draws
 * come from {@code new SplittableRandom(seed)} in a fixed order: the same family and seed give the
 * same values bit for bit.
 */
public final class RomanoWolfStepdown {
    private RomanoWolfStepdown() {
    }

    /**
     * @param family S >= 1 contrasts over the same T periods
     * @param resamples M >= 1
     * @param seed the bootstrap seed
     * @return the adjusted p-values in the family's order, each in (0, 1]
     */
    public static double[] adjust(List<FamilyContrast> family, int resamples, long seed) {
        return adjust(family, resamples, seed, 1);
    }

    /**
     * The same adjusted p-values, the resamples shared out over {@code threads} threads: the
     * block starts of every resample are drawn first, in the one fixed order, and each resample's
     * statistics depend on its own starts alone, so the values are bit for bit those of one
     * thread whatever the count.
     *
     * @param family S >= 1 contrasts over the same T periods
     * @param resamples M >= 1
     * @param seed the bootstrap seed
     * @param threads >= 1
     * @return the adjusted p-values in the family's order, each in (0, 1]
     */
    public static double[] adjust(List<FamilyContrast> family, int resamples, long seed, int threads) {
        if (!(threads >= 1)) {
            throw new IllegalArgumentException("threads (" + threads + ") must be >= 1");
        }
        if (family.isEmpty()) {
            return new double[0];
        }
        if (!(resamples >= 1)) {
            throw new IllegalArgumentException("resamples (" + resamples + ") must be >= 1");
        }
        int length = family.get(0).first().length;
        int block = 1;
        for (FamilyContrast c : family) {
            if (c.first().length != length) {
                throw new IllegalArgumentException("family members must share their periods: " + c.first().length
                        + " and " + length);
            }
            block = Math.max(block, c.test().blockLength());
        }
        int blocks = length / block;
        if (!(blocks >= 2)) {
            throw new IllegalArgumentException("block length (" + block + ") must leave >= 2 blocks in " + length
                    + " periods");
        }
        int size = family.size();
        double[] observed = new double[size];
        for (int s = 0; s < size; s++) {
            observed[s] = Math.abs(family.get(s).test().statistic());
        }
        // A series that several contrasts share (a path in several pairs, or the same values
        // rebuilt for each contrast) is resampled once per draw: same values, same starts.
        List<double[]> distinct = new ArrayList<>();
        int[] firstOf = new int[size];
        int[] secondOf = new int[size];
        for (int s = 0; s < size; s++) {
            firstOf[s] = indexOf(distinct, family.get(s).first());
            secondOf[s] = indexOf(distinct, family.get(s).second());
        }
        int drawn = blocks * block;
        int[][] starts = new int[resamples][blocks];
        SplittableRandom random = new SplittableRandom(seed);
        for (int m = 0; m < resamples; m++) {
            for (int j = 0; j < blocks; j++) {
                starts[m][j] = random.nextInt(length);
            }
        }
        double[][] resampled = new double[resamples][];
        int shared = block;
        int parts = Math.min(threads, resamples);
        List<Callable<Void>> tasks = new ArrayList<>(parts);
        for (int k = 0; k < parts; k++) {
            int from = (int) ((long) resamples * k / parts);
            int to = (int) ((long) resamples * (k + 1) / parts);
            tasks.add(() -> {
                resampleRange(family, distinct, firstOf, secondOf, starts, shared, drawn, from, to, resampled);
                return null;
            });
        }
        SharedOut.all(tasks, parts, "resampling the family");
        return fromResamples(observed, resampled);
    }

    /** d*_{s,m} of resamples {@code from} to {@code to} - 1, with buffers of this range's own. */
    private static void resampleRange(List<FamilyContrast> family, List<double[]> distinct, int[] firstOf, int[] secondOf,
                                      int[][] starts, int block, int drawn, int from, int to, double[][] resampled) {
        int size = family.size();
        CircularResample[] draws = new CircularResample[distinct.size()];
        for (int d = 0; d < draws.length; d++) {
            draws[d] = new CircularResample(drawn);
        }
        for (int m = from; m < to; m++) {
            for (int d = 0; d < draws.length; d++) {
                draws[d].draw(distinct.get(d), starts[m], block);
            }
            double[] row = new double[size];
            for (int s = 0; s < size; s++) {
                FamilyContrast c = family.get(s);
                CircularResample ra = draws[firstOf[s]];
                CircularResample rb = draws[secondOf[s]];
                row[s] = StudentisedBlockBootstrap.studentised(c.measure(), ra.values(), rb.values(),
                        CircularResample.moments(ra, rb), block, c.test().difference());
            }
            resampled[m] = row;
        }
    }

    /**
     * The stepdown adjusted p-values from the observed statistics and their resampled
     * counterparts (the equations above).
     *
     * @param observed d̂_s >= 0, S of them
     * @param resampled d*_{s,m}: M rows of S values each (+∞ allowed)
     */
    static double[] fromResamples(double[] observed, double[][] resampled) {
        int size = observed.length;
        Integer[] order = new Integer[size];
        Arrays.setAll(order, s -> s);
        // Descending by d̂; ties keep the family's order, so the result is deterministic.
        Arrays.sort(order, Comparator.comparingDouble((Integer s) -> -observed[s]));
        int[] atLeast = new int[size];
        for (double[] row : resampled) {
            // Suffix maxima over the ordered family: the largest d* among hypotheses j..S.
            double running = Double.NEGATIVE_INFINITY;
            for (int j = size - 1; j >= 0; j--) {
                running = Math.max(running, row[order[j]]);
                if (running >= observed[order[j]]) {
                    atLeast[j]++;
                }
            }
        }
        double[] adjusted = new double[size];
        double previous = 0;
        for (int j = 0; j < size; j++) {
            double p = Math.max(previous, (atLeast[j] + 1.0) / (resampled.length + 1.0));
            adjusted[order[j]] = p;
            previous = p;
        }
        return adjusted;
    }

    /** Where {@code x}'s values sit in {@code distinct}, appending them when they are new. */
    private static int indexOf(List<double[]> distinct, double[] x) {
        for (int d = 0; d < distinct.size(); d++) {
            if (distinct.get(d) == x || Arrays.equals(distinct.get(d), x)) {
                return d;
            }
        }
        distinct.add(x);
        return distinct.size() - 1;
    }
}
