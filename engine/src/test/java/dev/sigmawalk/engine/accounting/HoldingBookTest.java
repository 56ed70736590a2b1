package dev.sigmawalk.engine.accounting;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sigmawalk.engine.data.ReturnPanel;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Holding-period accounting of Method §6, checked against hand computations shown inline. */
class HoldingBookTest {
    private static final double EXACT = 1e-15;

    private static ReturnPanel panel() {
        LocalDate[] d = {LocalDate.of(2020, 1, 31), LocalDate.of(2020, 2, 29), LocalDate.of(2020, 3, 31)};
        double nan = Double.NaN;
        double[] r = {
            0.10, -0.05, 0.02,
            0.00, 0.10, nan,
            0.05, 0.05, 0.05};
        return new ReturnPanel(d, List.of("X1", "X2", "X3"), r, new double[] {0.01, 0.02, 0.03},
                new double[] {0.001, 0.002, 0.003}, "index", 12);
    }

    @Test
    void driftAndReturn_matchHandComputation() {
        HoldingBook book = new HoldingBook(panel(), 20);
        HoldingBook.Trade t = book.rebalance(new int[] {0, 1}, new double[] {0.6, 0.4});
        assertEquals(1.0, t.turnover(), EXACT, "from cash: Σ|w| = 1");
        assertEquals(0.002, t.cost(), EXACT, "20 bp × 1");
        HoldingBook.RowReturn r0 = book.hold(0);
        // R = 0.6·0.10 + 0.4·(−0.05) = 0.04; net = 0.04 − 0.002
        assertEquals(0.04, r0.gross(), EXACT);
        assertEquals(0.038, r0.net(), EXACT);
        // h = (0.6·1.10, 0.4·0.95)/1.04 = (0.66, 0.38)/1.04
        assertArrayEquals(new double[] {0.66 / 1.04, 0.38 / 1.04}, book.weights(), EXACT);
        HoldingBook.RowReturn r1 = book.hold(1);
        assertEquals(0.38 / 1.04 * 0.10, r1.gross(), EXACT, "only X2 moves");
        assertEquals(r1.gross(), r1.net(), 0.0, "cost only on the first held row");
    }

    @Test
    void turnover_coversTheUnionOfOldAndNewAssets() {
        HoldingBook book = new HoldingBook(panel(), 0);
        book.rebalance(new int[] {0, 1}, new double[] {0.5, 0.5});
        book.hold(0);
        double[] h = book.weights(); // (0.55, 0.475)/1.025
        HoldingBook.Trade t = book.rebalance(new int[] {1, 2}, new double[] {0.3, 0.7});
        // X1 sold entirely, X2 moves from h[1] to 0.3, X3 bought from 0.
        assertEquals(h[0] + Math.abs(0.3 - h[1]) + 0.7, t.turnover(), EXACT);
    }

    @Test
    void missingReturnOfHeldAsset_countsAsZero_andIsCounted() {
        HoldingBook book = new HoldingBook(panel(), 0);
        book.rebalance(new int[] {1, 2}, new double[] {0.5, 0.5});
        HoldingBook.RowReturn r = book.hold(1);
        assertEquals(0.05, r.gross(), EXACT, "0.5·0.10 + 0.5·0 (missing)");
        assertEquals(1, book.missingHeld());
        double[] h = book.weights();
        assertEquals(0.55 / 1.05, h[0], EXACT);
        assertEquals(0.5 / 1.05, h[1], EXACT, "a missing return leaves the asset's value unchanged");
    }

    @Test
    void cash_earnsTheRiskFreeRate() {
        HoldingBook book = new HoldingBook(panel(), 10);
        assertEquals(0.002, book.hold(1).gross(), EXACT);
        assertEquals(0.0, book.keep().turnover(), 0.0);
    }
}
