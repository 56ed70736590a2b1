package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code sigmawalk watch} end to end on a small study over the invented sample universe: a save
 * reruns the study in the same process, a bad edit is reported on one located line and leaves
 * the last good outputs in place, and a rerun writes the same bytes as a fresh {@code run}.
 */
class WatchCommandTest {
    @TempDir
    static Path data;

    @BeforeAll
    static void extract() throws IOException {
        SampleUniverse.extractTo(data);
    }

    private static String study(String windows) {
        return String.join("\n",
                "title: Small invented study, watched",
                "data:",
                "  assets: assets-monthly.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: riskfree-monthly.csv",
                "walkforward:",
                "  windows: " + windows,
                "  rebalance_every: 3",
                "  start: 2016-01-01",
                "  end: 2019-12-31",
                "strategies:",
                "  - name: index-model",
                "    risk: single-index",
                "    objective: min-variance",
                "    bounds: [0, 0.10]",
                "  - name: plain",
                "    risk: sample",
                "    objective: min-variance",
                "    bounds: [0, 0.10]",
                "evidence:",
                "  resamples: 100",
                "");
    }

    /** A command line writing into buffers that another thread may read while it runs. */
    private record Cli(CommandLine line, StringWriter out, StringWriter err) {
        static Cli create() {
            CommandLine cl = SigmawalkCommand.commandLine();
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            cl.setOut(new PrintWriter(out, true));
            cl.setErr(new PrintWriter(err, true));
            return new Cli(cl, out, err);
        }
    }

    /** Waits for {@code condition}; fails at once when the watch ended first. */
    private static void await(BooleanSupplier condition, CompletableFuture<Integer> watch, Cli cli, String what)
            throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (!condition.getAsBoolean()) {
            if (watch.isDone() || System.nanoTime() > deadline) {
                throw new AssertionError((watch.isDone() ? "the watch ended" : "timed out") + " before " + what
                        + "; its output: " + cli.out() + "; its errors: " + cli.err());
            }
            Thread.sleep(50);
        }
    }

    /** The windows of summary.csv (the market's rows have none). */
    private static Set<String> windowsIn(Path summary) throws IOException {
        Set<String> out = new TreeSet<>();
        List<String> lines = Files.readAllLines(summary);
        for (String line : lines.subList(1, lines.size())) {
            String window = line.split(",", -1)[1];
            if (!window.isEmpty()) {
                out.add(window);
            }
        }
        return out;
    }

    @Test
    void aSaveRunsTheStudyAgain_aBadEditKeepsTheLastOutputs_andARerunMatchesAFreshRun(@TempDir Path tmp)
            throws Exception {
        Path study = data.resolve("watched.yaml");
        Files.writeString(study, study("[24, 36]"), StandardCharsets.UTF_8);
        Path res = tmp.resolve("res");
        Cli cli = Cli.create();
        CompletableFuture<Integer> watch = new CompletableFuture<>();
        Thread watcher = new Thread(() -> watch.complete(cli.line().execute("watch", study.toString(), "--out",
                res.toString(), "--quiet", "--threads", "2", "--stop-after", "3")), "watch-under-test");
        watcher.setDaemon(true);
        watcher.start();
        try {
            watchAndEdit(study, res, cli, watch, tmp);
        } finally {
            // A failed check must not leave the watch polling for the rest of the test run.
            watcher.interrupt();
        }
    }

    private static void watchAndEdit(Path study, Path res, Cli cli, CompletableFuture<Integer> watch, Path tmp)
            throws Exception {

        await(() -> cli.out().toString().contains("wrote"), watch, cli, "the first run");
        assertEquals(Set.of("24", "36"), windowsIn(res.resolve("summary.csv")));

        Files.writeString(study, study("[24, x]"), StandardCharsets.UTF_8);
        await(() -> cli.err().toString().contains("walkforward.windows"), watch, cli, "the bad edit's message");
        assertTrue(cli.err().toString().contains("watched.yaml line 8, column 17"), cli.err().toString());
        assertEquals(Set.of("24", "36"), windowsIn(res.resolve("summary.csv")), "the last good outputs stay");

        Files.writeString(study, study("[30]"), StandardCharsets.UTF_8);
        assertEquals(0, watch.get(120, TimeUnit.SECONDS), cli.err().toString());
        assertEquals(2, cli.out().toString().lines().filter(l -> l.startsWith("sigmawalk: wrote ")).count(),
                cli.out().toString());
        assertEquals(Set.of("30"), windowsIn(res.resolve("summary.csv")));

        Path fresh = tmp.resolve("fresh");
        Cli run = Cli.create();
        assertEquals(0, run.line().execute("run", study.toString(), "--out", fresh.toString(), "--quiet",
                "--threads", "1"), run.err().toString());
        for (String f : List.of("returns.csv", "weights.csv", "summary.csv", "rebalances.csv", "estimates.csv",
                "diagnostics.csv", "tests.csv")) {
            assertArrayEquals(Files.readAllBytes(fresh.resolve(f)), Files.readAllBytes(res.resolve(f)), f);
        }
    }

    @Test
    void aMissingStudy_aSweepFile_andANegativeCountAreRefusedAtOnce(@TempDir Path tmp) throws IOException {
        Cli missing = Cli.create();
        assertEquals(2, missing.line().execute("watch", tmp.resolve("nope.yaml").toString()));
        assertTrue(missing.err().toString().contains("nope.yaml does not exist"), missing.err().toString());

        Path base = tmp.resolve("base.yaml");
        Files.writeString(base, study("[24]"), StandardCharsets.UTF_8);
        Path sweep = tmp.resolve("grid.yaml");
        Files.writeString(sweep, "title: g\nstudy: base.yaml\nvary:\n  walkforward.windows: [[24], [36]]\n",
                StandardCharsets.UTF_8);
        Cli grid = Cli.create();
        assertEquals(2, grid.line().execute("watch", sweep.toString()));
        assertTrue(grid.err().toString().contains("is a sweep file"), grid.err().toString());

        Cli negative = Cli.create();
        assertEquals(2, negative.line().execute("watch", base.toString(), "--stop-after", "-1"));
        assertTrue(negative.err().toString().contains("--stop-after must be >= 0"), negative.err().toString());
        assertFalse(Files.exists(tmp.resolve("sigmawalk-out")), "nothing written");
    }
}
