package dev.sigmawalk.engine.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Bounds;
import dev.sigmawalk.engine.study.ExpectedReturnKind;
import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.ShrinkageTarget;
import dev.sigmawalk.engine.study.StrategySpec;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** Every strategy is listed with its baseline or the reason it has none; nothing drops out silently. */
class BaselinesTest {
    private static final Optional<Bounds> LONG_ONLY = Optional.of(new Bounds(0, 0.1));

    private static StrategySpec spec(String name, RiskKind risk, Objective objective, Optional<Bounds> bounds,
                                     Optional<String> baseline) {
        return new StrategySpec(name, risk, ShrinkageTarget.SINGLE_INDEX, objective, bounds, 1,
                ExpectedReturnKind.SINGLE_INDEX, Optional.empty(), OptionalDouble.empty(), baseline);
    }

    private static StrategySpec spec(String name, RiskKind risk, Objective objective, Optional<Bounds> bounds) {
        return spec(name, risk, objective, bounds, Optional.empty());
    }

    @Test
    void ordinaryStudy_everyStrategyHasBaselineOrReason() {
        List<StrategySpec> study = List.of(
                spec("index-model", RiskKind.SINGLE_INDEX, Objective.MIN_VARIANCE, LONG_ONLY),
                spec("plain-sample", RiskKind.SAMPLE, Objective.MIN_VARIANCE, LONG_ONLY),
                spec("tilted", RiskKind.SINGLE_INDEX, Objective.MEAN_VARIANCE, LONG_ONLY),
                spec("equal", RiskKind.SAMPLE, Objective.EQUAL_WEIGHT, Optional.empty()));
        List<BaselineChoice> choices = Baselines.choices(study);
        assertEquals(List.of(
                new BaselineChoice("index-model", Optional.of("plain-sample"), Baselines.DEFAULT),
                new BaselineChoice("plain-sample", Optional.empty(), Baselines.IS_REFERENCE),
                new BaselineChoice("tilted", Optional.empty(), Baselines.NO_COUNTERPART),
                new BaselineChoice("equal", Optional.empty(), Baselines.EQUAL_WEIGHT)), choices);
        assertEquals(Map.of("index-model", "plain-sample"), Baselines.of(study));
    }

    @Test
    void boundsOnSampleAlone_othersSayNoCounterpart() {
        List<StrategySpec> study = List.of(
                spec("index-model", RiskKind.SINGLE_INDEX, Objective.MIN_VARIANCE, Optional.empty()),
                spec("shrunk", RiskKind.SHRINKAGE, Objective.MIN_VARIANCE, Optional.empty()),
                spec("plain-sample", RiskKind.SAMPLE, Objective.MIN_VARIANCE, LONG_ONLY));
        List<BaselineChoice> choices = Baselines.choices(study);
        assertEquals(3, choices.size(), "every strategy listed");
        assertEquals("no baseline: no sample-covariance strategy with the same objective and bounds",
                choices.get(0).describe());
        assertEquals(Baselines.NO_COUNTERPART, choices.get(1).reason());
        assertFalse(choices.get(1).compared());
        assertEquals(Baselines.IS_REFERENCE, choices.get(2).reason());
        assertTrue(Baselines.of(study).isEmpty());
    }

    @Test
    void namedBaseline_winsOverDefault_evenForEqualWeight() {
        List<StrategySpec> study = List.of(
                spec("plain-sample", RiskKind.SAMPLE, Objective.MIN_VARIANCE, Optional.empty()),
                spec("equal", RiskKind.SAMPLE, Objective.EQUAL_WEIGHT, Optional.empty(), Optional.of("plain-sample")),
                spec("second-sample", RiskKind.SAMPLE, Objective.MIN_VARIANCE, Optional.empty(), Optional.of("equal")));
        List<BaselineChoice> choices = Baselines.choices(study);
        assertEquals("baseline plain-sample (set by baseline: in the study)", choices.get(1).describe());
        assertEquals(Optional.of("equal"), choices.get(2).baseline());
        assertEquals(Baselines.NAMED, choices.get(2).reason());
    }

    @Test
    void secondSampleStrategyOfAKind_isComparedWithTheFirst() {
        List<StrategySpec> study = List.of(
                spec("first", RiskKind.SAMPLE, Objective.MAX_SHARPE, LONG_ONLY),
                spec("second", RiskKind.SAMPLE, Objective.MAX_SHARPE, LONG_ONLY));
        assertEquals(Map.of("second", "first"), Baselines.of(study));
    }

    @Test
    void equalWeightWithOtherRiskModel_isNotComparedWithAnIdenticalPortfolio() {
        List<StrategySpec> study = List.of(
                spec("equal-sample", RiskKind.SAMPLE, Objective.EQUAL_WEIGHT, Optional.empty()),
                spec("equal-index", RiskKind.SINGLE_INDEX, Objective.EQUAL_WEIGHT, Optional.empty()));
        assertEquals(Baselines.EQUAL_WEIGHT, Baselines.choices(study).get(1).reason());
        assertTrue(Baselines.of(study).isEmpty());
    }

    @Test
    void choice_rejectsBlankReasonAndSelfBaseline() {
        IllegalArgumentException blank = assertThrows(IllegalArgumentException.class,
                () -> new BaselineChoice("a", Optional.empty(), " "));
        assertEquals("reason of strategy 'a' must not be blank", blank.getMessage());
        IllegalArgumentException self = assertThrows(IllegalArgumentException.class,
                () -> new BaselineChoice("a", Optional.of("a"), Baselines.NAMED));
        assertEquals("strategy 'a' cannot be its own baseline", self.getMessage());
    }
}
