package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.ValueKind;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Reads an assets file in the long layout ({@code data.layout: long}): header
 * {@code date,asset,value}, one fact per row, rows in any order, into the same {@link WideTable}
 * a wide file gives. Rows become the distinct dates in increasing order; columns the distinct
 * assets in increasing order of their names ({@link String#compareTo}), so the row order of the
 * file never changes a result. A (date, asset) pair the file does not give is missing, exactly
 * like an empty cell of a wide file; an empty value is missing too. Every cell is validated as in
 * the wide file (Method §1) and located at its own line.
 */
final class LongAssetsReader {
    private static final List<String> HEADER = List.of("date", "asset", "value");
    private static final int INITIAL = 1024;

    private LongAssetsReader() {
    }

    /**
     * @param file the long CSV
     * @param kind returns or prices (prices must be &gt; 0)
     * @param ratesColumn an asset holding rates (a risk-free column), exempt from the price rule; {@code null} for none
     * @throws InputException naming file, line, column and value of the first problem
     */
    static WideTable read(Path file, ValueKind kind, String ratesColumn) {
        Facts facts = new Facts();
        Map<String, Integer> assetIds = new HashMap<>();
        List<String> names = new ArrayList<>();
        try (CsvSource source = CsvSource.open(file)) {
            LongCsv.requireHeader(source, HEADER);
            String[] cells;
            while ((cells = source.next()) != null) {
                int line = source.line();
                LongCsv.requireWidth(source, cells, HEADER.size(), line);
                LocalDate date = Cells.date(cells[0], file, line, "date");
                String asset = Names.requireInert(LongCsv.requireText(source, cells[1], line, "asset"), file, line,
                        "asset", "asset");
                double v = Cells.number(cells[2], file, line, "value");
                Cells.requirePossible(v, kind == ValueKind.PRICES && !asset.equals(ratesColumn), cells[2], file, line,
                        "value");
                Integer id = assetIds.get(asset);
                if (id == null) {
                    id = names.size();
                    assetIds.put(asset, id);
                    names.add(asset);
                }
                facts.add(date, id, v, line);
            }
        }
        if (facts.count == 0) {
            throw new InputException(new InputException.Location(file, 1, null),
                    "the header has no rows below it; expected rows of date,asset,value");
        }
        return facts.toTable(file, names, assetIds);
    }

    /** The rows as read, in file order, in growing primitive arrays. */
    private static final class Facts {
        private LocalDate[] dates = new LocalDate[INITIAL];
        private int[] assets = new int[INITIAL];
        private double[] values = new double[INITIAL];
        private int[] lines = new int[INITIAL];
        private int count;

        void add(LocalDate date, int asset, double value, int line) {
            if (count == dates.length) {
                int capacity = count * 2;
                dates = Arrays.copyOf(dates, capacity);
                assets = Arrays.copyOf(assets, capacity);
                values = Arrays.copyOf(values, capacity);
                lines = Arrays.copyOf(lines, capacity);
            }
            dates[count] = date;
            assets[count] = asset;
            values[count] = value;
            lines[count] = line;
            count++;
        }

        WideTable toTable(Path file, List<String> names, Map<String, Integer> ids) {
            TreeMap<LocalDate, Integer> firstLine = new TreeMap<>();
            for (int f = 0; f < count; f++) {
                firstLine.merge(dates[f], lines[f], Math::min);
            }
            Map<LocalDate, Integer> row = new HashMap<>();
            LocalDate[] rowDates = new LocalDate[firstLine.size()];
            int[] rowLines = new int[rowDates.length];
            for (Map.Entry<LocalDate, Integer> e : firstLine.entrySet()) {
                rowDates[row.size()] = e.getKey();
                rowLines[row.size()] = e.getValue();
                row.put(e.getKey(), row.size());
            }
            List<String> sorted = new ArrayList<>(names);
            sorted.sort(null);
            int[] column = new int[names.size()];
            for (int c = 0; c < sorted.size(); c++) {
                column[ids.get(sorted.get(c))] = c;
            }
            int cols = sorted.size();
            double[] cells = new double[rowDates.length * cols];
            Arrays.fill(cells, Double.NaN);
            int[] cellLines = new int[cells.length];
            for (int f = 0; f < count; f++) {
                int at = row.get(dates[f]) * cols + column[assets[f]];
                if (cellLines[at] != 0) {
                    throw new InputException(new InputException.Location(file, lines[f], "asset"),
                            "'" + names.get(assets[f]) + "' on " + dates[f] + " is already given on line " + cellLines[at]
                                    + "; expected one row per date and asset");
                }
                cells[at] = values[f];
                cellLines[at] = lines[f];
            }
            return new WideTable(file, sorted, rowDates, rowLines, cells, cellLines);
        }
    }
}
