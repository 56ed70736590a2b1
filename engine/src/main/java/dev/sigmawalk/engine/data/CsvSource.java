package dev.sigmawalk.engine.data;

import com.univocity.parsers.common.TextParsingException;
import com.univocity.parsers.csv.CsvParser;
import com.univocity.parsers.csv.CsvParserSettings;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Streams the records of one CSV file with the line each record sits on, so that every error can
 * name the line as a text editor counts it (the header being line 1).
 *
 * <p>Parsing is done by univocity-parsers, the CSV engine Tablesaw itself reads with, driven
 * record by record: a Tablesaw {@code Table} of string columns would keep every cell in a string
 * dictionary (gigabytes for 2 000 × 5 000 cells) and forgets the line numbers once blank lines are
 * skipped. Spreadsheet exports are accepted: a UTF-8 byte-order mark, CRLF or LF line ends, quoted
 * headers and fields, and whitespace around a cell (trimmed). Blank lines are skipped but still
 * counted. No cell may hold a line break: a quote left open is reported at the line where it opened.
 */
final class CsvSource implements AutoCloseable {
    /**
     * The parser clears a buffer of its column limit for every record, so the limit is sized
     * from the header line (every comma there may start a column) rather than set very large.
     */
    private static final int MIN_COLUMNS = 512;
    private static final int MAX_CHARS_PER_CELL = 100_000;

    private final Path file;
    private final CsvParser parser;
    private final List<String> header;

    private CsvSource(Path file, CsvParser parser, List<String> header) {
        this.file = file;
        this.parser = parser;
        this.header = header;
    }

    /**
     * Opens {@code file} and reads its header row.
     *
     * @throws InputException when the file is missing, unreadable or empty
     */
    static CsvSource open(Path file) {
        TextEncoding.requireUtf8(file, "data file");
        CsvParserSettings settings = new CsvParserSettings();
        settings.setNullValue("");
        settings.setEmptyValue("");
        settings.setMaxColumns(columnLimit(file));
        settings.setMaxCharsPerColumn(MAX_CHARS_PER_CELL);
        settings.setLineSeparatorDetectionEnabled(true);
        settings.setSkipEmptyLines(true);
        CsvParser parser = new CsvParser(settings);
        parser.beginParsing(file.toFile(), StandardCharsets.UTF_8);
        CsvSource source = new CsvSource(file, parser, null);
        String[] first = source.nextRaw();
        if (first == null) {
            parser.stopParsing();
            throw new InputException(new InputException.Location(file, 0, null),
                    "the file is empty; expected a header row");
        }
        List<String> names = new ArrayList<>(first.length);
        for (String cell : first) {
            String name = trim(cell);
            if (name.indexOf('\n') >= 0 || name.indexOf('\r') >= 0) {
                QuoteScan.Span span = QuoteScan.firstMultiLine(file);
                parser.stopParsing();
                throw span != null ? QuoteScan.unclosed(file, span)
                        : new InputException(new InputException.Location(file, 1, null), "a header cell holds a line break");
            }
            names.add(name);
        }
        return new CsvSource(file, parser, Collections.unmodifiableList(names));
    }

    /** An upper bound on the header's cells: commas on the first line plus one, at least 512. */
    private static int columnLimit(Path file) {
        try (java.io.BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String first = in.readLine();
            int commas = 0;
            for (int i = 0; first != null && i < first.length(); i++) {
                if (first.charAt(i) == ',') {
                    commas++;
                }
            }
            return Math.max(MIN_COLUMNS, commas + 2);
        } catch (java.io.IOException e) {
            throw InputFile.unreadable(file, e);
        }
    }

    Path file() {
        return file;
    }

    /** The header cells, trimmed. */
    List<String> header() {
        return header;
    }

    /**
     * The next record's cells, trimmed, or {@code null} at the end of the file. A record whose
     * cells are all empty (a line of nothing but commas, as a spreadsheet writes below its data)
     * is skipped like a blank line, as the wide reader skips it.
     *
     * @throws InputException at the line where a quote opened when a cell spans a line break
     */
    String[] next() {
        String[] cells = nextRaw();
        while (cells != null && allEmpty(cells)) {
            cells = nextRaw();
        }
        if (cells != null) {
            for (int i = 0; i < cells.length; i++) {
                cells[i] = trim(cells[i]);
                if (cells[i].indexOf('\n') >= 0 || cells[i].indexOf('\r') >= 0) {
                    QuoteScan.Span span = QuoteScan.firstMultiLine(file);
                    throw span != null ? QuoteScan.unclosed(file, span)
                            : new InputException(new InputException.Location(file, line(), null),
                                    "a cell holds a line break; expected one row per line");
                }
            }
        }
        return cells;
    }

    /** The 1-based line of the record last returned by {@link #next()}. */
    int line() {
        return (int) parser.getContext().currentLine();
    }

    private String[] nextRaw() {
        try {
            return parser.parseNext();
        } catch (TextParsingException e) {
            QuoteScan.Span span = QuoteScan.firstMultiLine(file);
            if (span != null) {
                throw QuoteScan.unclosed(file, span);
            }
            // The parser counts lines from 0.
            throw new InputException(new InputException.Location(file, (int) e.getLineIndex() + 1, null),
                    "cannot read this row as CSV; expected no more cells than the header ("
                            + (header == null ? "first row" : header.size() + " cells")
                            + "), closed quotes and cells under " + MAX_CHARS_PER_CELL + " characters");
        }
    }

    private static boolean allEmpty(String[] cells) {
        for (String c : cells) {
            if (!trim(c).isEmpty()) {
                return false;
            }
        }
        return true;
    }

    /** Strips surrounding whitespace and a stray byte-order mark; cheap when there is none. */
    private static String trim(String cell) {
        if (cell == null || cell.isEmpty()) {
            return "";
        }
        String s = cell.charAt(0) == '\uFEFF' ? cell.substring(1) : cell;
        if (s.isEmpty()) {
            return s;
        }
        if (Character.isWhitespace(s.charAt(0)) || Character.isWhitespace(s.charAt(s.length() - 1))) {
            return s.strip();
        }
        return s;
    }

    @Override
    public void close() {
        parser.stopParsing();
    }
}
