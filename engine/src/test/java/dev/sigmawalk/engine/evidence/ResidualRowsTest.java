package dev.sigmawalk.engine.evidence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.model.EstimationWindow;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/**
 * The residual statistics of Method §8 from sum identities and the tiled pair scan, against the
 * pair-by-pair values of {@link ResidualCorrelations} and against numpy.
 */
class ResidualRowsTest {
    /** Sums and statistics: the two routes differ in summation order only. */
    private static final double SAME_TO_ROUNDING = 1e-12;
    /** Against the numpy reference. */
    private static final double REFERENCE = 1e-10;
    /** p-values against scipy. */
    private static final double P_VALUE = 1e-9;

    /**
     * The wide window (L = 20 rows, n = 45 assets, so L &lt; n and Σρ² comes from the 20×20 Gram
     * matrix): mean |ρ|, Breusch-Pagan LM, Pesaran CD, the bias-adjusted LM with μ = 1 and
     * v² = 2(d−1)/(d+2), the five largest pairs and the sector means. Source: numpy 2.4.6
     * ({@code lstsq} residuals, {@code corrcoef}) and scipy 1.17.1 p-values, written by the
     * script {@code wide_window.py} beside the values ({@code wide_window.txt}).
     */
    @Test
    void wideWindow_matchesNumpyAndScipy() {
        EstimationWindow w = ReferenceWindow.load("wide_window.csv");
        Map<String, List<String>> expected = reference("wide_window.txt");
        ResidualRows z = all(w);
        assertTrue(z.length() < z.assetCount(), "the Gram route");
        PairScan scan = z.scan(5);
        ResidualDiagnostics d = z.diagnostics().withMeanAbsCorrelation(scan.meanAbsCorrelation());
        assertEquals(value(expected, "mean_abs"), d.meanAbsCorrelation(), REFERENCE, "mean |rho|");
        assertRelative(value(expected, "lm"), d.lmStatistic(), REFERENCE, "LM");
        assertEquals(value(expected, "lm_p"), d.lmPValue(), P_VALUE, "LM p");
        assertRelative(value(expected, "cd"), d.cdStatistic(), REFERENCE, "CD");
        assertEquals(value(expected, "cd_p"), d.cdPValue(), P_VALUE, "CD p");
        assertRelative(value(expected, "lm_adj"), d.lmAdjStatistic(), REFERENCE, "LM_adj");
        assertEquals(value(expected, "lm_adj_p"), d.lmAdjPValue(), P_VALUE, "LM_adj p");
        List<String> pairs = expected.get("pair");
        assertEquals(5, scan.largest().size());
        for (int k = 0; k < 5; k++) {
            String[] p = pairs.get(k).split(" ");
            ResidualPair got = scan.largest().get(k);
            assertEquals(p[0] + "/" + p[1], got.first() + "/" + got.second(), "pair " + k);
            assertEquals(Double.parseDouble(p[2]), got.correlation(), REFERENCE, "pair " + k);
        }
        Map<String, String> sectors = new HashMap<>();
        for (int k = 0; k < w.assetCount(); k++) {
            sectors.put(w.assets().get(k), "S" + ((k + 1) % 4));
        }
        SectorCoMovement s = z.bySector(sectors);
        for (String line : expected.get("within")) {
            String[] p = line.split(" ");
            SectorCorrelation c = s.withinSectors().stream().filter(x -> x.sector().equals(p[0])).findFirst()
                    .orElseThrow();
            assertEquals(Double.parseDouble(p[1]), c.meanCorrelation(), REFERENCE, "within " + p[0]);
        }
        for (String line : expected.get("between")) {
            String[] p = line.split(" ");
            SectorPairMean c = s.betweenSectors().stream().filter(x -> x.first().equals(p[0])
                    && x.second().equals(p[1])).findFirst().orElseThrow();
            assertEquals(Double.parseDouble(p[2]), c.meanCorrelation(), REFERENCE, "between " + line);
        }
    }

