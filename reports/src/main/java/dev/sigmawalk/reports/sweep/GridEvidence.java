package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.HolmAdjustment;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The grid's answer to "is the best point really better than its baseline?", corrected for
 * having searched the whole grid (Method §9). The best point is the strategy, window and point
 * with the lowest realised volatility among those its point's {@code tests.csv} compares and
 * that formed a portfolio at one rebalance at least (a path that never did held cash). Its
 * family-corrected p-value is the Romano-Wolf stepdown over every variance comparison of every
 * point, on the dates they share ({@link GridFamily}). Holm's (1979) step-down over the points'
 * own bootstrap p-values, each on its own full period, is kept beside it: it holds under any
 * dependence and leaves no comparison out, but ignores how alike the points' studies are.
 *
 * @param best the best row, when any point has a compared strategy
 * @param baseline the best row's baseline in the same point and window
 * @param rawPValue the best comparison's own bootstrap p-value, from its point's {@code tests.csv}
 * @param familyPValue the best comparison's Romano-Wolf p-value over the grid family (NaN without one)
 * @param holmPValue the best comparison's Holm p-value over every comparison of the grid
 * @param comparisons every comparison of the grid, in grid order
 * @param holm the Holm p-value of each comparison, in the same order
 * @param family the Romano-Wolf family and what was left out of it
 */
public record GridEvidence(Optional<PointRow> best, Optional<PointRow> baseline, double rawPValue, double familyPValue,
                           double holmPValue, List<PointComparison> comparisons, double[] holm, GridFamily family) {
    public GridEvidence {
        Objects.requireNonNull(best, "best");
        Objects.requireNonNull(baseline, "baseline");
        comparisons = List.copyOf(comparisons);
        holm = holm.clone();
        Objects.requireNonNull(family, "family");
        if (holm.length != comparisons.size()) {
            throw new IllegalArgumentException(holm.length + " Holm values for " + comparisons.size() + " comparisons");
        }
    }

    /** Number of comparisons in the grid (Holm's family). */
    public int comparisonCount() {
        return comparisons.size();
    }

    /**
     * @param rows every point's summary rows, in grid order
     * @param candidates every comparison with its returns, in grid order
     * @param tests the difference tests the family is run again with (the base study's settings)
     */
    static GridEvidence of(List<PointRow> rows, List<ContrastReturns> candidates, DifferenceTests tests) {
        return of(rows, candidates, tests, 1);
    }

    /** The same evidence, the grid family's resamples shared out over {@code threads} threads. */
    static GridEvidence of(List<PointRow> rows, List<ContrastReturns> candidates, DifferenceTests tests, int threads) {
        List<PointComparison> comparisons = candidates.stream().map(ContrastReturns::comparison).toList();
        double[] holm = HolmAdjustment.adjust(comparisons.stream().mapToDouble(PointComparison::pValue).toArray());
        PointRow best = null;
        int bestTest = -1;
        boolean tested = false;
        for (PointRow r : rows) {
            int t = indexOf(comparisons, r);
            tested |= t >= 0;
            // A path that never formed a portfolio held cash: its low volatility is the
            // risk-free rate's, so it is never the grid's best.
            if (t >= 0 && r.invested() && Double.isFinite(r.volatility())
                    && (best == null || r.volatility() < best.volatility())) {
                best = r;
                bestTest = t;
            }
        }
        if (best == null) {
            return new GridEvidence(Optional.empty(), Optional.empty(), Double.NaN, Double.NaN, Double.NaN, comparisons,
                    holm, GridFamily.none(tested ? "no compared strategy formed a portfolio at any rebalance"
                            : "no point has a strategy compared with another"));
        }
        PointComparison test = comparisons.get(bestTest);
        GridFamily family = GridFamily.of(candidates, bestTest, tests, threads);
        double familyP = family.member(test).map(GridFamily.Member::adjusted).orElse(Double.NaN);
        return new GridEvidence(Optional.of(best), baselineOf(rows, test), test.pValue(), familyP, holm[bestTest],
                comparisons, holm, family);
    }

    /** The first comparison of this row's point, strategy and window; -1 when it has none. */
    static int indexOf(List<PointComparison> tests, PointRow r) {
        for (int i = 0; i < tests.size(); i++) {
            PointComparison t = tests.get(i);
            if (t.point().equals(r.point()) && t.strategy().equals(r.strategy()) && t.window().equals(r.window())) {
                return i;
            }
        }
        return -1;
    }

    private static Optional<PointRow> baselineOf(List<PointRow> rows, PointComparison test) {
        return rows.stream().filter(r -> r.point().equals(test.point()) && r.strategy().equals(test.baseline())
                && r.window().equals(test.window())).findFirst();
    }
}
