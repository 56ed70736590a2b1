package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Data intake as the user meets it through {@code sigmawalk check} and {@code sigmawalk run}:
 * the long layout gives the wide file's results, and faults of real exports (other encodings,
 * unclosed quotes, YAML number forms, formula-like names) are exit 2 with a located one-line
 * message from both commands, never a stack trace.
 */
class IntakeCommandTest {
    @TempDir
    static Path data;
    static Path wideStudy;

    /** A quick study on the sample universe's monthly files, with the assets' columns sorted by name. */
    @BeforeAll
    static void writeStudies() throws IOException {
        SampleUniverse.extractTo(data);
        Files.writeString(data.resolve("assets-sorted.csv"), sortColumns(Files.readString(data.resolve("assets-monthly.csv"))));
        wideStudy = data.resolve("wide.yaml");
        Files.writeString(wideStudy, String.join("\n",
                "title: Intake study",
                "data:",
                "  assets: assets-sorted.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: riskfree-monthly.csv",
                "walkforward:",
                "  windows: [24]",
                "  rebalance_every: 6",
                "  start: 2016-01-01",
                "  end: 2018-12-31",
                "  cost_bps: 10",
                "strategies:",
                "  - name: index-model",
                "    risk: single-index",
                "    objective: min-variance",
                "    bounds: [0, 0.10]",
                "  - name: shrunk",
                "    risk: shrinkage",
                "    objective: min-variance",
                "    bounds: [0, 0.10]",
                "  - name: equal",
                "    objective: equal-weight",
                ""), StandardCharsets.UTF_8);
    }

    private record Result(int code, String out, String err) {
    }

