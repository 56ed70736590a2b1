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
        return new FactorTable(file, f.columns(), values);
    }
}
