package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.CovarianceEstimate;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.DenseProof;

import java.util.OptionalDouble;

/**
 * Ledoit &amp; Wolf (2020) analytical nonlinear shrinkage (Method §11): the sample matrix of the
 * demeaned window, S = X̃'X̃/N with N = L - 1, keeps its eigenvectors U and each eigenvalue is
 * replaced by {@link AnalyticalShrinkage#shrink}. With n ≤ N, Σ = U diag(d̃) U'. With n &gt; N
 * only the N non-null eigenpairs are computed (through the L×L dual, {@link SampleEigen}) and the
 * n - N null directions all get d̃_0: Σ = U_N diag(d̃) U_N' + d̃_0 (I - U_N U_N'). Σ is positive
 * definite whenever every d̃ is positive. Its diagonal is not S's. Cost O(min(n, L)³ + n² min(n, N)).
 */
public record NonlinearShrinkageRiskModel() implements RiskModel {
    /** Method §11: with n &gt; N the formula for H̃(0) needs √5 N^(-1/3) &lt; 1, that is L ≥ 13. */
    public static final int SHORTEST_WIDE_WINDOW = 13;

    /**
     * @throws IllegalArgumentException when a used sample eigenvalue is not positive, or when
     *                                  n &gt; L - 1 and L &lt; 13
     */
    @Override
    public CovarianceEstimate estimate(EstimationWindow window) {
        CentredWindow centred = new CentredWindow(window);
        int n = centred.assets();
        int sampleSize = centred.length() - 1;
        if (n > sampleSize && centred.length() < SHORTEST_WIDE_WINDOW) {
            throw new IllegalArgumentException("nonlinear shrinkage with n (" + n + ") > L - 1 (" + sampleSize
                    + ") needs a window of at least " + SHORTEST_WIDE_WINDOW + " rows, not " + centred.length());
        }
        int m = Math.min(n, sampleSize);
        SampleEigen eigen = SampleEigen.largest(centred, m);
        double[] shrunk = AnalyticalShrinkage.shrink(eigen.values(), n, sampleSize);
        double floor = n > sampleSize ? shrunk[m] : 0.0;
        return new DenseCovariance(n, assemble(eigen, shrunk, floor), OptionalDouble.empty(), DenseProof.UNPROVEN);
    }

    /** floor·I + U diag(d̃ - floor) U', upper triangle then mirrored, so it is exactly symmetric. */
    private static double[] assemble(SampleEigen eigen, double[] shrunk, double floor) {
        int n = eigen.assets();
        int m = eigen.count();
        double[] u = eigen.vectors();
        double[] scaled = new double[n * m];
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < m; a++) {
                scaled[i * m + a] = u[i * m + a] * (shrunk[a] - floor);
            }
        }
        double[] s = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double v = 0;
                for (int a = 0; a < m; a++) {
                    v += scaled[i * m + a] * u[j * m + a];
                }
                s[i * n + j] = v;
                s[j * n + i] = v;
            }
            s[i * n + i] += floor;
        }
        return s;
    }

    /** Only when n ≤ L: with more assets than rows the eigenpairs come from the L×L dual ({@link SampleEigen}). */
    @Override
    public boolean needsDenseMoments(int window, int assets) {
        return assets <= window;
    }

    @Override
    public String label() {
        return "nonlinear shrinkage";
    }
}
