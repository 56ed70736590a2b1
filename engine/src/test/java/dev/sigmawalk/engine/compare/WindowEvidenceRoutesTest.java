package dev.sigmawalk.engine.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.ResidualCorrelations;
import dev.sigmawalk.engine.evidence.ResidualDiagnostics;
import dev.sigmawalk.engine.evidence.ResidualPair;
import dev.sigmawalk.engine.evidence.SectorCorrelation;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import dev.sigmawalk.engine.timeline.Schedule;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/**
 * The probe's two routes (dense moments when L ≥ n, residual rows when L &lt; n) give the same
 * evidence, the rows route never asks for the window's moments, and the pair-scan plan leaves
 * the all-pairs statistics out exactly where it says.
 */
class WindowEvidenceRoutesTest {
    private static final double SAME_TO_ROUNDING = 1e-12;
    private static final int L = 24;

    /**
     * L×n returns on a market and three sector shocks; asset 0 is 2 m exactly when asked. The
     * window's moments are the cheap ones, with S built only if someone asks, as the walk-forward
     * hands them to a window whose consumers do not need S.
     */
    private static EstimationWindow window(int n, int endRow, boolean firstFollowsMarket) {
        SplittableRandom rng = new SplittableRandom(17 + n);
        double[] m = new double[L];
        double[] x = new double[L * n];
        for (int t = 0; t < L; t++) {
            m[t] = 0.04 * (rng.nextDouble() - 0.5);
            double[] shock = {rng.nextDouble() - 0.5, rng.nextDouble() - 0.5, rng.nextDouble() - 0.5};
            for (int i = 0; i < n; i++) {
                x[t * n + i] = firstFollowsMarket && i == 0 ? 2 * m[t]
                        : 0.8 * m[t] + 0.02 * shock[i % 3] + 0.05 * (rng.nextDouble() - 0.5);
            }
        }
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add("A" + i);
        }
        return new EstimationWindow(LocalDate.of(2020, 12, 31), endRow, ids, IntStream.range(0, n).toArray(), x, m, 12,
                () -> WindowMoments.withoutCovariance(x, m, n));
    }

    private static Map<String, String> sectors(int n) {
        Map<String, String> out = new HashMap<>();
        for (int i = 1; i < n - 1; i++) {
            out.put("A" + i, "S" + (i % 3));
        }
        return out;
    }

    /**
     * A wide window (n = 60 > L = 24) with an asset that moves exactly with the market: the same
     * note as the moment route, and statistics, pairs and sector means equal to the pair-by-pair
     * values of the other 59 assets (the last asset has no sector: its own group).
     */
    @Test
    void wideWindow_rowsRoute_equalsThePairByPairValues_andLeavesOutTheSameAsset() {
        int n = 60;
        EstimationWindow w = window(n, 100, true);
        WindowEvidence e = new WindowEvidenceProbe(sectors(n), 5).probe(w);
        assertEquals(List.of("asset 'A0' left out of the residual diagnostics: its market-model residual variance"
                + " is zero (it moves exactly with the market)"), e.notes());
        ResidualCorrelations rho = ResidualCorrelations.of(withoutFirst(w));
        ResidualDiagnostics expected = rho.diagnostics();
        ResidualDiagnostics got = e.diagnostics().orElseThrow();
        assertEquals(n - 1, got.assets());
        assertEquals(expected.meanAbsCorrelation(), got.meanAbsCorrelation(), SAME_TO_ROUNDING, "mean |rho|");
        assertEquals(expected.lmStatistic(), got.lmStatistic(), SAME_TO_ROUNDING * expected.lmStatistic(), "LM");
        assertEquals(expected.cdStatistic(), got.cdStatistic(), SAME_TO_ROUNDING * 100, "CD");
        assertEquals(expected.lmAdjStatistic(), got.lmAdjStatistic(), SAME_TO_ROUNDING * 100, "LM_adj");
        List<ResidualPair> pairs = rho.largestPairs(5);
        for (int k = 0; k < 5; k++) {
            assertEquals(pairs.get(k).first() + pairs.get(k).second(),
                    e.largestPairs().get(k).first() + e.largestPairs().get(k).second(), "pair " + k);
        }
        Map<String, String> withUnlisted = new HashMap<>(sectors(n));
        withUnlisted.put("A" + (n - 1), WindowEvidenceProbe.UNLISTED);
        List<SectorCorrelation> within = rho.bySector(withUnlisted).withinSectors();
        List<SectorCorrelation> gotWithin = e.sectors().orElseThrow().withinSectors();
        assertEquals(within.size(), gotWithin.size());
        for (int k = 0; k < within.size(); k++) {
            assertEquals(within.get(k).sector(), gotWithin.get(k).sector());
            assertEquals(within.get(k).meanCorrelation(), gotWithin.get(k).meanCorrelation(), SAME_TO_ROUNDING);
        }
    }

    /**
     * The rows route never has the window's dense S built; with L ≥ n the moment route builds it
     * once (the probe declares that it needs it there), and where a model already had it built the
     * moment route reads it even when L &lt; n, with the same evidence.
     */
    @Test
    void wideWindow_residualEvidence_neverBuildsTheDenseMoments() {
        EstimationWindow wide = window(40, 100, false);
        WindowEvidenceProbe probe = new WindowEvidenceProbe(sectors(40), 3);
        WindowEvidence fromRows = probe.probe(wide);
        assertTrue(fromRows.diagnostics().isPresent());
        assertFalse(wide.moments().hasCovariance(), "S was not built for the evidence");
        assertFalse(probe.needsDenseMoments(L, 40));
        EstimationWindow narrow = window(20, 100, false);
        probe.probe(narrow);
        assertTrue(narrow.moments().hasCovariance(), "L >= n reads S");
        assertTrue(probe.needsDenseMoments(L, 20));
        EstimationWindow built = window(40, 100, false);
        built.moments().covariance();
        WindowEvidence fromMoments = probe.probe(built);
        ResidualDiagnostics a = fromRows.diagnostics().orElseThrow();
        ResidualDiagnostics b = fromMoments.diagnostics().orElseThrow();
        assertEquals(a.meanAbsCorrelation(), b.meanAbsCorrelation(), SAME_TO_ROUNDING, "mean |rho|");
        assertEquals(a.lmStatistic(), b.lmStatistic(), SAME_TO_ROUNDING * a.lmStatistic(), "LM");
        assertEquals(a.cdStatistic(), b.cdStatistic(), SAME_TO_ROUNDING * 100, "CD");
        assertEquals(fromRows.largestPairs().stream().map(p -> p.first() + p.second()).toList(),
                fromMoments.largestPairs().stream().map(p -> p.first() + p.second()).toList());
    }

    @Test
    void wideWindow_constantMarket_givesTheSameNote() {
        int n = 30;
        double[] m = new double[L];
        java.util.Arrays.fill(m, 0.002);
        double[] x = new double[L * n];
        SplittableRandom rng = new SplittableRandom(3);
        for (int k = 0; k < x.length; k++) {
            x[k] = rng.nextDouble();
        }
        List<String> ids = IntStream.range(0, n).mapToObj(i -> "A" + i).toList();
        EstimationWindow w = new EstimationWindow(LocalDate.of(2020, 12, 31), 100, ids, IntStream.range(0, n).toArray(),
                x, m, 12, () -> WindowMoments.withoutCovariance(x, m, n));
        WindowEvidence e = new WindowEvidenceProbe(Map.of(), 3).probe(w);
        assertTrue(e.diagnostics().isEmpty());
        assertEquals(List.of(ResidualGuard.CONSTANT_MARKET), e.notes());
    }

    /**
     * With a plan that thins windows of 10 assets and more to every 3rd rebalance: at rebalances
     * 0, 3, 6 and the last (7) of rows 100..107 every statistic is there; at the others the
     * mean |ρ| is NaN and no pair is listed, while CD, LM and LM_adj are the full window's. Both
     * routes (n = 40 > L and n = 12 &lt; L) follow the plan; a window below the size scans always.
     */
    @Test
    void thinnedPlan_leavesOutTheAllPairsStatistics_exactlyBetweenScans() {
        Schedule schedule = new Schedule(IntStream.rangeClosed(100, 107).toArray(), 120);
        PairScanPlan plan = PairScanPlan.of(schedule, 10, 3);
        for (int n : new int[] {40, 12}) {
            for (int row = 100; row <= 107; row++) {
                WindowEvidence thinned = new WindowEvidenceProbe(Map.of(), 3, plan).probe(window(n, row, false));
                WindowEvidence full = new WindowEvidenceProbe(Map.of(), 3).probe(window(n, row, false));
                ResidualDiagnostics d = thinned.diagnostics().orElseThrow();
                boolean scanned = row == 100 || row == 103 || row == 106 || row == 107;
                String label = "n = " + n + ", row " + row;
                assertEquals(scanned, d.hasMeanAbsCorrelation(), label);
                assertEquals(scanned ? 3 : 0, thinned.largestPairs().size(), label);
                assertEquals(full.diagnostics().orElseThrow().cdStatistic(), d.cdStatistic(), label);
                assertEquals(full.diagnostics().orElseThrow().lmAdjStatistic(), d.lmAdjStatistic(), label);
                if (scanned) {
                    assertEquals(full.diagnostics(), thinned.diagnostics(), label);
                    assertEquals(full.largestPairs(), thinned.largestPairs(), label);
                }
            }
        }
        WindowEvidence small = new WindowEvidenceProbe(Map.of(), 3, plan).probe(window(9, 101, false));
        assertTrue(small.diagnostics().orElseThrow().hasMeanAbsCorrelation(), "below the size: every rebalance");
    }

    /**
     * Both routes (n = 30 > L and n = 12 &lt; L) give the same notes when only one asset has a
     * residual: every other asset named, then that no correlation is left, and no diagnostics.
     */
    @Test
    void onlyOneAssetWithAResidual_givesNamedNotes_onBothRoutes() {
        for (int n : new int[] {30, 12}) {
            SplittableRandom rng = new SplittableRandom(n);
            double[] m = new double[L];
            double[] x = new double[L * n];
            for (int t = 0; t < L; t++) {
                m[t] = rng.nextDouble() - 0.5;
                for (int i = 0; i < n; i++) {
                    x[t * n + i] = i == n - 1 ? rng.nextDouble() : (i + 1) * m[t];
                }
            }
            List<String> ids = IntStream.range(0, n).mapToObj(i -> "A" + i).toList();
            WindowEvidence e = new WindowEvidenceProbe(Map.of(), 3).probe(new EstimationWindow(
                    LocalDate.of(2020, 12, 31), 100, ids, IntStream.range(0, n).toArray(), x, m, 12,
                    () -> WindowMoments.withoutCovariance(x, m, ids.size())));
            assertTrue(e.diagnostics().isEmpty(), "n = " + n);
            List<String> expected = new ArrayList<>();
            for (int i = 0; i < n - 1; i++) {
                expected.add("asset 'A" + i + "' left out of the residual diagnostics: its market-model residual"
                        + " variance is zero (it moves exactly with the market)");
            }
            expected.add("fewer than two assets with a residual variance: no residual correlation");
            assertEquals(expected, e.notes(), "n = " + n);
        }
    }

    /**
     * A column that is 0.1 in every row (its computed mean is not exactly 0.1, so centring leaves
     * rounding dust) is left out by name on both routes (n = 40 > L and n = 12 &lt; L), and the
     * others give the diagnostics they give without it.
     */
    @Test
    void constantColumn_isLeftOutByName_onBothRoutes() {
        for (int n : new int[] {40, 12}) {
            EstimationWindow base = window(n, 100, false);
            double[] x = base.excessReturns().clone();
            for (int t = 0; t < L; t++) {
                x[t * n] = 0.1;
            }
            double[] m = base.marketExcess();
            EstimationWindow w = new EstimationWindow(base.date(), 100, base.assets(), base.columns(), x, m, 12,
                    () -> WindowMoments.withoutCovariance(x, m, n));
            WindowEvidence e = new WindowEvidenceProbe(Map.of(), 3).probe(w);
            assertEquals(List.of("asset 'A0' left out of the residual diagnostics: its excess return does not vary in"
                    + " the window"), e.notes(), "n = " + n);
            ResidualDiagnostics expected = ResidualCorrelations.of(withoutFirst(w)).diagnostics();
            ResidualDiagnostics got = e.diagnostics().orElseThrow();
            assertEquals(n - 1, got.assets());
            assertEquals(expected.lmStatistic(), got.lmStatistic(), SAME_TO_ROUNDING * expected.lmStatistic(), "n = " + n);
            assertEquals(expected.meanAbsCorrelation(), got.meanAbsCorrelation(), SAME_TO_ROUNDING, "n = " + n);
        }
    }

    @Test
    void plan_scansTheFirstEveryKthAndTheLast() {
        Schedule schedule = new Schedule(new int[] {10, 20, 30, 40, 50, 60, 70}, 80);
        PairScanPlan plan = PairScanPlan.of(schedule, 100, 4);
        List<Integer> scanned = new ArrayList<>();
        for (int row : schedule.rebalanceRows()) {
            if (plan.scans(row, 100)) {
                scanned.add(row);
            }
        }
        assertEquals(List.of(10, 50, 70), scanned);
        assertTrue(plan.scans(20, 99), "below the size");
        assertTrue(plan.scans(25, 500), "a row that is no rebalance");
        assertFalse(plan.scans(60, 500));
        PairScanPlan study = PairScanPlan.of(schedule);
        assertEquals(PairScanPlan.LARGE_FROM, study.largeFrom());
        assertEquals(PairScanPlan.EVERY, study.every());
    }

    private static EstimationWindow withoutFirst(EstimationWindow w) {
        int n = w.assetCount();
        double[] x = new double[L * (n - 1)];
        for (int t = 0; t < L; t++) {
            System.arraycopy(w.excessReturns(), t * n + 1, x, t * (n - 1), n - 1);
        }
        return new EstimationWindow(w.date(), w.endRow(), w.assets().subList(1, n), IntStream.range(1, n).toArray(), x,
                w.marketExcess(), 12, null);
    }
}
