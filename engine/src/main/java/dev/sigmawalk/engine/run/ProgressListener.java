package dev.sigmawalk.engine.run;

/** Told after each rebalance of each window; may be called from several threads. */
@FunctionalInterface
public interface ProgressListener {
    /**
     * @param done rebalance steps finished so far (all windows)
     * @param total rebalance steps in the run
     */
    void progress(int done, int total);

    ProgressListener NONE = (done, total) -> { };
}
