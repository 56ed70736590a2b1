package dev.sigmawalk.strategies.risk;

/**
 * When the models built on the sample matrix hand it on in low-rank form. A window of L rows
 * gives a sample matrix of rank at most L − 1, so with far fewer rows than assets S = X̃'X̃/(L−1)
 * is carried by its L×n centred rows (8Ln bytes instead of 8n²) and every product with it costs
 * O(L n). The choice depends on L and n only, so a study always takes the same path.
 */
final class SampleRank {
    private SampleRank() {
    }

    /**
     * Whether a window of {@code window} rows and {@code assets} assets takes the low-rank path:
     * when 4L &lt; n. S has rank below n as soon as L &lt; n, but the low-rank forms cost work of
     * their own at every rebalance: shrinkage's intensity needs an L×L Gram matrix of the rows,
     * O(L² n), and the screened solve of the singular sample matrix builds |S|×|S| blocks at
     * O(|S|² L), against the dense path's running sums and n×n passes, about O(n²) a rebalance.
     * At n = 2,000 on the benchmark machine the two cost about the same near L = 500 (which
     * therefore stays dense) and the low-rank forms cost several times more at L = 1,000.
     */
    static boolean lowRank(int window, int assets) {
        return 4L * window < assets;
    }
}
