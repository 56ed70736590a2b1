package dev.sigmawalk.engine.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.ResidualCorrelations;
import dev.sigmawalk.engine.model.EstimationWindow;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Evidence never stops the portfolios: degenerate windows give notes, not exceptions. */
class WindowEvidenceProbeTest {
    private static final int L = 24;
    private static final LocalDate DATE = LocalDate.of(2020, 12, 31);

    /** L×n excess returns, one factor plus noise; asset 0 is set to follow the market exactly when asked. */
    private static EstimationWindow window(int n, boolean firstFollowsMarket, boolean flatMarket, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] m = new double[L];
        double[] x = new double[L * n];
        for (int t = 0; t < L; t++) {
            m[t] = flatMarket ? 0.003 : 0.04 * (rng.nextDouble() - 0.5);
            for (int i = 0; i < n; i++) {
                x[t * n + i] = (firstFollowsMarket && i == 0) ? 2 * m[t] : 0.8 * m[t] + 0.05 * (rng.nextDouble() - 0.5);
            }
        }
        List<String> ids = new java.util.ArrayList<>();
        int[] cols = new int[n];
        for (int i = 0; i < n; i++) {
            ids.add("A" + i);
            cols[i] = i;
        }
        return new EstimationWindow(DATE, 100, ids, cols, x, m, 12, null);
    }

    /** The same window without its first asset. */
    private static EstimationWindow withoutFirst(EstimationWindow w) {
        int n = w.assetCount();
        double[] x = new double[L * (n - 1)];
        for (int t = 0; t < L; t++) {
            System.arraycopy(w.excessReturns(), t * n + 1, x, t * (n - 1), n - 1);
        }
        int[] cols = new int[n - 1];
        for (int i = 0; i < n - 1; i++) {
            cols[i] = i + 1;
        }
        return new EstimationWindow(DATE, 100, w.assets().subList(1, n), cols, x, w.marketExcess(), 12, null);
    }

    @Test
    void assetMovingExactlyWithTheMarket_isLeftOutOfTheDiagnostics_byName() {
        EstimationWindow w = window(6, true, false, 3);
        WindowEvidence e = new WindowEvidenceProbe(Map.of(), 3).probe(w);
        assertEquals(List.of("asset 'A0' left out of the residual diagnostics: its market-model residual variance"
                + " is zero (it moves exactly with the market)"), e.notes());
        // The other five assets give the diagnostics they give on their own.
        ResidualCorrelations alone = ResidualCorrelations.of(withoutFirst(w));
        assertEquals(alone.diagnostics(), e.diagnostics().orElseThrow());
        assertEquals(alone.largestPairs(3), e.largestPairs());
    }

    @Test
    void constantMarket_givesNoDiagnostics_andANote_insteadOfAnException() {
        WindowEvidence e = new WindowEvidenceProbe(Map.of("A1", "harbour"), 3).probe(window(4, false, true, 4));
        assertTrue(e.diagnostics().isEmpty());
        assertTrue(e.sectors().isEmpty());
        assertEquals(List.of(ResidualGuard.CONSTANT_MARKET), e.notes());
    }

    @Test
    void ordinaryWindow_hasNoNotes() {
        WindowEvidence e = new WindowEvidenceProbe(Map.of(), 3).probe(window(5, false, false, 5));
        assertTrue(e.diagnostics().isPresent());
        assertEquals(List.of(), e.notes());
    }

    @Test
    void notes_becomeOneWarningPerWindowAndNote_withCountAndDates() {
        String note = "asset 'A0' left out of the residual diagnostics: its market-model residual variance is zero"
                + " (it moves exactly with the market)";
        Map<Integer, List<WindowEvidence>> probes = new LinkedHashMap<>();
        probes.put(24, List.of(
                new WindowEvidence(LocalDate.of(2020, 1, 31), 24, java.util.Optional.empty(), List.of(),
                        java.util.Optional.empty(), List.of(note)),
                new WindowEvidence(LocalDate.of(2020, 2, 29), 24, java.util.Optional.empty(), List.of(),
                        java.util.Optional.empty(), List.of(ResidualGuard.CONSTANT_MARKET)),
                new WindowEvidence(LocalDate.of(2020, 3, 31), 24, java.util.Optional.empty(), List.of(),
                        java.util.Optional.empty(), List.of(note))));
        probes.put(36, List.of(new WindowEvidence(LocalDate.of(2020, 3, 31), 36, java.util.Optional.empty(),
                List.of(), java.util.Optional.empty(), List.of(note))));
        assertEquals(List.of(
                "residual diagnostics, 24-row window, at 2 rebalances from 2020-01-31 to 2020-03-31: " + note,
                "residual diagnostics, 36-row window, at 1 rebalance, 2020-03-31: " + note),
                EvidenceNotes.warnings(probes), "the constant market is warned of by the window scan instead");
    }
}
