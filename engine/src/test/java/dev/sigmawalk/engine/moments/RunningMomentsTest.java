package dev.sigmawalk.engine.moments;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.DenseProof;
import dev.sigmawalk.engine.model.WindowMoments;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class RunningMomentsTest {
    /** Agreement asked of running sums against a fresh two-pass computation, relative to scale. */
    private static final double RELATIVE = 1e-12;

    /**
     * Long run, 470 moves of three rows over a 1,500-row panel of 40 assets with a late listing,
     * a gap and a delisting, window 120, rebuilt once 120 rows have slid (the default budget): at
     * every move the moments of the
     * eligible assets match the Method §3 definitions computed in two passes (means, then
     * centred products) by a plain loop in this test.
     */
    @Test
    void hundredsOfMoves_matchTwoPassDefinition() {
        ReturnPanel panel = panel(1500, 40, 0.0004, 11L);
        assertMovesAgree(panel, 120, 3, 120, 400);
    }

    /**
     * Without the periodic rebuild (a budget of 10^9 rows) the shifted sums still agree over hundreds
     * of moves: the shift keeps the subtraction from cancelling, so drift stays near machine
     * precision.
     */
    @Test
    void hundredsOfMovesWithoutRebuild_stillMatchTwoPassDefinition() {
        ReturnPanel panel = panel(1500, 40, 0.0004, 12L);
        assertMovesAgree(panel, 250, 2, 1_000_000_000, 600);
    }

    /**
     * Returns whose level (1.5 a period) dwarfs their spread (0.001): the raw one-pass form
     * Σx² − L x̄² would lose about six of sixteen digits here; the shifted sums keep 1e-12.
     */
    @Test
    void largeLevelSmallSpread_matchesTwoPassDefinition() {
        ReturnPanel panel = levelPanel(900, 12, 1.5, 0.001, 5L);
        assertMovesAgree(panel, 60, 5, 60, 150);
    }

    /**
     * The shared reference window (60 rows, 12 assets, rf = 0) placed at the end of a longer
     * panel and reached after 29 moves: S matches numpy.cov(X, rowvar=False, ddof=1)
     * (numpy 1.24.2, sample_cov.csv) and β = s_im/s_mm matches single_index.csv (numpy 1.24.2).
     */
    @Test
    void referenceWindowReachedByMoves_matchesNumpy() throws IOException {
        double[][] window = readCsv("window.csv");
        double[][] cov = readCsv("sample_cov.csv");
        double[][] single = readCsvSkippingFirstColumn("single_index.csv");
        int n = 12;
        int before = 200;
        int rows = before + window.length;
        SplittableRandom rng = new SplittableRandom(99L);
        double[] r = new double[rows * n];
        double[] m = new double[rows];
        for (int t = 0; t < rows; t++) {
            for (int i = 0; i < n; i++) {
                r[t * n + i] = t < before ? 0.3 + 0.05 * rng.nextGaussian() : window[t - before][i + 2];
            }
            m[t] = t < before ? 0.01 * rng.nextGaussian() : window[t - before][1];
        }
        ReturnPanel panel = new ReturnPanel(days(rows), ids(n), r, m, new double[rows], "index", 252);
        RunningMoments running = new RunningMoments(panel, window.length);
        for (int tau = window.length - 1; tau < rows; tau += 7) {
            running.moveTo(tau);
        }
        running.moveTo(rows - 1);
        int[] all = new int[n];
        Arrays.setAll(all, i -> i);
        WindowMoments got = running.snapshot(all);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double scale = Math.sqrt(cov[i][i] * cov[j][j]);
                assertEquals(cov[i][j], got.covariance(i, j), RELATIVE * scale, "S(" + i + "," + j + ")");
            }
            double beta = got.marketCovariance()[i] / got.marketVariance();
            assertEquals(single[i][1], beta, RELATIVE * Math.abs(single[i][1]) + 1e-14, "beta of A" + (i + 1));
        }
    }

    /**
     * Seeded loop over panels wider than a snapshot tile (150 assets against tiles of 64): every
     * snapshot of finite returns promises {@link DenseProof#MIRRORED_FINITE} and keeps it, S_ij ==
     * S_ji bit for bit for every pair and every entry finite, whichever eligible columns (gaps
     * included) and whether the move slid or rebuilt.
     */
    @Test
    void snapshot_isMirroredBitForBit() {
        SplittableRandom cases = new SplittableRandom(41L);
        for (int trial = 0; trial < 6; trial++) {
            int length = 40 + cases.nextInt(60);
            ReturnPanel panel = panel(1100, 150, 0.0002 * trial, cases.nextLong());
            RunningMoments running = new RunningMoments(panel, length);
            for (int tau = length - 1; tau < panel.rows(); tau += 37 + cases.nextInt(80)) {
                running.moveTo(tau);
                WindowMoments got = running.snapshot(eligible(panel, tau, length));
                assertEquals(DenseProof.MIRRORED_FINITE, got.covarianceProof(), "τ = " + tau);
                assertBitSymmetric(got, "trial " + trial + ", τ = " + tau);
                for (double v : got.covariance()) {
                    assertTrue(Double.isFinite(v), "trial " + trial + ", τ = " + tau + ": " + v);
                }
            }
        }
    }

    /**
     * Every entry of a snapshot is the formula of Method §3 on the running sums,
     * (D_ij − s_i s_j / L)/(L − 1), computed here entry by entry, bit for bit (the diagonal clamped
     * at 0), whichever route the snapshot's rows take: every column of the panel (one run from
     * column 0, read straight from the sums' rows), a run that starts later, seeded subsets with
     * gaps and a single column (gathered through the column list). Panels of 150 columns, more
     * than two blocks of the snapshot's rows; one column is constant, so its variance rounds to
     * about 0 and must come out clamped, never negative.
     */
    @Test
    void snapshot_ofAnyColumns_isTheFormulaBitForBit() {
        SplittableRandom cases = new SplittableRandom(47L);
        int constant = 7;
        int fullRuns = 0;
        for (int trial = 0; trial < 4; trial++) {
            int length = 30 + cases.nextInt(90);
            ReturnPanel panel = withConstantColumn(panel(1100, 150, 0.0, cases.nextLong()), constant, 0.0004);
            RunningMoments running = new RunningMoments(panel, length);
            for (int tau = length - 1; tau < panel.rows(); tau += 61 + cases.nextInt(90)) {
                running.moveTo(tau);
                int[] eligible = eligible(panel, tau, length);
                fullRuns += eligible.length == 150 ? 1 : 0;
                List<int[]> choices = List.of(eligible, range(4, 150), range(20, 90), subset(eligible, constant, cases),
                        subset(eligible, constant, cases), new int[] {eligible[eligible.length / 2]});
                for (int k = 0; k < choices.size(); k++) {
                    String where = "trial " + trial + ", τ = " + tau + ", columns #" + k;
                    WindowMoments got = assertFormula(running, choices.get(k), where);
                    int at = Arrays.binarySearch(choices.get(k), constant);
                    if (at >= 0) {
                        double v = got.variance(at);
                        assertTrue(v >= 0 && v < 1e-30, where + ": constant column's variance " + v);
                    }
                }
            }
        }
        assertTrue(fullRuns >= 2, "snapshots of every column: " + fullRuns);
    }

    private static WindowMoments assertFormula(RunningMoments running, int[] cols, String where) {
        WindowMoments got = running.snapshot(cols);
        int n = cols.length;
        double len = running.length();
        double div = running.length() - 1.0;
        double[] s = got.covariance();
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                int i = cols[Math.min(a, b)];
                int j = cols[Math.max(a, b)];
                double want = (running.crossSum(i, j) - running.columnSum(i) * running.columnSum(j) / len) / div;
                if (a == b) {
                    want = Math.max(0.0, want);
                }
                if (Double.doubleToRawLongBits(want) != Double.doubleToRawLongBits(s[a * n + b])) {
                    throw new AssertionError(where + ": S(" + a + "," + b + ") = " + s[a * n + b] + ", formula " + want);
                }
            }
        }
        return got;
    }

    private static int[] range(int from, int to) {
        int[] cols = new int[to - from];
        Arrays.setAll(cols, k -> from + k);
        return cols;
    }

    /** About four in five of the eligible columns, seeded, always with {@code keep}. */
    private static int[] subset(int[] eligible, int keep, SplittableRandom rng) {
        return Arrays.stream(eligible).filter(c -> c == keep || rng.nextInt(5) != 0).toArray();
    }

    /** The panel with column {@code col} set to {@code value} in every row. */
    private static ReturnPanel withConstantColumn(ReturnPanel panel, int col, double value) {
        int rows = panel.rows();
        int n = panel.assetCount();
        double[] r = panel.rawReturns().clone();
        double[] m = new double[rows];
        double[] rf = new double[rows];
        for (int t = 0; t < rows; t++) {
            r[t * n + col] = value;
            m[t] = panel.market(t);
            rf[t] = panel.riskFree(t);
        }
        return new ReturnPanel(days(rows), ids(n), r, m, rf, "index", 252);
    }

    /**
     * Returns whose spread (10^160) squares past the largest double: the sums overflow, so the
     * snapshot promises symmetry but not finiteness ({@link DenseProof#MIRRORED}), and the pairs
     * are still the same doubles (infinities and NaNs stored twice from one value).
     */
    @Test
    void overflowingSnapshot_isMirroredButNotPromisedFinite() {
        ReturnPanel panel = levelPanel(200, 70, 0.0, 1e160, 9L);
        RunningMoments running = new RunningMoments(panel, 50);
        for (int tau = 49; tau < 200; tau += 50) {
            running.moveTo(tau);
            int[] all = new int[70];
            Arrays.setAll(all, i -> i);
            WindowMoments got = running.snapshot(all);
            assertEquals(DenseProof.MIRRORED, got.covarianceProof(), "τ = " + tau);
            assertTrue(Arrays.stream(got.covariance()).anyMatch(v -> !Double.isFinite(v)), "τ = " + tau);
            assertBitSymmetric(got, "τ = " + tau);
        }
    }

    /**
     * The two-pass moments of a window mirror their upper triangle too, whether S is built at
     * once or on first request (finiteness is not tracked there, so only symmetry is promised);
     * moments handed in through the constructor promise nothing.
     */
    @Test
    void twoPassMoments_areMirrored_handedInMomentsAreNot() {
        SplittableRandom rng = new SplittableRandom(43L);
        int len = 90;
        int n = 130;
        double[] x = new double[len * n];
        double[] m = new double[len];
        for (int t = 0; t < len; t++) {
            m[t] = 0.01 * rng.nextGaussian();
            for (int i = 0; i < n; i++) {
                x[t * n + i] = (0.4 + i / 100.0) * m[t] + 0.02 * rng.nextGaussian();
            }
        }
        WindowMoments lazy = WindowMoments.withoutCovariance(x, m, n);
        assertEquals(DenseProof.MIRRORED, lazy.covarianceProof());
        assertBitSymmetric(lazy, "built on request");
        WindowMoments given = new WindowMoments(n, len, lazy.mean(), lazy.marketMean(), lazy.marketVariance(),
                lazy.marketCovariance(), lazy.covariance());
        assertEquals(DenseProof.UNPROVEN, given.covarianceProof());
        assertEquals(DenseProof.UNPROVEN, given.withConstantMarket().covarianceProof());
        assertEquals(DenseProof.MIRRORED, lazy.withConstantMarket().covarianceProof());
    }

    private static void assertBitSymmetric(WindowMoments moments, String where) {
        int n = moments.assets();
        double[] s = moments.covariance();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (Double.doubleToRawLongBits(s[i * n + j]) != Double.doubleToRawLongBits(s[j * n + i])) {
                    throw new AssertionError(where + ": S(" + i + "," + j + ") = " + s[i * n + j] + " but S(" + j
                            + "," + i + ") = " + s[j * n + i]);
                }
            }
        }
    }

    @Test
    void rebuild_happensWhenTheSlidRowsWouldExceedTheBudget() {
        ReturnPanel panel = panel(200, 5, 0.0, 3L);
        RunningMoments running = new RunningMoments(panel, 30, 20);
        running.moveTo(29);
        assertEquals(1, running.refreshes(), "first window is built from its rows");
        for (int tau = 30; tau <= 74; tau++) {
            running.moveTo(tau);
        }
        // 45 one-row moves: 20 slides, a rebuild, 20 slides, a rebuild, 3 slides.
        assertEquals(3, running.refreshes(), "rebuilds after 20 slid rows");
        running.moveTo(74 + 16);
        assertEquals(4, running.refreshes(), "a move over more than half the window rebuilds");
    }

    /**
     * The default budget is the window length: with L = 30 and moves of 7 rows, four moves slide
     * 28 rows and the fifth, which would take the count to 35, rebuilds instead.
     */
    @Test
    void defaultBudget_isTheWindowLength() {
        ReturnPanel panel = panel(200, 5, 0.0, 4L);
        RunningMoments running = new RunningMoments(panel, 30);
        running.moveTo(29);
        for (int move = 1; move <= 4; move++) {
            running.moveTo(29 + 7 * move);
        }
        assertEquals(1, running.refreshes(), "28 slid rows stay within the budget of 30");
        running.moveTo(29 + 7 * 5);
        assertEquals(2, running.refreshes(), "35 rows would exceed it");
        for (int move = 6; move <= 9; move++) {
            running.moveTo(29 + 7 * move);
        }
        assertEquals(2, running.refreshes(), "the count starts again at the rebuild");
    }

    /**
     * The same moves give the same sums bit for bit whatever else happens in the process: two
     * instances over one panel, one of them interleaved with an unrelated third, agree exactly at
     * every move (the rebuild points depend on the schedule alone).
     */
    @Test
    void sameSchedule_givesBitIdenticalMoments() {
        ReturnPanel panel = panel(900, 30, 0.0004, 21L);
        RunningMoments first = new RunningMoments(panel, 100);
        RunningMoments second = new RunningMoments(panel, 100);
        RunningMoments other = new RunningMoments(panel, 250);
        int[] cols = new int[12];
        for (int a = 0; a < cols.length; a++) {
            cols[a] = 4 + 2 * a;
        }
        for (int tau = 249; tau < panel.rows(); tau += 9) {
            first.moveTo(tau);
            other.moveTo(tau);
            second.moveTo(tau);
            WindowMoments a = first.snapshot(cols);
            WindowMoments b = second.snapshot(cols);
            for (int i = 0; i < cols.length; i++) {
                assertEquals(Double.doubleToRawLongBits(a.mean()[i]), Double.doubleToRawLongBits(b.mean()[i]), "mean");
                for (int j = 0; j < cols.length; j++) {
                    assertEquals(Double.doubleToRawLongBits(a.covariance(i, j)),
                            Double.doubleToRawLongBits(b.covariance(i, j)), "S at τ = " + tau);
                }
            }
        }
    }

    @Test
    void movingBack_isRejected() {
        RunningMoments running = new RunningMoments(panel(100, 3, 0.0, 1L), 20, 20);
        running.moveTo(50);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> running.moveTo(49));
        assertTrue(e.getMessage().contains("(49)") && e.getMessage().contains("50"), e.getMessage());
    }

    @Test
    void windowBeforeFirstRow_isRejected() {
        RunningMoments running = new RunningMoments(panel(100, 3, 0.0, 1L), 20, 20);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> running.moveTo(18));
        assertTrue(e.getMessage().contains("starts before row 0"), e.getMessage());
    }

    @Test
    void snapshotBeforeAnyMove_isRefused() {
        RunningMoments running = new RunningMoments(panel(100, 3, 0.0, 1L), 20, 20);
        assertThrows(IllegalStateException.class, () -> running.snapshot(new int[] {0}));
    }

    @Test
    void unorderedColumns_areRejected() {
        RunningMoments running = new RunningMoments(panel(100, 3, 0.0, 1L), 20, 20);
        running.moveTo(40);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> running.snapshot(new int[] {2, 1}));
        assertTrue(e.getMessage().contains("ascending"), e.getMessage());
    }

    private static void assertMovesAgree(ReturnPanel panel, int length, int step, int refreshRows, int minMoves) {
        RunningMoments running = new RunningMoments(panel, length, refreshRows);
        int moves = 0;
        for (int tau = length - 1; tau < panel.rows(); tau += step) {
            running.moveTo(tau);
            int[] cols = eligible(panel, tau, length);
            assertAgrees(reference(panel, tau, length, cols), running.snapshot(cols), "τ = " + tau);
            moves++;
        }
        assertTrue(moves >= minMoves, "moves made: " + moves);
    }

    private static void assertAgrees(WindowMoments want, WindowMoments got, String where) {
        int n = want.assets();
        assertEquals(n, got.assets(), where + ": assets");
        double smm = want.marketVariance();
        // A mean is no more precise than its own last digits, so its scale includes its level.
        assertEquals(want.marketMean(), got.marketMean(), RELATIVE * (Math.abs(want.marketMean()) + Math.sqrt(smm)),
                where + ": market mean");
        assertEquals(smm, got.marketVariance(), RELATIVE * smm, where + ": s_mm");
        for (int i = 0; i < n; i++) {
            double sii = want.covariance(i, i);
            assertEquals(want.mean()[i], got.mean()[i], RELATIVE * (Math.abs(want.mean()[i]) + Math.sqrt(sii)),
                    where + ": mean " + i);
            assertEquals(want.marketCovariance()[i], got.marketCovariance()[i], RELATIVE * Math.sqrt(sii * smm),
                    where + ": s_im " + i);
            for (int j = 0; j < n; j++) {
                double scale = Math.sqrt(sii * want.covariance(j, j));
                assertEquals(want.covariance(i, j), got.covariance(i, j), RELATIVE * scale,
                        where + ": S(" + i + "," + j + ")");
            }
        }
    }

    /** Method §3 in two passes over the eligible columns, excess returns x = r − rf, m = r_m − rf. */
    private static WindowMoments reference(ReturnPanel panel, int tau, int length, int[] cols) {
        int n = cols.length;
        int first = tau - length + 1;
        double[][] x = new double[length][n];
        double[] m = new double[length];
        for (int t = 0; t < length; t++) {
            double rf = panel.riskFree(first + t);
            m[t] = panel.market(first + t) - rf;
            for (int a = 0; a < n; a++) {
                x[t][a] = panel.value(first + t, cols[a]) - rf;
            }
        }
        double[] mean = new double[n];
        double mm = 0;
        for (int t = 0; t < length; t++) {
            mm += m[t];
            for (int a = 0; a < n; a++) {
                mean[a] += x[t][a];
            }
        }
        mm /= length;
        for (int a = 0; a < n; a++) {
            mean[a] /= length;
        }
        double[] s = new double[n * n];
        double[] sim = new double[n];
        double smm = 0;
        for (int t = 0; t < length; t++) {
            double dm = m[t] - mm;
            smm += dm * dm;
            for (int a = 0; a < n; a++) {
                double da = x[t][a] - mean[a];
                sim[a] += da * dm;
                for (int b = 0; b < n; b++) {
                    s[a * n + b] += da * (x[t][b] - mean[b]);
                }
            }
        }
        double div = length - 1.0;
        for (int k = 0; k < s.length; k++) {
            s[k] /= div;
        }
        for (int a = 0; a < n; a++) {
            sim[a] /= div;
        }
        return new WindowMoments(n, length, mean, mm, smm / div, sim, s);
    }

    private static int[] eligible(ReturnPanel panel, int tau, int length) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < panel.assetCount(); i++) {
            boolean complete = true;
            for (int t = tau - length + 1; t <= tau && complete; t++) {
                complete = !Double.isNaN(panel.value(t, i));
            }
            if (complete) {
                out.add(i);
            }
        }
        return out.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * One-factor daily returns with a varying risk-free rate; asset 1 lists at row 300, asset 2
     * has a gap over rows 600-700, asset 3 stops after row 1000.
     */
    private static ReturnPanel panel(int rows, int n, double rfLevel, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] r = new double[rows * n];
        double[] m = new double[rows];
        double[] rf = new double[rows];
        for (int t = 0; t < rows; t++) {
            rf[t] = rfLevel * (1 + 0.5 * Math.sin(t / 90.0));
            m[t] = rf[t] + 0.0003 + 0.01 * rng.nextGaussian();
            for (int i = 0; i < n; i++) {
                double beta = 0.5 + (double) i / n;
                r[t * n + i] = rf[t] + beta * (m[t] - rf[t]) + 0.015 * rng.nextGaussian();
            }
            if (n > 3) {
                if (t < 300) {
                    r[t * n + 1] = Double.NaN;
                }
                if (t >= 600 && t <= 700) {
                    r[t * n + 2] = Double.NaN;
                }
                if (t > 1000) {
                    r[t * n + 3] = Double.NaN;
                }
            }
        }
        return new ReturnPanel(days(rows), ids(n), r, m, rf, "index", 252);
    }

    private static ReturnPanel levelPanel(int rows, int n, double level, double spread, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] r = new double[rows * n];
        double[] m = new double[rows];
        for (int t = 0; t < rows; t++) {
            m[t] = level + spread * rng.nextGaussian();
            for (int i = 0; i < n; i++) {
                r[t * n + i] = level * (1 + 0.1 * i) + spread * (0.5 * (m[t] - level) / spread + rng.nextGaussian());
            }
        }
        return new ReturnPanel(days(rows), ids(n), r, m, new double[rows], "index", 252);
    }

    private static LocalDate[] days(int rows) {
        LocalDate[] d = new LocalDate[rows];
        for (int t = 0; t < rows; t++) {
            d[t] = LocalDate.of(2001, 1, 1).plusDays(t);
        }
        return d;
    }

    private static List<String> ids(int n) {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add(String.format("K%03d", i));
        }
        return ids;
    }

    private static double[][] readCsv(String name) throws IOException {
        List<double[]> out = new ArrayList<>();
        for (String line : lines(name)) {
            String[] parts = line.split(",");
            double[] v = new double[parts.length];
            for (int k = 0; k < parts.length; k++) {
                v[k] = Double.parseDouble(parts[k]);
            }
            out.add(v);
        }
        return out.toArray(new double[0][]);
    }

    private static double[][] readCsvSkippingFirstColumn(String name) throws IOException {
        List<double[]> out = new ArrayList<>();
        for (String line : lines(name)) {
            String[] parts = line.split(",");
            double[] v = new double[parts.length - 1];
            for (int k = 1; k < parts.length; k++) {
                v[k - 1] = Double.parseDouble(parts[k]);
            }
            out.add(v);
        }
        return out.toArray(new double[0][]);
    }

    /** The file's lines after its header, blank lines dropped. */
    private static List<String> lines(String name) throws IOException {
        try (InputStream in = RunningMomentsTest.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + name + " is missing");
            }
            List<String> all = new ArrayList<>(List.of(new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\\R")));
            all.remove(0);
            all.removeIf(String::isBlank);
            return all;
        }
    }
}
