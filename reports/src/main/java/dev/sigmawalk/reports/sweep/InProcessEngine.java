package dev.sigmawalk.reports.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;

/**
 * Runs grid points on this process's threads: up to {@code threads} points at once, each
 * walking forward with its share of the threads (a point's files do not depend on that share).
 */
public final class InProcessEngine implements SweepEngine {
    private final int threads;

    /** @param threads worker threads in all, at least 1 */
    public InProcessEngine(int threads) {
        if (!(threads >= 1)) {
            throw new IllegalArgumentException("threads (" + threads + ") must be >= 1");
        }
        this.threads = threads;
    }

    @Override
    public List<PointOutcome> run(List<PointTask> tasks, boolean force, Consumer<PointOutcome> done) {
        if (tasks.isEmpty()) {
            return List.of();
        }
        int workers = Math.min(threads, tasks.size());
        int inner = Math.max(1, threads / workers);
        ExecutorService pool = Executors.newFixedThreadPool(workers);
        try {
            ExecutorCompletionService<PointOutcome> finished = new ExecutorCompletionService<>(pool);
            List<Future<PointOutcome>> futures = new ArrayList<>();
            for (PointTask t : tasks) {
                futures.add(finished.submit(() -> PointRunner.run(t, inner, force)));
            }
            for (int i = 0; i < tasks.size(); i++) {
                done.accept(finished.take().get());
            }
            List<PointOutcome> out = new ArrayList<>();
            for (Future<PointOutcome> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the sweep was interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a grid point's worker stopped unexpectedly", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    @Override
    public int driverThreads() {
        return threads;
    }

    @Override
    public String describe() {
        return IN_PROCESS + ", " + threads + (threads == 1 ? " thread" : " threads");
    }
}
