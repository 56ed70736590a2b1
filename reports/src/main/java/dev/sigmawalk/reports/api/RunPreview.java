package dev.sigmawalk.reports.api;

import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.run.ConstantSpan;
import dev.sigmawalk.engine.run.WindowScan;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
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

    /** The asset counts n with n·lower ≤ 1 ≤ n·upper, in words. */
    private static String needs(Bounds b) {
        long least = b.upper() > 0 ? (long) Math.ceil(1 / b.upper() - 1e-9) : Long.MAX_VALUE;
        String low = "the bounds need at least " + least + " assets";
        return b.lower() > 0 ? low + " and at most " + (long) Math.floor(1 / b.lower() + 1e-9) : low;
    }
}
