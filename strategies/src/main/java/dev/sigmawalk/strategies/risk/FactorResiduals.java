package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.evidence.BiasAdjustedLm;
import dev.sigmawalk.engine.evidence.ExactPairMoments;
import dev.sigmawalk.engine.evidence.RegressorSpace;
import dev.sigmawalk.engine.evidence.SectorCoMovement;
import dev.sigmawalk.engine.evidence.SectorCorrelation;
import dev.sigmawalk.engine.evidence.SectorPairMean;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.WindowMoments;
import org.apache.commons.math3.special.Erf;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;

/**
 * The residual diagnostics of a factor model (Method §11 last item): the residual correlations
 * ρ_ij of the multi-index or principal-components fit, and from them the mean |ρ|, Pesaran's CD
 * and the bias-adjusted LM of Method §8, all without forming the L×n residuals.
 * <ul>
 *   <li>multi-index: cov(e_i, e_j) from the fit ({@link MultiIndexFit#residualCovariance}); asset
 *       i's regression is [1, G_i], so with sectors the pair moments μ_ij, v_ij depend on the
 *       pair's two sectors and come from {@link ExactPairMoments#of}; with a factor file every
 *       asset has the same k = K + 1 regressors;</li>
 *   <li>principal components: e = x - x̄ - V_k V_k'(x - x̄), so cov(e) = S - V_k Λ_k V_k' and
 *       k = components + 1 for every asset.</li>
 * </ul>
 */
public final class FactorResiduals {
    /** A residual variance below this share of the asset's variance counts as an exact fit. */
    static final double EXACT_FIT = 1e-12;

    private FactorResiduals() {
    }

    /** Whether {@link #diagnose} applies: multi-index and principal-components models. */
    public static boolean applies(RiskModel model) {
        return model instanceof MultiIndexRiskModel || model instanceof PrincipalComponentsRiskModel;
    }

    /**
     * @param name the model's name for outputs, e.g. {@code principal-components:5}
     * @param model a multi-index or principal-components model
     * @param sectors asset to sector, for the within-sector means (may be empty)
     * @return empty when the window cannot support the model or fewer than two assets have a
     *         residual variance above rounding
     */
    public static Optional<FactorDiagnostics> diagnose(String name, RiskModel model, EstimationWindow window,
                                                       Map<String, String> sectors) {
        if (!applies(model)) {
            throw new IllegalArgumentException("risk model " + model.label() + " has no factor residuals");
        }
        try {
            return model instanceof MultiIndexRiskModel mi
                    ? multiIndex(name, mi, window, sectors)
                    : principalComponents(name, (PrincipalComponentsRiskModel) model, window, sectors);
        } catch (IllegalArgumentException | ArithmeticException e) {
            // The strategy records the same failure for this rebalance; there is nothing to diagnose.
            return Optional.empty();
        }
    }

