package dev.sigmawalk.strategies.risk;

/**
 * The four sums over the n×n sample matrix S that the dense single-index shrinkage intensity
 * needs (Ledoit &amp; Wolf 2003, J. Empirical Finance, appendix; Method §3), taken in one read of
 * the upper triangle of S with the target computed on the fly, f_ij = s_mm β_i β_j for i ≠ j and
 * f_ii = s_ii, exactly as {@link SingleIndexCovariance#dense()} builds its off-diagonal entries.
 * All four are in the units of S (divisor L-1); multiply by ((L-1)/L)² for the papers' divisor-L
 * moments.
 *
 * <p>S is symmetric, so a sum over all (i, j) is the diagonal plus twice the strict upper
 * triangle, and the target never has to be stored: the intensity costs one pass over half of S
 * instead of building F and sweeping F and S several times. Each row's sums run in four
 * interleaved partial sums so that the additions pipeline rather than wait on each other; the
 * order is fixed, so the result is the same on every run.
 *
 * @param sampleSquares     Σ_ij s_ij²
 * @param diagonalSquares   Σ_i s_ii²
 * @param targetTimesSample Σ_{i≠j} f_ij s_ij
 * @param distance          Σ_ij (f_ij - s_ij)² (the diagonal adds nothing, f_ii = s_ii)
 */
record SingleIndexTargetSums(double sampleSquares, double diagonalSquares, double targetTimesSample,
                             double distance) {

    /**
     * @param s              S, n×n row-major, symmetric
     * @param n              assets
     * @param marketVariance s_mm
     * @param beta           β_i = s_im / s_mm, length n
     */
    static SingleIndexTargetSums of(double[] s, int n, double marketVariance, double[] beta) {
        if (s.length != n * n || beta.length != n) {
            throw new IllegalArgumentException("sample matrix (" + s.length + " values) and loadings (" + beta.length
                    + ") must match n = " + n);
        }
        double upperSquares = 0;
        double diagonal = 0;
        double upperProducts = 0;
        double upperDistance = 0;
        double[] row = new double[3];
        for (int i = 0; i < n; i++) {
            int at = i * n;
            double sii = s[at + i];
            diagonal += sii * sii;
            upperRow(s, i, n, marketVariance, beta, row);
            upperSquares += row[0];
            upperProducts += beta[i] * row[1];
            upperDistance += row[2];
        }
        return new SingleIndexTargetSums(diagonal + 2 * upperSquares, diagonal,
                2 * marketVariance * upperProducts, 2 * upperDistance);
    }

    /**
     * For row i of S right of the diagonal: out[0] = Σ_j s_ij², out[1] = Σ_j β_j s_ij and
     * out[2] = Σ_j (s_mm β_i β_j - s_ij)², each in four partial sums.
     */
    private static void upperRow(double[] s, int i, int n, double smm, double[] beta, double[] out) {
        int at = i * n;
        double bi = beta[i];
        double q0 = 0;
        double q1 = 0;
        double q2 = 0;
        double q3 = 0;
        double p0 = 0;
        double p1 = 0;
        double p2 = 0;
        double p3 = 0;
        double d0 = 0;
        double d1 = 0;
        double d2 = 0;
        double d3 = 0;
        int j = i + 1;
        for (; j + 4 <= n; j += 4) {
            double v0 = s[at + j];
            double v1 = s[at + j + 1];
            double v2 = s[at + j + 2];
            double v3 = s[at + j + 3];
            // s_mm (β_i β_j), the same rounding as the target's stored entries.
            double e0 = smm * (bi * beta[j]) - v0;
            double e1 = smm * (bi * beta[j + 1]) - v1;
            double e2 = smm * (bi * beta[j + 2]) - v2;
            double e3 = smm * (bi * beta[j + 3]) - v3;
            q0 += v0 * v0;
            q1 += v1 * v1;
            q2 += v2 * v2;
            q3 += v3 * v3;
            p0 += beta[j] * v0;
            p1 += beta[j + 1] * v1;
            p2 += beta[j + 2] * v2;
            p3 += beta[j + 3] * v3;
            d0 += e0 * e0;
            d1 += e1 * e1;
            d2 += e2 * e2;
            d3 += e3 * e3;
        }
        for (; j < n; j++) {
            double v = s[at + j];
            double e = smm * (bi * beta[j]) - v;
            q0 += v * v;
            p0 += beta[j] * v;
            d0 += e * e;
        }
        out[0] = (q0 + q1) + (q2 + q3);
        out[1] = (p0 + p1) + (p2 + p3);
        out[2] = (d0 + d1) + (d2 + d3);
    }
}
