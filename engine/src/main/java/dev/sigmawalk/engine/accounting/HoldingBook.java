package dev.sigmawalk.engine.accounting;

import dev.sigmawalk.engine.data.ReturnPanel;
import java.util.Arrays;

/**
 * The portfolio one path holds between rebalances, with the holding-period accounting of
 * Method §6: drift, turnover against the drifted weights, costs on the first held row, and the
 * count of held assets with no return.
 *
 * <p>Holdings are kept by panel column so that an asset leaving the eligible set is sold at the
 * next rebalance. An empty book is cash: it earns the risk-free rate and trades from zero.
 * One book serves one path and one thread.
 */
public final class HoldingBook {
    private final ReturnPanel panel;
    private final double costRate;
    private int[] columns = new int[0];
    private double[] weights = new double[0];
    private double pendingCost;
    private int missingHeld;

    /**
     * @param panel the returns the book earns
     * @param costBps cost per unit of traded weight in basis points (c = costBps / 10 000)
     */
    public HoldingBook(ReturnPanel panel, double costBps) {
        if (!(costBps >= 0)) {
            throw new IllegalArgumentException("cost_bps (" + costBps + ") must be >= 0");
        }
        this.panel = panel;
        this.costRate = costBps / 10_000.0;
    }

    /** Whether the book holds only cash (nothing was ever bought, or every allocation failed). */
    public boolean isCash() {
        return columns.length == 0;
    }

    /**
     * Trades from the drifted holdings to {@code target} (weights by panel column) and returns the
     * turnover TO = Σ_i |w_i(new) − h_i(drifted)| over the union of old and new assets. From cash,
     * TO = Σ_i |w_i|. The cost c·TO is charged on the next held row.
     */
    public Trade rebalance(int[] targetColumns, double[] targetWeights) {
        if (targetColumns.length != targetWeights.length) {
            throw new IllegalArgumentException("columns (" + targetColumns.length + ") and weights ("
                    + targetWeights.length + ") differ in length");
        }
        double turnover = turnover(targetColumns, targetWeights);
        columns = targetColumns.clone();
        weights = targetWeights.clone();
        pendingCost = costRate * turnover;
        missingHeld = 0;
        return new Trade(turnover, pendingCost);
    }

    /** Keeps the drifted holdings without trading (after a failed allocation). */
    public Trade keep() {
        pendingCost = 0;
        missingHeld = 0;
        return new Trade(0, 0);
    }

    private double turnover(int[] targetColumns, double[] targetWeights) {
        double total = 0;
        // Both column arrays are ascending (panel order), so one merge pass covers the union.
        int i = 0;
        int j = 0;
        while (i < columns.length || j < targetColumns.length) {
            int ci = i < columns.length ? columns[i] : Integer.MAX_VALUE;
            int cj = j < targetColumns.length ? targetColumns[j] : Integer.MAX_VALUE;
            if (ci == cj) {
                total += Math.abs(targetWeights[j++] - weights[i++]);
            } else if (ci < cj) {
                total += Math.abs(weights[i++]);
            } else {
                total += Math.abs(targetWeights[j++]);
            }
        }
        return total;
    }

    /**
     * Earns row {@code row}: R_t = Σ_i h_i r_{t,i} (a held asset with no return counts as 0 and is
     * counted in {@link #missingHeld()}), then drifts h_i ← h_i (1 + r_{t,i}) / (1 + R_t). Cash earns
     * rf_t. Returns gross and net return (net = gross − pending cost on the first held row).
     */
    public RowReturn hold(int row) {
        double gross;
        if (isCash()) {
            gross = panel.riskFree(row);
        } else {
            gross = 0;
            int n = panel.assetCount();
            double[] r = panel.rawReturns();
            int base = row * n;
            for (int k = 0; k < columns.length; k++) {
                double rk = r[base + columns[k]];
                if (Double.isNaN(rk)) {
                    if (weights[k] != 0) {
                        missingHeld++;
                    }
                    continue;
                }
                gross += weights[k] * rk;
            }
            drift(r, base, gross);
        }
        double net = gross - pendingCost;
        pendingCost = 0;
        return new RowReturn(gross, net);
    }

    private void drift(double[] r, int base, double gross) {
        double growth = 1 + gross;
        if (!(growth > 0)) {
            // A total loss leaves nothing to drift; weights stay as they were so the next
            // rebalance still sees the assets it must sell.
            return;
        }
        for (int k = 0; k < columns.length; k++) {
            double rk = r[base + columns[k]];
            double factor = Double.isNaN(rk) ? 1 : 1 + rk;
            weights[k] = weights[k] * factor / growth;
        }
    }

    /** Held assets (h_i ≠ 0) with no return, counted since the last rebalance. */
    public int missingHeld() {
        return missingHeld;
    }

    /** A copy of the current (drifted) holdings' panel columns, ascending. */
    public int[] columns() {
        return columns.clone();
    }

    /** A copy of the current (drifted) weights, aligned with {@link #columns()}. */
    public double[] weights() {
        return weights.clone();
    }

    /** Turnover and cost of one rebalance. */
    public record Trade(double turnover, double cost) {
    }

    /** One held row's gross and net return. */
    public record RowReturn(double gross, double net) {
    }

    @Override
    public String toString() {
        return "HoldingBook" + Arrays.toString(columns);
    }
}
