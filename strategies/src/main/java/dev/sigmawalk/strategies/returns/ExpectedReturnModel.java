package dev.sigmawalk.strategies.returns;

import dev.sigmawalk.engine.model.EstimationWindow;
import dev.sigmawalk.engine.study.ExpectedReturnKind;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Per-period expected excess returns μ of a window's eligible assets, in the window's asset
 * order (Method §4), for the portfolio rules that need them. Models are immutable values.
 */
public sealed interface ExpectedReturnModel permits SingleIndexReturns, HistoricalReturns {

    /** μ_i per period, length n; a new array owned by the caller. */
    double[] expected(EstimationWindow window);

    /**
     * The model a strategy names in the study file.
     *
     * @param kind          {@code expected_returns:}
     * @param alphas        user alphas for the single-index model ({@link AlphaLookup#none()} if none)
     * @param annualPremium the study's annual market premium; empty = the window mean m̄
     */
    static ExpectedReturnModel of(ExpectedReturnKind kind, AlphaLookup alphas, OptionalDouble annualPremium) {
        Objects.requireNonNull(kind, "expected-return kind");
        if (kind == ExpectedReturnKind.HISTORICAL) {
            return new HistoricalReturns();
        }
        return new SingleIndexReturns(alphas, annualPremium);
    }
}
