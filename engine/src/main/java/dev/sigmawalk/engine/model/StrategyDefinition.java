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

    /**
     * Whether this strategy's allocator reads the dense n×n sample matrix S of a window of
     * {@code window} rows and {@code assets} eligible assets (through
     * {@link WindowMoments#covariance()}). The engine keeps the O(n²) running sums of a window
     * length only when some consumer answers yes, so the answer must depend on the two numbers
     * alone (never on timing or data), which keeps the outputs the same for every thread count.
     * Answering no while reading S anyway is still correct, only slower: S is then built from
     * the window's rows on request. The default says yes.
     */
    default boolean needsDenseMoments(int window, int assets) {
        return true;
    }
}
