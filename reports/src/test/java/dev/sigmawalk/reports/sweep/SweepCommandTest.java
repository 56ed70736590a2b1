package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.FamilyContrast;
import dev.sigmawalk.engine.evidence.HacKernel;
import dev.sigmawalk.engine.evidence.RomanoWolfStepdown;
import dev.sigmawalk.engine.study.EvidenceSpec;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code sigmawalk sweep} end to end, in-process, on a 2 x 2 grid of the small sample study:
 * grid order, every point's files byte-identical to {@code sigmawalk run} on its point.yaml,
 * the sweep's own files, re-runs that keep current points, and failed points that do not stop
 * the others.
 */
class SweepCommandTest {
    @TempDir
    static Path data;
    static Path grid;
    static Path out;

    @BeforeAll
    static void runGrid() throws IOException {
        SweepFixture.baseStudy(data);
        grid = SweepFixture.sweepFile(data, "grid.yaml", "walkforward.cost_bps: [5, 20]",
                "walkforward.rebalance_every: [3, 6]");
        out = data.resolve("grid-out");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", grid.toString(), "--out", out.toString(), "--quiet",
                "--threads", "2");
        assertEquals(0, r.code(), r.err());
    }

    @Test
    void points_followFileOrder_lastKeyFastest() {
        double[] costs = {5, 5, 20, 20};
        int[] every = {3, 6, 3, 6};
        for (int i = 0; i < 4; i++) {
            Study s = StudyReader.read(out.resolve("points/00" + (i + 1) + "/point.yaml"));
            assertEquals(costs[i], s.walkForward().costBps(), "point " + (i + 1) + " cost");
            assertEquals(new RebalanceRule.EveryRows(every[i]), s.walkForward().rebalance(), "point " + (i + 1) + " rule");
            assertEquals(data.resolve("assets-monthly.csv"), s.data().assets(), "point " + (i + 1) + " assets path");
        }
    }

    @Test
    void everyPoint_isByteIdenticalToRunningItsPointYamlAlone() throws IOException {
        for (int i = 1; i <= 4; i++) {
            Path point = out.resolve("points/00" + i);
            Path alone = data.resolve("alone-" + i);
            SweepFixture.Result r = SweepFixture.sigmawalk("run", point.resolve("point.yaml").toString(), "--out",
                    alone.toString(), "--quiet", "--threads", "1");
            assertEquals(0, r.code(), r.err());
            SweepFixture.assertSameRun(point, alone, "point " + i);
        }
    }

    @Test
    void sweepCsv_hasOneRowPerPointStrategyAndWindow_copiedFromTheSummaries() throws IOException {
        List<String> lines = SweepFixture.lines(out.resolve("sweep.csv"));
        assertEquals("point,walkforward.cost_bps,walkforward.rebalance_every,strategy,window,volatility,sharpe,"
                + "mean_turnover,bias,status,reason,baseline,family_pvalue,holm_pvalue,family_note", lines.get(0));
        // 2 strategies x 2 windows + the market, for each of 4 points
        assertEquals(1 + 4 * 5, lines.size());
        List<String> summary = SweepFixture.lines(out.resolve("points/003/summary.csv"));
        String[] head = summary.get(0).split(",");
        String[] first = summary.get(1).split(",", -1);
        String expected = "003,20,3," + first[0] + "," + first[1] + "," + first[indexOf(head, "volatility")] + ","
                + first[indexOf(head, "sharpe")] + "," + first[indexOf(head, "mean_turnover")] + ","
                + first[indexOf(head, "bias")] + ",ran,";
        assertTrue(lines.stream().anyMatch(l -> l.startsWith(expected)), "sweep.csv holds point 003's first summary row: "
                + expected);
    }

    /**
     * The grid's family p-values in {@code sweep.csv} are the Romano-Wolf stepdown run directly on
     * the points' published files: every variance comparison of every point's {@code tests.csv},
     * in grid order, on the dates of {@code returns.csv} they all share (here every point has the
     * same out-of-sample dates, so all eight join), with the base study's 100 resamples and the
     * default seed.
     */
    @Test
    void familyPValues_areTheStepdownOnThePointsCommonDates() throws IOException {
        List<String[]> compared = new ArrayList<>();
        List<Map<String, double[]>> paths = new ArrayList<>();
        TreeSet<String> common = null;
        for (int i = 1; i <= 4; i++) {
            Path point = out.resolve("points/00" + i);
            Map<String, List<String[]>> rows = new LinkedHashMap<>();
            List<String> returns = SweepFixture.lines(point.resolve("returns.csv"));
            for (String line : returns.subList(1, returns.size())) {
                String[] f = line.split(",", -1);
                rows.computeIfAbsent(f[1] + "@" + f[2], k -> new ArrayList<>()).add(f);
            }
            Map<String, double[]> net = new LinkedHashMap<>();
            for (Map.Entry<String, List<String[]>> e : rows.entrySet()) {
                if (e.getKey().startsWith("market@")) {
                    continue;
                }
                net.put(e.getKey(), e.getValue().stream().mapToDouble(f -> Double.parseDouble(f[4])).toArray());
                TreeSet<String> dates = new TreeSet<>(e.getValue().stream().map(f -> f[0]).toList());
                if (common == null) {
                    common = dates;
                } else {
                    assertEquals(common, dates, "point " + i + " " + e.getKey() + " has the grid's dates");
                }
            }
            for (String line : SweepFixture.lines(point.resolve("tests.csv"))) {
                String[] f = line.split(",", -1);
                if (f[3].equals("variance")) {
                    compared.add(new String[] {String.valueOf(i), f[0], f[1], f[2]});
                }
            }
            paths.add(net);
        }
        DifferenceTests tests = new DifferenceTests(HacKernel.PARZEN, new EvidenceSpec(100, EvidenceSpec.DEFAULT_SEED, 0));
        List<FamilyContrast> family = new ArrayList<>();
        for (String[] c : compared) {
            Map<String, double[]> net = paths.get(Integer.parseInt(c[0]) - 1);
            double[] a = net.get(c[1] + "@" + c[3]);
            double[] b = net.get(c[2] + "@" + c[3]);
            family.add(new FamilyContrast(DifferenceMeasure.VARIANCE, a, b, tests.variance(a, b)));
        }
        assertEquals(8, family.size(), "two windows of one pair in each of four points");
        double[] expected = RomanoWolfStepdown.adjust(family, 100, EvidenceSpec.DEFAULT_SEED);

        List<String> sweep = SweepFixture.lines(out.resolve("sweep.csv"));
        String[] head = sweep.get(0).split(",");
        for (int k = 0; k < compared.size(); k++) {
            String[] c = compared.get(k);
            String prefix = "00" + c[0] + ",";
            String[] row = sweep.stream().map(l -> l.split(",", -1))
                    .filter(f -> (f[0] + ",").equals(prefix) && f[indexOf(head, "strategy")].equals(c[1])
                            && f[indexOf(head, "window")].equals(c[3]))
                    .findFirst().orElseThrow();
            assertEquals(c[2], row[indexOf(head, "baseline")], "baseline of " + String.join(" ", c));
            assertEquals(expected[k], Double.parseDouble(row[indexOf(head, "family_pvalue")]), 0.0,
                    "family p-value of " + String.join(" ", c));
            double holm = Double.parseDouble(row[indexOf(head, "holm_pvalue")]);
            assertTrue(holm > 0 && holm <= 1, "Holm value of " + String.join(" ", c) + ": " + holm);
            assertEquals("", row[indexOf(head, "family_note")], "no note for a member");
        }
    }

    /**
     * Points over other years: the sample's assets file whole (2012-2019 out of sample), cut to
     * rows before 2014 and to rows from 2015. The lowest volatility is the late universe's
     * (2017-2019); the whole file shares those 36 dates and joins the family, the early one
     * shares none and is left out, with its reason in {@code sweep.csv}, on the page and in the
     * manifest, while Holm's value still covers it.
     */
    @Test
    void pointOverOtherYears_isLeftOutOfTheFamily_withItsReason() throws IOException {
        List<String> all = Files.readAllLines(data.resolve("assets-monthly.csv"), StandardCharsets.UTF_8);
        Files.write(data.resolve("assets-early.csv"), all.stream().filter(l -> l.startsWith("date")
                || l.compareTo("2014-01-01") < 0).toList(), StandardCharsets.UTF_8);
        Files.write(data.resolve("assets-late.csv"), all.stream().filter(l -> l.startsWith("date")
                || l.compareTo("2015-01-01") >= 0).toList(), StandardCharsets.UTF_8);
        String base = Files.readString(data.resolve("base.yaml"), StandardCharsets.UTF_8)
                .replace("windows: [24, 36]", "windows: [24]").replace("start: 2016-01-01", "start: 2012-01-01");
        Files.writeString(data.resolve("base-years.yaml"), base, StandardCharsets.UTF_8);
        Path sweep = data.resolve("years.yaml");
        Files.writeString(sweep, "title: Universes over other years\nstudy: base-years.yaml\nvary:\n"
                + "  data.assets: [assets-monthly.csv, assets-early.csv, assets-late.csv]\n", StandardCharsets.UTF_8);
        Path target = data.resolve("years-out");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());

        List<String> lines = SweepFixture.lines(target.resolve("sweep.csv"));
        String[] head = lines.get(0).split(",");
        String early = lines.stream().filter(l -> l.startsWith("002,assets-early.csv,index-model,")).findFirst().orElseThrow();
        String[] f = early.split(",", indexOf(head, "family_note") + 1);
        assertEquals("", f[indexOf(head, "family_pvalue")], "no family p-value for the early universe");
        assertFalse(f[indexOf(head, "holm_pvalue")].isEmpty(), "Holm still covers it");
        assertTrue(f[indexOf(head, "family_note")].contains("left out of the grid family: its out-of-sample period (2012-02-29"
                + " to 2013-12-31) does not overlap the best comparison's (2017-01-31 to 2019-12-31)"), early);
        for (String member : List.of("001,assets-monthly.csv,index-model,", "003,assets-late.csv,index-model,")) {
            String[] m = lines.stream().filter(l -> l.startsWith(member)).findFirst().orElseThrow().split(",", -1);
            assertFalse(m[indexOf(head, "family_pvalue")].isEmpty(), member + " is in the family");
        }
        String html = Files.readString(target.resolve("sweep.html"), StandardCharsets.UTF_8);
        assertTrue(html.contains("on their 36 common dates (2017-01-31 to 2019-12-31)"), "common dates stated");
        assertTrue(html.contains("Left out of the grid family") && html.contains("Point 002, index-model against plain"),
                "left-out comparison listed");
        var best = SweepFixture.manifestWithoutClock(target).get("best_point");
        assertEquals("003", best.get("point").asText());
        assertEquals(1, best.get("left_out").size());
        assertEquals(2, best.get("family_size").asInt());
        assertEquals(3, best.get("comparisons").asInt());
    }

    @Test
    void sweepPage_isSelfContained_withAHeatMapPerStrategyAndMeasure() throws IOException {
        String html = Files.readString(out.resolve("sweep.html"), StandardCharsets.UTF_8);
        for (String s : List.of("index-model", "plain")) {
            assertTrue(html.contains(s + ": Realised volatility"), "volatility map of " + s);
            assertTrue(html.contains(s + ": Sharpe ratio"), "Sharpe map of " + s);
        }
        assertFalse(html.contains("http://") || html.contains("https://") || html.contains("<script"), "offline page");
        assertFalse(html.contains("{{"), "no template tag left");
        assertTrue(html.contains("border-collapse") && html.contains("td.best"), "the report's stylesheet is inlined");
        assertTrue(html.contains("Corrected for the search over"), "family-corrected p-value stated");
        assertTrue(Files.isRegularFile(out.resolve("manifest.json")));
    }

    @Test
    void rerun_keepsCompletePoints_andRunsAgainWhenAnInputChanges() throws IOException {
        Path copy = data.resolve("rerun");
        Files.createDirectories(copy);
        Path base = SweepFixture.baseStudy(copy);
        Path sweep = SweepFixture.sweepFile(copy, "grid.yaml", "walkforward.cost_bps: [5, 20]");
        Path target = copy.resolve("out");
        assertEquals(0, SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet").code());
        FileTime before = Files.getLastModifiedTime(target.resolve("points/001/returns.csv"));

        SweepFixture.Result again = SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet");
        assertEquals(0, again.code(), again.err());
        assertEquals(before, Files.getLastModifiedTime(target.resolve("points/001/returns.csv")), "point 001 kept");
        assertTrue(SweepFixture.lines(target.resolve("sweep.csv")).stream().skip(1).allMatch(l -> l.contains(",reused,")),
                "every point reused");

        Files.writeString(base.getParent().resolve("sectors.csv"), "\n", StandardCharsets.UTF_8,
                java.nio.file.StandardOpenOption.APPEND);
        assertEquals(0, SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet").code());
        assertTrue(SweepFixture.lines(target.resolve("sweep.csv")).stream().skip(1).allMatch(l -> l.contains(",ran,")),
                "an input's fingerprint changed, so every point ran again");
    }

    @Test
    void failedPoint_isRecordedWithItsReason_andTheOthersFinish() throws IOException {
        Path sweep = SweepFixture.sweepFile(data, "bounds.yaml", "strategies.plain.bounds: [[0, 0.10], [0, 0.001]]");
        Path target = data.resolve("bounds-out");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet");
        assertEquals(1, r.code(), "some point failed: " + r.out() + r.err());
        List<String> lines = SweepFixture.lines(target.resolve("sweep.csv"));
        String failed = lines.stream().filter(l -> l.startsWith("002,")).findFirst().orElseThrow();
        assertTrue(failed.contains(",failed,") && failed.contains("cannot make 72 weights sum to 1"), failed);
        assertTrue(Files.isRegularFile(target.resolve("points/001/summary.csv")), "point 001 finished");
        assertFalse(Files.exists(target.resolve("points/002")), "nothing half-written for the failed point");
        assertTrue(Files.readString(target.resolve("sweep.html"), StandardCharsets.UTF_8).contains("Lowest realised"
                + " volatility among the points that ran (1 of 2 failed, and their comparisons are in neither the search"
                + " nor its corrections): "), "the best point is the best of the points that ran");
        try (var s = Files.list(target.resolve("points"))) {
            assertEquals(List.of("001"), s.map(p -> p.getFileName().toString()).sorted().toList(), "no staging left");
        }
    }

    /** A smaller grid into the same folder takes back the points it no longer has, keeping the user's files. */
    @Test
    void smallerGridIntoTheSameFolder_retractsTheOldPoints_keepingTheUsersFiles() throws IOException {
        Path target = data.resolve("shrink-out");
        Path sweep = SweepFixture.sweepFile(data, "shrink.yaml", "walkforward.cost_bps: [5, 20, 40]");
        assertEquals(0, SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet").code());
        Files.writeString(target.resolve("points/002/notes.txt"), "mine", StandardCharsets.UTF_8);
        SweepFixture.sweepFile(data, "shrink.yaml", "walkforward.cost_bps: [5]");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        try (var s = Files.walk(target.resolve("points"))) {
            assertEquals(List.of("002/notes.txt"), s.filter(Files::isRegularFile).map(p -> target.resolve("points")
                    .relativize(p).toString()).filter(p -> !p.startsWith("001/")).sorted().toList(),
                    "point 003 is gone, and of point 002 only the user's file is left");
        }
        assertEquals("mine", Files.readString(target.resolve("points/002/notes.txt"), StandardCharsets.UTF_8));
        assertTrue(SweepFixture.lines(target.resolve("sweep.csv")).get(1).contains(",reused,"), "point 001 kept");
        assertTrue(Files.isRegularFile(target.resolve("points/001/summary.csv")));
    }

    /** A point that fails now leaves no earlier results under its number to pass for this grid's. */
    @Test
    void pointThatFailsOnARerun_losesItsEarlierResults() throws IOException {
        Path copy = data.resolve("assets-copy.csv");
        Files.copy(data.resolve("assets-monthly.csv"), copy);
        Path target = data.resolve("refail-out");
        Path sweep = SweepFixture.sweepFile(data, "refail.yaml", "data.assets: [assets-monthly.csv, assets-copy.csv]");
        assertEquals(0, SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet").code());
        assertTrue(Files.isRegularFile(target.resolve("points/002/summary.csv")));
        Files.writeString(copy, "date,A\n2020-01-31,x\n", StandardCharsets.UTF_8);
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet");
        assertEquals(1, r.code(), r.err());
        assertFalse(Files.exists(target.resolve("points/002")), "the failed point's old folder is taken back");
        assertTrue(Files.isRegularFile(target.resolve("points/001/summary.csv")));
    }

    @Test
    void badValue_isReportedAtItsPlaceInTheSweepFile_beforeAnyWork() throws IOException {
        Path sweep = SweepFixture.sweepFile(data, "bad.yaml", "walkforward.cost_bps: [5, -3]");
        Path target = data.resolve("bad-out");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--out", target.toString(), "--quiet");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("bad.yaml line 4, column 29") && r.err().contains("cost_bps: -3 is negative"), r.err());
        assertFalse(Files.exists(target), "nothing written");
    }

    @Test
    void unknownStep_isReportedAtItsKey() throws IOException {
        Path sweep = SweepFixture.sweepFile(data, "step.yaml", "strategies.nosuch.bounds: [[0, 1]]");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--quiet");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("step.yaml line 4, column 3") && r.err().contains("no item named 'nosuch'")
                && r.err().contains("index-model, plain"), r.err());
    }

    /** A position too large for an int is still a position that does not exist. */
    @Test
    void hugePosition_isReportedAsMissing() throws IOException {
        Path sweep = SweepFixture.sweepFile(data, "huge.yaml", "strategies.99999999999999999999.bounds: [[0, 1]]");
        SweepFixture.Result r = SweepFixture.sigmawalk("sweep", sweep.toString(), "--quiet");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("huge.yaml line 4, column 3: vary key 'strategies.99999999999999999999.bounds':"
                + " 'strategies' has 2 items in the base study; position 99999999999999999999 does not exist"
                + " (positions count from 0)"), r.err());
    }

    @Test
    void check_acceptsASweepFile_andValidatesEveryPointsData() throws IOException {
        SweepFixture.Result ok = SweepFixture.sigmawalk("check", grid.toString());
        assertEquals(0, ok.code(), ok.err());
        assertTrue(ok.out().contains("Grid: 4 points") && ok.out().contains("Sweep is valid: grid.yaml"), ok.out());
        Path sweep = SweepFixture.sweepFile(data, "check-bounds.yaml", "strategies.plain.bounds: [[0, 0.10], [0, 0.001]]");
        SweepFixture.Result bad = SweepFixture.sigmawalk("check", sweep.toString());
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("1 point of 2 cannot run; first: point 002"), bad.err());
    }

    @Test
    void check_warnsOfAnOutputFolderASweepWouldRefuse() throws IOException {
        Path sweep = SweepFixture.sweepFile(data, "check-out.yaml", "walkforward.cost_bps: [5]");
        Files.writeString(sweep, "output: base.yaml\n", StandardCharsets.UTF_8, java.nio.file.StandardOpenOption.APPEND);
        SweepFixture.Result r = SweepFixture.sigmawalk("check", sweep.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("  warning: a sweep without --out would stop here: output " + data.resolve("base.yaml")
                + " is a file, not a folder; choose another --out"), r.out());
    }

    private static int indexOf(String[] header, String column) {
        for (int i = 0; i < header.length; i++) {
            if (header[i].equals(column)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no column " + column);
    }
}