    private static Optional<FactorDiagnostics> multiIndex(String name, MultiIndexRiskModel model, EstimationWindow window,
                                                          Map<String, String> sectors) {
        MultiIndexFit fit = model.fit(window);
        WindowMoments moments = window.moments();
        int n = window.assetCount();
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = fit.residualVariance(i);
        }
        PairMomentsSource pairs = pairMoments(fit.design(), window);
        return summarise(name, window, sectors, d, (i, j) -> fit.residualCovariance(i, j, moments.covariance(i, j)), pairs);
    }

    private static Optional<FactorDiagnostics> principalComponents(String name, PrincipalComponentsRiskModel model,
                                                                   EstimationWindow window, Map<String, String> sectors) {
        FactorCovariance sigma = model.estimate(window);
        WindowMoments moments = window.moments();
        double[] d = sigma.specificVariances();
        ExactPairMoments common = ExactPairMoments.common(window.length(), model.components() + 1);
        return summarise(name, window, sectors, d, (i, j) -> moments.covariance(i, j) - sigma.get(i, j),
                (i, j) -> common);
    }

    /** cov(e_i, e_j) for i ≠ j. */
    @FunctionalInterface
    private interface ResidualCovariance {
        double of(int i, int j);
    }

    /** The exact moments of the pair of assets i, j (window indices). */
    @FunctionalInterface
    private interface PairMomentsSource {
        ExactPairMoments of(int i, int j);
    }

    /**
     * With sectors, one regression per distinct column set (market only, or market and one sector),
     * and the moments of a pair cached by its two column sets; with a file, one common regression.
     */
    private static PairMomentsSource pairMoments(FactorDesign design, EstimationWindow window) {
        int len = design.length();
        int k = design.factorCount();
        int[][] columnsOf = design.columnsOf();
        Map<List<Integer>, RegressorSpace> spaces = new HashMap<>();
        List<Integer>[] keyOf = keys(columnsOf);
        for (List<Integer> key : keyOf) {
            spaces.computeIfAbsent(key, cols -> {
                double[][] z = new double[cols.size() + 1][len];
                Arrays.fill(z[0], 1.0);
                for (int c = 0; c < cols.size(); c++) {
                    for (int t = 0; t < len; t++) {
                        z[c + 1][t] = design.values()[t * k + cols.get(c)];
                    }
                }
                return RegressorSpace.of(z);
            });
        }
        Map<List<List<Integer>>, ExactPairMoments> cache = new HashMap<>();
        return (i, j) -> cache.computeIfAbsent(List.of(keyOf[i], keyOf[j]),
                pair -> ExactPairMoments.of(spaces.get(pair.get(0)), spaces.get(pair.get(1))));
    }

    @SuppressWarnings("unchecked")
    private static List<Integer>[] keys(int[][] columnsOf) {
        List<Integer>[] keys = new List[columnsOf.length];
        for (int i = 0; i < columnsOf.length; i++) {
            keys[i] = Arrays.stream(columnsOf[i]).boxed().toList();
        }
        return keys;
    }

    private static Optional<FactorDiagnostics> summarise(String name, EstimationWindow window, Map<String, String> sectors,
                                                         double[] d, ResidualCovariance cov, PairMomentsSource pairs) {
        WindowMoments moments = window.moments();
        List<Integer> kept = new ArrayList<>();
        for (int i = 0; i < d.length; i++) {
            if (d[i] > EXACT_FIT * moments.covariance(i, i)) {
                kept.add(i);
            }
        }
        int n = kept.size();
        if (n < 2) {
            return Optional.empty();
        }
        double[] rho = new double[n * n];
        double sum = 0;
        double sumAbs = 0;
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n; b++) {
                int i = kept.get(a);
                int j = kept.get(b);
                double r = Math.max(-1.0, Math.min(1.0, cov.of(i, j) / Math.sqrt(d[i] * d[j])));
                rho[a * n + b] = r;
                sum += r;
                sumAbs += Math.abs(r);
            }
        }
        int len = window.length();
        double cd = Math.sqrt(2.0 * len / ((double) n * (n - 1))) * sum;
        double cdP = Math.min(1.0, Erf.erfc(Math.abs(cd) / Math.sqrt(2.0)));
        Optional<BiasAdjustedLm> lm;
        try {
            lm = Optional.of(BiasAdjustedLm.of(n, (a, b) -> rho[a * n + b], (a, b) -> pairs.of(kept.get(a), kept.get(b))));
        } catch (IllegalArgumentException e) {
            // L - k ≤ 4: the paper's moments are undefined for so short a window.
            lm = Optional.empty();
        }
        double meanAbs = Math.min(1.0, sumAbs / (n * (n - 1) / 2.0));
        return Optional.of(new FactorDiagnostics(name, window.date(), len, n, meanAbs, lm, cd, cdP,
                sectors(window, sectors, kept, rho)));
    }

    /**
     * The residual correlations of the kept assets grouped by sector (Method §8's sector sums on
     * the factor model's residuals): the mean over the pairs inside each sector with two or more
     * kept assets, over the pairs across each two sectors, and over all pairs across sectors.
     * Assets without a sector take no part; empty when no kept asset has one.
     */
    private static Optional<SectorCoMovement> sectors(EstimationWindow window, Map<String, String> sectors,
                                                      List<Integer> kept, double[] rho) {
        int n = kept.size();
        TreeMap<String, Integer> members = new TreeMap<>();
        String[] sectorOf = new String[n];
        for (int a = 0; a < n; a++) {
            sectorOf[a] = sectors.get(window.assets().get(kept.get(a)));
            if (sectorOf[a] != null) {
                members.merge(sectorOf[a], 1, Integer::sum);
            }
        }
        if (members.isEmpty()) {
            return Optional.empty();
        }
        Map<List<String>, double[]> sums = new TreeMap<>(Comparator.comparing((List<String> k) -> k.get(0))
                .thenComparing(k -> k.get(1)));
        double across = 0;
        int acrossPairs = 0;
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n && sectorOf[a] != null; b++) {
                if (sectorOf[b] == null) {
                    continue;
                }
                String first = sectorOf[a].compareTo(sectorOf[b]) <= 0 ? sectorOf[a] : sectorOf[b];
                String second = first.equals(sectorOf[a]) ? sectorOf[b] : sectorOf[a];
                double[] s = sums.computeIfAbsent(List.of(first, second), x -> new double[2]);
                s[0] += rho[a * n + b];
                s[1]++;
                if (!first.equals(second)) {
                    across += rho[a * n + b];
                    acrossPairs++;
                }
            }
        }
        List<SectorCorrelation> within = new ArrayList<>();
        List<SectorPairMean> between = new ArrayList<>();
        sums.forEach((pair, s) -> {
            double mean = Math.max(-1.0, Math.min(1.0, s[0] / s[1]));
            if (pair.get(0).equals(pair.get(1))) {
                int m = members.get(pair.get(0));
                within.add(new SectorCorrelation(pair.get(0), m, m * (m - 1) / 2, mean));
            } else {
                between.add(new SectorPairMean(pair.get(0), pair.get(1), (int) s[1], mean));
            }
        });
        OptionalDouble acrossMean = acrossPairs == 0 ? OptionalDouble.empty()
                : OptionalDouble.of(Math.max(-1.0, Math.min(1.0, across / acrossPairs)));
        return Optional.of(new SectorCoMovement(within, acrossPairs, acrossMean, between));
    }
}
