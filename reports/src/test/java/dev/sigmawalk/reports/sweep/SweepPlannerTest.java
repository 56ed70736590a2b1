package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * How the grid's keys combine: keys resolve against the base study (so a renamed strategy is
 * still found), two keys may not set the same value, and two points may not be the same study.
 * Planning reads no data, so these run without walking anything.
 */
class SweepPlannerTest {
    @TempDir
    static Path dir;

    @BeforeAll
    static void base() throws IOException {
        SweepFixture.baseStudy(dir);
    }

    private static SweepPlan plan(String... vary) throws IOException {
        SweepFile sweep = SweepReader.read(SweepFixture.sweepFile(dir, "grid.yaml", vary));
        return SweepPlanner.plan(sweep, dir.resolve("out"));
    }

    private static void assertRefused(String message, String... vary) {
        InputException e = assertThrows(InputException.class, () -> plan(vary));
        assertEquals(message, e.getMessage());
    }

    private static Study point(SweepPlan plan, int i) {
        GridPoint p = plan.points().get(i);
        return StudyReader.read(p.studyFile(), p.yaml());
    }

    @Test
    void keyNamingARenamedStrategy_findsItInEveryPoint() throws IOException {
        SweepPlan plan = plan("strategies.plain.name: [p2, p3]", "strategies.plain.bounds: [[0, 0.1], [0, 0.2]]");
        assertEquals(4, plan.points().size());
        Study last = point(plan, 3);
        assertEquals("p3", last.strategies().get(1).name());
        assertEquals(new Bounds(0, 0.2), last.strategies().get(1).bounds().orElseThrow());
        assertEquals("index-model", last.strategies().get(0).name(), "the other strategy is untouched");
    }

