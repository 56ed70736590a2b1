package dev.sigmawalk.reports.cli;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.Arrays;
import java.util.Optional;
import picocli.CommandLine;

/**
 * Turns any exception a command throws into one line on standard error and an exit code: a bad
 * input (exit 2) as its located message; an environment fault while reading or writing files
 * (exit 2) as the file and the system's reason; anything unexpected (exit 1) as its kind and
 * message. Never a stack trace on the terminal: for every failure but a bad input the trace goes
 * to a {@link CrashLog} file, and the line says where.
 */
final class FailureHandler implements CommandLine.IExecutionExceptionHandler {
    private final CrashLog log;

    FailureHandler(CrashLog log) {
        this.log = log;
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, CommandLine.ParseResult parseResult) {
        PrintWriter err = cmd.getErr();
        Optional<InputException> input = find(ex, InputException.class);
        if (input.isPresent()) {
            err.println("sigmawalk: " + input.get().getMessage());
            err.flush();
            return SigmawalkCommand.EXIT_BAD_INPUT;
        }
        String[] args = parseResult == null ? new String[0] : parseResult.originalArgs().toArray(new String[0]);
        Optional<String> where = log.write(ex, Arrays.asList(args), Instant.now()).map(p -> "; the details are in " + p);
        Optional<IOException> io = find(ex, IOException.class);
        if (io.isPresent()) {
            String context = ex instanceof UncheckedIOException && ex.getMessage() != null ? ex.getMessage() : "";
            String reason = io.get().getMessage() == null ? io.get().getClass().getSimpleName() : io.get().toString();
            err.println("sigmawalk: " + (context.isEmpty() || context.contains(reason) ? reason : context + ": " + reason)
                    + where.orElse(""));
            err.flush();
            return SigmawalkCommand.EXIT_BAD_INPUT;
        }
        err.println("sigmawalk: internal error: " + ex + where.map(w -> w + "; please report it with that file")
                .orElse("; please report it"));
        err.flush();
        return SigmawalkCommand.EXIT_FAILURE;
    }

    /** The first throwable of the given kind in the cause chain (tasks on other threads wrap them). */
    static <T extends Throwable> Optional<T> find(Throwable ex, Class<T> kind) {
        for (Throwable t = ex; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (kind.isInstance(t)) {
                return Optional.of(kind.cast(t));
            }
        }
        return Optional.empty();
    }
}
