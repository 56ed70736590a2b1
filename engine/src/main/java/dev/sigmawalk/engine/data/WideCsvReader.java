package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.ValueKind;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Reads a wide CSV (first column {@code date}, then one column per series) into a
 * {@link WideTable}, enforcing Method §1: ISO-8601 dates, strictly increasing with no
 * duplicates; distinct, non-empty column names; numeric cells (empty = missing); with prices,
 * every price strictly positive; no return below -1.
 *
 * <p>The file is read once, in large chunks, straight from bytes: a plain data line is cut at
 * its commas and every number is parsed by {@link DecimalBytes} into one row-major
 * {@code double[]}, with no string per cell, while {@link ByteChunks} takes the file's SHA-256
 * on the way. Only the header line, a line holding a quoted cell and a faulty cell go through
 * text. Accepted as spreadsheets export them: a UTF-8 byte-order mark, LF, CRLF or CR line ends,
 * blanks around cells, quoted cells; blank lines, and lines of nothing but commas, are skipped
 * but counted, so every line number is the one a text editor shows. A header that ends in empty
 * cells (columns beside the data that a spreadsheet once saw used or formatted) is read without
 * them, as long as every row leaves those cells empty too or stops before them; a value under a
 * column without a name is refused at its line and cell.
 */
final class WideCsvReader {
    private static final String DATE = "date";
    private static final int INITIAL_ROWS = 256;
    /** {@link #record} results besides a parsed or skipped line. */
    private static final int MORE = -1;
    private static final int END = -2;

    private final Path file;
    private final ByteChunks in;
    private final ValueKind kind;
    private final String ratesColumn;
    private final DecimalBytes number = new DecimalBytes();
    private List<String> columns;
    /** Empty cells that end the header, read past (empty) in every row. */
    private int unnamed;
    private boolean[] positive;
    private RowStore rows;
    private byte[] b;
    private int pos;
    private int limit;
    private int line = 1;
    /** Bytes dropped from the front of the buffer so far: file offset = dropped + buffer position. */
    private long dropped;

    /** A wide file's table and the fingerprint of the bytes it was read from. */
    record Read(WideTable table, FileFingerprint fingerprint) {
    }

    private WideCsvReader(Path file, ByteChunks in, ValueKind kind, String ratesColumn) {
        this.file = file;
        this.in = in;
        this.kind = kind;
        this.ratesColumn = ratesColumn;
    }

    /**
     * @param file the CSV
     * @param kind returns or prices (prices must be &gt; 0)
     * @param ratesColumn a column holding rates, exempt from the price rule; {@code null} for none
     * @throws InputException naming file, line, column and value of the first problem
     */
    static Read read(Path file, ValueKind kind, String ratesColumn) {
        try (ByteChunks in = new ByteChunks(file, "data file")) {
            WideCsvReader reader = new WideCsvReader(file, in, kind, ratesColumn);
            WideTable table = reader.readAll();
            return new Read(table, in.fingerprint());
        }
    }

    private WideTable readAll() {
        refill(0);
        if (limit == 0) {
            throw new InputException(new InputException.Location(file, 0, null), "the file is empty; expected a header row");
        }
        String problem = TextEncoding.sniff(b, limit);
        if (problem != null) {
            throw new InputException(new InputException.Location(file, 1, null), problem);
        }
        if (limit >= 3 && (b[0] & 0xFF) == 0xEF && (b[1] & 0xFF) == 0xBB && (b[2] & 0xFF) == 0xBF) {
            pos = 3;
        }
        columns = valueColumns(header());
        positive = new boolean[columns.size()];
        for (int j = 0; j < positive.length; j++) {
            positive[j] = kind == ValueKind.PRICES && !columns.get(j).equals(ratesColumn);
        }
        rows = new RowStore(columns.size(), in.size(), dropped + pos, INITIAL_ROWS);
        while (true) {
            int r = record();
            if (r == END) {
                break;
            }
            if (r == MORE) {
                refill(pos);
            }
        }
        if (rows.count == 0) {
            throw new InputException(new InputException.Location(file, 1, null),
                    "the header has no rows below it; expected at least one dated row");
        }
        return rows.toTable(file, columns);
    }

