package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.FamilyContrast;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.evidence.RomanoWolfStepdown;
import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.study.EvidenceSpec;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The grid's Romano-Wolf family on the dates its members share (Method §9): which comparisons
 * join, on which dates, and that the adjusted p-values are those of the stepdown run directly
 * on the aligned series (Romano &amp; Wolf 2005, Econometrica 73, Algorithm 4.1, in the adjusted
 * form of Romano &amp; Wolf 2016, Stat. Probab. Letters 113; the stepdown itself is checked by
 * hand in the engine's own tests). Under a null of no difference the family rejects at about
 * its nominal size.
 */
class GridFamilyTest {
    private static final EvidenceSpec QUICK = new EvidenceSpec(199, 7L, 0);
    private static final DifferenceTests TESTS = new DifferenceTests(HacKernel.PARZEN, QUICK);
    private static final int DAY0 = Math.toIntExact(LocalDate.of(2010, 1, 1).toEpochDay());

    private static GridPoint point(int n) {
        return new GridPoint(n, String.format("%03d", n), List.of(String.valueOf(n)), Path.of("/grid/points/" + n), "");
    }

    /** A compared pair on dates DAY0 + from .. DAY0 + from + length - 1, both sides drawn from {@code random}. */
    private static ContrastReturns pair(int n, int from, int length, double ratio, SplittableRandom random) {
        int[] days = new int[length];
        double[] a = new double[length];
        double[] b = new double[length];
        for (int t = 0; t < length; t++) {
            days[t] = DAY0 + from + t;
            double common = gaussian(random);
            a[t] = 0.01 * (0.8 * common + 0.6 * gaussian(random)) * ratio;
            b[t] = 0.01 * (0.8 * common + 0.6 * gaussian(random));
        }
        return new ContrastReturns(new PointComparison(point(n), "model", "base", "60", 0.5), days, a, b);
    }

    private static double gaussian(SplittableRandom random) {
        // Box-Muller; the second variate is dropped, which keeps the draw order simple.
        double u = 1.0 - random.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random.nextDouble());
    }

    /**
     * Five points: the best (1) on days 0-99, so at least 50 common dates must stay. Point 2
     * (days 20-119) shares 80 and joins first, point 3 (days 50-149) shares 50 and still leaves
     * 50 (days 50-99), point 4 (days 70-169) shares 30 and is left out, point 5 (days 200-299)
     * does not overlap at all. The adjusted p-values equal the stepdown run directly on the three
     * members' series cut to days 50-99, bit for bit.
     */
    @Test
    void family_isFormedOnTheCommonDates_andMatchesTheStepdownRunDirectly() {
        SplittableRandom random = new SplittableRandom(11);
        List<ContrastReturns> grid = List.of(pair(1, 0, 100, 0.8, random), pair(2, 20, 100, 0.9, random),
                pair(3, 50, 100, 1.0, random), pair(4, 70, 100, 0.85, random), pair(5, 200, 100, 0.9, random));
        GridFamily f = GridFamily.of(grid, 0, TESTS);

        assertEquals(List.of("001", "002", "003"),
                f.members().stream().map(m -> m.comparison().point().label()).toList(), "members, in grid order");
        assertEquals(50, f.periods(), "common dates");
        assertEquals(LocalDate.ofEpochDay(DAY0 + 50), f.first().get());
        assertEquals(LocalDate.ofEpochDay(DAY0 + 99), f.last().get());
        assertEquals(List.of("004", "005"), f.leftOut().stream().map(l -> l.comparison().point().label()).toList());
        assertTrue(f.leftOut().get(0).reason().contains("would keep 30 common dates, fewer than the 50 required"),
                f.leftOut().get(0).reason());
        assertTrue(f.leftOut().get(1).reason().contains("does not overlap"), f.leftOut().get(1).reason());
        assertTrue(f.note(grid.get(4).comparison()).startsWith("left out of the grid family: "), "note of point 5");
        assertEquals("", f.note(grid.get(0).comparison()), "no note for a member");

        List<FamilyContrast> direct = new ArrayList<>();
        // Day 50 is row 50 of point 1, row 30 of point 2 and row 0 of point 3.
        int[] offsets = {50, 30, 0};
        for (int k = 0; k < 3; k++) {
            double[] a = Arrays.copyOfRange(grid.get(k).first(), offsets[k], offsets[k] + 50);
            double[] b = Arrays.copyOfRange(grid.get(k).second(), offsets[k], offsets[k] + 50);
            DifferenceTest t = TESTS.variance(a, b);
            direct.add(new FamilyContrast(DifferenceMeasure.VARIANCE, a, b, t));
        }
        double[] expected = RomanoWolfStepdown.adjust(direct, QUICK.resamples(), QUICK.seed());
        for (int k = 0; k < 3; k++) {
            assertEquals(expected[k], f.members().get(k).adjusted(), 0.0, "member " + k + " adjusted p-value");
            assertEquals(direct.get(k).test().statistic(), f.members().get(k).test().statistic(), 0.0, "member " + k);
        }
    }

    @Test
    void bestWithTooFewDates_formsNoFamily() {
        List<ContrastReturns> grid = List.of(pair(1, 0, 9, 0.8, new SplittableRandom(3)));
        GridFamily f = GridFamily.of(grid, 0, TESTS);
        assertTrue(f.members().isEmpty() && f.notFormed().isPresent(), "no family");
        assertTrue(f.note(grid.get(0).comparison()).startsWith("no grid family: the best comparison has 9"),
                f.note(grid.get(0).comparison()));
    }

    /**
     * Size under the null: four points whose strategies share most of their shocks (as studies of
     * one universe at different costs do), on periods shifted by 0, 8, 16 and 24 days, every
     * strategy with the same variance as its baseline. The best is the lowest sample volatility, as
     * in a sweep. Over 200 seeded grids the family rejects at the 5 % level in about 5 % of them
     * (binomial standard error 1.5 points; the band allows for the bootstrap's small-sample
     * error at 96 common dates), while the best point's own uncorrected test, chosen after the
     * search, rejects more often.
     */
    @Test
    void underNoDifference_theFamilyRejectsAtAboutItsSize() {
        SplittableRandom random = new SplittableRandom(20_260_101L);
        int draws = 200;
        int family = 0;
        int own = 0;
        for (int k = 0; k < draws; k++) {
            List<ContrastReturns> grid = nullGrid(random, 4, 120, 8);
            int best = 0;
            for (int i = 1; i < grid.size(); i++) {
                if (SeriesStats.sd(grid.get(i).first()) < SeriesStats.sd(grid.get(best).first())) {
                    best = i;
                }
            }
            GridFamily f = GridFamily.of(grid, best, new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(199, k, 0)));
            assertEquals(4, f.members().size(), "every point joins (96 of 120 dates shared)");
            double min = f.members().stream().mapToDouble(GridFamily.Member::adjusted).min().getAsDouble();
            family += min <= 0.05 ? 1 : 0;
            DifferenceTest t = TESTS.variance(grid.get(best).first(), grid.get(best).second());
            own += t.bootstrapPValue() <= 0.05 ? 1 : 0;
        }
        double rate = (double) family / draws;
        assertTrue(rate >= 0.01 && rate <= 0.11, "family-wise rejection rate " + rate);
        assertTrue(own >= family, "own test of the best after the search " + own + " vs family " + family);
    }

    /** Points sharing 90 % of their strategy's and their baseline's shocks; period of point i starts at i × shift. */
    private static List<ContrastReturns> nullGrid(SplittableRandom random, int points, int length, int shift) {
        int span = length + shift * (points - 1);
        double[] marketA = new double[span];
        double[] marketB = new double[span];
        for (int t = 0; t < span; t++) {
            double common = gaussian(random);
            marketA[t] = 0.8 * common + 0.6 * gaussian(random);
            marketB[t] = 0.8 * common + 0.6 * gaussian(random);
        }
        List<ContrastReturns> grid = new ArrayList<>();
        for (int i = 0; i < points; i++) {
            int[] days = new int[length];
            double[] a = new double[length];
            double[] b = new double[length];
            for (int t = 0; t < length; t++) {
                int s = i * shift + t;
                days[t] = DAY0 + s;
                a[t] = 0.01 * (Math.sqrt(0.9) * marketA[s] + Math.sqrt(0.1) * gaussian(random));
                b[t] = 0.01 * (Math.sqrt(0.9) * marketB[s] + Math.sqrt(0.1) * gaussian(random));
            }
            grid.add(new ContrastReturns(new PointComparison(point(i + 1), "model", "base", "60", 0.5), days, a, b));
        }
        return grid;
    }
}