    /**
     * The reference window of 60 rows and 12 assets (L > n): the same numpy and scipy values
     * {@link ResidualCorrelationsTest} checks the moment route against (values.json: numpy 1.24.2,
     * scipy 1.10.1), now from the residual rows.
     */
    @Test
    void referenceWindow_rowsRouteMatchesNumpy() {
        ResidualRows z = all(ReferenceWindow.load());
        PairScan scan = z.scan(4);
        ResidualDiagnostics d = z.diagnostics().withMeanAbsCorrelation(scan.meanAbsCorrelation());
        assertEquals(0.11804932183684894, d.meanAbsCorrelation(), REFERENCE, "mean |rho|");
        assertRelative(84.02820600005185, d.lmStatistic(), REFERENCE, "LM");
        assertRelative(0.7331503601798056, d.cdStatistic(), REFERENCE, "CD");
        assertRelative(1.359794124772336, d.lmAdjStatistic(), REFERENCE, "LM_adj");
        assertEquals(List.of("A09/A12", "A10/A11", "A11/A12", "A10/A12"),
                scan.largest().stream().map(p -> p.first() + "/" + p.second()).toList());
    }

    /**
     * Seeded random windows with L &lt; n and L > n, sectors of uneven size (one of a single asset)
     * and an asset that moves exactly with the market (left out by both routes): every statistic,
     * the largest pairs and every sector cell agree with the pair-by-pair moment route.
     */
    @Test
    void randomWindows_rowsRouteAgreesWithPairByPair() {
        SplittableRandom seeds = new SplittableRandom(41);
        int[][] shapes = {{12, 40}, {30, 7}, {9, 130}, {50, 50}, {8, 600}, {200, 35}};
        for (int[] shape : shapes) {
            long seed = seeds.nextLong();
            EstimationWindow w = window(shape[0], shape[1], seed);
            ResidualFit fit = ResidualFit.of(w);
            assertFalse(fit.hasResidual(0), "asset 0 is twice the market");
            int[] keep = IntStream.range(1, w.assetCount()).toArray();
            ResidualRows z = fit.standardised(keep);
            ResidualCorrelations rho = ResidualCorrelations.of(withoutFirst(w));
            String label = "L = " + shape[0] + ", n = " + shape[1] + ", seed " + seed;
            assertAgree(rho, z, label);
        }
    }

    private static void assertAgree(ResidualCorrelations rho, ResidualRows z, String label) {
        int n = rho.assetCount();
        ResidualDiagnostics pairwise = rho.diagnostics();
        PairScan scan = z.scan(7);
        ResidualDiagnostics sums = z.diagnostics().withMeanAbsCorrelation(scan.meanAbsCorrelation());
        double pairs = n * (n - 1) / 2.0;
        // Scales: the sums' magnitudes without cancellation.
        double cdScale = Math.sqrt(2.0 * z.length() / (n * (n - 1.0))) * pairs;
        assertEquals(pairwise.cdStatistic(), sums.cdStatistic(), SAME_TO_ROUNDING * cdScale, label + ": CD");
        assertRelative(pairwise.lmStatistic(), sums.lmStatistic(), SAME_TO_ROUNDING, label + ": LM");
        assertRelative(pairwise.lmStatistic(), z.length() * scan.sumOfSquares(), SAME_TO_ROUNDING,
                label + ": LM from the scan");
        if (pairwise.hasLmAdj()) {
            double adjScale = Math.sqrt(2.0 / (n * (n - 1.0))) * pairs * (1 + z.length() * pairwise.lmStatistic() / pairs);
            assertEquals(pairwise.lmAdjStatistic(), sums.lmAdjStatistic(), SAME_TO_ROUNDING * adjScale, label + ": LM_adj");
        }
        assertEquals(pairwise.meanAbsCorrelation(), sums.meanAbsCorrelation(), SAME_TO_ROUNDING, label + ": mean |rho|");
        List<ResidualPair> expected = rho.largestPairs(7);
        assertEquals(expected.size(), scan.largest().size(), label);
        for (int k = 0; k < expected.size(); k++) {
            assertEquals(expected.get(k).first() + "/" + expected.get(k).second(),
                    scan.largest().get(k).first() + "/" + scan.largest().get(k).second(), label + ": pair " + k);
            assertEquals(expected.get(k).correlation(), scan.largest().get(k).correlation(), SAME_TO_ROUNDING,
                    label + ": pair " + k);
        }
        Map<String, String> sectors = new HashMap<>();
        for (int i = 0; i < n; i++) {
            sectors.put(rho.assets().get(i), i == n - 1 ? "lone" : "G" + (i * i % 5));
        }
        SectorCoMovement a = rho.bySector(sectors);
        SectorCoMovement b = z.bySector(sectors);
        assertEquals(a.withinSectors().size(), b.withinSectors().size(), label);
        for (int k = 0; k < a.withinSectors().size(); k++) {
            SectorCorrelation x = a.withinSectors().get(k);
            SectorCorrelation y = b.withinSectors().get(k);
            assertEquals(x.sector() + x.assets() + "/" + x.pairs(), y.sector() + y.assets() + "/" + y.pairs(), label);
            assertEquals(x.meanCorrelation(), y.meanCorrelation(), SAME_TO_ROUNDING, label + ": within " + x.sector());
        }
        assertEquals(a.acrossPairs(), b.acrossPairs(), label);
        assertEquals(a.acrossMean().orElseThrow(), b.acrossMean().orElseThrow(), SAME_TO_ROUNDING, label + ": across");
        assertEquals(a.betweenSectors().size(), b.betweenSectors().size(), label);
        for (int k = 0; k < a.betweenSectors().size(); k++) {
            SectorPairMean x = a.betweenSectors().get(k);
            SectorPairMean y = b.betweenSectors().get(k);
            assertEquals(x.first() + "/" + x.second() + "/" + x.pairs(), y.first() + "/" + y.second() + "/" + y.pairs(),
                    label);
            assertEquals(x.meanCorrelation(), y.meanCorrelation(), SAME_TO_ROUNDING, label + ": cell " + k);
        }
    }