    private void refill(int keepFrom) {
        int shift = in.refill(keepFrom);
        dropped += shift;
        pos -= shift;
        b = in.bytes();
        limit = in.limit();
    }

    /** The first non-blank line's cells. */
    private List<String> header() {
        while (true) {
            int end = lineEnd(pos);
            if (end < 0) {
                if (in.atEnd()) {
                    end = limit;
                } else {
                    refill(pos);
                    continue;
                }
            }
            List<String> cells = CsvLine.split(b, pos, end, file, line);
            int next = consumeLineEnd(end);
            if (next == MORE) {
                refill(pos);
                continue;
            }
            pos = next;
            if (cells.size() > 1 || !cells.get(0).isEmpty()) {
                return cells;
            }
            if (pos >= limit && in.atEnd()) {
                throw new InputException(new InputException.Location(file, 0, null), "the file is empty; expected a header row");
            }
        }
    }

    /** The first line break at or after {@code p}, or -1 when the buffer ends first. */
    private int lineEnd(int p) {
        while (p < limit && b[p] != '\n' && b[p] != '\r') {
            p++;
        }
        return p < limit ? p : -1;
    }

    /**
     * Steps over the line break at {@code p} (LF, CRLF or CR; or the end of the file) and counts
     * the line; {@link #MORE} when a CR ends the buffer and an LF may follow.
     */
    private int consumeLineEnd(int p) {
        if (p >= limit) {
            if (!in.atEnd()) {
                return MORE;
            }
            line++;
            return p;
        }
        if (b[p] == '\r') {
            if (p + 1 >= limit && !in.atEnd()) {
                return MORE;
            }
            line++;
            return p + 1 < limit && b[p + 1] == '\n' ? p + 2 : p + 1;
        }
        line++;
        return p + 1;
    }

