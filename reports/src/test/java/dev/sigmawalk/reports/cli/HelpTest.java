package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** Asking for help is never an error: every way of asking prints usage on standard output and exits 0. */
class HelpTest {

    private record Result(int code, String out, String err) {
    }

    private static Result execute(String... args) {
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    @Test
    void everySubcommand_printsUsageAndExitsZero_forDashDashHelp() {
        for (String command : SigmawalkCommand.commandLine().getSubcommands().keySet()) {
            if (command.equals("help")) {
                continue;
            }
            for (String flag : List.of("--help", "-h")) {
                Result r = execute(command, flag);
                assertEquals(0, r.code(), command + " " + flag + ": " + r.err());
                assertTrue(r.out().startsWith("Usage: sigmawalk " + command), command + " " + flag + ": " + r.out());
                assertTrue(r.out().contains("A study file"), command + " usage points at the study format: " + r.out());
                assertEquals("", r.err(), command + " " + flag + " writes nothing on standard error");
            }
        }
    }

    @Test
    void helpSubcommand_printsTheNamedCommandsUsage() {
        for (String command : List.of("run", "check", "demo")) {
            Result r = execute("help", command);
            assertEquals(0, r.code(), "help " + command + ": " + r.err());
            assertTrue(r.out().startsWith("Usage: sigmawalk " + command), r.out());
        }
        Result run = execute("help", "run");
        assertTrue(run.out().contains("STUDY.yaml") && run.out().contains("--out") && run.out().contains("--force"),
                "run's usage names its parameter and options: " + run.out());
    }

    @Test
    void topLevelHelp_listsTheCommandsAndTheStudyFormat() {
        Result r = execute("--help");
        assertEquals(0, r.code(), r.err());
        for (String command : List.of("run", "check", "demo", "help")) {
            assertTrue(r.out().contains("  " + command), command + " listed in: " + r.out());
        }
        assertTrue(r.out().contains("A study file"), r.out());
    }

    @Test
    void usage_carriesNoEscapeCodes_whenNotATerminal() {
        for (String command : List.of("run", "check", "demo")) {
            Result r = execute(command, "--help");
            assertFalse(r.out().contains("\u001b"), command + " usage must not contain ANSI escapes");
        }
    }

    /** The progress line printed to a stream that is not a terminal is plain text: whole lines, no escape codes. */
    @Test
    void progressLine_isPlainText_onAStreamThatIsNotATerminal() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        long[] now = {0};
        ProgressLine line = new ProgressLine(new PrintStream(bytes, true, StandardCharsets.UTF_8), () -> now[0]);
        for (int done = 1; done <= 5; done++) {
            now[0] += 1_500_000_000L;
            line.progress(done, 5);
        }
        String text = bytes.toString(StandardCharsets.UTF_8);
        assertTrue(line.printed(), "a run of 7.5 s prints progress");
        assertFalse(text.contains("\u001b"), "no escape codes: " + text);
        assertFalse(text.contains("\r"), "no carriage returns: " + text);
        assertTrue(text.contains("sigmawalk: 5 of 5 rebalance dates done"), text);
    }
}
