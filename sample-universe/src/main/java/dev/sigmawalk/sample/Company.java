package dev.sigmawalk.sample;

import java.util.Objects;

/**
 * The true parameters of one invented company (annual figures, decimal).
 *
 * @param id sector code plus a number, e.g. {@code TW07}; digits keep it from looking like a
 *     ticker symbol
 * @param sector its sector
 * @param alpha true alpha, annual
 * @param beta true beta on the market factor, &gt; 0
 * @param residualVolatility residual volatility in calm times, annual, &gt; 0
 * @param firstRow first daily row with a return (0 = trades from the start)
 * @param lastRow last daily row with a return, ≥ firstRow
 */
record Company(String id, Sector sector, double alpha, double beta, double residualVolatility,
               int firstRow, int lastRow) {
    Company {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(sector, "sector");
        if (!(Double.isFinite(alpha))) {
            throw new IllegalArgumentException(id + ": alpha (" + alpha + ") must be finite");
        }
        if (!(beta > 0 && beta < 5)) {
            throw new IllegalArgumentException(id + ": beta (" + beta + ") must be in (0, 5)");
        }
        if (!(residualVolatility > 0 && residualVolatility < 2)) {
            throw new IllegalArgumentException(id + ": residual volatility (" + residualVolatility + ") must be in (0, 2)");
        }
        if (!(firstRow >= 0 && lastRow >= firstRow)) {
            throw new IllegalArgumentException(id + ": rows [" + firstRow + ", " + lastRow + "] need 0 <= first <= last");
        }
    }

    boolean tradesOn(int row) {
        return row >= firstRow && row <= lastRow;
    }
}
