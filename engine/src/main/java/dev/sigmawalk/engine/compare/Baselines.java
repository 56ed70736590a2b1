package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.study.RiskKind;
import dev.sigmawalk.engine.study.StrategySpec;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Which strategy each strategy is compared with. A strategy's own {@code baseline:} wins;
 * otherwise the first strategy built on the sample covariance with the same objective and the
 * same bounds (the natural "what if we had just used the sample matrix" question). A sample
 * strategy is not compared with itself; a strategy with no such counterpart is not compared.
 */
public final class Baselines {
    private Baselines() {
    }

    /** Strategy name to baseline name, in study order, for the strategies that have one. */
    public static Map<String, String> of(List<StrategySpec> strategies) {
        Map<String, String> out = new LinkedHashMap<>();
        for (StrategySpec s : strategies) {
            Optional<String> base = s.baseline().isPresent() ? s.baseline() : defaultFor(s, strategies);
            base.filter(b -> !b.equals(s.name())).ifPresent(b -> out.put(s.name(), b));
        }
        return out;
    }

    private static Optional<String> defaultFor(StrategySpec s, List<StrategySpec> all) {
        for (StrategySpec c : all) {
            if (c.risk() == RiskKind.SAMPLE && c.objective() == s.objective() && c.bounds().equals(s.bounds())
                    && c.objective().needsExpectedReturns() == s.objective().needsExpectedReturns()) {
                return Optional.of(c.name());
            }
        }
        return Optional.empty();
    }
}
