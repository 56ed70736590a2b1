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
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code sigmawalk run} end to end on a small study over the invented sample universe: exit codes,
 * the output contract, determinism across runs and thread counts, and the output-folder rules.
 * The summary is re-derived from {@code returns.csv} with the formulas of the method reference
 * (an independent second computation, not the engine's code).
 */
class RunCommandTest {
    private static final double TIGHT = 1e-12;

    @TempDir
    static Path data;
    static Path study;

    @BeforeAll
    static void writeStudy() throws IOException {
        SampleUniverse.extractTo(data);
        study = data.resolve("small.yaml");
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
                "  start: 2015-01-01",
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
                "  - name: shrunk",
                "    risk: shrinkage",
                "    objective: min-variance",
                "    bounds: [0, 0.10]",
                "  - name: equal",
                "    objective: equal-weight",
                "evidence:",
                "  resamples: 200",
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

    private static List<String[]> csv(Path file) throws IOException {
        List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(file)) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    @Test
    void run_writesEveryContractFile_withTheContractHeaders(@TempDir Path out) throws IOException {
        Result r = sigmawalk("run", study.toString(), "--out", out.resolve("res").toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        Path res = out.resolve("res");
        Map<String, String> headers = Map.of(
                "returns.csv", "date,strategy,window,gross_return,net_return",
                "weights.csv", "date,strategy,window,asset,weight",
                "summary.csv", "strategy,window,periods,mean_return,volatility,sharpe,cagr,max_drawdown,mean_turnover,"
                        + "tracking_error,information_ratio,forecast_volatility,bias",
                "diagnostics.csv", "date,window,assets,mean_abs_residual_corr,lm_stat,lm_pvalue,cd_stat,cd_pvalue,"
                        + "lm_adj_stat,lm_adj_pvalue",
                "estimates.csv", "date,window,asset,alpha,beta,residual_variance",
                "tests.csv", "strategy,baseline,window,measure,estimate,baseline_estimate,difference,standard_error,"
                        + "statistic,hac_pvalue,bootstrap_pvalue,holm_pvalue,method,jk_pvalue,family_pvalue");
        for (Map.Entry<String, String> h : headers.entrySet()) {
            assertEquals(h.getValue(), Files.readAllLines(res.resolve(h.getKey())).get(0), h.getKey());
        }
        assertTrue(Files.readAllLines(res.resolve("rebalances.csv")).get(0)
                .startsWith("date,strategy,window,assets,turnover,cost,forecast_volatility,shrinkage,missing_held"));
        for (String f : List.of("tests.csv", "manifest.json", "report.html", "charts")) {
            assertTrue(Files.exists(res.resolve(f)), f);
        }
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(res), s.toList(), "no staging folder is left beside the output");
        }
    }

    /**
     * summary.csv against a second computation from returns.csv (Method §7): volatility
     * √12·sd(net, N−1), Sharpe √12·mean(net − rf)/sd(net − rf) with rf from the invented bill file,
     * and the market row's mean return 12·mean(market).
     */
    @Test
    void summary_agreesWithReturnsFile(@TempDir Path out) throws IOException {
        assertEquals(0, sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet").code());
        Map<String, Double> rf = new HashMap<>();
        for (String[] row : csv(data.resolve("riskfree-monthly.csv")).subList(1, csv(data.resolve("riskfree-monthly.csv")).size())) {
            rf.put(row[0], Double.parseDouble(row[1]));
        }
        List<Double> net = new ArrayList<>();
        List<Double> excess = new ArrayList<>();
        List<Double> market = new ArrayList<>();
        for (String[] row : csv(out.resolve("returns.csv"))) {
            if (row[1].equals("shrunk") && row[2].equals("36")) {
                double v = Double.parseDouble(row[4]);
                net.add(v);
                excess.add(v - rf.get(row[0]));
            } else if (row[1].equals("market")) {
                market.add(Double.parseDouble(row[3]));
            }
        }
        String[] shrunk = null;
        String[] marketRow = null;
        for (String[] row : csv(out.resolve("summary.csv"))) {
            if (row[0].equals("shrunk") && row[1].equals("36")) {
                shrunk = row;
            } else if (row[0].equals("market")) {
                marketRow = row;
            }
        }
        assertEquals(net.size(), Integer.parseInt(shrunk[2]));
        assertEquals(Math.sqrt(12) * sd(net), Double.parseDouble(shrunk[4]), TIGHT, "volatility");
        assertEquals(Math.sqrt(12) * mean(excess) / sd(excess), Double.parseDouble(shrunk[5]), TIGHT, "sharpe");
        assertEquals(12 * mean(market), Double.parseDouble(marketRow[3]), TIGHT, "market mean return");
        assertEquals("", marketRow[1], "the market row has no window");
    }

    @Test
    void weights_sumToOne_andRespectBounds_atEveryRebalance(@TempDir Path out) throws IOException {
        assertEquals(0, sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet").code());
        Map<String, Double> sums = new HashMap<>();
        List<String[]> rows = csv(out.resolve("weights.csv"));
        for (String[] row : rows.subList(1, rows.size())) {
            double w = Double.parseDouble(row[4]);
            if (!row[1].equals("equal")) {
                assertTrue(w >= -1e-12 && w <= 0.10 + 1e-12, "weight " + w + " of " + String.join(",", row));
            }
            sums.merge(row[0] + "/" + row[1] + "/" + row[2], w, Double::sum);
        }
        assertFalse(sums.isEmpty());
        sums.forEach((key, sum) -> assertEquals(1.0, sum, 1e-9, key));
    }

    /** Java's fork-join pool refuses a parallelism above 32767, so a larger count is a usage error. */
    @Test
    void threadCountBeyondTheRuntimeLimit_isRefusedBeforeAnyWork(@TempDir Path out) {
        Result r = sigmawalk("run", study.toString(), "--out", out.resolve("t").toString(), "--quiet", "--threads",
                "100000");
        assertEquals(2, r.code());
        assertEquals("sigmawalk: --threads (100000) must be between 1 and 32767", r.err().strip());
        assertFalse(Files.exists(out.resolve("t")));
    }

    /** Two runs, one with one thread and one with two, give byte-identical CSV files. */
    @Test
    void csvFiles_areByteIdentical_acrossRunsAndThreadCounts(@TempDir Path out) throws IOException {
        assertEquals(0, sigmawalk("run", study.toString(), "--out", out.resolve("a").toString(), "--quiet",
                "--threads", "1").code());
        assertEquals(0, sigmawalk("run", study.toString(), "--out", out.resolve("b").toString(), "--quiet",
                "--threads", "2").code());
        for (String f : List.of("returns.csv", "rebalances.csv", "weights.csv", "summary.csv", "diagnostics.csv",
                "tests.csv", "estimates.csv", "factor_diagnostics.csv", "sector_correlations.csv")) {
            assertArrayEquals(Files.readAllBytes(out.resolve("a").resolve(f)), Files.readAllBytes(out.resolve("b").resolve(f)),
                    f);
        }
    }

    @Test
    void foreignNonEmptyFolder_isRefused_andLeftUntouched(@TempDir Path out) throws IOException {
        Path mine = Files.writeString(out.resolve("notes.txt"), "my own notes");
        Result r = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("not empty and was not written by sigmawalk"), r.err());
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(mine), s.toList());
        }
        Result forced = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet", "--force");
        assertEquals(0, forced.code(), forced.err());
        assertEquals("my own notes", Files.readString(mine), "--force writes beside the user's files");
        assertTrue(Files.exists(out.resolve("summary.csv")));
    }

    /** With --force too, a user's file named like an output is kept and the run refused (exit 2), before any work. */
    @Test
    void usersFileNamedLikeAnOutput_isKept_evenWithForce(@TempDir Path out) throws IOException {
        Path mine = Files.writeString(out.resolve("summary.csv"), "my own summary");
        Result forced = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet", "--force");
        assertEquals(2, forced.code(), forced.err());
        assertTrue(forced.err().contains("sigmawalk never replaces a file it did not write, with or without --force"),
                forced.err());
        assertEquals("my own summary", Files.readString(mine));
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(mine), s.toList());
        }
    }

    /** An empty --out (an unset variable in "$OUT") would be the working folder; every command refuses it. */
    @Test
    void emptyPath_isRefusedBeforeAnyWork() {
        for (String[] args : List.of(new String[] {"run", study.toString(), "--out", "", "--force"},
                new String[] {"demo", "--out", " "}, new String[] {"check", ""})) {
            Result r = sigmawalk(args);
            assertEquals(SigmawalkCommand.EXIT_BAD_INPUT, r.code(), String.join(" ", args));
            assertTrue(r.err().contains("is an empty path; expected the name of a file or folder (is a variable in"
                    + " the command empty?)"), r.err());
        }
    }

    @Test
    void rerunIntoItsOwnFolder_isAllowedWithoutForce(@TempDir Path out) {
        assertEquals(0, sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet").code());
        assertEquals(0, sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet").code());
    }

    @Test
    void badStudy_exitsTwo_andWritesNothing(@TempDir Path out) throws IOException {
        Path bad = out.resolve("bad.yaml");
        Files.writeString(bad, Files.readString(study).replace("windows: [24, 36]", "windows: [24, 1]")
                .replace("assets: assets-monthly.csv", "assets: " + data.resolve("assets-monthly.csv"))
                .replace("market: market-monthly.csv", "market: " + data.resolve("market-monthly.csv"))
                .replace("riskfree: riskfree-monthly.csv", "riskfree: " + data.resolve("riskfree-monthly.csv"))
                .replace("sectors: sectors.csv", "sectors: " + data.resolve("sectors.csv")));
        Result r = sigmawalk("run", bad.toString(), "--out", out.resolve("res").toString(), "--quiet");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("windows"), r.err());
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(bad), s.toList(), "nothing written beside the study");
        }
    }

    /**
     * A sample matrix with more assets than window rows is singular, so unbounded minimum variance
     * fails at every rebalance (Method §5) and the path holds cash: it must be recorded, warned
     * about, and kept out of the "lowest realised risk" answer it would otherwise win.
     */
    @Test
    void strategyThatNeverFormsAPortfolio_isRecorded_andNotRanked(@TempDir Path out) throws IOException {
        Path singular = data.resolve("singular.yaml");
        Files.writeString(singular, String.join("\n",
                "title: More assets than rows",
                "data:",
                "  assets: assets-monthly.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: riskfree-monthly.csv",
                "walkforward:",
                "  windows: [24]",
                "  rebalance_every: 6",
                "  start: 2020-01-01",
                "strategies:",
                "  - name: plain-unbounded",
                "    risk: sample",
                "    objective: min-variance",
                "  - name: index-unbounded",
                "    risk: single-index",
                "    objective: min-variance",
                ""), StandardCharsets.UTF_8);
        Result r = sigmawalk("run", singular.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        List<String[]> rebalances = csv(out.resolve("rebalances.csv"));
        long failed = rebalances.stream().filter(row -> row[1].equals("plain-unbounded") && row[9].equals("failed")).count();
        assertEquals(10, failed, "every rebalance of the singular path is recorded as failed");
        assertTrue(Files.readString(out.resolve("manifest.json")).contains("no portfolio formed at 10 of 10 rebalances"));
        String headline = org.jsoup.Jsoup.parse(out.resolve("report.html").toFile(), "UTF-8")
                .getElementById("lowest-risk").selectFirst(".answer").text();
        assertTrue(headline.startsWith("With a 24-period window, index-unbounded had the lowest realised volatility"),
                headline);
        assertTrue(headline.contains("Not ranked") && headline.contains("plain-unbounded"), headline);
    }

    private static double mean(List<Double> x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.size();
    }

    private static double sd(List<Double> x) {
        double m = mean(x);
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return Math.sqrt(s / (x.size() - 1));
    }
}
