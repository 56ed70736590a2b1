package dev.sigmawalk.strategies.risk;

/**
 * Estimators of the optimal Ledoit-Wolf shrinkage intensity δ for Σ = δF + (1-δ)S, one per
 * target. All are computed on demeaned window data with divisor-L moments, as the papers define
 * them (Method §3): a divisor-(L-1) quantity q enters as q (L-1)/L. δ is scale-free, so it
 * applies unchanged to the divisor-(L-1) matrices the caller combines.
 *
 * <p>Common notation: x̃_ti and ỹ_t the demeaned asset and market excess returns; s_ij, s_i0,
 * s_00 the divisor-L moments; f_ij the target; π̂ from {@link ProductVariances};
 * γ̂ = Σ_ij (f_ij - s_ij)². For the first two targets κ̂ = (π̂ - ρ̂)/γ̂ and
 * δ = max(0, min(1, κ̂/L)). When the target equals the sample matrix (γ̂ = 0, or γ̂ below
 * {@link #SAME_AS_SAMPLE} times Σ_ij s_ij², a difference made by rounding alone) every δ gives the
 * same Σ; δ = 0 is then reported rather than a value decided by rounding noise. That happens for
 * example with the constant-correlation target and two assets, where r̄ is the one correlation.
 */
final class ShrinkageIntensity {
    /**
     * γ̂ / ‖S‖² at or below which the target counts as equal to S: a relative Frobenius distance
     * of 1e-12, a few hundred units of rounding in the entries of S.
     */
    static final double SAME_AS_SAMPLE = 1e-24;

    private ShrinkageIntensity() {
    }

    /**
     * Ledoit &amp; Wolf (2003, J. Empirical Finance), target F = Σ_SI. From the paper's appendix:
     * ρ̂_ii = π̂_ii and, for i ≠ j, ρ̂_ij = 1/L Σ_t r_tij with
     * r_tij = (s_j0 s_00 x̃_ti + s_i0 s_00 x̃_tj - s_i0 s_j0 ỹ_t) ỹ_t x̃_ti x̃_tj / s_00² - f_ij s_ij.
     *
     * <p>Summed over i ≠ j (the first two terms are equal after swapping i and j), with
     * c_t = Σ_j s_j0 x̃_tj:
     * Σ_{i≠j} ρ̂_ij = (2/s_00) 1/L Σ_t ỹ_t Σ_i x̃_ti² (c_t - s_i0 x̃_ti)
     * - (1/s_00²) 1/L Σ_t ỹ_t² (c_t² - Σ_i s_i0² x̃_ti²) - Σ_{i≠j} f_ij s_ij, which is O(L n + n²).
     * π̂ comes from the same sweep of the rows and the same sums over S as in
     * {@link ProductVariances}: π̂ = 1/L Σ_t (Σ_i x̃_ti²)² - Σ_ij s_ij². One pass over the rows
     * ({@link CentredRowSums}) and one over the upper triangle of S ({@link SingleIndexTargetSums}) give
     * every term.
     *
     * @param sums the sums over S and the target F (F_ii = S_ii), divisor L-1
     */
    static double singleIndex(CentredWindow w, SingleIndexTargetSums sums) {
        int len = w.length();
        double c = w.toPopulationDivisor();
        double cc = c * c;
        double s00 = c * w.moments().marketVariance();
        double[] sim = w.moments().marketCovariance();
        double[] si0 = new double[sim.length];
        for (int i = 0; i < si0.length; i++) {
            si0[i] = c * sim[i];
        }
        CentredRowSums rows = CentredRowSums.of(w, si0);
        double normS = cc * sums.sampleSquares();
        double pi = rows.squaredNorms() / len - normS;
        double piDiagonal = rows.fourthPowers() / len - cc * sums.diagonalSquares();
        double rhoOff = 2.0 / s00 * rows.cross() / len - rows.market() / (s00 * s00 * len)
                - cc * sums.targetTimesSample();
        return fromKappa(pi, piDiagonal + rhoOff, finiteDistance(cc * sums.distance()), normS, len);
    }

