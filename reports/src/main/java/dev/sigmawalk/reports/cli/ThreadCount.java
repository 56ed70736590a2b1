package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.data.InputException;

/** The {@code --threads} value of {@code run} and {@code sweep}. */
final class ThreadCount {
    /** The largest parallelism {@link java.util.concurrent.ForkJoinPool} accepts (its MAX_CAP). */
    static final int MOST = 0x7fff;

    private ThreadCount() {
    }

    /** {@code n} itself, or a usage error when no worker pool can have that many threads. */
    static int require(int n) {
        if (n < 1 || n > MOST) {
            throw new InputException("--threads (" + n + ") must be between 1 and " + MOST);
        }
        return n;
    }
}