    /**
     * The tiled scan visits each pair once across tile borders: with n = 1,100 (three column
     * tiles, a last row block of 12 assets) its largest pairs and Σρ² equal those of the
     * correlations computed one pair at a time from the same residual rows.
     */
    @Test
    void pairScan_acrossTileBorders_seesEveryPairOnce() {
        EstimationWindow w = window(6, 1_101, 5);
        ResidualRows z = ResidualFit.of(w).standardised(IntStream.range(1, w.assetCount()).toArray());
        int n = z.assetCount();
        double squares = 0;
        double abs = 0;
        LargestPairs top = new LargestPairs(25);
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double r = z.correlation(i, j);
                squares += r * r;
                abs += Math.abs(r);
                top.offer(r, i, j);
            }
        }
        PairScan scan = z.scan(25);
        assertEquals((long) n * (n - 1) / 2, scan.pairs());
        assertRelative(squares, scan.sumOfSquares(), SAME_TO_ROUNDING, "sum of squares");
        assertEquals(abs / scan.pairs(), scan.meanAbsCorrelation(), SAME_TO_ROUNDING, "mean |rho|");
        List<ResidualPair> expected = top.pairs(z.assets());
        for (int k = 0; k < expected.size(); k++) {
            assertEquals(expected.get(k).first() + "/" + expected.get(k).second(),
                    scan.largest().get(k).first() + "/" + scan.largest().get(k).second(), "pair " + k);
        }
        assertRelative(squares, z.sumOfSquaredCorrelations(), SAME_TO_ROUNDING, "the Gram identity");
    }

    /** Ties keep (i, j) ascending whatever the order the pairs arrive in; more room than pairs keeps all. */
    @Test
    void largestPairs_tiesAndOrder_doNotDependOnArrival() {
        List<String> ids = List.of("P", "Q", "R", "S");
        double[][] offers = {{0.5, 2, 3}, {0.5, 0, 3}, {0.9, 1, 2}, {0.5, 0, 1}, {-0.2, 1, 3}};
        for (int rotation = 0; rotation < offers.length; rotation++) {
            LargestPairs top = new LargestPairs(3);
            for (int k = 0; k < offers.length; k++) {
                double[] o = offers[(k + rotation) % offers.length];
                top.offer(o[0], (int) o[1], (int) o[2]);
            }
            assertEquals(List.of("Q/R", "P/Q", "P/S"),
                    top.pairs(ids).stream().map(p -> p.first() + "/" + p.second()).toList(), "rotation " + rotation);
        }
        LargestPairs roomy = new LargestPairs(10);
        roomy.offer(0.1, 0, 1);
        roomy.offer(0.3, 2, 3);
        assertEquals(List.of(0.3, 0.1), roomy.pairs(ids).stream().map(ResidualPair::correlation).toList());
        LargestPairs none = new LargestPairs(0);
        none.offer(0.4, 0, 1);
        assertEquals(List.of(), none.pairs(ids));
        assertEquals(Double.POSITIVE_INFINITY, none.threshold());
    }

    @Test
    void fit_refusesAFlatMarketAndShortWindows() {
        EstimationWindow flat = new EstimationWindow(LocalDate.of(2020, 1, 31), 5, List.of("A", "B"), new int[] {0, 1},
                new double[] {1, 2, 3, 4, 5, 6}, new double[] {0.1, 0.1, 0.1}, 12, null);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ResidualFit.of(flat));
        assertTrue(e.getMessage().contains("does not vary"), e.getMessage());
        EstimationWindow two = new EstimationWindow(LocalDate.of(2020, 1, 31), 5, List.of("A"), new int[] {0},
                new double[] {1, 2}, new double[] {0.1, 0.2}, 12, null);
        assertThrows(IllegalArgumentException.class, () -> ResidualFit.of(two));
    }

    /** L×n excess returns: a market, betas, sector shocks of three sizes and noise; asset 0 is 2 m exactly. */
    static EstimationWindow window(int length, int n, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] m = new double[length];
        double[] x = new double[length * n];
        double[] beta = new double[n];
        for (int i = 0; i < n; i++) {
            beta[i] = 0.4 + rng.nextDouble();
        }
        for (int t = 0; t < length; t++) {
            m[t] = 0.05 * (rng.nextDouble() - 0.5);
            double[] shock = {rng.nextDouble() - 0.5, rng.nextDouble() - 0.5, rng.nextDouble() - 0.5};
            for (int i = 0; i < n; i++) {
                x[t * n + i] = i == 0 ? 2 * m[t]
                        : beta[i] * m[t] + 0.02 * shock[i % 3] + 0.03 * (rng.nextDouble() - 0.5) + 0.001;
            }
        }
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add(String.format("X%04d", i));
        }
        return new EstimationWindow(LocalDate.of(2021, 6, 30), 400, ids, IntStream.range(0, n).toArray(), x, m, 12,
                null);
    }

    /** The same window without asset 0. */
    static EstimationWindow withoutFirst(EstimationWindow w) {
        int n = w.assetCount();
        int len = w.length();
        double[] x = new double[len * (n - 1)];
        for (int t = 0; t < len; t++) {
            System.arraycopy(w.excessReturns(), t * n + 1, x, t * (n - 1), n - 1);
        }
        return new EstimationWindow(w.date(), w.endRow(), w.assets().subList(1, n), IntStream.range(1, n).toArray(), x,
                w.marketExcess(), w.periodsPerYear(), null);
    }

    private static ResidualRows all(EstimationWindow w) {
        return ResidualFit.of(w).standardised(IntStream.range(0, w.assetCount()).toArray());
    }

    private static void assertRelative(double expected, double actual, double tolerance, String what) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance, what);
    }

    private static double value(Map<String, List<String>> values, String key) {
        return Double.parseDouble(values.get(key).get(0));
    }

    /** The reference file: one "key rest..." per line, lines of a key in file order. */
    private static Map<String, List<String>> reference(String resource) {
        Map<String, List<String>> out = new HashMap<>();
        try (InputStream in = ResidualRowsTest.class.getResourceAsStream(resource)) {
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                int space = line.indexOf(' ');
                out.computeIfAbsent(line.substring(0, space), k -> new ArrayList<>()).add(line.substring(space + 1));
            }
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out;
    }
}
