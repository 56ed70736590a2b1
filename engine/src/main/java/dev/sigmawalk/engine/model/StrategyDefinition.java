package dev.sigmawalk.engine.model;

/**
 * A named strategy the engine can run for any window length. The engine knows strategies only
 * through this interface; the concrete risk models and rules live elsewhere.
 */
public interface StrategyDefinition {
    /** Unique name, as in the study file. */
    String name();

    /** Short description of the risk model, for reports (for example {@code single-index}). */
    String riskLabel();

    /** A fresh allocator for one path of this strategy with window length {@code window}. */
    Allocator newAllocator(int window);
}
