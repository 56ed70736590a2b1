package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.FamilyContrast;
import dev.sigmawalk.engine.evidence.RomanoWolfStepdown;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The grid's family of variance comparisons, corrected together by the Romano-Wolf studentised
 * stepdown on the dates every member shares (Method §9).
 *
 * <p>The points of a grid rarely share their out-of-sample periods (a longer window or a later
 * start begins later, another asset file may cover other years), and the joint resampling needs
 * one history for all. The family is therefore formed on the intersection of its members'
 * dates, anchored on the best comparison: the others join in order of how many dates they share
 * with it (most first, ties in grid order), each only if the common dates after it joins still
 * number at least half of the best comparison's own dates (and at least
 * {@link DifferenceTests#MIN_PERIODS}). A comparison left out is named with its reason; leaving
 * it out makes the correction milder, which is why the grid-wide Holm value over every
 * comparison is kept beside it. On the common dates every member's variance test is run again
 * (Ledoit-Wolf 2011, studentised circular block bootstrap), and {@link RomanoWolfStepdown}
 * draws the same block starts for all members, so the dependence between the points' studies
 * is kept. The result depends only on the comparisons and their returns, never on the order in
 * which points finished.
 *
 * @param members the comparisons in the family, in grid order, with their tests on the common
 *        dates and their adjusted p-values
 * @param leftOut comparisons not in the family, in grid order, each with its reason
 * @param first first common date (empty when no family was formed)
 * @param last last common date
 * @param periods number of common dates; 0 when no family was formed
 * @param notFormed why there is no family at all, when there is none
 */
record GridFamily(List<Member> members, List<LeftOut> leftOut, Optional<LocalDate> first, Optional<LocalDate> last,
                  int periods, Optional<String> notFormed) {
    /** Least share of the best comparison's dates the family keeps (our choice, stated in Method §9). */
    static final double MIN_SHARE = 0.5;

    GridFamily {
        members = List.copyOf(members);
        leftOut = List.copyOf(leftOut);
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(last, "last");
        Objects.requireNonNull(notFormed, "notFormed");
    }

    /** A member: its test on the common dates and its family-adjusted p-value. */
    record Member(PointComparison comparison, DifferenceTest test, double adjusted) {
    }

    /** A comparison outside the family and why. */
    record LeftOut(PointComparison comparison, String reason) {
    }

    /** The empty family, with its reason. */
    static GridFamily none(String reason) {
        return new GridFamily(List.of(), List.of(), Optional.empty(), Optional.empty(), 0, Optional.of(reason));
    }

    /**
     * @param candidates every comparison of the grid with its returns, in grid order
     * @param anchor index of the best comparison in {@code candidates}
     * @param tests the difference tests (kernel, resamples, seed, block length)
     */
    static GridFamily of(List<ContrastReturns> candidates, int anchor, DifferenceTests tests) {
        return of(candidates, anchor, tests, 1);
    }

    /**
     * The same family, its resamples shared out over {@code threads} threads (the values do not
     * depend on the count: {@link RomanoWolfStepdown#adjust(List, int, long, int)}).
     */
    static GridFamily of(List<ContrastReturns> candidates, int anchor, DifferenceTests tests, int threads) {
        ContrastReturns best = candidates.get(anchor);
        int minimum = Math.max(DifferenceTests.MIN_PERIODS, (int) Math.ceil(MIN_SHARE * best.periods()));
        if (best.periods() < minimum) {
            return none("the best comparison has " + best.periods() + " out-of-sample dates, fewer than the "
                    + DifferenceTests.MIN_PERIODS + " a test needs");
        }
        int[] common = best.days();
        boolean[] joined = new boolean[candidates.size()];
        joined[anchor] = true;
        String[] reasons = new String[candidates.size()];
        for (int i : byOverlap(candidates, anchor)) {
            int[] next = candidates.get(i).sharedWith(common);
            if (next.length >= minimum) {
                common = next;
                joined[i] = true;
            } else {
                reasons[i] = reason(candidates.get(i), best, next.length, minimum);
            }
        }
        return tested(candidates, joined, reasons, common, anchor, tests, threads);
    }

    /** Indexes other than the anchor, most dates shared with the anchor first, ties in grid order. */
    private static List<Integer> byOverlap(List<ContrastReturns> candidates, int anchor) {
        int[] shared = new int[candidates.size()];
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < candidates.size(); i++) {
            if (i != anchor) {
                shared[i] = candidates.get(i).sharedWith(candidates.get(anchor).days()).length;
                order.add(i);
            }
        }
        order.sort(Comparator.comparingInt((Integer i) -> -shared[i]).thenComparingInt(i -> i));
        return order;
    }

    private static String reason(ContrastReturns c, ContrastReturns best, int wouldKeep, int minimum) {
        int shared = c.sharedWith(best.days()).length;
        if (shared == 0) {
            return "its out-of-sample period (" + span(c.days()) + ") does not overlap the best comparison's ("
                    + span(best.days()) + ")";
        }
        return "with it the family would keep " + wouldKeep + " common dates, fewer than the " + minimum
                + " required (half of the best comparison's " + best.periods() + "); its period is " + span(c.days());
    }

    private static String span(int[] days) {
        return days.length == 0 ? "no dates" : LocalDate.ofEpochDay(days[0]) + " to " + LocalDate.ofEpochDay(days[days.length - 1]);
    }

    /** Runs each member's test on the common dates, then the stepdown over those that ran. */
    private static GridFamily tested(List<ContrastReturns> candidates, boolean[] joined, String[] reasons, int[] common,
                                     int anchor, DifferenceTests tests, int threads) {
        List<PointComparison> inFamily = new ArrayList<>();
        List<FamilyContrast> contrasts = new ArrayList<>();
        for (int i = 0; i < candidates.size(); i++) {
            if (!joined[i]) {
                continue;
            }
            double[][] pair = candidates.get(i).on(common);
            try {
                DifferenceTest t = tests.variance(pair[0], pair[1]);
                contrasts.add(new FamilyContrast(DifferenceMeasure.VARIANCE, pair[0], pair[1], t));
                inFamily.add(candidates.get(i).comparison());
            } catch (IllegalArgumentException e) {
                if (i == anchor) {
                    return none("the best comparison's variance test on the common dates did not run: " + e.getMessage());
                }
                reasons[i] = "its variance test on the common dates did not run: " + e.getMessage();
            }
        }
        double[] adjusted = RomanoWolfStepdown.adjust(contrasts, tests.evidence().resamples(), tests.evidence().seed(),
                threads);
        List<Member> members = new ArrayList<>();
        for (int k = 0; k < contrasts.size(); k++) {
            members.add(new Member(inFamily.get(k), contrasts.get(k).test(), adjusted[k]));
        }
        List<LeftOut> leftOut = new ArrayList<>();
        for (int i = 0; i < candidates.size(); i++) {
            if (reasons[i] != null) {
                leftOut.add(new LeftOut(candidates.get(i).comparison(), reasons[i]));
            }
        }
        return new GridFamily(members, leftOut, Optional.of(LocalDate.ofEpochDay(common[0])),
                Optional.of(LocalDate.ofEpochDay(common[common.length - 1])), common.length, Optional.empty());
    }

    /** The member for this comparison, if it is in the family. */
    Optional<Member> member(PointComparison c) {
        return members.stream().filter(m -> m.comparison().equals(c)).findFirst();
    }

    /** Why this comparison is not in the family; empty when it is. */
    String note(PointComparison c) {
        if (notFormed.isPresent()) {
            return "no grid family: " + notFormed.get();
        }
        return leftOut.stream().filter(l -> l.comparison().equals(c)).map(l -> "left out of the grid family: " + l.reason())
                .findFirst().orElse("");
    }

    /** The largest block length of the members' tests, which the stepdown uses; 0 without members. */
    int blockLength() {
        return members.stream().mapToInt(m -> m.test().blockLength()).max().orElse(0);
    }
}
