package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.model.WindowMoments;
import java.util.List;

/**
 * Every asset's single-index estimates of one window (Method §3, written out per Method §12), all
 * per period on excess returns: β_i = s_im / s_mm, α_i = x̄_i - β_i m̄ and the residual variance
 * d_i = S_ii - β_i² s_mm (divisor L - 1), so a user can compare them with known truth.
 *
 * @param assets asset ids, in the order of the arrays
 * @param alpha α_i per period
 * @param beta β_i
 * @param residualVariance d_i per period
 */
public record SingleIndexEstimates(List<String> assets, double[] alpha, double[] beta, double[] residualVariance) {
    public SingleIndexEstimates {
        assets = List.copyOf(assets);
        if (alpha.length != assets.size() || beta.length != assets.size() || residualVariance.length != assets.size()) {
            throw new IllegalArgumentException("estimates of " + assets.size() + " assets need as many α, β and d ("
                    + alpha.length + ", " + beta.length + ", " + residualVariance.length + ")");
        }
    }

    /**
     * @param moments the window's moments, with s_mm > 0
     * @param assets ids in the moments' order
     */
    public static SingleIndexEstimates of(WindowMoments moments, List<String> assets) {
        int n = moments.assets();
        if (assets.size() != n) {
            throw new IllegalArgumentException("asset ids (" + assets.size() + ") must match the moments' n (" + n + ")");
        }
        double smm = moments.marketVariance();
        if (!(smm > 0) || Double.isInfinite(smm)) {
            throw new IllegalArgumentException("market variance (" + smm + ") must be finite and > 0 for β");
        }
        double[] alpha = new double[n];
        double[] beta = new double[n];
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            beta[i] = moments.marketCovariance()[i] / smm;
            alpha[i] = moments.mean()[i] - beta[i] * moments.marketMean();
            d[i] = moments.covariance(i, i) - beta[i] * beta[i] * smm;
        }
        return new SingleIndexEstimates(assets, alpha, beta, d);
    }
}
