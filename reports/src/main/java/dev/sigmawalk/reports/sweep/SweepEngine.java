package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.data.InputException;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * Where a sweep's grid points run. Every engine runs each task through {@link PointRunner}, so
 * the files of a point never depend on the engine, the number of workers or the order in which
 * tasks finish.
 */
public sealed interface SweepEngine permits InProcessEngine, SparkEngine {
    /** Engine name for {@code --engine}: this process's threads. */
    String IN_PROCESS = "in-process";
    /** Engine name for {@code --engine}: Apache Spark, through spark-submit. */
    String SPARK = "spark";
    /** Spark's own launcher sets this system property in the driver. */
    String SPARK_MASTER_PROPERTY = "spark.master";

    /**
     * Runs every task and returns one outcome per task, in the tasks' order.
     *
     * @param force write into point folders sigmawalk did not write
     * @param done told of each outcome as it arrives (for a progress line)
     */
    List<PointOutcome> run(List<PointTask> tasks, boolean force, Consumer<PointOutcome> done);

    /** One line for the manifest and the page: which engine, how many workers. */
    String describe();

    /**
     * Threads of this process for the grid's own evidence, computed here after the points: the
     * in-process engine's thread count, or every processor of a Spark driver.
     */
    int driverThreads();

    /**
     * The engine asked for, or by default Spark when launched through spark-submit and this
     * process otherwise. The Spark engine is loaded by name only when chosen, so that
     * {@code java -jar} runs without Spark on the class path.
     *
     * @param asked {@value #IN_PROCESS}, {@value #SPARK}, or empty for the default
     * @param threads worker threads of the in-process engine
     * @throws InputException for an unknown engine name, or Spark asked for but absent
     */
    static SweepEngine choose(Optional<String> asked, int threads) {
        String name = asked.orElse(System.getProperty(SPARK_MASTER_PROPERTY) != null ? SPARK : IN_PROCESS);
        if (IN_PROCESS.equals(name)) {
            return new InProcessEngine(threads);
        }
        if (!SPARK.equals(name)) {
            throw new InputException("--engine '" + name + "' is not an engine; expected " + IN_PROCESS + " or " + SPARK);
        }
        try {
            Class<?> spark = Class.forName("dev.sigmawalk.reports.sweep.SparkEngine");
            return (SweepEngine) spark.getDeclaredConstructor().newInstance();
        } catch (ClassNotFoundException | NoClassDefFoundError e) {
            throw new InputException("--engine spark needs Apache Spark on the class path (" + e.getMessage()
                    + "); launch the jar through spark-submit, as the README shows");
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot start the Spark engine", e);
        }
    }
}
