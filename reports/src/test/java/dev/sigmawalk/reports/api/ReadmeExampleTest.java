package dev.sigmawalk.reports.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tech.tablesaw.api.Table;

/**
 * The README's library example runs, gives the tables it promises, and is the code of this test:
 * {@link #readmeExample_isTheCodeOfThisTest} compares the README's snippet with the lines between
 * this file's markers.
 */
class ReadmeExampleTest {
    private static final Path README = Path.of("..", "README.md");
    private static final Path THIS_FILE = Path.of("src", "test", "java", "dev", "sigmawalk", "reports", "api",
            "ReadmeExampleTest.java");
    private static final String UNIVERSE_LINE = "Path universe = ";
    private static final double TOLERANCE = 1e-12;

    @Test
    void readmeExample_runs_andItsTablesHoldTheRun() {
        // The README starts from the repository's folder; the tests run in the reports module's.
        Path universe = Path.of("..", "sample-universe");
        // README example: begin
        Study study = Study.builder()
                .title("Index model against the sample covariance")
                .data("assets", universe.resolve("assets-monthly.csv"))
                .data("values", "returns")
                .data("market", universe.resolve("market-monthly.csv"))
                .data("riskfree", universe.resolve("riskfree-monthly.csv"))
                .windows(36, 60)
                .walkForward("cost_bps", 10)
                .strategy("index-model", Map.of("risk", "single-index", "objective", "min-variance", "bounds", List.of(0, 0.1)))
                .strategy("plain-sample", Map.of("risk", "sample", "objective", "min-variance", "bounds", List.of(0, 0.1)))
                .evidence("resamples", 500)
                .build();
        Results results = study.run();
        Table summary = results.summary();
        Table calm = summary.where(summary.doubleColumn("volatility").isLessThan(0.14));
        Table tests = results.tests();
        System.out.println(summary.selectColumns("strategy", "window", "volatility", "sharpe").print());
        System.out.println(tests.where(tests.stringColumn("measure").isEqualTo("variance")).print());
        // README example: end

        assertEquals(5, summary.rowCount(), "two strategies x two windows, then the market");
        assertEquals("market", summary.stringColumn("strategy").get(4));
        assertTrue(summary.intColumn("window").isMissing(4), "the market has no window");
        for (int r = 0; r < calm.rowCount(); r++) {
            assertTrue(calm.doubleColumn("volatility").get(r) < 0.14, "the slice keeps only calm rows");
        }
        assertEquals(2 * 2, tests.where(tests.stringColumn("strategy").isEqualTo("index-model")).rowCount(),
                "index-model against plain-sample: Sharpe and variance tests for each of two windows");
        for (int r = 0; r < tests.rowCount(); r++) {
            assertEquals("plain-sample", tests.stringColumn("baseline").get(r), "row " + r);
            double family = tests.doubleColumn("family_pvalue").get(r);
            assertTrue(family >= 0 && family <= 1, "family p-value in [0, 1], row " + r + ": " + family);
            assertTrue(family >= tests.doubleColumn("bootstrap_pvalue").get(r) - TOLERANCE,
                    "a family-corrected p-value is never below the raw one, row " + r);
        }
        Table returns = results.returns();
        assertEquals((4 + 1) * results.run().dates().length, returns.rowCount(), "every row of every path and the market");
        long weights = results.run().paths().stream().flatMap(p -> p.rebalances().stream()).mapToLong(r -> r.assets().size()).sum();
        assertEquals(weights, results.weights().rowCount(), "one weight per eligible asset and rebalance");
        assertEquals(results.run().paths().stream().mapToInt(p -> p.rebalances().size()).sum(),
                results.rebalances().rowCount(), "one row per rebalance");
    }

    /**
     * The volatility in the summary table is the annualised standard deviation of the net
     * returns in the returns table (Method §7: divisor N - 1, times the square root of the
     * periods in a year), recomputed here from the table alone.
     */
    @Test
    void summaryVolatility_matchesTheReturnsTable() {
        Path universe = Path.of("..", "sample-universe");
        Results results = Study.builder()
                .data("assets", universe.resolve("assets-monthly.csv"))
                .data("values", "returns")
                .data("market", universe.resolve("market-monthly.csv"))
                .data("riskfree", 0.02)
                .windows(36)
                .strategy("equal", Map.of("objective", "equal-weight"))
                .build().run(1);
        Table returns = results.returns();
        Table equal = returns.where(returns.stringColumn("strategy").isEqualTo("equal"));
        double[] net = equal.doubleColumn("net_return").asDoubleArray();
        double mean = 0;
        for (double x : net) {
            mean += x / net.length;
        }
        double squares = 0;
        for (double x : net) {
            squares += (x - mean) * (x - mean);
        }
        double annual = Math.sqrt(squares / (net.length - 1)) * Math.sqrt(12);
        assertEquals(annual, results.summary().doubleColumn("volatility").get(0), 1e-10);
    }

    @Test
    void readmeExample_isTheCodeOfThisTest() throws IOException {
        List<String> readme = snippet(Files.readAllLines(README, StandardCharsets.UTF_8));
        List<String> test = markedLines(Files.readAllLines(THIS_FILE, StandardCharsets.UTF_8));
        assertEquals(test, readme, "the README's library example, after its '" + UNIVERSE_LINE + "' line");
    }

    /** The README's library snippet after its universe line, each line stripped. */
    private static List<String> snippet(List<String> lines) {
        int section = lines.indexOf("## Using sigmawalk as a library");
        assertTrue(section >= 0, "README has the library section");
        int start = section;
        while (!lines.get(start).equals("```java")) {
            start++;
        }
        int end = start + 1;
        while (!lines.get(end).equals("```")) {
            end++;
        }
        List<String> code = lines.subList(start + 1, end);
        int universe = 0;
        while (!code.get(universe).startsWith(UNIVERSE_LINE)) {
            universe++;
        }
        return code.subList(universe + 1, code.size()).stream().map(String::strip).toList();
    }

    private static List<String> markedLines(List<String> lines) {
        int begin = lines.indexOf("        // README example: begin");
        int end = lines.indexOf("        // README example: end");
        assertTrue(begin >= 0 && end > begin, "markers present");
        return lines.subList(begin + 1, end).stream().map(String::strip).toList();
    }
}
