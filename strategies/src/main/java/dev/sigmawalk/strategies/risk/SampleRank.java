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
}
