package dev.sigmawalk.strategies.risk;

import java.util.List;

/**
 * The factors of one window for a multi-index model (Method §11): G, L×K row-major over the
 * window rows (oldest first), and the columns of G each asset loads on.
 *
 * @param names the factors' names, length K
 * @param length L
 * @param values G, L×K row-major (owned, read-only)
 * @param columnsOf per asset (window order), the indices of the columns it loads on, ascending
 */
record FactorDesign(List<String> names, int length, double[] values, int[][] columnsOf) {
    FactorDesign {
        names = List.copyOf(names);
        if (values.length != length * names.size()) {
            throw new IllegalArgumentException("factor values (" + values.length + ") must be L*K with L = " + length
                    + ", K = " + names.size());
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("factor '" + names.get(i % names.size()) + "' in window row "
                        + i / names.size() + " (" + values[i] + ") must be finite");
            }
        }
    }

    /** K. */
    int factorCount() {
        return names.size();
    }
}