    /**
     * Ledoit &amp; Wolf (2004, J. Portfolio Management, appendix on the optimal intensity),
     * constant-correlation target:
     * ρ̂ = Σ_i π̂_ii + Σ_{i≠j} (r̄/2)(√(s_jj/s_ii) ϑ̂_ii,ij + √(s_ii/s_jj) ϑ̂_jj,ij) with
     * ϑ̂_ii,ij = 1/L Σ_t (x̃_ti² - s_ii)(x̃_ti x̃_tj - s_ij) = 1/L Σ_t x̃_ti³ x̃_tj - s_ii s_ij.
     *
     * <p>The two halves are equal after swapping i and j, and with g_t = Σ_j √s_jj x̃_tj:
     * Σ_{i≠j} √(s_jj/s_ii) ϑ̂_ii,ij = 1/L Σ_t [(Σ_i x̃_ti³/√s_ii) g_t - Σ_i x̃_ti⁴]
     * - Σ_{i≠j} √(s_ii s_jj) s_ij, which is O(L n + n²).
     *
     * @param meanCorrelation r̄ (scale-free)
     * @param target          F with divisor L-1
     */
    static double constantCorrelation(CentredWindow w, double meanCorrelation, double[] target, ProductVariances pi) {
        int n = w.assets();
        int len = w.length();
        double c = w.toPopulationDivisor();
        double[] s = w.moments().covariance();
        double[] sd = new double[n];
        for (int i = 0; i < n; i++) {
            sd[i] = Math.sqrt(c * s[i * n + i]);
        }
        double[] x = new double[n];
        double fourth = 0;
        for (int t = 0; t < len; t++) {
            w.row(t, x);
            double g = 0;
            double cubes = 0;
            for (int i = 0; i < n; i++) {
                double xi = x[i];
                g += sd[i] * xi;
                cubes += xi * xi * xi / sd[i];
                fourth -= xi * xi * xi * xi;
            }
            fourth += cubes * g;
        }
        double scaled = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j) {
                    scaled += sd[i] * sd[j] * c * s[i * n + j];
                }
            }
        }
        double rhoOff = meanCorrelation * (fourth / len - scaled);
        return fromKappa(w, pi.total(), pi.diagonal() + rhoOff, gamma(w, target));
    }

    /**
     * Ledoit &amp; Wolf (2004, J. Multivariate Analysis, section 3, the consistent estimators of m, d²,
     * b̄² and b²), target F = m I with m = tr(S)/n. In the paper's norm ‖A‖² = tr(AA')/n: d² = ‖S - mI‖² = γ̂/n,
     * b̄² = 1/L² Σ_t ‖x̃_t x̃_t' - S‖² = π̂/(nL), b² = min(b̄², d²) and δ = b²/d², the weight of mI
     * in the paper's estimator (b²/d²) mI + (a²/d²) S; it lies in [0, 1] by construction.
     *
     * @param target F = (tr S / n) I with divisor L-1
     */
    static double identity(CentredWindow w, double[] target, ProductVariances pi) {
        int n = w.assets();
        double gamma = gamma(w, target);
        if (sameAsSample(w, gamma)) {
            return 0.0;
        }
        double dSquared = gamma / n;
        double bBarSquared = Math.max(0.0, pi.total()) / ((double) n * w.length());
        return Math.min(bBarSquared, dSquared) / dSquared;
    }

    /** γ̂ = Σ_ij (f_ij - s_ij)² with divisor-L moments. */
    private static double gamma(CentredWindow w, double[] target) {
        double c = w.toPopulationDivisor();
        double[] s = w.moments().covariance();
        double sum = 0;
        for (int k = 0; k < s.length; k++) {
            double diff = c * (target[k] - s[k]);
            sum += diff * diff;
        }
        return finiteDistance(sum);
    }

    /** γ̂ itself, or an ArithmeticException when it is not finite. */
    private static double finiteDistance(double gamma) {
        if (!Double.isFinite(gamma)) {
            throw new ArithmeticException("distance between shrinkage target and sample matrix (" + gamma
                    + ") must be finite");
        }
        return gamma;
    }

    /** True when γ̂ ≤ {@link #SAME_AS_SAMPLE} Σ_ij s_ij² (divisor-L moments throughout). */
    private static boolean sameAsSample(CentredWindow w, double gamma) {
        return sameAsSample(gamma, sampleNormSquared(w));
    }

    /** True when γ̂ ≤ {@link #SAME_AS_SAMPLE} ‖S‖², both with divisor-L moments. */
    private static boolean sameAsSample(double gamma, double normSquared) {
        return !(gamma > SAME_AS_SAMPLE * normSquared);
    }

    /** Σ_ij s_ij² with divisor-L moments, from the dense S. */
    private static double sampleNormSquared(CentredWindow w) {
        double c = w.toPopulationDivisor();
        double norm = 0;
        for (double v : w.moments().covariance()) {
            norm += c * v * c * v;
        }
        return norm;
    }

    /** δ = max(0, min(1, κ̂/L)), κ̂ = (π̂ - ρ̂)/γ̂; 0 when the target equals S. */
    private static double fromKappa(CentredWindow w, double pi, double rho, double gamma) {
        return fromKappa(pi, rho, gamma, sampleNormSquared(w), w.length());
    }

    /** As {@link #fromKappa(CentredWindow, double, double, double)} with ‖S‖² (divisor L) given. */
    private static double fromKappa(double pi, double rho, double gamma, double normSquared, int length) {
        if (sameAsSample(gamma, normSquared)) {
            return 0.0;
        }
        double delta = (pi - rho) / gamma / length;
        if (Double.isNaN(delta)) {
            throw new ArithmeticException("shrinkage intensity is undefined (pi " + pi + ", rho " + rho
                    + ", gamma " + gamma + ")");
        }
        return Math.max(0.0, Math.min(1.0, delta));
    }

    /**
     * The single-index intensity of {@link #singleIndex} without the n×n matrices, for any L and
     * n: every O(n²) sum of the dense version becomes an O(L n) row sum or the squared norm of an
     * L×L Gram matrix ({@link CentredColumns#gramNormSquared}), O(L² n) in all.
     * <ul>
     *   <li>Σ_ij s_ij² = ‖X̃X̃'‖²/L², so π̂ = 1/L Σ_t (Σ_i x̃_ti²)² − ‖X̃X̃'‖²/L²;</li>
     *   <li>with a_i = s_i0, Σ_{i≠j} f_ij s_ij = (a'Sa − Σ_i a_i² s_ii)/s_00 and
     *       a'Sa = 1/L Σ_t c_t², c_t = Σ_i a_i x̃_ti;</li>
     *   <li>the target with its diagonal, aa'/s_00, equals X̃'PX̃/L with P = ỹỹ'/ỹ'ỹ, so
     *       S − aa'/s_00 = E'E/L with E = (I − P)X̃ the market-model residuals, and
     *       γ̂ = Σ_{i≠j} (e_i'e_j)²/L² = (‖EE'‖² − Σ_i (e_i'e_i)²)/L², a sum of squares of small
     *       numbers rather than a difference of large ones;</li>
     *   <li>X̃ = E + ỹβ' gives X̃X̃' = EE' + vỹ' + ỹv' + (β'β)ỹỹ' with v = Eβ, so one L×L Gram
     *       matrix serves both norms.</li>
     * </ul>
     */
    static double singleIndexGram(CentredWindow w, CentredColumns x) {
        int n = w.assets();
        int len = w.length();
        double c = w.toPopulationDivisor();
        double s00 = c * w.moments().marketVariance();
        double[] si0 = new double[n];
        double[] slope = new double[n];
        for (int i = 0; i < n; i++) {
            si0[i] = c * w.moments().marketCovariance()[i];
            slope[i] = si0[i] / s00;
        }
        CentredRowSums rows = CentredRowSums.of(w, si0);
        double[] e = x.residuals(slope);
        double[] h = CentredColumns.gram(e, n, len);
        double normS = CentredColumns.normSquared(CentredColumns.withMarket(h, e, slope, x.market(), n, len), len)
                / ((double) len * len);
        double pi = rows.squaredNorms() / len - normS;
        double piDiagonal = rows.fourthPowers() / len - rows.ownVarianceSquares(len);
        double rhoOff = 2.0 / s00 * rows.cross() / len - rows.market() / (s00 * s00 * len)
                - rows.targetTimesSample() / (s00 * len);
        double gamma = (CentredColumns.normSquared(h, len) - CentredColumns.ownNormsSquared(e, n, len))
                / ((double) len * len);
        return fromKappa(pi, piDiagonal + rhoOff, gamma, normS, len);
    }

    /**
     * The identity-target intensity of {@link #identity} without the n×n matrices: with
     * m_L = tr(S_L)/n, γ̂ = ‖S_L − m_L I‖² = ‖S_L‖² − n m_L², and ‖S_L‖² = ‖X̃X̃'‖²/L².
     */
    static double identityGram(CentredWindow w, CentredColumns x) {
        int n = w.assets();
        int len = w.length();
        CentredRowSums rows = CentredRowSums.of(w, new double[n]);
        double normS = CentredColumns.gramNormSquared(x.columns(), n, len) / ((double) len * len);
        double trace = 0;
        for (int i = 0; i < n; i++) {
            trace += rows.ownSquares()[i] / len;
        }
        double gamma = Math.max(0.0, normS - trace * trace / n);
        if (sameAsSample(gamma, normS)) {
            return 0.0;
        }
        double pi = rows.squaredNorms() / len - normS;
        double dSquared = gamma / n;
        double bBarSquared = Math.max(0.0, pi) / ((double) n * len);
        return Math.min(bBarSquared, dSquared) / dSquared;
    }
}
