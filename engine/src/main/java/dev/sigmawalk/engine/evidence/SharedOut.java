package dev.sigmawalk.engine.evidence;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;

/**
 * Independent tasks shared out over a few threads, their results handed back in the tasks'
 * order whatever thread ran each, so a caller whose tasks depend on their own inputs alone gets
 * the same values at every thread count. One thread runs them on the caller, in order.
 */
public final class SharedOut {
    private SharedOut() {
    }

    /**
     * @param tasks independent tasks
     * @param threads >= 1; more threads than tasks are not started
     * @param what what the tasks compute, for the message when the wait is interrupted
     * @return each task's result, in the tasks' order
     * @throws RuntimeException the first failed task's exception, as it threw it (in task order)
     */
    public static <T> List<T> all(List<Callable<T>> tasks, int threads, String what) {
        if (!(threads >= 1)) {
            throw new IllegalArgumentException("threads (" + threads + ") must be >= 1");
        }
        List<T> out = new ArrayList<>(tasks.size());
        int parts = Math.min(threads, tasks.size());
        if (parts <= 1) {
            for (Callable<T> task : tasks) {
                out.add(call(task));
            }
            return out;
        }
        ForkJoinPool pool = new ForkJoinPool(parts);
        try {
            for (Future<T> f : pool.invokeAll(tasks)) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while " + what, e);
        } catch (ExecutionException e) {
            throw rethrown(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private static <T> T call(Callable<T> task) {
        try {
            return task.call();
        } catch (Exception e) {
            throw rethrown(e);
        }
    }

    private static RuntimeException rethrown(Throwable cause) {
        if (cause instanceof RuntimeException r) {
            return r;
        }
        if (cause instanceof Error err) {
            throw err;
        }
        return new IllegalStateException(cause);
    }
}
