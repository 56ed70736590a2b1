package dev.sigmawalk.strategies.risk;

/**
 * The O(L n) sums over a window's centred rows that the Ledoit-Wolf intensities share (Method §3),
 * for weights a_i (the divisor-L s_i0 of the single-index target, or zeros): with
 * c_t = Σ_i a_i x̃_ti and q_t = Σ_i x̃_ti²,
 * <ul>
 *   <li>cross = Σ_t ỹ_t Σ_i x̃_ti² (c_t − a_i x̃_ti) = Σ_t ỹ_t c_t q_t − Σ_i a_i Σ_t ỹ_t x̃_ti³;</li>
 *   <li>market = Σ_t ỹ_t² (c_t² − Σ_i a_i² x̃_ti²) = Σ_t ỹ_t² c_t² − Σ_i a_i² Σ_t ỹ_t² x̃_ti²;</li>
 *   <li>targetTimesSample = Σ_t (c_t² − Σ_i a_i² x̃_ti²);</li>
 *   <li>squaredNorms = Σ_t q_t², fourthPowers = Σ_t Σ_i x̃_ti⁴ and ownSquares_i = Σ_t x̃_ti².</li>
 * </ul>
 * The right-hand forms split every sum into two per-row reductions (c_t and q_t) and four
 * per-asset sums over t. The per-asset sums are elementwise updates of arrays along a row, which
 * the JIT compiles to SIMD instructions, and the two reductions run in four interleaved partial
 * sums, so one sweep of the rows costs a few cycles per entry rather than waiting on six chains
 * of dependent additions. The order is fixed: the same result on every run.
 */
record CentredRowSums(double cross, double market, double targetTimesSample, double squaredNorms,
                      double fourthPowers, double[] ownSquares) {

    /** @param a the weights a_i, length n */
    static CentredRowSums of(CentredWindow w, double[] a) {
        int n = w.assets();
        if (a.length != n) {
            throw new IllegalArgumentException("weights (" + a.length + ") must have length n (" + n + ")");
        }
        double[] x = new double[n];
        double[] own = new double[n];
        double[] fourth = new double[n];
        double[] marketCubes = new double[n];
        double[] marketSquares = new double[n];
        double[] row = new double[2];
        double rowCross = 0;
        double rowMarket = 0;
        double rowTarget = 0;
        double squaredNorms = 0;
        for (int t = 0; t < w.length(); t++) {
            double y = w.row(t, x);
            double yy = y * y;
            for (int i = 0; i < n; i++) {
                double xi = x[i];
                double sq = xi * xi;
                own[i] += sq;
                fourth[i] += sq * sq;
                marketCubes[i] += (y * xi) * sq;
                marketSquares[i] += yy * sq;
            }
            reductions(x, a, row);
            double ct = row[0];
            double q = row[1];
            rowCross += y * (ct * q);
            rowMarket += yy * (ct * ct);
            rowTarget += ct * ct;
            squaredNorms += q * q;
        }
        double cubes = 0;
        double squares = 0;
        double ownWeighted = 0;
        double fourthPowers = 0;
        for (int i = 0; i < n; i++) {
            double ai = a[i];
            cubes += ai * marketCubes[i];
            squares += ai * ai * marketSquares[i];
            ownWeighted += ai * ai * own[i];
            fourthPowers += fourth[i];
        }
        return new CentredRowSums(rowCross - cubes, rowMarket - squares, rowTarget - ownWeighted, squaredNorms,
                fourthPowers, own);
    }

    /** out[0] = Σ_i a_i x_i and out[1] = Σ_i x_i², each in four partial sums. */
    private static void reductions(double[] x, double[] a, double[] out) {
        int n = x.length;
        double c0 = 0;
        double c1 = 0;
        double c2 = 0;
        double c3 = 0;
        double q0 = 0;
        double q1 = 0;
        double q2 = 0;
        double q3 = 0;
        int i = 0;
        for (; i + 4 <= n; i += 4) {
            double x0 = x[i];
            double x1 = x[i + 1];
            double x2 = x[i + 2];
            double x3 = x[i + 3];
            c0 += a[i] * x0;
            c1 += a[i + 1] * x1;
            c2 += a[i + 2] * x2;
            c3 += a[i + 3] * x3;
            q0 += x0 * x0;
            q1 += x1 * x1;
            q2 += x2 * x2;
            q3 += x3 * x3;
        }
        for (; i < n; i++) {
            c0 += a[i] * x[i];
            q0 += x[i] * x[i];
        }
        out[0] = (c0 + c1) + (c2 + c3);
        out[1] = (q0 + q1) + (q2 + q3);
    }

    /** Σ_i s_ii² with divisor-L variances from the rows. */
    double ownVarianceSquares(int len) {
        double sum = 0;
        for (double v : ownSquares) {
            double sii = v / len;
            sum += sii * sii;
        }
        return sum;
    }
}
