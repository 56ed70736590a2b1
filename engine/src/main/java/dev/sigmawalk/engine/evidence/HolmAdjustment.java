package dev.sigmawalk.engine.evidence;

import java.util.Arrays;
import java.util.Comparator;

/**
 * Holm's (1979, Scand. J. Statistics 6, 65-70) step-down adjustment of m p-values, which keeps
 * the family-wise error rate at the nominal level under any dependence between the tests (for
 * example one test per estimation window).
 *
 * <p>With p_(1) ≤ … ≤ p_(m) sorted ascending, the adjusted values are
 * p̃_(k) = max_{j ≤ k} min(1, (m - j + 1) p_(j)); rejecting where p̃ ≤ α is Holm's procedure.
 * Results come back in the input order; ties keep their input order (the adjusted values of tied
 * p-values are equal anyway). Every adjusted value is in [p, 1].
 */
public final class HolmAdjustment {
    private HolmAdjustment() {
    }

    /**
     * @param pValues m >= 0 p-values, each in [0, 1]
     * @return adjusted p-values, same order and length
     */
    public static double[] adjust(double[] pValues) {
        int m = pValues.length;
        for (int i = 0; i < m; i++) {
            if (!(pValues[i] >= 0 && pValues[i] <= 1)) {
                throw new IllegalArgumentException("p-value " + i + " (" + pValues[i] + ") must be in [0, 1]");
            }
        }
        Integer[] order = new Integer[m];
        Arrays.setAll(order, i -> i);
        Arrays.sort(order, Comparator.comparingDouble(i -> pValues[i]));
        double[] adjusted = new double[m];
        double running = 0;
        for (int k = 0; k < m; k++) {
            int i = order[k];
            running = Math.max(running, Math.min(1.0, (m - k) * pValues[i]));
            adjusted[i] = running;
        }
        return adjusted;
    }
}
