package dev.sigmawalk.engine.evidence;

/**
 * Outcome of the Jobson-Korkie test of equal Sharpe ratios with Memmel's correction.
 *
 * @param periods T
 * @param sharpeA μ_a / σ_a per period (divisor T)
 * @param sharpeB μ_b / σ_b per period
 * @param statistic z; 0 when the Sharpe ratios are equal
 * @param pValue two-sided normal p-value, in [0, 1]
 */
public record JobsonKorkieTest(int periods, double sharpeA, double sharpeB, double statistic, double pValue) {
    public JobsonKorkieTest {
        if (!(periods >= 2)) {
            throw new IllegalArgumentException("periods (" + periods + ") must be >= 2");
        }
        if (!Double.isFinite(sharpeA) || !Double.isFinite(sharpeB) || !Double.isFinite(statistic)) {
            throw new IllegalArgumentException("Sharpe ratios (" + sharpeA + ", " + sharpeB + ") and statistic ("
                    + statistic + ") must be finite");
        }
        if (!(pValue >= 0 && pValue <= 1)) {
            throw new IllegalArgumentException("p-value (" + pValue + ") must be in [0, 1]");
        }
    }
}
