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
}
