package dev.sigmawalk.engine.study;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The settings of the risk models of Method §11, each present exactly when the strategy's model
 * uses it (the study reader rejects them elsewhere).
 *
 * @param factors {@code factors:} of a multi-index model
 * @param components {@code components:} of a principal-components model, k >= 1
 * @param halfLife {@code half_life:} of an ewma model, in periods, > 0
 */
public record RiskSettings(Optional<FactorSource> factors, OptionalInt components, OptionalDouble halfLife) {
    public RiskSettings {
        Objects.requireNonNull(factors, "factors");
        Objects.requireNonNull(components, "components");
        Objects.requireNonNull(halfLife, "halfLife");
        if (components.isPresent() && !(components.getAsInt() >= 1)) {
            throw new IllegalArgumentException("components (" + components.getAsInt() + ") must be >= 1");
        }
        if (halfLife.isPresent() && !(halfLife.getAsDouble() > 0 && Double.isFinite(halfLife.getAsDouble()))) {
            throw new IllegalArgumentException("half_life (" + halfLife.getAsDouble() + ") must be finite and > 0");
        }
    }

    /** No settings: the models of Method §3. */
    public static RiskSettings none() {
        return new RiskSettings(Optional.empty(), OptionalInt.empty(), OptionalDouble.empty());
    }

    /** Whether these settings are exactly the ones {@code risk} needs. */
    public boolean fit(RiskKind risk) {
        return factors.isPresent() == (risk == RiskKind.MULTI_INDEX)
                && components.isPresent() == (risk == RiskKind.PRINCIPAL_COMPONENTS)
                && halfLife.isPresent() == (risk == RiskKind.EWMA);
    }

    /**
     * The model's spelling plus its setting, as {@code factor_diagnostics.csv} names it:
     * {@code multi-index:sectors}, {@code principal-components:5}, {@code ewma:24}; the bare
     * spelling for models without a setting.
     */
    public String modelName(RiskKind risk) {
        if (factors.isPresent()) {
            return risk.spelling() + ":" + factors.get().spelling();
        }
        if (components.isPresent()) {
            return risk.spelling() + ":" + components.getAsInt();
        }
        if (halfLife.isPresent()) {
            double h = halfLife.getAsDouble();
            return risk.spelling() + ":" + (h == Math.rint(h) && Math.abs(h) < 1e15 ? Long.toString((long) h) : Double.toString(h));
        }
        return risk.spelling();
    }
}
