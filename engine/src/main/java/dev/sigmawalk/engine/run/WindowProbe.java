package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.model.EstimationWindow;

/**
 * Computes something from every estimation window the engine builds (for example residual
 * diagnostics), so that such evidence shares the window and its moments with the models.
 * Must be stateless or thread-safe: windows of different lengths run on different threads.
 */
@FunctionalInterface
public interface WindowProbe<T> {
    T probe(EstimationWindow window);

    /**
     * Whether {@link #probe} reads the dense n×n sample matrix of a window of {@code window}
     * rows and {@code assets} eligible assets; the same contract as
     * {@link dev.sigmawalk.engine.model.StrategyDefinition#needsDenseMoments}. A probe that
     * works from the window's rows, or only from the cheap moments (means, variances, each
     * asset's covariance with the market), answers no. The default says yes.
     */
    default boolean needsDenseMoments(int window, int assets) {
        return true;
    }
}
