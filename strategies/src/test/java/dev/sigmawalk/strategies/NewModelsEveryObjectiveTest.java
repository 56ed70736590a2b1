package dev.sigmawalk.strategies;

import dev.sigmawalk.engine.data.AlphaTable;
import dev.sigmawalk.engine.model.Decision;
import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.model.StrategyDefinition;
import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.ExpectedReturnKind;
import dev.sigmawalk.engine.study.FactorSource;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.RiskSettings;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.strategies.risk.ReferenceData;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every Method §11 model forms a portfolio under every objective, with and without bounds, on the
 * reference window, and reports w'Σw of its own matrix as the forecast variance.
 */
class NewModelsEveryObjectiveTest {
    /** Budget and bounds hold to solver precision. */
    private static final double CONSTRAINT_TOL = 1e-9;
    /** The reported forecast equals w'Σw up to rounding. */
    private static final double FORECAST_TOL = 1e-12;

    private static List<RiskSettings> settings() {
        return List.of(
                new RiskSettings(Optional.of(new FactorSource.Sectors()), OptionalInt.empty(), OptionalDouble.empty()),
                new RiskSettings(Optional.empty(), OptionalInt.of(2), OptionalDouble.empty()),
                new RiskSettings(Optional.empty(), OptionalInt.empty(), OptionalDouble.of(12)),
                RiskSettings.none());
    }

    private static final List<RiskKind> KINDS = List.of(RiskKind.MULTI_INDEX, RiskKind.PRINCIPAL_COMPONENTS,
            RiskKind.EWMA, RiskKind.NONLINEAR_SHRINKAGE);

    @Test
    void everyModel_everyObjective_withAndWithoutBounds() {
        EstimationWindow w = ReferenceData.window();
        Map<String, String> sectors = new HashMap<>();
        for (int i = 1; i <= 12; i++) {
            sectors.put(String.format("A%02d", i), i <= 4 ? "first" : i <= 8 ? "second" : "third");
        }
        List<StrategySpec> specs = new ArrayList<>();
        for (int m = 0; m < KINDS.size(); m++) {
            for (Objective objective : Objective.values()) {
                for (Optional<Bounds> bounds : List.of(Optional.<Bounds>empty(), Optional.of(new Bounds(0, 0.3)))) {
                    specs.add(new StrategySpec(KINDS.get(m).spelling() + "/" + objective.spelling() + "/" + bounds.isPresent(),
                            KINDS.get(m), ShrinkageTarget.SINGLE_INDEX, objective, bounds, 4.0,
                            ExpectedReturnKind.HISTORICAL, Optional.empty(), OptionalDouble.empty(), Optional.empty(),
                            settings().get(m)));
                }
            }
        }
        List<StrategyDefinition> built = StrategyCatalog.build(specs, spec -> AlphaTable.empty(), sectors, f -> null);
        for (int s = 0; s < specs.size(); s++) {
            String label = specs.get(s).name();
            Decision d = built.get(s).newAllocator(w.length()).decide(w);
            Decision.Chosen chosen = assertInstanceOf(Decision.Chosen.class, d, label + ": " + d);
            double sum = 0;
            for (double x : chosen.weights()) {
                sum += x;
                if (specs.get(s).bounds().isPresent()) {
                    assertTrue(x >= -CONSTRAINT_TOL && x <= 0.3 + CONSTRAINT_TOL, label + " weight " + x);
                }
            }
            assertEquals(1.0, sum, CONSTRAINT_TOL, label + " budget");
            var sigma = dev.sigmawalk.strategies.risk.RiskModel.of(specs.get(s), sectors, f -> null).estimate(w);
            double expected = sigma.portfolioVariance(chosen.weights());
            assertEquals(expected, chosen.forecastVariance(), FORECAST_TOL * expected, label + " forecast variance");
        }
    }
}
