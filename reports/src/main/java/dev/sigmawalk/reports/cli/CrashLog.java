package dev.sigmawalk.reports.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Where the full trace of an unexpected failure goes, so the terminal shows one line and nothing
 * is lost: a file per failure in the user's state folder, {@code $XDG_STATE_HOME/sigmawalk/logs}
 * (the XDG Base Directory convention; {@code ~/.local/state/sigmawalk/logs} when the variable is
 * unset), never beside the study or its data. When that folder cannot be written, the system's
 * temporary folder is used instead.
 *
 * @param folder the folder the log files go into
 */
record CrashLog(Path folder) {
    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd'T'HHmmss'Z'")
            .withZone(ZoneOffset.UTC);

    CrashLog {
        Objects.requireNonNull(folder, "folder");
    }

    /** The standard place, from the environment. */
    static CrashLog standard(Map<String, String> env) {
        String state = env.get("XDG_STATE_HOME");
        Path base = state != null && !state.isBlank() && Paths.get(state).isAbsolute() ? Paths.get(state)
                : Paths.get(System.getProperty("user.home"), ".local", "state");
        return new CrashLog(base.resolve("sigmawalk").resolve("logs"));
    }

    /**
     * Writes the failure's trace with the command line and versions.
     *
     * @return the file written, or empty when neither this folder nor the temporary folder can be written
     */
    Optional<Path> write(Throwable failure, List<String> args, Instant when) {
        String name = "sigmawalk-" + STAMP.format(when) + "-" + ProcessHandle.current().pid() + ".log";
        StringWriter trace = new StringWriter();
        failure.printStackTrace(new PrintWriter(trace));
        String text = "sigmawalk " + VersionProvider.version() + " on Java " + System.getProperty("java.version") + ", "
                + System.getProperty("os.name") + "\n" + "time: " + when + "\n" + "arguments: " + String.join(" ", args)
                + "\n\n" + trace;
        for (Path dir : List.of(folder, Paths.get(System.getProperty("java.io.tmpdir"), "sigmawalk-logs"))) {
            try {
                Files.createDirectories(dir);
                return Optional.of(Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8));
            } catch (IOException | SecurityException e) {
                // try the next place
            }
        }
        return Optional.empty();
    }
}