    /**
     * The reader takes any factors text but "sectors" as a file, so point.yaml must name it from its
     * own folder, a .csv file too (which planning once refused as an internal error).
     */
    @Test
    void factorFileWithoutCsvEnding_isNamedFromThePointFolder() throws IOException {
        java.nio.file.Files.copy(dir.resolve("market-monthly.csv"), dir.resolve("factors.txt"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        String strategy = "{name: plain, risk: multi-index, objective: min-variance, factors: ";
        SweepPlan plan = plan("strategies.plain: [" + strategy + "factors.txt}, " + strategy + "sectors}, " + strategy
                + "market-monthly.csv}]");
        assertEquals(new dev.sigmawalk.engine.study.FactorSource.File(dir.resolve("factors.txt"), "../../../factors.txt"),
                point(plan, 0).strategies().get(1).riskSettings().factors().orElseThrow());
        assertEquals(dev.sigmawalk.engine.study.StudyDefaults.FACTORS,
                point(plan, 1).strategies().get(1).riskSettings().factors().orElseThrow());
        assertEquals(new dev.sigmawalk.engine.study.FactorSource.File(dir.resolve("market-monthly.csv"),
                "../../../market-monthly.csv"), point(plan, 2).strategies().get(1).riskSettings().factors().orElseThrow());
    }

    /** factors alone would be refused on a sample-covariance strategy; with risk: multi-index beside it, it is valid. */
    @Test
    void valuesValidOnlyTogether_areAccepted_andAValueWrongAloneIsStillPlacedAtItself() throws IOException {
        SweepPlan plan = plan("strategies.plain.risk: [multi-index]", "strategies.plain.factors: [market-monthly.csv]");
        assertEquals(dev.sigmawalk.engine.study.RiskKind.MULTI_INDEX, point(plan, 0).strategies().get(1).risk());
        assertRefused("grid.yaml line 5, column 29: vary.walkforward.cost_bps = -3 makes the base study base.yaml"
                        + " invalid: walkforward.cost_bps: -3 is negative; expected a cost >= 0 in basis points",
                "strategies.plain.risk: [multi-index]", "walkforward.cost_bps: [5, -3]");
    }

    /** null leaves the base's key out, so a point can switch from a row count to calendar ends. */
    @Test
    void nullValue_leavesTheBaseKeyOut() throws IOException {
        SweepPlan plan = plan("walkforward.rebalance_every: [null]", "walkforward.rebalance: [quarter-end]");
        assertEquals(new dev.sigmawalk.engine.study.RebalanceRule.CalendarEnd(
                dev.sigmawalk.engine.study.Calendar.QUARTER_END), point(plan, 0).walkForward().rebalance());
    }

    @Test
    void twoKeysForOneValue_areRefusedAtTheSecond() {
        assertRefused("grid.yaml line 5, column 3: vary key 'strategies.1.bounds' names the same study value as"
                        + " 'strategies.plain.bounds' (line 4), so one would overrule the other at every point; expected"
                        + " keys that set separate values (vary only one of them)",
                "strategies.plain.bounds: [[0, 0.1], [0, 0.2]]", "strategies.1.bounds: [[0, 0.05]]");
    }

    @Test
    void keyInsideAnotherKeysValue_isRefused_inEitherOrder() {
        assertRefused("grid.yaml line 5, column 3: vary key 'walkforward' holds 'walkforward.cost_bps' (line 4), so one"
                        + " would overrule the other at every point; expected keys that set separate values (vary only"
                        + " one of them)",
                "walkforward.cost_bps: [5, 20]", "walkforward: [{windows: [24], cost_bps: 1}]");
        assertRefused("grid.yaml line 5, column 3: vary key 'strategies.index-model.bounds' lies inside"
                        + " 'strategies.0' (line 4), so one would overrule the other at every point; expected keys that"
                        + " set separate values (vary only one of them)",
                "strategies.0: [{name: a, objective: equal-weight}]", "strategies.index-model.bounds: [[0, 0.2]]");
    }

    @Test
    void valuesThatMeanTheSame_areRefusedAtTheRepeat() {
        assertRefused("grid.yaml line 4, column 29: vary.walkforward.cost_bps: 5.0 gives the same study as 5 (grid"
                        + " points 1 and 2 would be one walk run twice); expected values that differ in meaning, not"
                        + " only in how they are written",
                "walkforward.cost_bps: [5, 5.0]");
        assertRefused("grid.yaml line 4, column 37: vary.data.assets: ./assets-monthly.csv gives the same study as"
                        + " assets-monthly.csv (grid points 1 and 2 would be one walk run twice); expected values that"
                        + " differ in meaning, not only in how they are written",
                "data.assets: [assets-monthly.csv, ./assets-monthly.csv]");
    }

    @Test
    void repeatOnTheSecondAxis_isPlacedThere() {
        assertRefused("grid.yaml line 5, column 30: vary.walkforward.cost_bps: 1e1 gives the same study as 10 (grid"
                        + " points 1 and 2 would be one walk run twice); expected values that differ in meaning, not"
                        + " only in how they are written",
                "walkforward.rebalance_every: [1, 3]", "walkforward.cost_bps: [10, 1e1]");
    }

    @Test
    void distinctValues_giveOnePointEach() throws IOException {
        SweepPlan plan = plan("walkforward.cost_bps: [5, 20]", "walkforward.rebalance_every: [1, 3]");
        assertEquals(List.of("001", "002", "003", "004"), plan.points().stream().map(GridPoint::label).toList());
        assertEquals(20.0, point(plan, 2).walkForward().costBps());
    }

    /** With no best point the page says whether that is because points failed, not that none was compared. */
    @Test
    void noBestPoint_isExplainedByTheFailedPoints() throws IOException {
        SweepPlan plan = plan("walkforward.cost_bps: [5, 20]");
        GridEvidence none = GridEvidence.of(List.of(), List.of(), new dev.sigmawalk.engine.evidence.DifferenceTests(
                dev.sigmawalk.engine.evidence.HacKernel.PARZEN, plan.base().evidence()));
        assertEquals("Every point failed (the reasons are listed below), so the grid names no best point.",
                GridWords.answer(plan, none, 2));
        assertEquals("No point that ran has a strategy tested against a baseline (1 of 2 failed), so the grid names no"
                + " best point.", GridWords.answer(plan, none, 1));
        assertEquals("No point has a strategy tested against a baseline, so the grid names no best point.",
                GridWords.answer(plan, none, 0));
    }

    /**
     * Compared paths that all held cash (no portfolio at any rebalance) leave no best point, and
     * the page says so instead of claiming that nothing was compared.
     */
    @Test
    void noBestPoint_whenEveryComparedPathHeldCash_saysSo() throws IOException {
        SweepPlan plan = plan("walkforward.cost_bps: [5, 20]");
        GridPoint first = plan.points().get(0);
        PointComparison c = new PointComparison(first, "model", "base", "36", 0.5);
        int[] days = new int[40];
        double[] a = new double[40];
        double[] b = new double[40];
        for (int t = 0; t < 40; t++) {
            days[t] = 18_000 + t;
            a[t] = 0.001 * ((t * 7) % 5 - 2);
            b[t] = 0.002 * ((t * 3) % 7 - 3);
        }
        GridEvidence none = GridEvidence.of(List.of(new PointRow(first, "model", "36", 0.0, 0.0, 0.0, Double.NaN, false),
                new PointRow(first, "base", "36", 0.1, 0.2, 0.1, 1.0)), List.of(new ContrastReturns(c, days, a, b)),
                new dev.sigmawalk.engine.evidence.DifferenceTests(dev.sigmawalk.engine.evidence.HacKernel.PARZEN,
                        plan.base().evidence()));
        assertEquals("No strategy tested against a baseline formed a portfolio at any rebalance: each such path held"
                + " cash throughout, so its volatility is the risk-free rate's and the grid names no best point.",
                GridWords.answer(plan, none, 0));
        assertEquals("No strategy tested against a baseline formed a portfolio at any rebalance of the points that ran"
                + " (1 of 2 failed): each such path held cash throughout, so its volatility is the risk-free rate's and"
                + " the grid names no best point.", GridWords.answer(plan, none, 1));
    }
}
