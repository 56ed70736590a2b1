package dev.sigmawalk.engine.model;

/**
 * What the producer of a dense covariance matrix promises about Σ_ij against Σ_ji. A consumer
 * that needs a symmetric matrix (the dense quadratic problem) proves symmetry itself unless the
 * promise is {@link #MIRRORED}; finiteness is never promised and is always proven.
 */
public enum Symmetry {
    /**
     * Every pair was stored from one computed value (Σ_ji written as the same double as Σ_ij, or
     * both computed by one expression of inputs that are themselves mirrored), so the matrix is
     * symmetric bit for bit by construction. Only producers whose write loop does this say so.
     */
    MIRRORED,
    /** No promise: the matrix came from elsewhere (a caller, a decomposition, a test). */
    UNPROVEN
}
