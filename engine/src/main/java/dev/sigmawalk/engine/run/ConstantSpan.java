package dev.sigmawalk.engine.run;

import java.time.LocalDate;
import java.util.Objects;

/**
 * The rebalances of one window length at which one series was the same number in every row of
 * its estimation window (zero sample variance), found before any model runs.
 *
 * @param series the asset's name, or the market's
 * @param market whether the series is the market (then the single-index models and the residual
 *               diagnostics cannot be estimated there); otherwise an asset left out of the
 *               eligible set there
 * @param window L
 * @param rebalances how many rebalances, ≥ 1
 * @param firstRebalance the first such rebalance date
 * @param lastRebalance the last such rebalance date
 * @param firstWindowStart the first row date of the first such window
 * @param excessOnly whether, in some of those windows, the asset's own return varies and only
 *                   its excess return is constant (cash at a fixed spread over the bill rate)
 */
public record ConstantSpan(String series, boolean market, int window, int rebalances, LocalDate firstRebalance,
                           LocalDate lastRebalance, LocalDate firstWindowStart, boolean excessOnly) {
    /** A span whose return itself is constant (or the market, which is judged on excess returns). */
    public ConstantSpan(String series, boolean market, int window, int rebalances, LocalDate firstRebalance,
                        LocalDate lastRebalance, LocalDate firstWindowStart) {
        this(series, market, window, rebalances, firstRebalance, lastRebalance, firstWindowStart, false);
    }

    public ConstantSpan {
        Objects.requireNonNull(series, "series");
        Objects.requireNonNull(firstRebalance, "firstRebalance");
        Objects.requireNonNull(lastRebalance, "lastRebalance");
        Objects.requireNonNull(firstWindowStart, "firstWindowStart");
        if (!(rebalances >= 1)) {
            throw new IllegalArgumentException("rebalances (" + rebalances + ") must be >= 1");
        }
    }

    /** The warning a user reads, naming the series, the window length and the dates. */
    public String warning() {
        String where = window + "-row window at " + rebalances + (rebalances == 1 ? " rebalance, " : " rebalances ")
                + (rebalances == 1 ? firstRebalance.toString() : "from " + firstRebalance + " to " + lastRebalance)
                + " (first such window " + firstWindowStart + " to " + firstRebalance + ")";
        if (market) {
            return "market '" + series + "': its excess return is the same in every row of the " + where
                    + "; its variance there is zero, so single-index models (and shrinkage toward them, and"
                    + " single-index expected returns) form no portfolio at those rebalances and the residual"
                    + " diagnostics are not computed";
        }
        return "asset '" + series + "': its " + (excessOnly ? "excess " : "") + "return is the same in every row of the "
                + where + (excessOnly ? ", though its return moves with the risk-free rate" : "") + "; a series with zero variance (a suspended stock or a stale price) has no risk to estimate, so it"
                + " is left out of the eligible assets at those rebalances, for every strategy";
    }
}
