package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same 2 x 2 grid on Apache Spark {@code local[2]} (two executor threads, tasks finishing in
 * any order) and in-process: every point's files byte-identical across the two engines and to
 * {@code sigmawalk run} on the point alone, and the same {@code sweep.csv}. One Spark context
 * serves the class.
 */
class SparkEngineTest {
    private static final PrintStream SILENT = new PrintStream(OutputStream.nullOutputStream());

    @TempDir
    static Path data;
    static JavaSparkContext spark;
    static Path sweep;

    @BeforeAll
    static void start() throws IOException {
        spark = new JavaSparkContext(new SparkConf().setMaster("local[2]").setAppName("sigmawalk sweep test")
                .set("spark.ui.enabled", "false").set("spark.driver.host", "127.0.0.1")
                .set("spark.driver.bindAddress", "127.0.0.1"));
        SweepFixture.baseStudy(data);
        sweep = SweepFixture.sweepFile(data, "grid.yaml", "walkforward.cost_bps: [5, 20]", "walkforward.windows: [[24], [36]]");
    }

    @AfterAll
    static void stop() {
        spark.stop();
    }

    @Test
    void sparkLocal2_givesTheFilesOfInProcessAndOfSingleRuns() throws IOException {
        Path onSpark = data.resolve("spark");
        Path inProcess = data.resolve("in-process");
        SweepRun.Outcome s = SweepRun.execute(sweep, new SweepRun.Options(Optional.of(onSpark), false, true),
                new SparkEngine(spark), SILENT);
        SweepRun.Outcome p = SweepRun.execute(sweep, new SweepRun.Options(Optional.of(inProcess), false, true),
                new InProcessEngine(2), SILENT);
        assertEquals(0, s.failed(), "no point failed on Spark: " + s.points());
        assertEquals(List.of(PointOutcome.Status.RAN), s.points().stream().map(PointOutcome::status).distinct().toList());
        for (int i = 1; i <= 4; i++) {
            String label = "00" + i;
            Path a = onSpark.resolve("points").resolve(label);
            Path b = inProcess.resolve("points").resolve(label);
            SweepFixture.assertSamePoint(a, b, "point " + label + " spark vs in-process");
            assertArrayEquals(Files.readAllBytes(a.resolve("point.yaml")), Files.readAllBytes(b.resolve("point.yaml")),
                    "point " + label + " point.yaml");
            Path alone = data.resolve("alone-" + label);
            SweepFixture.Result r = SweepFixture.sigmawalk("run", a.resolve("point.yaml").toString(), "--out",
                    alone.toString(), "--quiet");
            assertEquals(0, r.code(), r.err());
            SweepFixture.assertSameRun(a, alone, "point " + label + " spark vs alone");
        }
        assertArrayEquals(Files.readAllBytes(inProcess.resolve("sweep.csv")), Files.readAllBytes(onSpark.resolve("sweep.csv")),
                "sweep.csv");
        assertTrue(s.evidence().best().isPresent(), "a best point");
        PointRow best = s.evidence().best().get();
        PointRow inProcessBest = p.evidence().best().get();
        assertEquals(List.of(inProcessBest.point().label(), inProcessBest.strategy(), inProcessBest.window()),
                List.of(best.point().label(), best.strategy(), best.window()), "same best point");
        assertEquals(p.evidence().familyPValue(), s.evidence().familyPValue(), 0.0, "same family p-value");
        assertEquals(p.evidence().comparisonCount(), s.evidence().comparisonCount(), "same comparisons");
        assertEquals(p.evidence().family().periods(), s.evidence().family().periods(), "same common dates");
    }
}
