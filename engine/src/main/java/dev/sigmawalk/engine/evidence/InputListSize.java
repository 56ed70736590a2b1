package dev.sigmawalk.engine.evidence;

/**
 * How many estimates a mean-variance rebalance needs (Method §10): the full sample model needs
 * n expected returns and n(n+1)/2 distinct covariances, n + n(n+1)/2; the single-index model
 * needs α_i, β_i and the residual variance per asset plus the market premium and market
 * variance, 3n + 2. Counts are exact integers (long: n up to about 4 · 10⁹ fits).
 *
 * @param assets n >= 1
 */
public record InputListSize(int assets) {
    public InputListSize {
        if (!(assets >= 1)) {
            throw new IllegalArgumentException("assets (" + assets + ") must be >= 1");
        }
    }

    /** n + n(n+1)/2. */
    public long fullModel() {
        long n = assets;
        return n + n * (n + 1) / 2;
    }

    /** 3n + 2. */
    public long singleIndex() {
        return 3L * assets + 2;
    }

    /** 1 - singleIndex / fullModel: the share of estimates the single index saves (negative for n ≤ 3). */
    public double reduction() {
        return 1.0 - (double) singleIndex() / fullModel();
    }
}
