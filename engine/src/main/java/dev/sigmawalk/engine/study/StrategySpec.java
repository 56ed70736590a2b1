package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One entry of {@code strategies:}. Defaults (applied by the study reader, listed in
 * {@code StudyDefaults}): risk {@code sample} for equal-weight when absent, shrinkage target
 * {@code single-index}, expected returns {@code single-index}, no bounds (short sales allowed).
 *
 * @param name unique strategy name
 * @param risk covariance model (for equal-weight: the model whose forecast is reported)
 * @param shrinkageTarget used when risk is shrinkage
 * @param objective the portfolio rule
 * @param bounds per-asset bounds; empty = short sales allowed, no bounds
 * @param riskAversion λ for mean-variance (> 0)
 * @param expectedReturns expected-return model for objectives that need one
 * @param alphas optional long CSV {@code date,asset,alpha}
 * @param marketPremium optional annual market premium; empty = window mean
 * @param baseline the strategy this one is compared against; empty = the default baseline
 * @param riskSettings the settings of a Method §11 model ({@code factors}, {@code components},
 *                     {@code half_life}), exactly those its {@code risk} uses
 */
public record StrategySpec(String name, RiskKind risk, ShrinkageTarget shrinkageTarget, Objective objective,
                           Optional<Bounds> bounds, double riskAversion, ExpectedReturnKind expectedReturns,
                           Optional<Path> alphas, OptionalDouble marketPremium, Optional<String> baseline,
                           RiskSettings riskSettings) {
    public StrategySpec {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(risk, "risk");
        Objects.requireNonNull(shrinkageTarget, "shrinkageTarget");
        Objects.requireNonNull(objective, "objective");
        Objects.requireNonNull(bounds, "bounds");
        Objects.requireNonNull(expectedReturns, "expectedReturns");
        Objects.requireNonNull(alphas, "alphas");
        Objects.requireNonNull(marketPremium, "marketPremium");
        Objects.requireNonNull(baseline, "baseline");
        Objects.requireNonNull(riskSettings, "riskSettings");
        if (!riskSettings.fit(risk)) {
            throw new IllegalArgumentException("risk settings " + riskSettings + " do not fit risk " + risk.spelling());
        }
        if (!(riskAversion > 0)) {
            throw new IllegalArgumentException("risk_aversion (" + riskAversion + ") must be > 0");
        }
    }

    /** A strategy under one of the Method §3 models, which take no settings. */
    public StrategySpec(String name, RiskKind risk, ShrinkageTarget shrinkageTarget, Objective objective,
                        Optional<Bounds> bounds, double riskAversion, ExpectedReturnKind expectedReturns,
                        Optional<Path> alphas, OptionalDouble marketPremium, Optional<String> baseline) {
        this(name, risk, shrinkageTarget, objective, bounds, riskAversion, expectedReturns, alphas, marketPremium,
                baseline, RiskSettings.none());
    }

    /** The risk model's name with its setting, for example {@code multi-index:sectors}. */
    public String riskModelName() {
        return riskSettings.modelName(risk);
    }
}
