package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.ValueKind;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Arrays;

/** Reads a factor file and aligns it to the panel's rows (Method §11). */
final class FactorFileReader {
    private FactorFileReader() {
    }

    /**
     * @param file the CSV {@code date,<f1>,...} of per-period returns
     * @param assets the assets file as read
     * @param offset assets-file rows before panel row 0 (1 with prices)
     * @param panel the cut panel
     * @param firstNeeded the first panel row any window reads (τ_0 − L_max + 1)
     * @param firstRebalance τ_0, for the message
     * @throws InputException at the first needed date the file has no row for, its first empty
     *                        cell on a needed row, or its first row inside a needed period ({@link InsidePeriod})
     */
    static FactorTable read(Path file, WideTable assets, int offset, ReturnPanel panel, int firstNeeded,
                            int firstRebalance) {
        WideTable f = WideCsvReader.read(file, ValueKind.RETURNS, null).table();
        int k = f.columnCount();
        double[] values = new double[panel.rows() * k];
        Arrays.fill(values, Double.NaN);
        String span = " on every date from " + panel.date(firstNeeded) + " (the start of the longest window before the"
                + " first rebalance on " + panel.date(firstRebalance) + ") to " + panel.date(panel.rows() - 1);
        LocalDate[] have = f.dates();
        int r = 0;
        for (int t = firstNeeded; t < panel.rows(); t++) {
            LocalDate want = panel.date(t);
            while (r < have.length && have[r].isBefore(want)) {
                if (t > 0 && have[r].isAfter(panel.date(t - 1))) {
                    throw InsidePeriod.refusal(file, f.lines()[r], have[r], panel.date(t - 1), want,
                            assets.file());
                }
                r++;
            }
            if (r == have.length || !have[r].equals(want)) {
                throw new InputException(new InputException.Location(assets.file(), assets.lines()[t + offset], "date"),
                        "'" + want + "' has no row in " + file.getFileName() + "; the factors need a row" + span);
            }
            for (int a = 0; a < k; a++) {
                double v = f.value(r, a);
                if (Double.isNaN(v)) {
                    throw new InputException(new InputException.Location(file, f.lines()[r], f.columns().get(a)),
                            "'' is missing; the factors need a value" + span);
                }
                values[t * k + a] = v;
            }
        }
        requireDistinct(file, f, values, firstNeeded, panel.rows(), span);
        return new FactorTable(file, f.columns(), values);
    }

    /**
     * Two factors with the same return on every row a window reads (a column pasted twice) make
     * every regression's loadings unidentified (Method §11), so every rebalance of the model
     * would fail; the file is refused at the second column instead.
     */
    private static void requireDistinct(Path file, WideTable f, double[] values, int firstNeeded, int rows,
                                        String span) {
        int k = f.columnCount();
        for (int b = 1; b < k; b++) {
            for (int a = 0; a < b; a++) {
                boolean same = true;
                for (int t = firstNeeded; t < rows && same; t++) {
                    same = values[t * k + a] == values[t * k + b];
                }
                if (same) {
                    throw new InputException(new InputException.Location(file, 1, f.columns().get(b)),
                            "factor '" + f.columns().get(b) + "' has the same return as '" + f.columns().get(a) + "'"
                                    + span + ", so no model can tell their loadings apart; expected distinct"
                                    + " factors: remove one of the two columns");
                }
            }
        }
    }
}
