package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.util.List;

/**
 * Method §1 for returns computed from prices: r_t = P_t / P_{t−1} − 1 obeys the bound a return
 * read from a file obeys ({@link Cells#LARGEST_RETURN}). Every price is already known positive
 * and finite, so r_t ≥ −1 holds by construction; only a jump by more than a factor of 10¹² (or
 * one whose quotient overflows to +∞) can break the bound. Such a jump is a data error (a lost
 * decimal point, a price in other units, a placeholder such as 1e-9 for "no price"), and it is
 * refused at the later price's cell, naming both prices and their lines, instead of reaching
 * the study's sums of fourth powers.
 */
final class PriceJumps {
    private PriceJumps() {
    }

    /**
     * @param table the assets file as read, prices
     * @param assetCols the table columns that are assets, in the order of {@code returns}' columns
     * @param returns panel rows × assetCols.size(), row-major, from {@link ValueConversion#convert}
     * @throws InputException at the first offending cell in file order (row, then column)
     */
    static void requireBounded(WideTable table, List<Integer> assetCols, double[] returns, int panelRows) {
        int cols = assetCols.size();
        for (int t = 0; t < panelRows; t++) {
            for (int k = 0; k < cols; k++) {
                double r = returns[t * cols + k];
                if (r > Cells.LARGEST_RETURN) {
                    int col = assetCols.get(k);
                    throw refusal(table.file(), table.columns().get(col), table.value(t, col),
                            table.line(t, col), table.value(t + 1, col), table.line(t + 1, col), r);
                }
            }
        }
    }

    /**
     * The market's (or a one-column series') returns from its prices.
     *
     * @param series the prices, one per row of the assets file
     * @param returns the returns computed from them, one fewer
     */
    static void requireBounded(SeriesColumn series, double[] returns) {
        for (int t = 0; t < returns.length; t++) {
            if (returns[t] > Cells.LARGEST_RETURN) {
                throw refusal(series.file(), series.column(), series.values()[t], series.lines()[t],
                        series.values()[t + 1], series.lines()[t + 1], returns[t]);
            }
        }
    }

    private static InputException refusal(Path file, String column, double before, int beforeLine, double after,
                                          int afterLine, double r) {
        String size = Double.isInfinite(r) ? "a return too large for a number" : "a return of " + r;
        return new InputException(new InputException.Location(file, afterLine, column),
                "the price " + after + " after " + before + " (line " + beforeLine + ") gives " + size
                        + ", above 1e12 (a gain of a hundred trillion percent in one period), which no asset earns;"
                        + " expected prices in one unit throughout: check both prices for a lost decimal point, a"
                        + " change of unit or a placeholder standing for a missing price (leave the cell empty)");
    }
}
