package dev.sigmawalk.reports.api;

import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.run.ConstantSpan;
import dev.sigmawalk.engine.run.WindowScan;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What a study's run will meet at its rebalances, known before anything is estimated: series
 * that are constant over a window, rebalances with no eligible asset, and bounds that the
 * eligible assets cannot meet (Method §5: n·lower ≤ 1 ≤ n·upper). {@code check} prints it and
 * {@code run} puts the same warnings in its warning list, so the two agree.
 */
public final class RunPreview {
    /** A row this many half-lives old weighs 2⁻⁵² of the latest: below a double's rounding. */
    private static final int EWMA_ROUNDING_HALF_LIVES = 52;

    private final List<String> feasibility = new ArrayList<>();
    private final List<String> warnings = new ArrayList<>();

    private RunPreview() {
    }

    public static RunPreview of(Study study, StudyData data) {
        Given.study(study);
        Given.data(data);
        List<Integer> windows = study.walkForward().windows();
        WindowScan scan = WindowScan.of(data.panel(), data.schedule(), windows);
        RunPreview p = new RunPreview();
        for (ConstantSpan s : scan.constantSpans()) {
            p.warnings.add(s.warning());
        }
        for (int w : windows) {
            p.emptyWindows(scan, w);
        }
        for (StrategySpec s : study.strategies()) {
            for (int w : windows) {
                p.bounds(scan, s, w);
                p.ewmaRank(scan, s, w);
            }
        }
        return p;
    }

    /** One line per strategy with bounds and window: met everywhere, or where first not. */
    public List<String> feasibility() {
        return List.copyOf(feasibility);
    }

    /** The warnings, identical in check and run. */
    public List<String> warnings() {
        return List.copyOf(warnings);
    }

    private void emptyWindows(WindowScan scan, int window) {
        int empty = 0;
        Optional<LocalDate> first = Optional.empty();
        for (int j = 0; j < scan.rebalances(); j++) {
            if (scan.eligible(window, j) == 0) {
                empty++;
                first = first.isPresent() ? first : Optional.of(scan.rebalanceDate(j));
            }
        }
        if (empty > 0) {
            warnings.add(window + "-row window: no asset is eligible at " + empty + " of " + scan.rebalances()
                    + " rebalances (first " + first.get() + "); no strategy forms a portfolio there");
        }
    }

    private void bounds(WindowScan scan, StrategySpec s, int window) {
        if (s.bounds().isEmpty()) {
            return;
        }
        Bounds b = s.bounds().get();
        int failed = 0;
        int firstIndex = -1;
        int fewest = Integer.MAX_VALUE;
        int most = 0;
        for (int j = 0; j < scan.rebalances(); j++) {
            int n = scan.eligible(window, j);
            fewest = Math.min(fewest, n);
            most = Math.max(most, n);
            if (n > 0 && !b.feasibleFor(n)) {
                failed++;
                firstIndex = firstIndex < 0 ? j : firstIndex;
            }
        }
        String head = "strategy '" + s.name() + "', " + window + "-row window: bounds [" + b.lower() + ", " + b.upper()
                + "]";
        if (failed == 0) {
            feasibility.add(head + " can be met at all " + scan.rebalances() + " rebalances (" + fewest + " to "
                    + most + " eligible assets)");
            return;
        }
        String line = head + " cannot be met at " + failed + " of " + scan.rebalances() + " rebalances (first "
                + scan.rebalanceDate(firstIndex) + ", " + scan.eligible(window, firstIndex) + " eligible assets; "
                + needs(b) + "); no portfolio is formed there";
        feasibility.add(line);
        warnings.add(line);
    }

    /**
     * Method §11's ewma weights ω_t ∝ 0.5^((τ − t)/h) fall below a double's rounding (2⁻⁵² of the
     * latest row's weight) once a row is more than 52 half-lives old, so only the latest
     * min(L, ⌊52h⌋ + 1) rows shape Σ and its rank is at most that. With more eligible assets the
     * matrix is singular to rounding: an unbounded portfolio fails at every such rebalance, and
     * the solver's reason (a matrix singular, as a sample one with too few periods) cannot say
     * that the half-life is the cause. One warning per strategy and window where it happens.
     */
    private void ewmaRank(WindowScan scan, StrategySpec s, int window) {
        if (s.riskSettings().halfLife().isEmpty()) {
            return;
        }
        double h = s.riskSettings().halfLife().getAsDouble();
        long rows = Math.min(window, (long) Math.floor(EWMA_ROUNDING_HALF_LIVES * h) + 1);
        int most = 0;
        for (int j = 0; j < scan.rebalances(); j++) {
            most = Math.max(most, scan.eligible(window, j));
        }
        if (rows < most) {
            warnings.add("strategy '" + s.name() + "', " + window + "-row window: half_life " + h + " leaves only the"
                    + " latest " + rows + (rows == 1 ? " row" : " rows") + " of the window with a weight above rounding,"
                    + " fewer than the up to " + most + " eligible assets, so the ewma matrix is singular to rounding:"
                    + " no portfolio without bounds can be formed where more assets are eligible, and bounded ones"
                    + " rest on " + rows + (rows == 1 ? " row" : " rows") + "; a half_life of at least "
                    + BigDecimal.valueOf(Math.ceil((most - 1) * 100.0 / EWMA_ROUNDING_HALF_LIVES) / 100)
                            .stripTrailingZeros().toPlainString()
                    + " keeps as many rows as assets");
        }
    }

    /** The asset counts n with n·lower ≤ 1 ≤ n·upper, in words. */
    private static String needs(Bounds b) {
        long least = b.upper() > 0 ? (long) Math.ceil(1 / b.upper() - 1e-9) : Long.MAX_VALUE;
        String low = "the bounds need at least " + least + " assets";
        return b.lower() > 0 ? low + " and at most " + (long) Math.floor(1 / b.lower() + 1e-9) : low;
    }
}
