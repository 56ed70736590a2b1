package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.timeline.Schedule;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What every estimation window of a study will hold, found with the walk-forward loop's own
 * eligibility rule ({@link WindowBuilder}) but without building a window or estimating
 * anything: how many assets are eligible at each rebalance of each window length, and which
 * series are constant over a window. {@code check} prints it and {@code run} warns with it, so
 * the two agree. Cost O(windows · rebalances · assets), each asset usually settled in O(1).
 */
public final class WindowScan {
    private final ReturnPanel panel;
    private final Schedule schedule;
    private final Map<Integer, int[]> eligible = new LinkedHashMap<>();
    private final List<ConstantSpan> constant = new ArrayList<>();

    private WindowScan(ReturnPanel panel, Schedule schedule) {
        this.panel = panel;
        this.schedule = schedule;
    }

    /**
     * @param panel returns, cut at the study's end
     * @param schedule the rebalance rows
     * @param windows window lengths, in study order
     */
    public static WindowScan of(ReturnPanel panel, Schedule schedule, List<Integer> windows) {
        WindowScan scan = new WindowScan(panel, schedule);
        WindowBuilder builder = new WindowBuilder(panel);
        for (int w : windows) {
            scan.scanWindow(builder, w);
        }
        return scan;
    }

    private void scanWindow(WindowBuilder builder, int length) {
        int count = schedule.count();
        int[] counts = new int[count];
        Map<Integer, Span> assets = new LinkedHashMap<>();
        Span market = null;
        for (int j = 0; j < count; j++) {
            int tau = schedule.rebalanceRow(j);
            int n = 0;
            for (int c : builder.complete(tau, length)) {
                if (builder.constant(c, tau, length)) {
                    assets.computeIfAbsent(c, k -> new Span(tau, length)).add(tau, !builder.rawConstant(c, tau, length));
                } else {
                    n++;
                }
            }
            counts[j] = n;
            if (builder.marketConstant(tau, length)) {
                market = market == null ? new Span(tau, length) : market;
                market.add(tau, false);
            }
        }
        eligible.put(length, counts);
        if (market != null) {
            constant.add(market.toSpan(panel.marketName(), true, length));
        }
        assets.entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> constant.add(e.getValue().toSpan(panel.assets().get(e.getKey()), false, length)));
    }

    /** The number of eligible assets at rebalance j of window L. */
    public int eligible(int window, int j) {
        int[] counts = eligible.get(window);
        if (counts == null) {
            throw new IllegalArgumentException("window " + window + " was not scanned; scanned " + eligible.keySet());
        }
        return counts[j];
    }

    /** The date of rebalance j. */
    public LocalDate rebalanceDate(int j) {
        return panel.date(schedule.rebalanceRow(j));
    }

    /** Rebalances per window length. */
    public int rebalances() {
        return schedule.count();
    }

    /** Every series constant over some window: per window length the market first, then assets in column order. */
    public List<ConstantSpan> constantSpans() {
        return List.copyOf(constant);
    }

    /** Accumulates the rebalances of one series and window length. */
    private final class Span {
        private final int firstRow;
        private final int length;
        private int lastRow;
        private int rebalances;
        private boolean excessOnly;

        Span(int firstRow, int length) {
            this.firstRow = firstRow;
            this.length = length;
        }

        void add(int tau, boolean onlyExcessConstant) {
            lastRow = tau;
            rebalances++;
            excessOnly |= onlyExcessConstant;
        }

        ConstantSpan toSpan(String series, boolean isMarket, int window) {
            return new ConstantSpan(series, isMarket, window, rebalances, panel.date(firstRow), panel.date(lastRow),
                    panel.date(firstRow - length + 1), excessOnly);
        }
    }
}
