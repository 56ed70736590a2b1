package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.evidence.HolmAdjustment;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The grid's answer to "is the best point really better than its baseline?", corrected for
 * having searched the whole grid (Method §9). The best point is the strategy, window and point
 * with the lowest realised volatility among those tested against a baseline. Its p-value is the
 * studentised block bootstrap p-value of the variance difference from its point's
 * {@code tests.csv}, adjusted by Holm's (1979) step-down over every such test in the grid: the
 * family is every point, strategy and window compared, so the search itself is paid for.
 * Holm's adjustment holds under any dependence between the tests, which the grid's overlapping
 * studies certainly have; a joint resampling of all points (Romano-Wolf) would be less
 * conservative but needs the points' returns on common dates.
 *
 * @param best the best row, when any point has a tested strategy
 * @param baseline the best row's baseline in the same point and window
 * @param rawPValue the best comparison's own p-value
 * @param familyPValue Holm-adjusted over {@code family} tests
 * @param family number of tests in the family
 */
public record GridEvidence(Optional<PointRow> best, Optional<PointRow> baseline, double rawPValue,
                           double familyPValue, int family) {
    public GridEvidence {
        Objects.requireNonNull(best, "best");
        Objects.requireNonNull(baseline, "baseline");
    }

    static GridEvidence of(List<PointRow> rows, List<PointComparison> tests) {
        PointRow best = null;
        int bestTest = -1;
        for (PointRow r : rows) {
            int t = indexOf(tests, r);
            if (t >= 0 && Double.isFinite(r.volatility()) && (best == null || r.volatility() < best.volatility())) {
                best = r;
                bestTest = t;
            }
        }
        if (best == null) {
            return new GridEvidence(Optional.empty(), Optional.empty(), Double.NaN, Double.NaN, tests.size());
        }
        double[] p = tests.stream().mapToDouble(PointComparison::pValue).toArray();
        double[] adjusted = HolmAdjustment.adjust(p);
        PointComparison test = tests.get(bestTest);
        Optional<PointRow> baseline = rows.stream().filter(r -> r.point().equals(test.point())
                && r.strategy().equals(test.baseline()) && r.window().equals(test.window())).findFirst();
        return new GridEvidence(Optional.of(best), baseline, p[bestTest], adjusted[bestTest], tests.size());
    }

    private static int indexOf(List<PointComparison> tests, PointRow r) {
        for (int i = 0; i < tests.size(); i++) {
            PointComparison t = tests.get(i);
            if (t.point().equals(r.point()) && t.strategy().equals(r.strategy()) && t.window().equals(r.window())) {
                return i;
            }
        }
        return -1;
    }
}
