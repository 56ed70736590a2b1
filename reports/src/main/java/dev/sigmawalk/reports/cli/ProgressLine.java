package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.run.ProgressListener;
import java.io.PrintStream;
import java.util.Locale;
import java.util.function.LongSupplier;

/**
 * The progress line on standard error: rebalances done of total, time elapsed and an estimate of
 * the time left. Silent for the first couple of seconds (short runs print nothing) and then at
 * most about once a second. Thread-safe: windows report from several threads.
 */
final class ProgressLine implements ProgressListener {
    private static final long QUIET_NANOS = 2_000_000_000L;
    private static final long EVERY_NANOS = 1_000_000_000L;

    private final PrintStream err;
    private final LongSupplier clock;
    private final long start;
    private long lastPrinted;
    private boolean printed;

    /**
     * @param err where to print
     * @param clock nanosecond clock (System::nanoTime in use; a fake one in tests)
     */
    ProgressLine(PrintStream err, LongSupplier clock) {
        this.err = err;
        this.clock = clock;
        this.start = clock.getAsLong();
        this.lastPrinted = start;
    }

    @Override
    public synchronized void progress(int done, int total) {
        long now = clock.getAsLong();
        long elapsed = now - start;
        if (elapsed < QUIET_NANOS || (now - lastPrinted < EVERY_NANOS && done < total)) {
            return;
        }
        lastPrinted = now;
        printed = true;
        double seconds = elapsed / 1e9;
        double left = done > 0 ? seconds * (total - done) / done : Double.NaN;
        err.print(String.format(Locale.ROOT, "sigmawalk: %d of %d rebalance dates done, %.1f s elapsed, about %.0f s left%n",
                done, total, seconds, left));
        err.flush();
    }

    /** Whether anything was printed. */
    synchronized boolean printed() {
        return printed;
    }
}