    /**
     * Parses the line at {@link #pos}: stores its row, or skips it when blank.
     *
     * @return 0, or {@link #MORE} when the buffer ends inside the line, or {@link #END}
     */
    private int record() {
        final byte[] b = this.b;
        final int limit = this.limit;
        final boolean last = in.atEnd();
        int p = pos;
        if (p >= limit) {
            return last ? END : MORE;
        }
        int s = p;
        while (p < limit && b[p] != ',' && b[p] != '\n' && b[p] != '\r') {
            p++;
        }
        if (p == limit && !last) {
            return MORE;
        }
        int ds = trimStart(b, s, p);
        int de = trimEnd(b, ds, p);
        boolean lineEnds = p == limit || b[p] != ',';
        if (ds == de && !lineEnds) {
            // A row of nothing but separators, as a spreadsheet writes below its data where the
            // sheet's formatting reaches further: no cell to read, so skipped like a blank line.
            int q = p;
            while (q < limit && (b[q] == ',' || b[q] == ' ' || b[q] == '\t')) {
                q++;
            }
            if (q == limit && !last) {
                return MORE;
            }
            if (q == limit || b[q] == '\n' || b[q] == '\r') {
                p = q;
                lineEnds = true;
            }
        }
        if (lineEnds && ds == de) {
            int next = consumeLineEnd(p);
            if (next == MORE) {
                return MORE;
            }
            pos = next;
            return 0;
        }
        if (ds < de && b[ds] == '"') {
            return quotedRecord();
        }
        LocalDate date = date(b, ds, de);
        if (!rows.isAfterLast(date)) {
            rows.requireAfterLast(date, file, line, CellText.decode(b, ds, de, file, line));
        }
        int cols = columns.size();
        double[] target = rows.ensureRoom();
        int base = rows.count * cols;
        for (int j = 0; j < cols; j++) {
            if (p == limit || b[p] != ',') {
                return wrongWidth(j + 1);
            }
            p++;
            while (p < limit && (b[p] == ' ' || b[p] == '\t')) {
                p++;
            }
            if (p < limit && b[p] != ',' && b[p] != '\n' && b[p] != '\r' && b[p] != '"' && number.scan(b, p, limit)) {
                int q = number.end;
                while (q < limit && (b[q] == ' ' || b[q] == '\t')) {
                    q++;
                }
                if (q == limit && !last) {
                    return MORE;
                }
                if (q == limit || b[q] == ',' || b[q] == '\n' || b[q] == '\r') {
                    double v = number.value;
                    if (positive[j] ? !(v > 0) : v < -1 || v > Cells.LARGEST_RETURN) {
                        Cells.requirePossible(v, positive[j], CellText.decode(b, p, number.end, file, line), file, line,
                                columns.get(j));
                    }
                    target[base + j] = v;
                    p = q;
                    continue;
                }
            }
            // Empty, quoted or unusual cells: find the cell's end and read it as text.
            s = p;
            while (p < limit && b[p] != ',' && b[p] != '\n' && b[p] != '\r') {
                p++;
            }
            if (p == limit && !last) {
                return MORE;
            }
            int ve = trimEnd(b, s, p);
            if (s < ve && b[s] == '"') {
                return quotedRecord();
            }
            double v = DecimalBytes.parse(b, s, ve, file, line, columns.get(j));
            if (positive[j] ? !(v > 0) && v == v : v < -1 || v > Cells.LARGEST_RETURN) {
                Cells.requirePossible(v, positive[j], CellText.decode(b, s, ve, file, line), file, line, columns.get(j));
            }
            target[base + j] = v;
        }
        for (int k = 0; k < unnamed && p < limit && b[p] == ','; k++) {
            p++;
            while (p < limit && (b[p] == ' ' || b[p] == '\t')) {
                p++;
            }
            if (p == limit && !last) {
                return MORE;
            }
            if (p < limit && b[p] != ',' && b[p] != '\n' && b[p] != '\r') {
                return valueWithoutColumn(cols + 2 + k);
            }
        }
        if (p < limit && b[p] == ',') {
            return wrongWidth(cols + unnamed + 2);
        }
        int next = consumeLineEnd(p);
        if (next == MORE) {
            return MORE;
        }
        rows.commit(date, line - 1, dropped + next);
        pos = next;
        return 0;
    }

    private LocalDate date(byte[] b, int s, int e) {
        if (e - s == 10 && b[s + 4] == '-' && b[s + 7] == '-') {
            int y = digits(b, s, 4);
            int m = digits(b, s + 5, 2);
            int d = digits(b, s + 8, 2);
            if (y >= 0 && m >= 0 && d >= 0) {
                try {
                    return LocalDate.of(y, m, d);
                } catch (DateTimeException e2) {
                    // Falls through to the text path, which words the message.
                }
            }
        }
        return Cells.date(CellText.decode(b, s, e, file, line), file, line, DATE);
    }

    /** The value of {@code n} ASCII digits at {@code s}, or -1 when one is not a digit. */
    private static int digits(byte[] b, int s, int n) {
        int v = 0;
        for (int i = s; i < s + n; i++) {
            int c = b[i] - '0';
            if (c < 0 || c > 9) {
                return -1;
            }
            v = v * 10 + c;
        }
        return v;
    }

    private static int trimStart(byte[] b, int s, int e) {
        while (s < e && (b[s] == ' ' || b[s] == '\t')) {
            s++;
        }
        return s;
    }

    private static int trimEnd(byte[] b, int s, int e) {
        while (e > s && (b[e - 1] == ' ' || b[e - 1] == '\t')) {
            e--;
        }
        return e;
    }

    /** The row's cells counted to its end, for the message about a row of the wrong width. */
    private int wrongWidth(int seen) {
        int p = pos;
        int end = lineEnd(p);
        if (end < 0 && !in.atEnd()) {
            return MORE;
        }
        List<String> cells = CsvLine.split(b, p, end < 0 ? limit : end, file, line);
        throw new InputException(new InputException.Location(file, line, null),
                "the row has " + Math.max(seen, cells.size()) + " cells but the header has " + headerCells());
    }

