package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Degenerate windows through the command line: a suspended stock (zero returns with a numeric
 * risk-free rate) and a market that does not move. The run completes, the warnings name the
 * series, window and dates, and {@code check} predicts the same warnings.
 */
class DegenerateDataCliTest {
    /** TW03 is suspended (return exactly 0) from 2010-04-30 to 2013-08-30. */
    private static final String SUSPENDED_FROM = "2010-04-30";
    private static final String SUSPENDED_TO = "2013-08-30";

    @TempDir
    static Path data;

    @BeforeAll
    static void writeData() throws IOException {
        SampleUniverse.extractTo(data);
        List<String> lines = Files.readAllLines(data.resolve("assets-monthly.csv"));
        int col = List.of(lines.get(0).split(",", -1)).indexOf("TW03");
        List<String> out = new ArrayList<>();
        for (String line : lines) {
            String[] cells = line.split(",", -1);
            String date = cells[0];
            if (date.compareTo(SUSPENDED_FROM) >= 0 && date.compareTo(SUSPENDED_TO) <= 0) {
                cells[col] = "0";
            }
            out.add(String.join(",", cells));
        }
        Files.write(data.resolve("suspended.csv"), out, StandardCharsets.UTF_8);
        List<String> market = new ArrayList<>();
        for (String line : Files.readAllLines(data.resolve("market-monthly.csv"))) {
            String[] cells = line.split(",", -1);
            boolean flat = cells[0].compareTo("2014-06-30") >= 0 && cells[0].compareTo("2016-11-30") <= 0;
            market.add(flat ? cells[0] + ",0" : line);
        }
        Files.write(data.resolve("flat-market.csv"), market, StandardCharsets.UTF_8);
    }

