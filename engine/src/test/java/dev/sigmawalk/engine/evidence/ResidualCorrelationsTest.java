package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import org.junit.jupiter.api.Test;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ResidualCorrelationsTest {
    /** Relative tolerance for statistics against the reference values. */
    private static final double STATISTIC_RELATIVE = 1e-10;
    /** Absolute tolerance for p-values against scipy. */
    private static final double P_VALUE = 1e-9;
    /** Hand-computed values are exact decimals; rounding only. */
    private static final double HAND = 1e-12;
    /** Correlations against numpy on the same data. */
    private static final double CORRELATION = 1e-10;

    /**
     * The shared reference window (60 × 12): mean |ρ| 0.11804932183684894, Breusch-Pagan LM
     * 84.02820600005185 with 66 df and p 0.06650857500512354, Pesaran CD 0.7331503601798056 with
     * two-sided p 0.4634667275358153. Source: numpy 1.24.2 {@code corrcoef} of least-squares
     * residuals; p-values {@code scipy.stats.chi2.sf} and {@code 2 * scipy.stats.norm.sf} (scipy
     * 1.10.1), reference/values.json.
     */
    @Test
    void referenceWindow_matchesNumpyAndScipy() {
        ResidualDiagnostics d = ResidualCorrelations.of(ReferenceWindow.load()).diagnostics();
        assertEquals(12, d.assets());
        assertEquals(60, d.length());
        assertRelative(0.11804932183684894, d.meanAbsCorrelation(), "mean |rho|");
        assertRelative(84.02820600005185, d.lmStatistic(), "LM");
        assertEquals(66, d.lmDegreesOfFreedom());
        assertEquals(0.06650857500512354, d.lmPValue(), P_VALUE, "LM p-value");
        assertRelative(0.7331503601798056, d.cdStatistic(), "CD");
        assertEquals(0.4634667275358153, d.cdPValue(), P_VALUE, "CD p-value");
    }

    /**
     * Bias-adjusted LM (Pesaran, Ullah &amp; Yamagata 2008) on the reference window's residuals,
     * k = 2: 1.359794124772336, upper-tail p 0.0869475410723013. Source: numpy 1.24.2 from the
     * paper's exact moments, {@code lm_adj_stat_puy2008} and {@code lm_adj_pvalue_puy2008} in the
     * copied {@code values.json}.
     */
    @Test
    void referenceWindow_lmAdjMatchesNumpy() {
        ResidualDiagnostics d = ResidualCorrelations.of(ReferenceWindow.load()).diagnostics();
        assertTrue(d.hasLmAdj());
        assertRelative(1.359794124772336, d.lmAdjStatistic(), "LM_adj");
        assertEquals(0.0869475410723013, d.lmAdjPValue(), P_VALUE, "LM_adj p-value");
    }

    /**
     * Hand computation: s_mm = 1, s_im = (1, 1, 1), S = [[2, 1.5, 1], [1.5, 2, 1], [1, 1, 2]],
     * L = 10. Residual covariance S - s s'/s_mm = [[1, .5, 0], [.5, 1, 0], [0, 0, 1]], so
     * ρ12 = 0.5, ρ13 = ρ23 = 0; mean |ρ| = 0.5/3; LM = 10 · 0.25 = 2.5 on 3 df;
     * CD = √(20/6) · 0.5 = 0.9128709291752769. p-values 0.4752910833430205 and
     * 0.3613104285261787 from scipy.stats.chi2.sf(2.5, 3) and 2·scipy.stats.norm.sf(CD)
     * (scipy 1.17.1, computed for this test).
     */
    @Test
    void threeAssets_handComputedDiagnostics() {
        WindowMoments m = new WindowMoments(3, 10, new double[3], 0.0, 1.0, new double[] {1, 1, 1},
                new double[] {2, 1.5, 1, 1.5, 2, 1, 1, 1, 2});
        ResidualCorrelations rho = ResidualCorrelations.of(m, List.of("X1", "X2", "X3"));
        assertEquals(0.5, rho.correlation(0, 1), HAND, "rho12");
        assertEquals(0.5, rho.correlation(1, 0), HAND, "rho21");
        assertEquals(0.0, rho.correlation(0, 2), HAND, "rho13");
        assertEquals(0.0, rho.correlation(1, 2), HAND, "rho23");
        ResidualDiagnostics d = rho.diagnostics();
        assertEquals(0.5 / 3, d.meanAbsCorrelation(), HAND);
        assertEquals(2.5, d.lmStatistic(), HAND);
        assertEquals(3, d.lmDegreesOfFreedom());
        assertEquals(Math.sqrt(20.0 / 6.0) * 0.5, d.cdStatistic(), HAND);
        assertEquals(0.4752910833430205, d.lmPValue(), P_VALUE);
        assertEquals(0.3613104285261787, d.cdPValue(), P_VALUE);
        // LM_adj with d = 8, μ = 1, v = √(2·7/10): √(1/3) ((8·0.25 - 1) + 2 (0 - 1)) / v; p from
        // scipy.stats.norm.sf (scipy 1.17.1, computed for this test).
        assertEquals(-0.48795003647426655, d.lmAdjStatistic(), HAND);
        assertEquals(0.6872073842378373, d.lmAdjPValue(), P_VALUE);
    }

    /**
     * The moment shortcut cov(e_i, e_j) = S_ij - s_im s_jm / s_mm must equal the correlation of
     * residuals formed explicitly (e = x - α - βm with α, β by least squares), computed here
     * loop by loop from the raw window.
     */
    @Test
    void momentShortcut_equalsExplicitResiduals() {
        EstimationWindow w = ReferenceWindow.load();
        ResidualCorrelations rho = ResidualCorrelations.of(w);
        double[][] e = explicitResiduals(w);
        int n = w.assetCount();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                assertEquals(correlation(e[i], e[j]), rho.correlation(i, j), CORRELATION, "pair " + i + "," + j);
            }
        }
    }

    /**
     * The four largest residual correlations of the reference window: A09/A12 0.3619898212555115,
     * A10/A11 0.35808432149094616, A11/A12 0.28857527712287734, A10/A12 0.23170641073565112, from
     * numpy 2.4.6 {@code corrcoef} of {@code numpy.linalg.lstsq} residuals with an intercept
     * (computed for this test); the data's README says A09-A12 share a sector shock.
     */
    @Test
    void largestPairs_referenceWindow_areTheSectorShockPairs() {
        List<ResidualPair> top = ResidualCorrelations.of(ReferenceWindow.load()).largestPairs(4);
        assertEquals(List.of("A09/A12", "A10/A11", "A11/A12", "A10/A12"),
                top.stream().map(p -> p.first() + "/" + p.second()).toList());
        double[] expected = {0.3619898212555115, 0.35808432149094616, 0.28857527712287734, 0.23170641073565112};
        for (int k = 0; k < expected.length; k++) {
            assertEquals(expected[k], top.get(k).correlation(), CORRELATION, "pair " + k);
        }
    }

    @Test
    void largestPairs_moreThanExist_returnsAllPairs() {
        WindowMoments m = new WindowMoments(3, 10, new double[3], 0.0, 1.0, new double[] {1, 1, 1},
                new double[] {2, 1.5, 1, 1.5, 2, 1, 1, 1, 2});
        List<ResidualPair> all = ResidualCorrelations.of(m, List.of("X1", "X2", "X3")).largestPairs(10);
        assertEquals(3, all.size());
        assertEquals("X1", all.get(0).first());
        assertEquals("X2", all.get(0).second());
        // ρ13 = ρ23 = 0: a tie keeps (i, j) order.
        assertEquals("X1/X3", all.get(1).first() + "/" + all.get(1).second());
        assertEquals("X2/X3", all.get(2).first() + "/" + all.get(2).second());
    }

    /** Selecting k pairs gives the head of the full ranking, which is sorted and covers all 66 pairs. */
    @Test
    void largestPairs_anyK_isThePrefixOfTheFullRanking() {
        ResidualCorrelations rho = ResidualCorrelations.of(ReferenceWindow.load());
        List<ResidualPair> all = rho.largestPairs(1000);
        assertEquals(66, all.size());
        for (int k = 1; k < all.size(); k++) {
            assertTrue(all.get(k - 1).correlation() >= all.get(k).correlation(), "sorted at " + k);
        }
        for (int k : new int[] {0, 1, 7, 65}) {
            assertEquals(all.subList(0, k), rho.largestPairs(k), "k = " + k);
        }
    }

    /**
     * Sectors of four assets each on the reference window: within A09-A12 the mean residual
     * correlation is 0.2666215577526063, across sectors -0.019174779017690085 over 48 pairs
     * (numpy 2.4.6 on lstsq residuals, computed for this test). The pair-weighted mean of all
     * groups equals the mean over all pairs.
     */
    @Test
    void bySector_referenceWindow_sectorShockStandsOut() {
        EstimationWindow w = ReferenceWindow.load();
        ResidualCorrelations rho = ResidualCorrelations.of(w);
        Map<String, String> sectors = new HashMap<>();
        for (int i = 0; i < 12; i++) {
            sectors.put(w.assets().get(i), "S" + (i / 4 + 1));
        }
        SectorCoMovement s = rho.bySector(sectors);
        assertEquals(3, s.withinSectors().size());
        SectorCorrelation third = s.withinSectors().get(2);
        assertEquals("S3", third.sector());
        assertEquals(6, third.pairs());
        assertEquals(0.2666215577526063, third.meanCorrelation(), CORRELATION);
        assertEquals(48, s.acrossPairs());
        assertEquals(-0.019174779017690085, s.acrossMean().orElseThrow(), CORRELATION);
        double weighted = s.acrossMean().orElseThrow() * s.acrossPairs();
        for (SectorCorrelation c : s.withinSectors()) {
            weighted += c.meanCorrelation() * c.pairs();
        }
        assertEquals(meanOverPairs(rho), weighted / 66, HAND);
    }

    /** Hand case: X1, X2 in one sector (ρ = 0.5), X3 alone (no within pairs), across mean 0. */
    @Test
    void bySector_singletonSector_hasNoWithinEntry() {
        WindowMoments m = new WindowMoments(3, 10, new double[3], 0.0, 1.0, new double[] {1, 1, 1},
                new double[] {2, 1.5, 1, 1.5, 2, 1, 1, 1, 2});
        SectorCoMovement s = ResidualCorrelations.of(m, List.of("X1", "X2", "X3"))
                .bySector(Map.of("X1", "P", "X2", "P", "X3", "Q"));
        assertEquals(List.of(new SectorCorrelation("P", 2, 1, 0.5)), s.withinSectors());
        assertEquals(2, s.acrossPairs());
        assertEquals(0.0, s.acrossMean().orElseThrow(), HAND);
        assertEquals(1, s.betweenSectors().size(), "one pair of distinct sectors");
        SectorPairMean pq = s.betweenSectors().get(0);
        assertEquals("P", pq.first());
        assertEquals("Q", pq.second());
        assertEquals(2, pq.pairs(), "X1-X3 and X2-X3");
        assertEquals(0.0, pq.meanCorrelation(), HAND);
    }

    /**
     * The sector x sector cells split the across-sector pairs: their pair counts add up to the
     * across count and their pair-weighted mean is the across mean (an identity of means).
     */
    @Test
    void bySector_betweenCells_splitTheAcrossPairs() {
        ResidualCorrelations rho = ResidualCorrelations.of(ReferenceWindow.load());
        Map<String, String> sectors = new java.util.HashMap<>();
        for (int i = 0; i < rho.assets().size(); i++) {
            sectors.put(rho.assets().get(i), "S" + (i % 3));
        }
        SectorCoMovement s = rho.bySector(sectors);
        assertEquals(3, s.betweenSectors().size(), "S0-S1, S0-S2, S1-S2");
        int pairs = 0;
        double weighted = 0;
        for (SectorPairMean c : s.betweenSectors()) {
            pairs += c.pairs();
            weighted += c.pairs() * c.meanCorrelation();
        }
        assertEquals(s.acrossPairs(), pairs);
        assertEquals(s.acrossMean().orElseThrow(), weighted / pairs, HAND);
    }

    @Test
    void bySector_assetWithoutSector_isRejectedByName() {
        ResidualCorrelations rho = ResidualCorrelations.of(ReferenceWindow.load());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> rho.bySector(Map.of("A01", "S1")));
        assertTrue(e.getMessage().contains("'A02'"), e.getMessage());
    }

    /** An asset equal to 2 × market has no residual: ρ is undefined and the window is refused. */
    @Test
    void assetThatIsExactlyTheMarket_isRejectedByName() {
        WindowMoments m = new WindowMoments(2, 10, new double[2], 0.0, 1.0, new double[] {2, 1},
                new double[] {4, 2, 2, 3});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ResidualCorrelations.of(m, List.of("Y1", "Y2")));
        assertTrue(e.getMessage().contains("'Y1'"), e.getMessage());
    }

    @Test
    void zeroMarketVarianceOrOneAsset_isRejected() {
        WindowMoments flat = new WindowMoments(2, 10, new double[2], 0.0, 0.0, new double[] {0, 0},
                new double[] {1, 0, 0, 1});
        assertThrows(IllegalArgumentException.class, () -> ResidualCorrelations.of(flat, List.of("Y1", "Y2")));
        WindowMoments single = new WindowMoments(1, 10, new double[1], 0.0, 1.0, new double[] {0.5},
                new double[] {1});
        assertThrows(IllegalArgumentException.class, () -> ResidualCorrelations.of(single, List.of("Y1")));
    }

    /**
     * The statistics summed in one pass while the correlations are made agree with the class
     * comment's formula applied pair by pair, ρ_ij = (S_ij − s_im s_jm / s_mm) / √(d_i d_j) with
     * d_i = S_ii − s_im² / s_mm (the least-squares residual covariance of the market model), over
     * 30 seeded windows with n from 2 to 41 (every remainder of the four-way unrolled loop), and
     * the route that stores no correlations gives the same statistics bit for bit.
     */
    @Test
    void onePassSums_matchPairByPairFormula() {
        SplittableRandom cases = new SplittableRandom(0x5EED_0201L);
        for (int c = 0; c < 30; c++) {
            int n = 3 + cases.nextInt(40);
            int len = 5 + cases.nextInt(60);
            EstimationWindow w = ResidualRowsTest.withoutFirst(ResidualRowsTest.window(len, n, cases.nextLong()));
            WindowMoments m = w.moments();
            int k = w.assetCount();
            double sum = 0;
            double sumAbs = 0;
            double sumSquares = 0;
            for (int i = 0; i < k; i++) {
                for (int j = i + 1; j < k; j++) {
                    double si = m.marketCovariance()[i];
                    double sj = m.marketCovariance()[j];
                    double smm = m.marketVariance();
                    double cov = m.covariance(i, j) - si * sj / smm;
                    double di = m.covariance(i, i) - si * si / smm;
                    double dj = m.covariance(j, j) - sj * sj / smm;
                    double r = cov / Math.sqrt(di * dj);
                    sum += r;
                    sumAbs += Math.abs(r);
                    sumSquares += r * r;
                }
            }
            double pairs = k * (k - 1) / 2.0;
            ResidualDiagnostics d = ResidualCorrelations.of(w).diagnostics();
            String label = " (case " + c + ", n = " + k + ", L = " + len + ")";
            assertEquals(sumAbs / pairs, d.meanAbsCorrelation(), 1e-13, "mean |rho|" + label);
            assertEquals(len * sumSquares, d.lmStatistic(), 1e-12 * len * pairs, "LM" + label);
            assertEquals(Math.sqrt(2.0 * len / (k * (k - 1.0))) * sum, d.cdStatistic(),
                    1e-12 * Math.sqrt(2.0 * len / (k * (k - 1.0))) * pairs, "CD" + label);
            assertEquals(d, ResidualCorrelations.diagnostics(m, w.assets()), "without storing" + label);
        }
    }

    /**
     * The stored correlations are ρ_ij = clamp((S_ij − s_im β_j)·(u_i u_j)) with β_j = s_jm / s_mm
     * and u_i = 1/√d_i, bit for bit, and the statistics are their sums row by row, each row in four
     * interleaved partial sums (the row's term k into partial sum k mod 4, the terms after the last
     * group of four into the first, combined as (p0 + p1) + (p2 + p3)), the rows added in order:
     * recomputed here in plain loops over 20 seeded windows with n from 3 to 42, so that a change
     * in the order of any addition shows, on both routes (correlations kept or not).
     */
    @Test
    void onePassSums_keepTheirOrderOfAdditionBitForBit() {
        SplittableRandom cases = new SplittableRandom(0x5EED_0202L);
        for (int c = 0; c < 20; c++) {
            int n = 3 + cases.nextInt(40);
            int len = 5 + cases.nextInt(60);
            EstimationWindow w = ResidualRowsTest.withoutFirst(ResidualRowsTest.window(len, n, cases.nextLong()));
            WindowMoments m = w.moments();
            int k = w.assetCount();
            double smm = m.marketVariance();
            double[] sim = m.marketCovariance();
            double[] u = new double[k];
            for (int i = 0; i < k; i++) {
                u[i] = 1.0 / Math.sqrt(m.covariance(i, i) - sim[i] * sim[i] / smm);
            }
            ResidualCorrelations rho = ResidualCorrelations.of(w);
            String label = " (case " + c + ", n = " + k + ", L = " + len + ")";
            double[] totals = new double[3];
            for (int i = 0; i < k; i++) {
                double[][] partial = new double[3][4];
                for (int j = i + 1; j < k; j++) {
                    double r = Math.max(-1.0, Math.min(1.0,
                            (m.covariance(i, j) - sim[i] * (sim[j] / smm)) * (u[i] * u[j])));
                    assertEquals(Double.doubleToRawLongBits(r), Double.doubleToRawLongBits(rho.correlation(i, j)),
                            "rho(" + i + "," + j + ")" + label);
                    int lane = (j - i - 1) < (k - i - 1) / 4 * 4 ? (j - i - 1) % 4 : 0;
                    partial[0][lane] += r;
                    partial[1][lane] += Math.abs(r);
                    partial[2][lane] += r * r;
                }
                for (int q = 0; q < 3; q++) {
                    totals[q] += (partial[q][0] + partial[q][1]) + (partial[q][2] + partial[q][3]);
                }
            }
            ResidualDiagnostics want = ResidualDiagnostics.fromSums(k, len, totals[0], totals[2],
                    totals[1] / (k * (k - 1) / 2));
            assertEquals(want, rho.diagnostics(), "kept" + label);
            assertEquals(want, ResidualCorrelations.diagnostics(m, w.assets()), "not kept" + label);
        }
    }

    private static void assertRelative(double expected, double actual, String what) {
        assertEquals(expected, actual, Math.abs(expected) * STATISTIC_RELATIVE, what);
    }

    private static double meanOverPairs(ResidualCorrelations rho) {
        int n = rho.assetCount();
        double s = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                s += rho.correlation(i, j);
            }
        }
        return s / (n * (n - 1) / 2.0);
    }

    /** e_i = x_i - α_i - β_i m with β_i = Σ(x - x̄)(m - m̄) / Σ(m - m̄)², one asset per row. */
    private static double[][] explicitResiduals(EstimationWindow w) {
        int n = w.assetCount();
        int len = w.length();
        double[] m = w.marketExcess();
        double[] x = w.excessReturns();
        double mBar = 0;
        for (double v : m) {
            mBar += v / len;
        }
        double[][] e = new double[n][len];
        for (int i = 0; i < n; i++) {
            double xBar = 0;
            for (int t = 0; t < len; t++) {
                xBar += x[t * n + i] / len;
            }
            double sxm = 0;
            double smm = 0;
            for (int t = 0; t < len; t++) {
                sxm += (x[t * n + i] - xBar) * (m[t] - mBar);
                smm += (m[t] - mBar) * (m[t] - mBar);
            }
            double beta = sxm / smm;
            double alpha = xBar - beta * mBar;
            for (int t = 0; t < len; t++) {
                e[i][t] = x[t * n + i] - alpha - beta * m[t];
            }
        }
        return e;
    }

    private static double correlation(double[] a, double[] b) {
        double ma = 0;
        double mb = 0;
        for (int t = 0; t < a.length; t++) {
            ma += a[t] / a.length;
            mb += b[t] / b.length;
        }
        double sab = 0;
        double saa = 0;
        double sbb = 0;
        for (int t = 0; t < a.length; t++) {
            sab += (a[t] - ma) * (b[t] - mb);
            saa += (a[t] - ma) * (a[t] - ma);
            sbb += (b[t] - mb) * (b[t] - mb);
        }
        return sab / Math.sqrt(saa * sbb);
    }
}
