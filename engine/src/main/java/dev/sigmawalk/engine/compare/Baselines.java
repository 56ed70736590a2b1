package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.study.Objective;
import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.StrategySpec;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Which strategy each strategy is compared with. A strategy's own {@code baseline:} wins;
 * otherwise the first strategy built on the sample covariance with the same objective and the
 * same bounds (the natural "what if we had just used the sample matrix" question). That first
 * sample strategy is the reference of its kind and is not compared itself; an equal-weight
 * strategy gets no default baseline, because its portfolio does not depend on the covariance
 * estimate and a sample-covariance counterpart would hold the same weights. Every strategy gets
 * a {@link BaselineChoice}, with the reason when it has no baseline.
 */
public final class Baselines {
    /** Reason for a baseline the study names. */
    public static final String NAMED = "set by baseline: in the study";
    /** Reason for the default baseline. */
    public static final String DEFAULT = "the first sample-covariance strategy with the same objective and bounds";
    /** Reason for no baseline: nothing to compare with. */
    public static final String NO_COUNTERPART = "no sample-covariance strategy with the same objective and bounds";
    /** Reason for no baseline: the strategy is itself the reference. */
    public static final String IS_REFERENCE = "it is the first sample-covariance strategy with its objective and"
            + " bounds, the reference others of its kind are compared with";
    /** Reason for no baseline: equal weight ignores the covariance estimate. */
    public static final String EQUAL_WEIGHT = "equal weight does not use the covariance estimate, so a"
            + " sample-covariance counterpart would hold the same portfolio (name one with baseline: to compare)";

    private Baselines() {
    }

    /** Every strategy's baseline or the reason it has none, in study order. */
    public static List<BaselineChoice> choices(List<StrategySpec> strategies) {
        List<BaselineChoice> out = new ArrayList<>(strategies.size());
        for (StrategySpec s : strategies) {
            out.add(choiceFor(s, strategies));
        }
        return List.copyOf(out);
    }

    /** Strategy name to baseline name, in study order, for the strategies that have one. */
    public static Map<String, String> of(List<StrategySpec> strategies) {
        Map<String, String> out = new LinkedHashMap<>();
        for (BaselineChoice c : choices(strategies)) {
            c.baseline().ifPresent(b -> out.put(c.strategy(), b));
        }
        return out;
    }

    private static BaselineChoice choiceFor(StrategySpec s, List<StrategySpec> all) {
        if (s.baseline().isPresent()) {
            return new BaselineChoice(s.name(), s.baseline(), NAMED);
        }
        if (s.objective() == Objective.EQUAL_WEIGHT) {
            return new BaselineChoice(s.name(), Optional.empty(), EQUAL_WEIGHT);
        }
        Optional<StrategySpec> reference = all.stream().filter(c -> c.risk() == RiskKind.SAMPLE
                && c.objective() == s.objective() && c.bounds().equals(s.bounds())).findFirst();
        if (reference.isEmpty()) {
            return new BaselineChoice(s.name(), Optional.empty(), NO_COUNTERPART);
        }
        if (reference.get().name().equals(s.name())) {
            return new BaselineChoice(s.name(), Optional.empty(), IS_REFERENCE);
        }
        return new BaselineChoice(s.name(), Optional.of(reference.get().name()), DEFAULT);
    }
}
