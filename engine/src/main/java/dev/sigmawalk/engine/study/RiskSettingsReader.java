package dev.sigmawalk.engine.study;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * Reads a strategy's {@code factors}, {@code components} and {@code half_life} (Method §11).
 * Each is an error on a model that does not use it, so a study means what it says.
 */
final class RiskSettingsReader {
    private RiskSettingsReader() {
    }

    static RiskSettings read(Section s, RiskKind risk, boolean sectorsGiven) {
        Optional<FactorSource> factors = factors(s, risk, sectorsGiven);
        OptionalInt components = OptionalInt.empty();
        if (usedBy(s, "components", risk, RiskKind.PRINCIPAL_COMPONENTS)) {
            components = OptionalInt.of(s.integer("components", 1));
        }
        OptionalDouble halfLife = OptionalDouble.empty();
        if (usedBy(s, "half_life", risk, RiskKind.EWMA)) {
            double h = s.number("half_life");
            if (!(h > 0)) {
                throw s.bad("half_life", "is not positive; expected a half-life in periods > 0, such as 24");
            }
            halfLife = OptionalDouble.of(h);
        }
        return new RiskSettings(factors, components, halfLife);
    }

    private static Optional<FactorSource> factors(Section s, RiskKind risk, boolean sectorsGiven) {
        if (!usedBy(s, "factors", risk, RiskKind.MULTI_INDEX)) {
            return risk == RiskKind.MULTI_INDEX ? Optional.of(sectors(s, sectorsGiven)) : Optional.empty();
        }
        String text = s.text("factors");
        if (text.equals(StudyDefaults.FACTORS.spelling())) {
            return Optional.of(sectors(s, sectorsGiven));
        }
        return Optional.of(new FactorSource.File(s.resolve(text), text));
    }

    private static FactorSource sectors(Section s, boolean sectorsGiven) {
        if (!sectorsGiven) {
            String problem = "needs data.sectors (a CSV asset,sector) for one factor per sector; add it, or name a"
                    + " factor file: factors: FILE.csv";
            throw s.has("factors") ? s.bad("factors", problem) : s.bad("risk", problem);
        }
        return StudyDefaults.FACTORS;
    }

    /**
     * Whether {@code key} is given, rejecting it on a model other than {@code owner}; a missing
     * {@code components} or {@code half_life} on its own model is an error (no default: the
     * forecast depends on it entirely).
     */
    private static boolean usedBy(Section s, String key, RiskKind risk, RiskKind owner) {
        if (!s.has(key)) {
            if (risk == owner && owner != RiskKind.MULTI_INDEX) {
                throw s.bad("risk", "needs " + s.pathOf(key) + ", which has no default"
                        + (owner == RiskKind.EWMA ? " (periods, such as 24)" : " (a whole number >= 1, such as 5)"));
            }
            return false;
        }
        if (risk != owner) {
            throw s.bad(key, "is only used with risk: " + owner.spelling() + "; remove it or set risk: "
                    + owner.spelling());
        }
        return true;
    }
}