    private static Path study(String name, String market, String... strategies) throws IOException {
        List<String> lines = new ArrayList<>(List.of(
                "title: Degenerate windows",
                "data:",
                "  assets: suspended.csv",
                "  values: returns",
                "  market: " + market,
                "  riskfree: 0.02",
                "walkforward:",
                "  windows: [24]",
                "  rebalance_every: 3",
                "  start: 2011-01-01",
                "  end: 2017-12-31",
                "strategies:"));
        lines.addAll(List.of(strategies));
        lines.addAll(List.of("evidence:", "  resamples: 100", ""));
        Path file = data.resolve(name);
        Files.write(file, lines, StandardCharsets.UTF_8);
        return file;
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

    @Test
    void suspendedStock_equalWeightStudy_runs(@TempDir Path out) throws IOException {
        Path study = study("equal.yaml", "market-monthly.csv", "  - name: equal", "    objective: equal-weight");
        Result r = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String manifest = Files.readString(out.resolve("manifest.json"));
        // Windows 2010-04..2012-03 up to 2011-09..2013-08 are all zero; rebalances every 3rd row from 2011-01-31.
        assertTrue(manifest.contains("asset 'TW03': its return is the same in every row of the 24-row window at"),
                manifest);
        assertTrue(manifest.contains("left out of the eligible assets at those rebalances"), manifest);
        assertTrue(Files.readString(out.resolve("weights.csv")).lines()
                .filter(l -> l.startsWith("2012-07-31,equal,24,")).noneMatch(l -> l.contains(",TW03,")),
                "TW03 holds no weight while suspended");
        assertTrue(Files.readString(out.resolve("weights.csv")).contains("2011-01-31,equal,24,TW03,"),
                "TW03 is eligible before a whole window is suspended");
    }

    @Test
    void flatMarket_failsSingleIndexRebalances_andEveryOtherStrategyRuns(@TempDir Path out) throws IOException {
        Path study = study("flat.yaml", "flat-market.csv",
                "  - name: index", "    risk: single-index", "    objective: min-variance", "    bounds: [0, 0.1]",
                "  - name: plain", "    risk: sample", "    objective: min-variance", "    bounds: [0, 0.1]",
                "  - name: sharpe", "    risk: shrinkage", "    shrinkage_target: identity",
                "    objective: max-sharpe", "    bounds: [0, 0.2]",
                "  - name: equal", "    objective: equal-weight");
        Result r = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        List<String> failedIndex = Files.readAllLines(out.resolve("rebalances.csv")).stream()
                .filter(l -> l.contains(",index,24,") && l.contains("market variance in the window (0.0)")).toList();
        // Flat rows 2014-06..2016-11: 24-row windows ending 2016-05..2016-11, every 3rd row from 2011-01.
        assertEquals(List.of("2016-07-29", "2016-10-31"), failedIndex.stream().map(l -> l.substring(0, 10)).toList());
        String manifest = Files.readString(out.resolve("manifest.json"));
        assertTrue(manifest.contains("market 'harbour_composite': its excess return is the same in every row of the"
                + " 24-row window at 2 rebalances from 2016-07-29 to 2016-10-31"), manifest);
        assertTrue(manifest.contains("strategy 'sharpe', window 24: no portfolio formed at 2 of"), manifest);
    }

    /**
     * Mean-variance without bounds and with a risk aversion of 0.001 holds positions hundreds of
     * times the capital, and a period loss beyond −100 % follows. From that row the product of
     * 1 + R is no longer wealth (a second such loss would turn it positive), so the summary gives
     * the ruin its own figures, max drawdown 1 and CAGR −1, instead of a drawdown of billions of
     * percent and an empty CAGR, and the manifest names the date and return (Method §7).
     */
    @Test
    void pathLosingMoreThanItsCapital_isRuin_inTheSummaryAndTheWarnings(@TempDir Path out) throws IOException {
        Path study = study("geared.yaml", "market-monthly.csv", "  - name: geared", "    risk: shrinkage",
                "    shrinkage_target: identity", "    objective: mean-variance", "    risk_aversion: 0.001",
                "    expected_returns: historical");
        Result r = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String[] first = Files.readAllLines(out.resolve("returns.csv")).stream().skip(1)
                .map(l -> l.split(",", -1)).filter(c -> c[1].equals("geared") && Double.parseDouble(c[4]) <= -1)
                .findFirst().orElseThrow();
        String[] header = Files.readAllLines(out.resolve("summary.csv")).get(0).split(",", -1);
        String[] row = Files.readAllLines(out.resolve("summary.csv")).stream().filter(l -> l.startsWith("geared,"))
                .findFirst().orElseThrow().split(",", -1);
        assertEquals("-1.0", row[List.of(header).indexOf("cagr")], "CAGR of a ruined path");
        assertEquals("1.0", row[List.of(header).indexOf("max_drawdown")], "max drawdown of a ruined path");
        String manifest = Files.readString(out.resolve("manifest.json"));
        assertTrue(manifest.contains("strategy 'geared', window 24: its net return of " + first[4] + " on " + first[0]
                + " loses more than the whole portfolio"), manifest);
        assertTrue(Double.parseDouble(first[4]) < -1, "the leveraged loss exceeds the capital: " + first[4]);
    }

    /**
     * 72 assets and a 24-row window make every sample covariance singular, so the unbounded
     * minimum-variance path forms no portfolio at any rebalance and holds cash throughout: its
     * volatility is the risk-free rate's, 0, which the report must not call the lowest realised
     * risk. With an equal-weight path beside it that invests, that path is the one ranked.
     */
    @Test
    void pathThatNeverInvested_isNotRankedAsTheLowestRisk(@TempDir Path out, @TempDir Path both) throws IOException {
        Path alone = study("never.yaml", "market-monthly.csv", "  - name: plain", "    risk: sample",
                "    objective: min-variance");
        Result r = sigmawalk("run", alone.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String report = Files.readString(out.resolve("report.html"));
        // 28 rebalances: every third month-end from 2011-01-31 to 2017-10-31; the apostrophe as the report escapes it.
        assertTrue(report.contains("No strategy formed a portfolio at any of the 28 rebalances: every path held cash"
                + " throughout, so its figures are the risk-free rate&#39;s and nothing is ranked"), report);
        assertTrue(!report.contains("had the lowest realised volatility"), "no lowest-risk claim");
        Path mixed = study("mixed.yaml", "market-monthly.csv", "  - name: plain", "    risk: sample",
                "    objective: min-variance", "  - name: capped", "    risk: sample", "    objective: min-variance",
                "    bounds: [0, 0.02]");
        Result m = sigmawalk("run", mixed.toString(), "--out", both.toString(), "--quiet");
        assertEquals(0, m.code(), m.err());
        String mixedReport = Files.readString(both.resolve("report.html"));
        assertTrue(mixedReport.contains("With a 24-period window, capped had the lowest realised volatility"), mixedReport);
    }

    @Test
    void check_predictsTheSameWarnings_asTheRunRecords(@TempDir Path out) throws IOException {
        Path study = study("both.yaml", "flat-market.csv", "  - name: equal", "    objective: equal-weight");
        Result c = sigmawalk("check", study.toString());
        assertEquals(0, c.code(), c.err());
        Result r = sigmawalk("run", study.toString(), "--out", out.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String manifest = Files.readString(out.resolve("manifest.json"));
        List<String> predicted = c.out().lines().dropWhile(l -> !l.equals("Warnings:")).skip(1)
                .takeWhile(l -> l.startsWith("  ")).map(String::strip).toList();
        assertTrue(predicted.stream().anyMatch(w -> w.startsWith("market 'harbour_composite': ")), c.out());
        assertTrue(predicted.stream().anyMatch(w -> w.startsWith("asset 'TW03': ")), c.out());
        for (String w : predicted) {
            assertTrue(manifest.contains(w), "run records what check predicted: " + w);
        }
    }
}
