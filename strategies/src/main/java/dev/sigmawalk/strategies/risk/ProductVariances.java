package dev.sigmawalk.strategies.risk;

/**
 * π̂, the sum over all pairs of the estimated asymptotic variances of √L s_ij, and its diagonal
 * part, as defined in Ledoit &amp; Wolf (2003, J. Empirical Finance, appendix) and Ledoit &amp; Wolf
 * (2004, J. Portfolio Management, appendix):
 * π̂_ij = 1/L Σ_t (x̃_ti x̃_tj - s_ij)², with s_ij = 1/L Σ_t x̃_ti x̃_tj.
 *
 * <p>Because the mean of x̃_ti x̃_tj over t is s_ij, each π̂_ij equals 1/L Σ_t (x̃_ti x̃_tj)² - s_ij²,
 * so summing over i and j gives π̂ = 1/L Σ_t (Σ_i x̃_ti²)² - Σ_ij s_ij², and the diagonal part
 * Σ_i π̂_ii = 1/L Σ_t Σ_i x̃_ti⁴ - Σ_i s_ii². Both cost O(L n + n²) instead of O(L n²).
 *
 * @param total    π̂ = Σ_ij π̂_ij (divisor-L moments)
 * @param diagonal Σ_i π̂_ii
 */
record ProductVariances(double total, double diagonal) {

    static ProductVariances of(CentredWindow window) {
        int n = window.assets();
        int len = window.length();
        double[] x = new double[n];
        double squaredNorms = 0;
        double fourthPowers = 0;
        for (int t = 0; t < len; t++) {
            window.row(t, x);
            double norm = 0;
            for (int i = 0; i < n; i++) {
                double sq = x[i] * x[i];
                norm += sq;
                fourthPowers += sq * sq;
            }
            squaredNorms += norm * norm;
        }
        double c = window.toPopulationDivisor();
        double[] s = window.moments().covariance();
        double sumSquares = 0;
        double diagSquares = 0;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            for (int j = 0; j < n; j++) {
                double sij = c * s[row + j];
                sumSquares += sij * sij;
            }
            double sii = c * s[row + i];
            diagSquares += sii * sii;
        }
        return new ProductVariances(squaredNorms / len - sumSquares, fourthPowers / len - diagSquares);
    }
}
