package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.reports.files.OutputFolder;
import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The output folder's guarantees where the user meets them, through {@code sigmawalk run}: inputs
 * are never overwritten, environment faults are one located line with exit 2 before any work,
 * a re-run removes what the earlier run wrote and this one does not, and warnings reach the terminal.
 */
class OutputSafetyCliTest {
    @TempDir
    Path dir;
    Path data;
    Path logs;

    @BeforeEach
    void writeStudy() throws IOException {
        data = dir.resolve("data");
        logs = dir.resolve("logs");
        SampleUniverse.extractTo(data);
        // A researcher's export that happens to carry an output's name.
        Files.move(data.resolve("assets-monthly.csv"), data.resolve("returns.csv"));
        study("study.yaml", "[24, 36]");
        study("smaller.yaml", "[24]");
    }

    private void study(String name, String windows) throws IOException {
        Files.writeString(data.resolve(name), String.join("\n",
                "title: Output safety",
                "data:",
                "  assets: returns.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: riskfree-monthly.csv",
                "walkforward:",
                "  windows: " + windows,
                "  rebalance_every: 12",
                "  start: 2016-01-01",
                "strategies:",
                "  - name: index-model",
                "    risk: single-index",
                "    objective: min-variance",
                "    bounds: [0, 0.2]",
                "  - name: equal",
                "    objective: equal-weight",
                "evidence:",
                "  resamples: 100",
                ""), StandardCharsets.UTF_8);
    }

    private record Result(int code, String out, String err) {
    }

    private Result sigmawalk(String... args) {
        CommandLine cl = SigmawalkCommand.commandLine(new CrashLog(logs));
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    private static List<String> files(Path root) throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> s = Files.walk(root)) {
            s.filter(Files::isRegularFile).forEach(p -> out.add(root.relativize(p).toString()));
        }
        out.sort(null);
        return out;
    }

    private void assertRefused(Result r, String message) {
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, r.code(), r.err());
        assertEquals("sigmawalk: " + message + "\n", r.err());
        assertFalse(Files.exists(logs), "a refused folder is not an internal error: no log");
    }

    @Test
    void forceIntoDataFolder_neverReplacesAnInput() throws IOException {
        byte[] before = Files.readAllBytes(data.resolve("returns.csv"));
        Path real = data.toRealPath();
        for (String[] args : List.of(new String[] {"--out", data.toString()}, new String[] {"--out", data.toString(), "--force"})) {
            List<String> all = new ArrayList<>(List.of("run", data.resolve("study.yaml").toString(), "--quiet"));
            all.addAll(List.of(args));
            assertRefused(sigmawalk(all.toArray(new String[0])), "output folder " + real + " is the folder " + real
                    + " that holds the input file 'returns.csv', a name sigmawalk writes; inputs are never"
                    + " overwritten, with or without --force: choose an output folder outside " + real);
        }
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(data.resolve("returns.csv"))));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of("data"), s.map(p -> p.getFileName().toString()).toList(), "no staging folder");
        }
    }

    @Test
    void defaultOutputBesideAnInputWithAnOutputName_isRefused() {
        Result r = sigmawalk("run", data.resolve("study.yaml").toString(), "--quiet");
        assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("sigmawalk-out is inside the folder "), r.err());
    }

    @Test
    void danglingSymlinkOut_failsBeforeAnyWork() throws IOException {
        Path link = dir.resolve("results");
        Files.createSymbolicLink(link, dir.resolve("gone"));
        assertRefused(sigmawalk("run", data.resolve("study.yaml").toString(), "--out", link.toString(), "--quiet"),
                "output folder " + link + " is a symbolic link to " + dir.resolve("gone")
                        + ", which does not exist; create that folder or choose another --out");
    }

    @Test
    void outUnderARegularFile_isExitTwo_notAStackTrace() throws IOException {
        Files.writeString(dir.resolve("notes.txt"), "a file");
        assertRefused(sigmawalk("run", data.resolve("study.yaml").toString(), "--out",
                dir.resolve("notes.txt/results").toString(), "--quiet"), "output folder " + dir.resolve("notes.txt/results")
                + " cannot be created: " + dir.resolve("notes.txt") + " is a file, not a folder; choose another --out");
    }

    @Test
    void rerunOfASmallerStudy_removesTheOldCharts_andKeepsTheUsersFiles() throws IOException {
        Path out = dir.resolve("results");
        assertEquals(0, sigmawalk("run", data.resolve("study.yaml").toString(), "--out", out.toString(), "--quiet").code());
        List<String> bigger = files(out);
        assertTrue(bigger.stream().anyMatch(f -> f.startsWith("charts/") && f.contains("36")), bigger.toString());
        Files.writeString(out.resolve("committee-notes.txt"), "the user's own notes");
        Result r = sigmawalk("run", data.resolve("smaller.yaml").toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        List<String> smaller = files(out);
        List<String> listed = new ArrayList<>(Files.readAllLines(out.resolve(OutputFolder.MARKER)));
        listed.add(OutputFolder.MARKER);
        listed.add("committee-notes.txt");
        listed.sort(null);
        assertEquals(listed, smaller, "exactly this run's files and the user's note");
        assertTrue(smaller.size() < bigger.size() + 1, "the 36-row window's charts are gone");
        assertEquals("the user's own notes", Files.readString(out.resolve("committee-notes.txt")));
    }

    @Test
    void warnings_reachStandardError_unlessQuiet() throws IOException {
        List<String> lines = new ArrayList<>(Files.readAllLines(data.resolve("smaller.yaml")));
        lines.replaceAll(l -> l.replace("bounds: [0, 0.2]", "bounds: [0, 0.0145]"));
        Files.write(data.resolve("tight.yaml"), lines);
        Result loud = sigmawalk("run", data.resolve("tight.yaml").toString(), "--out", dir.resolve("a").toString());
        assertEquals(0, loud.code(), loud.err());
        assertTrue(loud.err().contains("sigmawalk: warning: evidence.resamples: 100 resamples"), loud.err());
        assertTrue(loud.err().contains("sigmawalk: warning: strategy 'index-model', 24-row window: bounds [0.0, 0.0145]"
                + " cannot be met at 1 of 9 rebalances (first 2024-01-31, 68 eligible assets; the bounds need at least 69"
                + " assets); no portfolio is formed there"), loud.err());
        Result quiet = sigmawalk("run", data.resolve("tight.yaml").toString(), "--out", dir.resolve("b").toString(),
                "--quiet");
        assertEquals(0, quiet.code());
        assertEquals("", quiet.err());
    }
}
