package dev.sigmawalk.reports.cli;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;

/**
 * The threads that write a run's outputs beside the main thread: charts while the page is
 * assembled, the page and the walk's CSV files while the PDF is laid out. With one thread every
 * task runs at once on the caller, so a one-thread run uses no other thread. What a task writes never depends on which thread ran it.
 */
final class Workers implements AutoCloseable {
    private final ExecutorService pool;

    /** @param threads the run's thread count, >= 1 */
    Workers(int threads) {
        this.pool = threads > 1 ? Executors.newFixedThreadPool(threads, Workers::thread) : null;
    }

    /** Where tasks go: the pool, or the calling thread. */
    Executor executor() {
        return pool == null ? Runnable::run : pool;
    }

    /** Waits for a task started on {@link #executor}, rethrowing its exception as it was thrown. */
    static void await(CompletableFuture<Void> task) {
        try {
            task.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw e;
        }
    }

    /**
     * Stops the workers and waits for them: after a failure no task may still be writing into
     * the staging folder while it is removed. An interrupted file write stops at once.
     */
    @Override
    public void close() {
        if (pool != null) {
            pool.shutdownNow();
            try {
                pool.awaitTermination(1, TimeUnit.MINUTES);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /** A worker never keeps the program alive: a failed run ends at once. */
    private static Thread thread(Runnable task) {
        Thread t = new Thread(task, "sigmawalk-writer");
        t.setDaemon(true);
        return t;
    }
}