    private static Result sigmawalk(String... args) {
        CommandLine cl = SigmawalkCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    /** The wide file with its asset columns in name order (the long layout's column order). */
    private static String sortColumns(String wide) {
        String[] lines = wide.split("\n");
        String[] header = lines[0].split(",");
        List<Integer> order = new ArrayList<>();
        for (int j = 1; j < header.length; j++) {
            order.add(j);
        }
        order.sort((a, b) -> header[a].compareTo(header[b]));
        StringBuilder sb = new StringBuilder();
        for (String line : lines) {
            String[] cells = line.split(",", -1);
            sb.append(cells[0]);
            for (int j : order) {
                sb.append(',').append(cells[j]);
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** The wide file as shuffled {@code date,asset,value} rows, one per non-empty cell. */
    private static String toLong(String wide, long seed) {
        String[] lines = wide.split("\n");
        String[] header = lines[0].split(",");
        List<String> rows = new ArrayList<>();
        for (int i = 1; i < lines.length; i++) {
            String[] cells = lines[i].split(",", -1);
            for (int j = 1; j < header.length; j++) {
                if (!cells[j].isEmpty()) {
                    rows.add(cells[0] + "," + header[j] + "," + cells[j]);
                }
            }
        }
        Collections.shuffle(rows, new Random(seed));
        return "date,asset,value\n" + String.join("\n", rows) + "\n";
    }

    private static Path studyWith(String name, String from, String to) throws IOException {
        String text = Files.readString(wideStudy);
        assertTrue(text.contains(from), from);
        Path file = data.resolve(name);
        Files.writeString(file, text.replace(from, to));
        return file;
    }

    @Test
    void longLayout_runWritesTheWideFilesWeightsAndReturns(@TempDir Path out) throws IOException {
        Files.writeString(data.resolve("assets-long.csv"), toLong(Files.readString(data.resolve("assets-sorted.csv")), 7));
        Path longStudy = studyWith("long.yaml", "  assets: assets-sorted.csv", "  assets: assets-long.csv\n  layout: long");
        assertEquals(0, sigmawalk("run", wideStudy.toString(), "--out", out.resolve("wide").toString(), "--quiet").code());
        Result r = sigmawalk("run", longStudy.toString(), "--out", out.resolve("long").toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        for (String f : List.of("weights.csv", "returns.csv", "rebalances.csv", "summary.csv")) {
            assertArrayEquals(Files.readAllBytes(out.resolve("wide").resolve(f)), Files.readAllBytes(out.resolve("long").resolve(f)), f);
        }
        assertTrue(Pattern.compile("\"layout\"\\s*:\\s*\"long\"").matcher(Files.readString(out.resolve("long")
                .resolve("manifest.json"))).find(), "the manifest records the layout as read");
    }

    @Test
    void percentReturns_areExit2WithTheHint() throws IOException {
        StringBuilder percent = new StringBuilder();
        for (String line : Files.readAllLines(data.resolve("assets-sorted.csv"))) {
            if (percent.length() == 0) {
                percent.append(line).append('\n');
                continue;
            }
            String[] cells = line.split(",", -1);
            percent.append(cells[0]);
            for (int j = 1; j < cells.length; j++) {
                percent.append(',').append(cells[j].isEmpty() ? "" : String.valueOf(Double.parseDouble(cells[j]) * 100));
            }
            percent.append('\n');
        }
        Files.writeString(data.resolve("assets-percent.csv"), percent);
        Path study = studyWith("percent.yaml", "assets: assets-sorted.csv", "assets: assets-percent.csv");
        Result r = sigmawalk("check", study.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("assets-percent.csv line "), r.err());
        assertTrue(r.err().contains("divide every value by 100"), r.err());
    }

    @Test
    void folderGivenAsTheAssetsFile_isExit2NamingTheFolder() throws IOException {
        Files.createDirectories(data.resolve("exports"));
        Path study = studyWith("folder.yaml", "assets: assets-sorted.csv", "assets: exports/");
        Result r = sigmawalk("check", study.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("exports: is a folder"), r.err());
    }

    @Test
    void alphaForAnUnknownAsset_isAWarningThatCheckPrints() throws IOException {
        String first = Files.readAllLines(data.resolve("assets-sorted.csv")).get(0).split(",")[1];
        Files.writeString(data.resolve("alphas-ghost.csv"), "date,asset,alpha\n2015-01-30," + first + ",0.001\n"
                + "2015-01-30,NOBODY,0.002\n");
        Path study = studyWith("ghost.yaml", "  - name: equal\n    objective: equal-weight",
                "  - name: tilted\n    risk: single-index\n    objective: max-sharpe\n    alphas: alphas-ghost.csv");
        Result r = sigmawalk("check", study.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue((r.out() + r.err()).contains("alphas-ghost.csv gives alphas for 1 asset not in the universe, which are"
                + " ignored: NOBODY"), r.out() + r.err());
    }

    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    @Test
    void everyOutputCsvCell_isInertInASpreadsheet(@TempDir Path out) throws IOException {
        assertEquals(0, sigmawalk("run", wideStudy.toString(), "--out", out.toString(), "--quiet").code());
        List<Path> files;
        try (Stream<Path> s = Files.walk(out)) {
            files = s.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
        assertTrue(files.size() >= 5, files.toString());
        for (Path f : files) {
            for (String line : Files.readAllLines(f)) {
                for (String cell : line.split(",", -1)) {
                    boolean formula = !cell.isEmpty() && "=+-@\t\r".indexOf(cell.charAt(0)) >= 0;
                    assertFalse(formula && !NUMBER.matcher(cell).matches(), f.getFileName() + ": " + cell);
                }
            }
        }
    }

    @Test
    void formulaLikeStrategyName_isExit2AtItsLine() throws IOException {
        Path study = studyWith("formula.yaml", "  - name: equal", "  - name: \"=cmd|' /C calc'!A0\"");
        Result r = sigmawalk("check", study.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("formula.yaml line 22, column 11: strategies[2].name: '=cmd|' /C calc'!A0' starts with"
                + " a character that a spreadsheet runs as a formula"), r.err());
    }

    @Test
    void windows1252AssetsFile_isExit2InCheckAndRun(@TempDir Path out) throws IOException {
        String text = Files.readString(data.resolve("assets-sorted.csv"));
        int third = text.indexOf('\n', text.indexOf('\n', text.indexOf('\n') + 1) + 1);
        String edited = text.substring(0, third) + "\u00e9" + text.substring(third);
        Files.write(data.resolve("assets-1252.csv"), edited.getBytes(Charset.forName("windows-1252")));
        Path study = studyWith("latin.yaml", "assets: assets-sorted.csv", "assets: assets-1252.csv");
        for (String[] args : List.of(new String[] {"check", study.toString()},
                new String[] {"run", study.toString(), "--out", out.toString(), "--quiet"})) {
            Result r = sigmawalk(args);
            assertEquals(2, r.code(), args[0] + ": " + r.err());
            assertTrue(r.err().contains("assets-1252.csv line 3: the file is not UTF-8"), r.err());
            assertTrue(r.err().contains("re-save the file as UTF-8"), r.err());
            assertFalse(r.err().contains("\tat "), "no stack trace: " + r.err());
        }
    }

    @Test
    void unclosedQuoteInTheAssetsFile_isExit2AtTheLineWhereItOpened() throws IOException {
        List<String> lines = new ArrayList<>(Files.readAllLines(data.resolve("assets-sorted.csv")));
        lines.set(60, lines.get(60).replaceFirst(",", ",\""));
        Files.write(data.resolve("assets-quote.csv"), lines);
        Path study = studyWith("quote.yaml", "assets: assets-sorted.csv", "assets: assets-quote.csv");
        Result r = sigmawalk("check", study.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("assets-quote.csv line 61: a quote opens a cell here and is not closed on this line"),
                r.err());
    }

    @Test
    void yamlInfinity_isExit2AtItsLineAndColumn() throws IOException {
        Path study = studyWith("inf.yaml", "cost_bps: 10", "cost_bps: .inf");
        Result r = sigmawalk("check", study.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("inf.yaml line 12, column 13: walkforward.cost_bps: .inf is infinite; expected a finite"
                + " number"), r.err());
    }
}