    /** The header's cell count as the file has it, its empty cells at the end included. */
    private String headerCells() {
        int named = columns.size() + 1;
        return unnamed == 0 ? String.valueOf(named)
                : (named + unnamed) + " (" + named + " named, then " + unnamed + " empty)";
    }

    /** A line with a value in cell {@code cell} (counted from 1), past the header's named cells. */
    private int valueWithoutColumn(int cell) {
        int end = lineEnd(pos);
        if (end < 0 && !in.atEnd()) {
            return MORE;
        }
        List<String> cells = CsvLine.split(b, pos, end < 0 ? limit : end, file, line);
        throw unnamedValue(cells, cell);
    }

    private InputException unnamedValue(List<String> cells, int cell) {
        return new InputException(new InputException.Location(file, line, null),
                "cell " + cell + " holds '" + cells.get(cell - 1) + "' but the header names no column there (it names "
                        + (columns.size() + 1) + " cells, then " + unnamed + " empty); name the column or delete the"
                        + " value");
    }

    /** A line with a quoted cell, read through text like the header. */
    private int quotedRecord() {
        int end = lineEnd(pos);
        if (end < 0 && !in.atEnd()) {
            return MORE;
        }
        int stop = end < 0 ? limit : end;
        List<String> cells = CsvLine.split(b, pos, stop, file, line);
        int cols = columns.size();
        if (cells.size() < cols + 1 || cells.size() > cols + 1 + unnamed) {
            throw new InputException(new InputException.Location(file, line, null),
                    "the row has " + cells.size() + " cells but the header has " + headerCells());
        }
        for (int k = cols + 1; k < cells.size(); k++) {
            if (!cells.get(k).isEmpty()) {
                throw unnamedValue(cells, k + 1);
            }
        }
        LocalDate date = Cells.date(cells.get(0), file, line, DATE);
        rows.requireAfterLast(date, file, line, cells.get(0));
        double[] target = rows.ensureRoom();
        int base = rows.count * cols;
        for (int j = 0; j < cols; j++) {
            double v = Cells.number(cells.get(j + 1), file, line, columns.get(j));
            Cells.requirePossible(v, positive[j], cells.get(j + 1), file, line, columns.get(j));
            target[base + j] = v;
        }
        int next = consumeLineEnd(stop);
        if (next == MORE) {
            return MORE;
        }
        rows.commit(date, line - 1, dropped + next);
        pos = next;
        return 0;
    }

    private List<String> valueColumns(List<String> header) {
        int named = header.size();
        while (named > 2 && header.get(named - 1).isEmpty()) {
            named--;
        }
        unnamed = header.size() - named;
        header = header.subList(0, named);
        if (!DATE.equals(header.get(0))) {
            throw new InputException(new InputException.Location(file, 1, header.get(0)),
                    "the first column is '" + header.get(0) + "'; expected 'date'"
                            + CellHints.header(header.get(0)));
        }
        if (header.size() < 2) {
            throw new InputException(new InputException.Location(file, 1, null),
                    "the header names no column after 'date'");
        }
        Set<String> seen = new HashSet<>();
        List<String> names = new ArrayList<>(header.size() - 1);
        for (int j = 1; j < header.size(); j++) {
            String name = header.get(j);
            if (name.isEmpty()) {
                throw new InputException(new InputException.Location(file, 1, null),
                        "header cell " + (j + 1) + " is empty; every column needs a name");
            }
            Names.requireInert(name, file, 1, null, "column");
            if (!seen.add(name)) {
                throw new InputException(new InputException.Location(file, 1, name),
                        "'" + name + "' names two columns; expected each column's name once (an asset's, a series'"
                                + " or a factor's)");
            }
            names.add(name);
        }
        return names;
    }
}
