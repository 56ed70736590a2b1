package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

/**
 * A literal, pair-by-pair rendering of the Ledoit-Wolf intensity estimators, written
 * independently of the production code: it recomputes every moment from the raw window with
 * divisor L and loops over t for each pair (i, j) exactly as the papers write the sums, O(L n²).
 * Used to check the O(L n) rearrangements in {@link ShrinkageIntensity} and
 * {@link ProductVariances}.
 */
final class PaperFormulas {
    private final int n;
    private final int len;
    private final double[][] x;
    private final double[] y;
    private final double[][] s;
    private final double[] si0;
    private final double s00;

    PaperFormulas(EstimationWindow w) {
        n = w.assetCount();
        len = w.length();
        x = new double[len][n];
        y = new double[len];
        for (int i = 0; i < n; i++) {
            double mean = 0;
            for (int t = 0; t < len; t++) {
                mean += w.excessReturns()[t * n + i] / len;
            }
            for (int t = 0; t < len; t++) {
                x[t][i] = w.excessReturns()[t * n + i] - mean;
            }
        }
        double mMean = 0;
        for (int t = 0; t < len; t++) {
            mMean += w.marketExcess()[t] / len;
        }
        for (int t = 0; t < len; t++) {
            y[t] = w.marketExcess()[t] - mMean;
        }
        s = new double[n][n];
        si0 = new double[n];
        double v = 0;
        for (int t = 0; t < len; t++) {
            v += y[t] * y[t] / len;
            for (int i = 0; i < n; i++) {
                si0[i] += x[t][i] * y[t] / len;
                for (int j = 0; j < n; j++) {
                    s[i][j] += x[t][i] * x[t][j] / len;
                }
            }
        }
        s00 = v;
    }

    /** π̂_ij = 1/L Σ_t (x̃_ti x̃_tj - s_ij)². */
    double pi(int i, int j) {
        double sum = 0;
        for (int t = 0; t < len; t++) {
            double d = x[t][i] * x[t][j] - s[i][j];
            sum += d * d;
        }
        return sum / len;
    }

    double piTotal() {
        double sum = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                sum += pi(i, j);
            }
        }
        return sum;
    }

    double piDiagonal() {
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += pi(i, i);
        }
        return sum;
    }

    /** Ledoit &amp; Wolf (2003) δ with f_ij = s_i0 s_j0 / s_00 off the diagonal, f_ii = s_ii. */
    double singleIndexDelta() {
        double rho = 0;
        double gamma = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double f = i == j ? s[i][i] : si0[i] * si0[j] / s00;
                gamma += (f - s[i][j]) * (f - s[i][j]);
                if (i == j) {
                    rho += pi(i, i);
                    continue;
                }
                double sum = 0;
                for (int t = 0; t < len; t++) {
                    sum += (si0[j] * s00 * x[t][i] + si0[i] * s00 * x[t][j] - si0[i] * si0[j] * y[t]) * y[t] * x[t][i]
                            * x[t][j] / (s00 * s00) - f * s[i][j];
                }
                rho += sum / len;
            }
        }
        return clip((piTotal() - rho) / gamma / len);
    }

    /** Ledoit &amp; Wolf (2004, JPM) δ toward F_ij = r̄ √(s_ii s_jj). */
    double constantCorrelationDelta() {
        double rBar = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j) {
                    rBar += s[i][j] / Math.sqrt(s[i][i] * s[j][j]) / (n * (n - 1.0));
                }
            }
        }
        double rho = 0;
        double gamma = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double f = i == j ? s[i][i] : rBar * Math.sqrt(s[i][i] * s[j][j]);
                gamma += (f - s[i][j]) * (f - s[i][j]);
                if (i == j) {
                    rho += pi(i, i);
                } else {
                    rho += rBar / 2 * (Math.sqrt(s[j][j] / s[i][i]) * theta(i, j) + Math.sqrt(s[i][i] / s[j][j])
                            * theta(j, i));
                }
            }
        }
        return clip((piTotal() - rho) / gamma / len);
    }

    /** ϑ̂_ii,ij = 1/L Σ_t (x̃_ti² - s_ii)(x̃_ti x̃_tj - s_ij). */
    private double theta(int i, int j) {
        double sum = 0;
        for (int t = 0; t < len; t++) {
            sum += (x[t][i] * x[t][i] - s[i][i]) * (x[t][i] * x[t][j] - s[i][j]);
        }
        return sum / len;
    }

    /** Ledoit &amp; Wolf (2004, JMVA) δ = min(b̄², d²)/d² in the norm ‖A‖² = tr(AA')/n. */
    double identityDelta() {
        double m = 0;
        for (int i = 0; i < n; i++) {
            m += s[i][i] / n;
        }
        double d2 = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double diff = s[i][j] - (i == j ? m : 0);
                d2 += diff * diff / n;
            }
        }
        double b2 = 0;
        for (int t = 0; t < len; t++) {
            double norm = 0;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double diff = x[t][i] * x[t][j] - s[i][j];
                    norm += diff * diff / n;
                }
            }
            b2 += norm / ((double) len * len);
        }
        return Math.min(b2, d2) / d2;
    }

    private static double clip(double delta) {
        return Math.max(0, Math.min(1, delta));
    }
}
