package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/**
 * Times {@link StudyData#load} on a study, for the intake benchmark ({@code bench/intake.sh}):
 * {@code IntakeTiming STUDY.yaml [REPEATS]} prints the wall time of every load, their median,
 * and the heap the loaded data hold. Not a test: speed is measured here, never asserted.
 */
public final class IntakeTiming {
    private IntakeTiming() {
    }

    public static void main(String[] args) {
        Study study = StudyReader.read(Path.of(args[0]));
        int repeats = args.length > 1 ? Integer.parseInt(args[1]) : 5;
        double[] seconds = new double[repeats];
        double[] cpu = new double[repeats];
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        long retained = 0;
        for (int r = 0; r < repeats; r++) {
            long start = System.nanoTime();
            long startCpu = threads.getCurrentThreadCpuTime();
            StudyData data = StudyData.load(study);
            seconds[r] = (System.nanoTime() - start) / 1e9;
            cpu[r] = (threads.getCurrentThreadCpuTime() - startCpu) / 1e9;
            retained = usedAfterGc();
            System.out.printf(Locale.ROOT, "load %d: %.3f s wall, %.3f s cpu (%d rows x %d assets, heap held %.0f MiB)%n",
                    r + 1, seconds[r], cpu[r],
                    data.panel().rows(), data.panel().assetCount(), retained / 1048576.0);
        }
        System.out.printf(Locale.ROOT, "median load: %.3f s wall, %.3f s cpu over %d runs; heap held by the data %.0f MiB%n",
                median(seconds), median(cpu), repeats, retained / 1048576.0);
    }

    private static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }

    private static long usedAfterGc() {
        Runtime rt = Runtime.getRuntime();
        System.gc();
        return rt.totalMemory() - rt.freeMemory();
    }
}
