package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sigmawalk.reports.cli.SigmawalkCommand;
import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import picocli.CommandLine;

/** A small base study on the invented sample universe, sweep files over it, and byte comparisons. */
final class SweepFixture {
    /** Fields of a run manifest that record the clock and the machine, not the result. */
    static final List<String> CLOCK_FIELDS = List.of("started", "finished", "seconds", "threads");

    private SweepFixture() {
    }

    /** Unpacks the sample universe into {@code dir} and writes {@code base.yaml} beside it. */
    static Path baseStudy(Path dir) throws IOException {
        SampleUniverse.extractTo(dir);
        Path study = dir.resolve("base.yaml");
        Files.writeString(study, String.join("\n",
                "title: Small invented study",
                "data:",
                "  assets: assets-monthly.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: riskfree-monthly.csv",
                "  sectors: sectors.csv",
                "walkforward:",
                "  windows: [24, 36]",
                "  rebalance_every: 3",
                "  start: 2016-01-01",
                "  end: 2019-12-31",
                "  cost_bps: 10",
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
                ""), StandardCharsets.UTF_8);
        return study;
    }

    /** A sweep file {@code name} in {@code dir} over {@code base.yaml} with the given {@code vary:} lines. */
    static Path sweepFile(Path dir, String name, String... varyLines) throws IOException {
        StringBuilder text = new StringBuilder("title: Small grid\nstudy: base.yaml\nvary:\n");
        for (String line : varyLines) {
            text.append("  ").append(line).append('\n');
        }
        Path file = dir.resolve(name);
        Files.writeString(file, text.toString(), StandardCharsets.UTF_8);
        return file;
    }

    record Result(int code, String out, String err) {
    }

    static Result sigmawalk(String... args) {
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    /** Every file of a run folder that must be byte-identical: CSV files, charts and the study file. */
    static List<Path> identicalFiles(Path folder) throws IOException {
        try (Stream<Path> s = Files.walk(folder)) {
            return s.filter(Files::isRegularFile).map(folder::relativize)
                    .filter(p -> p.toString().endsWith(".csv") || p.startsWith("charts") || p.toString().equals("point.yaml"))
                    .sorted().toList();
        }
    }

    /** Asserts that two run folders hold the same files with the same bytes, manifests equal but for the clock. */
    static void assertSameRun(Path expected, Path actual, String label) throws IOException {
        assertSameFiles(expected, actual, label);
        assertEquals(manifestWithoutClock(expected), manifestWithoutClock(actual), label + ": manifest.json");
    }

    /**
     * As {@link #assertSameRun} for two sweeps written to different folders: their manifests also
     * differ in where the point's study file, and so its default output, stood.
     */
    static void assertSamePoint(Path expected, Path actual, String label) throws IOException {
        assertSameFiles(expected, actual, label);
        ObjectNode a = manifestWithoutClock(expected);
        ObjectNode b = manifestWithoutClock(actual);
        for (ObjectNode m : List.of(a, b)) {
            ((ObjectNode) m.get("study")).remove(List.of("file", "output"));
        }
        assertEquals(a, b, label + ": manifest.json");
    }

    private static void assertSameFiles(Path expected, Path actual, String label) throws IOException {
        List<Path> files = identicalFiles(expected);
        List<Path> theirs = identicalFiles(actual).stream().filter(p -> !p.toString().equals("point.yaml")).toList();
        assertEquals(files.stream().filter(p -> !p.toString().equals("point.yaml")).toList(), theirs, label + ": file list");
        for (Path f : theirs) {
            assertArrayEquals(Files.readAllBytes(expected.resolve(f)), Files.readAllBytes(actual.resolve(f)),
                    label + ": " + f + " differs");
        }
    }

    static ObjectNode manifestWithoutClock(Path folder) throws IOException {
        ObjectNode m = (ObjectNode) new ObjectMapper().readTree(folder.resolve("manifest.json").toFile());
        CLOCK_FIELDS.forEach(m::remove);
        return m;
    }

    static List<String> lines(Path file) throws IOException {
        return Files.readAllLines(file, StandardCharsets.UTF_8);
    }
}
