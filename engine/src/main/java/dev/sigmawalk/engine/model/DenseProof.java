package dev.sigmawalk.engine.model;

/**
 * What the producer of a dense covariance matrix has proven about it while writing it. A consumer
 * that needs a finite symmetric matrix (the dense quadratic problem) proves for itself whatever
 * is not promised here; the stronger promises exist so that a 2,000×2,000 matrix is not read
 * again only to confirm what its write loop already knew.
 */
public enum DenseProof {
    /** No promise: the matrix came from elsewhere (a caller, a decomposition, a test). */
    UNPROVEN,
    /**
     * Every pair was stored from one computed value (Σ_ji written as the same double as Σ_ij, or
     * both computed by one expression of inputs that are themselves mirrored), so the matrix is
     * symmetric bit for bit by construction. Finiteness is not promised.
     */
    MIRRORED,
    /**
     * {@link #MIRRORED}, and the write loop also saw every stored value finite (it summed
     * v·0 over them, which is NaN as soon as one v is NaN or infinite).
     */
    MIRRORED_FINITE;

    /** Whether Σ_ij and Σ_ji are promised equal bit for bit. */
    public boolean mirrored() {
        return this != UNPROVEN;
    }

    /** Mirrored, with finiteness promised when the write loop's check says so. */
    public static DenseProof mirrored(boolean finite) {
        return finite ? MIRRORED_FINITE : MIRRORED;
    }
}
