package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.moments.CrossProducts;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The standardised market-model residuals of one window, z_i = e_i / ‖e_i‖ (L values per asset,
 * stored time-major: z[t*n + i]), so that ρ_ij = z_i · z_j is the residual correlation of
 * Method §8. Every statistic that is a sum over pairs follows from sum identities without an
 * n×n matrix:
 * <pre>
 *   Σ_{i&lt;j} ρ_ij        = (‖Σ_i z_i‖² − Σ_i ‖z_i‖²) / 2                    O(L n)
 *   Σ_{i&lt;j} ρ_ij²       = (‖Z Z'‖_F² − Σ_i ‖z_i‖⁴) / 2,  Z Z' the L×L Gram   O(L² n)
 *   Σ_{i∈g, j∈h} ρ_ij   = Σ_t s_tg s_th,  s_tg = Σ_{i∈g} z_ti   (g ≠ h)      O(L n + L s²)
 * </pre>
 * (‖Z'Z‖_F = ‖Z Z'‖_F; the within-sector sum is the g = h case less Σ_{i∈g} ‖z_i‖², halved).
 * When L ≥ n the n×n side is the smaller one and Σ ρ² is summed pair by pair instead. Only the
 * mean |ρ| and the largest pairs need every pair: {@link #scan}.
 *
 * <p>Results agree with the pair-by-pair sums of {@link ResidualCorrelations} to rounding
 * (the correlations themselves are not clamped here; |ρ| exceeds 1 by at most a rounding step).
 */
public final class ResidualRows {
    private final List<String> assets;
    private final int length;
    private final double[] z;
    private final double[] squaredNorms;

    private ResidualRows(List<String> assets, int length, double[] z, double[] squaredNorms) {
        this.assets = assets;
        this.length = length;
        this.z = z;
        this.squaredNorms = squaredNorms;
    }

    /**
     * @param assets asset ids, n >= 2
     * @param length L
     * @param z L×n row-major standardised residuals (owned from here on)
     */
    static ResidualRows of(List<String> assets, int length, double[] z) {
        int n = assets.size();
        if (!(n >= 2) || !(length >= 1) || z.length != length * n) {
            throw new IllegalArgumentException("standardised residuals of " + n + " assets over " + length
                    + " rows need n >= 2 and L*n values, got " + z.length);
        }
        double[] norms = new double[n];
        for (int t = 0; t < length; t++) {
            int row = t * n;
            for (int i = 0; i < n; i++) {
                norms[i] += z[row + i] * z[row + i];
            }
        }
        return new ResidualRows(List.copyOf(assets), length, z, norms);
    }

    /** Asset ids, in the order of the indices used here. */
    public List<String> assets() {
        return assets;
    }

    /** n. */
    public int assetCount() {
        return assets.size();
    }

    /** L. */
    public int length() {
        return length;
    }

    /** ρ_ij = z_i · z_j, O(L); 1 up to rounding on the diagonal. */
    public double correlation(int i, int j) {
        int n = assets.size();
        Objects.checkIndex(i, n);
        Objects.checkIndex(j, n);
        double s = 0;
        for (int t = 0; t < length; t++) {
            s += z[t * n + i] * z[t * n + j];
        }
        return s;
    }

    /** Σ_{i&lt;j} ρ_ij from the row sums of Z, O(L n). */
    public double sumOfCorrelations() {
        int n = assets.size();
        double total = 0;
        for (int t = 0; t < length; t++) {
            int row = t * n;
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += z[row + i];
            }
            total += s * s;
        }
        double diagonal = 0;
        for (double v : squaredNorms) {
            diagonal += v;
        }
        return (total - diagonal) / 2;
    }

    /** Σ_{i&lt;j} ρ_ij², through whichever Gram matrix (L×L or n×n) is the smaller. */
    public double sumOfSquaredCorrelations() {
        int n = assets.size();
        if (length < n) {
            return (gramSquaredNorm() - fourthPowers()) / 2;
        }
        return PairScan.of(this, 0).sumOfSquares();
    }

    /** ‖Z Z'‖_F² from the upper triangle of the L×L Gram matrix (off-diagonal entries count twice). */
    private double gramSquaredNorm() {
        int n = assets.size();
        double[] byAsset = new double[n * length];
        for (int t = 0; t < length; t++) {
            int row = t * n;
            for (int i = 0; i < n; i++) {
                byAsset[i * length + t] = z[row + i];
            }
        }
        double[] gram = new double[length * length];
        CrossProducts.accumulate(byAsset, byAsset, n, length, gram);
        double sum = 0;
        for (int s = 0; s < length; s++) {
            int row = s * length;
            sum += gram[row + s] * gram[row + s];
            double off = 0;
            for (int t = s + 1; t < length; t++) {
                off += gram[row + t] * gram[row + t];
            }
            sum += 2 * off;
        }
        return sum;
    }

    private double fourthPowers() {
        double sum = 0;
        for (double v : squaredNorms) {
            sum += v * v;
        }
        return sum;
    }

    /**
     * Breusch-Pagan LM, Pesaran CD and the bias-adjusted LM from the sum identities (Method §8);
     * the mean |ρ| is not computed here (NaN, see {@link ResidualDiagnostics#hasMeanAbsCorrelation}).
     */
    public ResidualDiagnostics diagnostics() {
        return ResidualDiagnostics.fromSums(assets.size(), length, sumOfCorrelations(), sumOfSquaredCorrelations(),
                Double.NaN);
    }

    /**
     * Every pair once, O(L n²/2) in tiles, never holding an n×n matrix: the mean |ρ|, Σ ρ² and the
     * k pairs with the largest ρ.
     */
    public PairScan scan(int largest) {
        return PairScan.of(this, largest);
    }

    /**
     * Mean residual correlation within and between sectors from the sectors' sums of z, without
     * visiting pairs.
     *
     * @param sectorOf sector of every asset of the window
     */
    public SectorCoMovement bySector(Map<String, String> sectorOf) {
        SectorIndex index = SectorIndex.of(assets, sectorOf);
        int n = assets.size();
        int s = index.sectors();
        double[] cells = new double[s * s];
        double[] sums = new double[s];
        for (int t = 0; t < length; t++) {
            java.util.Arrays.fill(sums, 0.0);
            int row = t * n;
            for (int i = 0; i < n; i++) {
                sums[index.of(i)] += z[row + i];
            }
            for (int g = 0; g < s; g++) {
                double sg = sums[g];
                for (int h = g; h < s; h++) {
                    cells[g * s + h] += sg * sums[h];
                }
            }
        }
        double[] own = new double[s];
        for (int i = 0; i < n; i++) {
            own[index.of(i)] += squaredNorms[i];
        }
        for (int g = 0; g < s; g++) {
            cells[g * s + g] = (cells[g * s + g] - own[g]) / 2;
        }
        return SectorCoMovement.fromCells(index, cells);
    }

    /** z_ti (package use: the pair scan reads the rows directly). */
    double[] values() {
        return z;
    }
}
