package dev.sigmawalk.reports.sweep;

import java.util.List;
import java.util.function.Consumer;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;

/**
 * Runs grid points as Spark tasks, one task per point (a point's windows share its data and its
 * rolling sums, so splitting a point further would repeat that work). A task carries only the
 * point's study text; each executor reads the inputs from the path the study names, which must
 * be a folder every executor mounts at the same path, and publishes the point's folder on that
 * shared file system. Each task walks forward with {@code spark.task.cpus} threads.
 *
 * <p>Loaded by name from {@link SweepEngine#choose} only, so that nothing touches Spark's
 * classes when a sweep runs in-process.
 */
public final class SparkEngine implements SweepEngine {
    private final JavaSparkContext given;

    /** For spark-submit: the context is made from Spark's configuration and stopped afterwards. */
    public SparkEngine() {
        this.given = null;
    }

    /** On a context the caller owns and stops (tests share one per class). */
    public SparkEngine(JavaSparkContext context) {
        this.given = context;
    }

    @Override
    public List<PointOutcome> run(List<PointTask> tasks, boolean force, Consumer<PointOutcome> done) {
        if (tasks.isEmpty()) {
            return List.of();
        }
        JavaSparkContext sc = given != null ? given : new JavaSparkContext(new SparkConf()
                .setAppName("sigmawalk sweep").setIfMissing(SPARK_MASTER_PROPERTY, "local[*]"));
        try {
            int cpus = sc.getConf().getInt("spark.task.cpus", 1);
            List<PointOutcome> out = sc.parallelize(tasks, tasks.size())
                    .map(t -> PointRunner.run(t, cpus, force))
                    .collect();
            out.forEach(done);
            return out;
        } finally {
            if (given == null) {
                sc.stop();
            }
        }
    }

    @Override
    public int driverThreads() {
        return Runtime.getRuntime().availableProcessors();
    }

    @Override
    public String describe() {
        return given != null ? SPARK + " " + given.master()
                : SPARK + " " + System.getProperty(SPARK_MASTER_PROPERTY, "local[*]");
    }
}
