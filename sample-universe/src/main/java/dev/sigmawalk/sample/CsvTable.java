package dev.sigmawalk.sample;

import java.io.BufferedWriter;
import java.io.Closeable;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Writes one CSV file row by row: UTF-8, comma separated, {@code \n} line ends, ISO dates, values
 * in plain decimal at a fixed number of significant digits, an empty cell for NaN ("no value").
 * Cells are written as given, so they must not contain commas, quotes or line breaks.
 */
final class CsvTable implements Closeable {
    private static final int BUFFER_CHARS = 1 << 16;

    private final Path file;
    private final Writer out;
    private final SignificantDigits digits;
    private final int columns;
    private final StringBuilder line = new StringBuilder(256);
    private int cells;

    CsvTable(Path file, List<String> header, SignificantDigits digits) throws IOException {
        this.file = file;
        this.digits = digits;
        this.columns = header.size();
        this.out = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), BUFFER_CHARS);
        for (String cell : header) {
            requirePlain(cell);
        }
        out.write(String.join(",", header));
        out.write('\n');
    }

    /** Starts a row with its first cell. */
    CsvTable begin(String firstCell) {
        requirePlain(firstCell);
        line.setLength(0);
        line.append(firstCell);
        cells = 1;
        return this;
    }

    CsvTable text(String cell) {
        requirePlain(cell);
        line.append(',').append(cell);
        cells++;
        return this;
    }

    /** Appends a number cell, or an empty cell for NaN. */
    CsvTable number(double value) {
        line.append(',');
        if (!Double.isNaN(value)) {
            digits.append(line, value);
        }
        cells++;
        return this;
    }

    void end() throws IOException {
        if (cells != columns) {
            throw new IllegalStateException(file.getFileName() + ": row has " + cells
                    + " cells but the header has " + columns);
        }
        line.append('\n');
        out.append(line);
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    private void requirePlain(String cell) {
        if (cell.indexOf(',') >= 0 || cell.indexOf('"') >= 0 || cell.indexOf('\n') >= 0 || cell.indexOf('\r') >= 0) {
            throw new IllegalArgumentException(file.getFileName() + ": cell '" + cell
                    + "' must not contain commas, quotes or line breaks");
        }
    }
}
