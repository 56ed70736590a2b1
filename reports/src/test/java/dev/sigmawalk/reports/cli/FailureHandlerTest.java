package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Every failure is one line on standard error; the trace of an unexpected one goes to a log file. */
class FailureHandlerTest {
    @TempDir
    Path logs;

    /** A command that throws what it is given. */
    @Command(name = "boom")
    static final class Boom implements Callable<Integer> {
        private final RuntimeException failure;

        Boom(RuntimeException failure) {
            this.failure = failure;
        }

        @Override
        public Integer call() {
            throw failure;
        }
    }

    private record Result(int code, String err) {
    }

    private Result execute(RuntimeException failure, String... args) {
        CommandLine cl = new CommandLine(new Boom(failure));
        cl.setExecutionExceptionHandler(new FailureHandler(new CrashLog(logs)));
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err));
        return new Result(cl.execute(args), err.toString());
    }

    private List<Path> logFiles() throws IOException {
        try (Stream<Path> s = Files.list(logs)) {
            return s.toList();
        }
    }

    @Test
    void unexpectedException_isOneLine_andTheTraceIsInTheLog() throws IOException {
        Result r = execute(new IllegalStateException("weights sum to 0.7"));
        assertEquals(SigmawalkCommand.EXIT_FAILURE, r.code());
        List<Path> files = logFiles();
        assertEquals(1, files.size());
        assertEquals("sigmawalk: internal error: java.lang.IllegalStateException: weights sum to 0.7; the details are in "
                + files.get(0) + "; please report it with that file\n", r.err());
        String log = Files.readString(files.get(0));
        assertTrue(log.contains("java.lang.IllegalStateException: weights sum to 0.7"), log);
        assertTrue(log.contains("\tat dev.sigmawalk.reports.cli.FailureHandlerTest"), "the stack trace is kept: " + log);
    }

    @Test
    void ioFaultWhileWriting_isExitTwo_namingTheFileAndTheReason() throws IOException {
        Result r = execute(new UncheckedIOException("cannot write the report",
                new FileSystemException("/results/report.html", null, "No space left on device")));
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, r.code());
        assertTrue(r.err().startsWith("sigmawalk: cannot write the report: java.nio.file.FileSystemException:"
                + " /results/report.html: No space left on device; the details are in "), r.err());
        assertEquals(1, r.err().lines().count(), "one line");
    }

    @Test
    void inputErrorFromAnotherThread_isStillExitTwo_withItsMessage() {
        Result r = execute(new RuntimeException(new InputException("alphas.csv line 4: 'x' is not a number")));
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, r.code());
        assertEquals("sigmawalk: alphas.csv line 4: 'x' is not a number\n", r.err());
    }

    @Test
    void logFolderThatCannotBeWritten_fallsBackToTheTemporaryFolder() throws IOException {
        Path file = logs.resolve("a-file");
        Files.writeString(file, "not a folder");
        CrashLog log = new CrashLog(file.resolve("logs"));
        Path written = log.write(new IllegalStateException("x"), List.of("run"), java.time.Instant.EPOCH).orElseThrow();
        assertEquals(Paths.get(System.getProperty("java.io.tmpdir"), "sigmawalk-logs"), written.getParent());
        Files.delete(written);
    }

    @Test
    void standardLogPlace_followsXdgStateHome_neverTheStudyFolder() {
        assertEquals(Paths.get("/state/sigmawalk/logs"), CrashLog.standard(Map.of("XDG_STATE_HOME", "/state")).folder());
        assertEquals(Paths.get(System.getProperty("user.home"), ".local", "state", "sigmawalk", "logs"),
                CrashLog.standard(Map.of()).folder());
        assertEquals(Paths.get(System.getProperty("user.home"), ".local", "state", "sigmawalk", "logs"),
                CrashLog.standard(Map.of("XDG_STATE_HOME", "relative/path")).folder(), "a relative value is ignored");
    }
}
