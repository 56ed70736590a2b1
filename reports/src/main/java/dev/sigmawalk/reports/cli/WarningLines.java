package dev.sigmawalk.reports.cli;

import java.io.PrintWriter;
import java.util.function.Consumer;

/** Prints each warning of a run on standard error as it becomes known, unless {@code --quiet}. */
final class WarningLines {
    static final String PREFIX = "sigmawalk: warning: ";

    private WarningLines() {
    }

    static Consumer<String> to(PrintWriter err, boolean quiet) {
        if (quiet) {
            return w -> { };
        }
        return w -> {
            err.println(PREFIX + w);
            err.flush();
        };
    }
}
