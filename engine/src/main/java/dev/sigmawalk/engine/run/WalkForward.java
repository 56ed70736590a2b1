package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.accounting.HoldingBook;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.model.Allocator;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.moments.RunningMoments;
import dev.sigmawalk.engine.timeline.Schedule;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The walk-forward loop. For each window length (window lengths run in parallel, and so do the
 * strategies' decisions at one rebalance), at each rebalance τ it builds one estimation window from rows τ−L+1..τ, lets every strategy decide on
 * that same window (so the window's moments are computed once and shared), then holds each
 * strategy's portfolio over the rows up to the next rebalance. The dense moments come from running
 * sums per window length ({@link RunningMoments}), moved from one rebalance to the next by
 * adding and removing rows, when a consumer needs them ({@link DenseMomentPlan}); otherwise each
 * window computes only its cheap moments, in O(L n).
 *
 * <p>Every path is advanced by one task at a time in date order, with its own allocator and
 * book, and written into a slot fixed by study order, so the result does not depend on the
 * number of threads. The running sums of a window length are moved only by that length's task.
 */
public final class WalkForward<T> {
    private final ReturnPanel panel;
    private final Schedule schedule;
    private final List<StrategyDefinition> strategies;
    private final List<Integer> windows;
    private final double costBps;
    private final WindowProbe<T> probe;

    /**
     * @param panel returns, cut at the study's end
     * @param schedule rebalance rows from {@code Timeline.plan}
     * @param strategies in study order
     * @param windows window lengths in study order
     * @param costBps cost per unit of traded weight, basis points
     * @param probe evidence computed from every window, or {@code null}
     */
    public WalkForward(ReturnPanel panel, Schedule schedule, List<StrategyDefinition> strategies,
                       List<Integer> windows, double costBps, WindowProbe<T> probe) {
        this.panel = panel;
        this.schedule = schedule;
        this.strategies = List.copyOf(strategies);
        this.windows = List.copyOf(windows);
        this.costBps = costBps;
        this.probe = probe;
        for (int w : this.windows) {
            if (schedule.firstRebalance() - w + 1 < 0) {
                throw new IllegalArgumentException("window " + w + " reaches before the first row at τ_0 = "
                        + schedule.firstRebalance());
            }
        }
    }

    /**
     * Runs every (strategy, window) path.
     *
     * @param threads worker threads (1 = sequential); results are identical for any value
     * @param listener progress callback
     */
    public RunResult<T> run(int threads, ProgressListener listener) {
        WindowBuilder builder = new WindowBuilder(panel);
        int total = schedule.count() * windows.size();
        AtomicInteger done = new AtomicInteger();
        List<WindowRun> outcomes = threads <= 1
                ? sequential(builder, done, total, listener)
                : parallel(builder, threads, done, total, listener);
        List<PathResult> paths = new ArrayList<>();
        Map<Integer, List<T>> probes = new LinkedHashMap<>();
        for (WindowRun o : outcomes) {
            paths.addAll(o.paths);
            probes.put(o.window, o.probes);
        }
        int first = schedule.firstRebalance() + 1;
        int rows = schedule.lastRow() - first + 1;
        LocalDate[] dates = new LocalDate[rows];
        double[] market = new double[rows];
        double[] rf = new double[rows];
        for (int k = 0; k < rows; k++) {
            dates[k] = panel.date(first + k);
            market[k] = panel.market(first + k);
            rf[k] = panel.riskFree(first + k);
        }
        return new RunResult<>(dates, market, rf, panel.periodsPerYear(), schedule, paths, probes);
    }

    private List<WindowRun> sequential(WindowBuilder builder, AtomicInteger done, int total,
                                       ProgressListener listener) {
        List<WindowRun> out = new ArrayList<>();
        for (int w : windows) {
            out.add(runWindow(builder, w, done, total, listener, false));
        }
        return out;
    }

    /**
     * Windows run as tasks of one fork-join pool, and at each rebalance the strategies of a
     * window decide as subtasks of the same pool, so both levels share the cores: a study with
     * one window still uses every core, and a window that finishes last is not left alone.
     * Each path is still advanced by one task at a time, in date order.
     */
    private List<WindowRun> parallel(WindowBuilder builder, int threads, AtomicInteger done, int total,
                                     ProgressListener listener) {
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            List<ForkJoinTask<WindowRun>> tasks = new ArrayList<>();
            for (int w : windows) {
                tasks.add(pool.submit(() -> runWindow(builder, w, done, total, listener, true)));
            }
            List<WindowRun> out = new ArrayList<>();
            for (ForkJoinTask<WindowRun> t : tasks) {
                out.add(t.join());
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    private WindowRun runWindow(WindowBuilder builder, int length, AtomicInteger done, int total,
                                ProgressListener listener, boolean forkStrategies) {
        int s = strategies.size();
        PathState[] states = new PathState[s];
        for (int k = 0; k < s; k++) {
            states[k] = new PathState(strategies.get(k).newAllocator(length), new HoldingBook(panel, costBps),
                    schedule.outOfSampleRows());
        }
        List<T> probed = new ArrayList<>();
        // One set of running sums per window length, owned by this thread and moved forward in
        // date order, so the moments do not depend on the number of threads; kept only when a
        // consumer of this window length needs the dense S (DenseMomentPlan).
        DenseMomentPlan plan = new DenseMomentPlan(strategies, probe);
        RunningMoments running = plan.anyWindowNeeds(builder, schedule, length)
                ? new RunningMoments(panel, length) : null;
        int firstHeld = schedule.firstRebalance() + 1;
        for (int j = 0; j < schedule.count(); j++) {
            int tau = schedule.rebalanceRow(j);
            EstimationWindow window = builder.build(tau, length, running, n -> plan.needs(length, n));
            if (probe != null) {
                probed.add(probe.probe(window));
            }
            if (forkStrategies && states.length > 1) {
                decideInParallel(states, window);
            } else {
                for (PathState st : states) {
                    st.rebalance(window, panel);
                }
            }
            for (int t = tau + 1; t <= schedule.holdEnd(j); t++) {
                for (PathState st : states) {
                    st.hold(t, t - firstHeld);
                }
            }
            for (PathState st : states) {
                st.closeHoldingPeriod();
            }
            listener.progress(done.incrementAndGet(), total);
        }
        List<PathResult> paths = new ArrayList<>(s);
        for (int k = 0; k < s; k++) {
            StrategyDefinition def = strategies.get(k);
            paths.add(states[k].result(def.name(), def.riskLabel(), length));
        }
        return new WindowRun(length, paths, probed);
    }

    /**
     * Every strategy decides on the same window at once. The window's moments are computed
     * first, on this thread, because the window computes them lazily and is not thread-safe.
     */
    private void decideInParallel(PathState[] states, EstimationWindow window) {
        if (window.assetCount() > 0) {
            window.moments();
        }
        List<ForkJoinTask<?>> decisions = new ArrayList<>(states.length);
        for (PathState st : states) {
            decisions.add(ForkJoinTask.adapt(() -> st.rebalance(window, panel)));
        }
        ForkJoinTask.invokeAll(decisions);
    }

    private final class WindowRun {
        final int window;
        final List<PathResult> paths;
        final List<T> probes;

        WindowRun(int window, List<PathResult> paths, List<T> probes) {
            this.window = window;
            this.paths = paths;
            this.probes = probes;
        }
    }

    /** Mutable state of one path while its window's thread walks forward. */
    private static final class PathState {
        private final Allocator allocator;
        private final HoldingBook book;
        private final double[] gross;
        private final double[] net;
        private final double[] forecast;
        private final List<RebalanceRecord> records = new ArrayList<>();
        private RebalanceRecord open;
        private double currentForecast = Double.NaN;

        PathState(Allocator allocator, HoldingBook book, int rows) {
            this.allocator = allocator;
            this.book = book;
            this.gross = new double[rows];
            this.net = new double[rows];
            this.forecast = new double[rows];
        }

        void rebalance(EstimationWindow window, ReturnPanel panel) {
            Decision d = window.assetCount() == 0
                    ? new Decision.Failed("no asset has a return in every row of the window", OptionalDouble.empty())
                    : allocator.decide(window);
            if (d instanceof Decision.Chosen c) {
                checkWeights(c.weights(), window);
                HoldingBook.Trade trade = book.rebalance(window.columns(), c.weights());
                currentForecast = Math.sqrt(c.forecastVariance());
                open = new RebalanceRecord(window.date(), window.endRow(), window.assetCount(), window.assets(),
                        c.weights().clone(), trade.turnover(), trade.cost(), OptionalDouble.of(c.forecastVariance()),
                        c.shrinkage(), 0, Optional.empty(), c.notes());
            } else {
                Decision.Failed f = (Decision.Failed) d;
                HoldingBook.Trade trade = book.keep();
                currentForecast = Double.NaN;
                int[] cols = book.columns();
                List<String> held = new ArrayList<>(cols.length);
                for (int c : cols) {
                    held.add(panel.assets().get(c));
                }
                open = new RebalanceRecord(window.date(), window.endRow(), window.assetCount(), held, book.weights(),
                        trade.turnover(), trade.cost(), OptionalDouble.empty(), f.shrinkage(), 0,
                        Optional.of(f.reason()), List.of());
            }
        }

        private static void checkWeights(double[] w, EstimationWindow window) {
            if (w.length != window.assetCount()) {
                throw new IllegalStateException("allocator returned " + w.length + " weights for "
                        + window.assetCount() + " assets at " + window.date());
            }
            double sum = 0;
            for (double v : w) {
                if (!Double.isFinite(v)) {
                    throw new IllegalStateException("allocator returned a non-finite weight at " + window.date());
                }
                sum += v;
            }
            if (!(Math.abs(sum - 1) <= 1e-8)) {
                throw new IllegalStateException("weights at " + window.date() + " sum to " + sum + ", not 1");
            }
        }

        void hold(int row, int k) {
            HoldingBook.RowReturn r = book.hold(row);
            gross[k] = r.gross();
            net[k] = r.net();
            forecast[k] = currentForecast;
        }

        void closeHoldingPeriod() {
            records.add(open.withMissingHeld(book.missingHeld()));
            open = null;
        }

        PathResult result(String name, String riskLabel, int window) {
            return new PathResult(name, riskLabel, window, gross, net, forecast, records);
        }
    }

    @Override
    public String toString() {
        return "WalkForward" + Arrays.toString(windows.toArray());
    }
}
