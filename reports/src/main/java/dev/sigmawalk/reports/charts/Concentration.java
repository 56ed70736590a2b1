package dev.sigmawalk.reports.charts;

/** How concentrated one set of portfolio weights is. */
public final class Concentration {
    private Concentration() {
    }

    /**
     * Effective number of holdings 1 / Σ w_i² (the inverse Herfindahl index, common practice):
     * n for n equal weights, 1 for a single holding. Weights that sum to 1 give a value ≥ 1 when
     * they are long only; with short positions the value can be below the count of assets held.
     *
     * @throws IllegalArgumentException when there are no weights or all are zero
     */
    public static double effectiveHoldings(double[] weights) {
        double squares = 0;
        for (double w : weights) {
            squares += w * w;
        }
        if (!(squares > 0)) {
            throw new IllegalArgumentException("effective holdings need at least one non-zero weight, got "
                    + weights.length + " weights with Σw² = " + squares);
        }
        return 1 / squares;
    }

    /**
     * The largest single weight, max_i w_i.
     *
     * @throws IllegalArgumentException when there are no weights
     */
    public static double largestWeight(double[] weights) {
        if (weights.length == 0) {
            throw new IllegalArgumentException("largest weight of an empty portfolio");
        }
        double max = Double.NEGATIVE_INFINITY;
        for (double w : weights) {
            max = Math.max(max, w);
        }
        return max;
    }
}
