package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run stopped from outside, in a real second process: SIGTERM (what Ctrl-C and a scheduler's
 * stop send) removes the staging folder through the shutdown hook; SIGKILL cannot be caught, so
 * the next run into the same folder removes what the killed one left.
 */
class StopSignalsTest {
    /** Generous: the child only has to start, unpack the sample data and create its staging folder. */
    private static final long STAGING_WAIT_SECONDS = 120;

    @TempDir
    Path dir;

    private Process startDemo(Path out) throws IOException {
        String java = ProcessHandle.current().info().command().orElse("java");
        return new ProcessBuilder(java, "-Xmx384m", "-cp", System.getProperty("java.class.path"),
                SigmawalkCommand.class.getName(), "demo", "--daily", "--quiet", "--out", out.toString())
                .redirectErrorStream(true).redirectOutput(dir.resolve("child.log").toFile()).start();
    }

    private List<Path> workFolders() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().startsWith(".out.sigmawalk-")).toList();
        }
    }

    /** Waits until the child has created its staging folder (it is then past every check and computing). */
    private void awaitStaging(Process child) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(STAGING_WAIT_SECONDS);
        while (workFolders().isEmpty()) {
            assertTrue(child.isAlive(), "child ended early: " + Files.readString(dir.resolve("child.log")));
            assertTrue(System.nanoTime() < deadline, "no staging folder appeared");
            Thread.sleep(50);
        }
    }

    @Test
    void sigterm_removesTheStagingFolder() throws IOException, InterruptedException {
        Path out = dir.resolve("out");
        Process child = startDemo(out);
        awaitStaging(child);
        child.destroy();
        assertTrue(child.waitFor(60, TimeUnit.SECONDS), "child stopped");
        assertEquals(List.of(), workFolders(), "staging folder removed on SIGTERM");
        assertFalse(Files.exists(out), "nothing published");
    }

    @Test
    void sigkill_leavesStaging_whichTheNextRunRemoves() throws IOException, InterruptedException {
        Path out = dir.resolve("out");
        Process child = startDemo(out);
        awaitStaging(child);
        child.destroyForcibly();
        assertTrue(child.waitFor(60, TimeUnit.SECONDS), "child killed");
        assertEquals(1, workFolders().size(), "a killed run cannot clean up");
        StringWriter err = new StringWriter();
        Path study = dir.resolve("data");
        dev.sigmawalk.sample.SampleUniverse.extractTo(study);
        Path small = study.resolve("small.yaml");
        Files.writeString(small, String.join("\n", "title: After a killed run", "data:", "  assets: assets-monthly.csv",
                "  values: returns", "  market: market-monthly.csv", "  riskfree: riskfree-monthly.csv",
                "walkforward:", "  windows: [24]", "  rebalance_every: 12", "  start: 2018-01-01",
                "strategies:", "  - name: equal", "    objective: equal-weight", "evidence:", "  resamples: 100", ""));
        int rerun = SigmawalkCommand.commandLine().setErr(new PrintWriter(err)).setOut(new PrintWriter(new StringWriter()))
                .execute("run", small.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, rerun, err.toString());
        assertEquals(List.of(), workFolders(), "the next run removed the killed run's staging folder");
        assertTrue(Files.exists(out.resolve("report.html")));
    }
}
