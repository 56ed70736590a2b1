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

    /** The low-rank forms are taken with more than this many assets per row of the window. */
    static final int ASSETS_PER_ROW = 8;

    /**
     * Whether a window of {@code window} rows and {@code assets} assets takes the low-rank path:
     * when 8L &lt; n. S has rank below n as soon as L &lt; n, but the low-rank forms cost work of
     * their own at every rebalance that the dense path does not: shrinkage's intensity needs L×L
     * Gram matrices of the rows, O(L² n); the screened solve of the singular sample matrix builds
     * |S|×|S| blocks of L-term products, O(|S|² L) a round, through the same vectorised kernel
     * as the dense running sums; and once no model keeps the dense moments, the residual
     * evidence takes its own Gram matrices from the rows. Against that the dense path costs the
     * running sums and a few n×n passes, about O(n²) a rebalance. Measured as the CPU time of
     * whole studies (the three long-only minimum-variance strategies, one window length each,
     * every 21 rows): at n = 2,000 the low-rank forms cost 17 % less at L = 125, the same to
     * within the noise at L = 250, twice as much at L = 500 and four times as much at
     * L = 1,000; at n = 1,000 the same at L = 62 and 37 % more at L = 125. So the forms pay only
     * from about eight assets a row.
     */
    static boolean lowRank(int window, int assets) {
        return (long) ASSETS_PER_ROW * window < assets;
    }
}
