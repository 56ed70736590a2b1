package dev.sigmawalk.reports.files;

import com.fasterxml.jackson.core.io.NumberOutput;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * Writes one CSV file: header row, '\n' line ends, '.' decimal point, doubles in the shortest
 * form that round-trips, empty cells for absent values, UTF-8. Text cells are inert in a
 * spreadsheet and quoted when they hold a comma, quote or line break ({@link CsvCell}); number
 * cells are written by {@link #number} and are never changed.
 *
 * <p>Doubles are printed by jackson-core's port of Giulietti's Schubfach algorithm ("The
 * Schubfach way to render doubles", 2020), the algorithm of {@link Double#toString} since Java 19:
 * the format of {@link Double#toString} (plain from 10<sup>-3</sup> up to below 10<sup>7</sup>,
 * otherwise computerized scientific notation such as {@code 6.191552950165839E-4}), with the
 * fewest digits that read back as the same double. Java 17's {@link Double#toString} prints the
 * same text except where it keeps one digit too many ({@code 1.9999999999999998E23} for
 * {@code 2.0E23}); the walk's files never met such a value (every number cell of the research and
 * large benchmark cases is unchanged), and it is several times faster.
 *
 * <p>Rows go as bytes into a buffer of this writer, not through a character encoder: ASCII text
 * and numbers are copied as they are, other text is encoded once per cell.
 */
final class CsvWriter implements AutoCloseable {
    private static final int BUFFER = 1 << 16;
    /** Enough for any long: 19 digits and a sign. */
    private static final int LONG_DIGITS = 20;
    private static final byte[] ZERO = {'0', '.', '0'};
    private final Path file;
    private final OutputStream out;
    private final byte[] buffer = new byte[BUFFER];
    private int used;
    private boolean first = true;

    CsvWriter(Path file, String... header) {
        this.file = file;
        try {
            out = Files.newOutputStream(file);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
        for (String h : header) {
            text(h);
        }
        end();
    }

    /** A text cell. */
    CsvWriter text(String value) {
        sep();
        if (CsvCell.isPlain(value)) {
            ascii(value);
        } else {
            bytes(CsvCell.encode(value));
        }
        return this;
    }

    /** A text cell prepared once by the caller. */
    CsvWriter cell(CsvCell value) {
        sep();
        bytes(value.bytes());
        return this;
    }

    CsvWriter number(double value) {
        sep();
        if (Double.doubleToRawLongBits(value) == 0L) {
            // Most weights of a long-only portfolio with bounds are exactly zero.
            room(ZERO.length);
            System.arraycopy(ZERO, 0, buffer, used, ZERO.length);
            used += ZERO.length;
        } else if (Double.isFinite(value)) {
            ascii(NumberOutput.toString(value, true));
        }
        return this;
    }

    CsvWriter number(OptionalDouble value) {
        return value.isPresent() ? number(value.getAsDouble()) : empty();
    }

    /** An integer cell, its decimal digits written straight into the buffer. */
    CsvWriter integer(long value) {
        sep();
        room(LONG_DIGITS);
        if (value == Long.MIN_VALUE) {
            ascii(Long.toString(value));
            return this;
        }
        long rest = value;
        if (rest < 0) {
            buffer[used++] = '-';
            rest = -rest;
        }
        int end = used + digitCount(rest);
        for (int at = end - 1; at >= used; at--) {
            buffer[at] = (byte) ('0' + rest % 10);
            rest /= 10;
        }
        used = end;
        return this;
    }

    CsvWriter integer(OptionalInt value) {
        return value.isPresent() ? integer(value.getAsInt()) : empty();
    }

    CsvWriter empty() {
        sep();
        return this;
    }

    void end() {
        room(1);
        buffer[used++] = '\n';
        first = true;
    }

    @Override
    public void close() {
        try (OutputStream o = out) {
            flush();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    private static int digitCount(long nonNegative) {
        int count = 1;
        for (long v = nonNegative; v >= 10; v /= 10) {
            count++;
        }
        return count;
    }

    private void sep() {
        if (!first) {
            room(1);
            buffer[used++] = ',';
        }
        first = false;
    }

    /** Copies a text known to be ASCII, one byte per character. */
    private void ascii(String text) {
        int length = text.length();
        if (length > BUFFER) {
            bytes(text.getBytes(StandardCharsets.US_ASCII));
            return;
        }
        room(length);
        for (int i = 0; i < length; i++) {
            buffer[used + i] = (byte) text.charAt(i);
        }
        used += length;
    }

    private void bytes(byte[] cell) {
        if (cell.length > BUFFER) {
            flush();
            write(cell, cell.length);
            return;
        }
        room(cell.length);
        System.arraycopy(cell, 0, buffer, used, cell.length);
        used += cell.length;
    }

    private void room(int length) {
        if (used + length > BUFFER) {
            flush();
        }
    }

    private void flush() {
        write(buffer, used);
        used = 0;
    }

    private void write(byte[] bytes, int length) {
        try {
            out.write(bytes, 0, length);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }
}
