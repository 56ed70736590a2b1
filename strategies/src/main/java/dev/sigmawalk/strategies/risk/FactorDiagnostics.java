package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.evidence.BiasAdjustedLm;
import dev.sigmawalk.engine.evidence.SectorCoMovement;

import java.time.LocalDate;
import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;

/**
 * The Method §8 diagnostics on one factor model's residuals in one window (Method §11): did the
 * model's factors take up the co-movement the single index leaves?
 *
 * @param model the model's name with its setting, e.g. {@code multi-index:sectors}
 * @param date the rebalance date
 * @param window L
 * @param assets the assets whose residuals entered (those with a residual variance above
 *               rounding; an asset alone in its sector is fitted exactly and left out)
 * @param meanAbsCorrelation mean |ρ_ij| over their pairs, in [0, 1]
 * @param lmAdj the bias-adjusted LM test (Pesaran, Ullah &amp; Yamagata 2008) with each pair's exact
 *              moments; empty when the window is too short for the regressors (L - k ≤ 4)
 * @param cdStatistic Pesaran (2004) CD = √(2L/(n(n-1))) Σ ρ_ij
 * @param cdPValue its two-sided normal p-value
 * @param sectors mean residual correlation over the pairs of those assets inside each sector with
 *                at least two of them and across each pair of sectors (empty without sectors)
 */
public record FactorDiagnostics(String model, LocalDate date, int window, int assets, double meanAbsCorrelation,
                                Optional<BiasAdjustedLm> lmAdj, double cdStatistic, double cdPValue,
                                Optional<SectorCoMovement> sectors) {
    public FactorDiagnostics {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(lmAdj, "lmAdj");
        Objects.requireNonNull(sectors, "sectors");
        if (!(assets >= 2)) {
            throw new IllegalArgumentException("assets (" + assets + ") must be >= 2");
        }
        if (!(meanAbsCorrelation >= 0 && meanAbsCorrelation <= 1)) {
            throw new IllegalArgumentException("mean |residual correlation| (" + meanAbsCorrelation + ") must be in [0, 1]");
        }
        if (!Double.isFinite(cdStatistic) || !(cdPValue >= 0 && cdPValue <= 1)) {
            throw new IllegalArgumentException("CD (" + cdStatistic + ", p " + cdPValue + ") must be finite, p in [0, 1]");
        }
    }

    /** The within-sector means of {@link #sectors()} by sector name; empty without sectors. */
    public Map<String, Double> withinSector() {
        Map<String, Double> out = new TreeMap<>();
        sectors.ifPresent(s -> s.withinSectors().forEach(c -> out.put(c.sector(), c.meanCorrelation())));
        return Collections.unmodifiableMap(out);
    }
}
