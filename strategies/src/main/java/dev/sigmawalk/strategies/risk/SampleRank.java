package dev.sigmawalk.strategies.risk;

/**
 * When the models built on the sample matrix hand it on in low-rank form. A window of L rows
 * gives a sample matrix of rank at most L − 1, so with fewer rows than assets S = X̃'X̃/(L−1)
 * is carried by its L×n centred rows (8Ln bytes instead of 8n²) and every product with it costs
 * O(L n). The choice depends on L and n only, so a study always takes the same path.
 */
final class SampleRank {
    private SampleRank() {
    }

    /** Whether a window of {@code window} rows and {@code assets} assets takes the low-rank path: L &lt; n. */
    static boolean lowRank(int window, int assets) {
        return window < assets;
    }

    /**
     * Whether shrinkage takes the low-rank path, whose intensity needs an L×L Gram matrix of the
     * rows, O(L² n), at every rebalance: when 4L &lt; n. Against it stand the dense path's running
     * sums and n×n passes, about O(n²) a rebalance; at n = 2,000 on the benchmark machine the two
     * cost about the same near L = 500 (which therefore stays dense) and the Gram matrix costs
     * four times more at L = 1,000.
     */
    static boolean gramPays(int window, int assets) {
        return 4L * window < assets;
    }
}
