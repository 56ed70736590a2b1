package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.ValueKind;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Reads a wide CSV (first column {@code date}, then one column per series) into a
 * {@link WideTable}, enforcing Method §1: ISO-8601 dates, strictly increasing with no
 * duplicates; distinct, non-empty column names; numeric cells (empty = missing); with prices,
 * every price strictly positive.
 */
final class WideCsvReader {
    private static final String DATE = "date";
    private static final int INITIAL_ROWS = 256;

    private WideCsvReader() {
    }

    /**
     * @param file the CSV
     * @param kind returns or prices (prices must be &gt; 0)
     * @param ratesColumn a column holding rates, exempt from the price rule; {@code null} for none
     * @throws InputException naming file, line, column and value of the first problem
     */
    static WideTable read(Path file, ValueKind kind, String ratesColumn) {
        try (CsvSource source = CsvSource.open(file)) {
            List<String> columns = valueColumns(source);
            int cols = columns.size();
            Rows rows = new Rows(cols);
            int ratesAt = columns.indexOf(ratesColumn);
            String[] cells;
            while ((cells = source.next()) != null) {
                int line = source.line();
                if (cells.length != cols + 1) {
                    throw new InputException(new InputException.Location(file, line, null),
                            "the row has " + cells.length + " cells but the header has " + (cols + 1));
                }
                LocalDate date = Cells.date(cells[0], file, line, DATE);
                rows.checkOrder(date, file, line, cells[0]);
                double[] target = rows.append(date, line);
                int base = (rows.count - 1) * cols;
                for (int j = 0; j < cols; j++) {
                    double v = Cells.number(cells[j + 1], file, line, columns.get(j));
                    Cells.requirePossible(v, kind == ValueKind.PRICES && j != ratesAt, cells[j + 1], file, line,
                            columns.get(j));
                    target[base + j] = v;
                }
            }
            if (rows.count == 0) {
                throw new InputException(new InputException.Location(file, 1, null),
                        "the header has no rows below it; expected at least one dated row");
            }
            return rows.toTable(file, columns);
        }
    }

    private static List<String> valueColumns(CsvSource source) {
        List<String> header = source.header();
        Path file = source.file();
        if (!DATE.equals(header.get(0))) {
            throw new InputException(new InputException.Location(file, 1, header.get(0)),
                    "the first column is '" + header.get(0) + "'; expected 'date'");
        }
        if (header.size() < 2) {
            throw new InputException(new InputException.Location(file, 1, null),
                    "the header names no column after 'date'");
        }
        Set<String> seen = new HashSet<>();
        List<String> columns = new ArrayList<>(header.size() - 1);
        for (int j = 1; j < header.size(); j++) {
            String name = header.get(j);
            if (name.isEmpty()) {
                throw new InputException(new InputException.Location(file, 1, null),
                        "header cell " + (j + 1) + " is empty; every column needs a name");
            }
            Names.requireInert(name, file, 1, null, "column");
            if (!seen.add(name)) {
                throw new InputException(new InputException.Location(file, 1, name),
                        "'" + name + "' names two columns; asset names must be distinct");
            }
            columns.add(name);
        }
        return columns;
    }

    /** Growing row-major storage; doubles its capacity so appends cost O(1) amortised. */
    private static final class Rows {
        private final int cols;
        private LocalDate[] dates = new LocalDate[INITIAL_ROWS];
        private int[] lines = new int[INITIAL_ROWS];
        private double[] values;
        private int count;
        private int lastLine;

        Rows(int cols) {
            this.cols = cols;
            this.values = new double[INITIAL_ROWS * cols];
        }

        void checkOrder(LocalDate date, Path file, int line, String cell) {
            if (count == 0) {
                return;
            }
            LocalDate previous = dates[count - 1];
            if (date.equals(previous)) {
                throw new InputException(new InputException.Location(file, line, DATE),
                        "'" + cell + "' repeats the date on line " + lastLine
                                + "; dates must be strictly increasing with no duplicates");
            }
            if (date.isBefore(previous)) {
                throw new InputException(new InputException.Location(file, line, DATE),
                        "'" + cell + "' comes before " + previous + " on line " + lastLine
                                + "; dates must be strictly increasing");
            }
        }

        /** Records the row's date and line and returns the array to write its values into. */
        double[] append(LocalDate date, int line) {
            if (count == dates.length) {
                int capacity = dates.length * 2;
                dates = Arrays.copyOf(dates, capacity);
                lines = Arrays.copyOf(lines, capacity);
                values = Arrays.copyOf(values, capacity * cols);
            }
            dates[count] = date;
            lines[count] = line;
            lastLine = line;
            count++;
            return values;
        }

        WideTable toTable(Path file, List<String> columns) {
            return new WideTable(file, columns, Arrays.copyOf(dates, count), Arrays.copyOf(lines, count),
                    Arrays.copyOf(values, count * cols));
        }
    }
}
