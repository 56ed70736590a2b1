package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.Names;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * Writes one CSV file: header row, '\n' line ends, '.' decimal point, doubles in the shortest
 * form that round-trips ({@link Double#toString}), empty cells for absent values. Text cells are
 * quoted when they hold a comma, quote or line break (RFC 4180).
 *
 * <p>Every text cell is inert in a spreadsheet: one that starts with {@code =}, {@code +},
 * {@code -}, {@code @}, a tab or a carriage return (which a spreadsheet runs as a formula) gets a
 * leading apostrophe, as the OWASP guidance on CSV injection advises. Names from the inputs
 * never need it, since intake refuses them; the rule guards text the tool composes, such as
 * notes. Number cells are written by {@link #number} and are never changed.
 */
final class CsvWriter implements AutoCloseable {
    private static final java.util.regex.Pattern PLAIN_NUMBER =
            java.util.regex.Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private final BufferedWriter out;
    private final StringBuilder line = new StringBuilder(256);
    private boolean first = true;

    CsvWriter(Path file, String... header) {
        try {
            out = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
        for (String h : header) {
            text(h);
        }
        end();
    }

    CsvWriter text(String value) {
        sep();
        value = inert(value);
        if (value.indexOf(',') >= 0 || value.indexOf('"') >= 0 || value.indexOf('\n') >= 0 || value.indexOf('\r') >= 0) {
            line.append('"').append(value.replace("\"", "\"\"")).append('"');
        } else {
            line.append(value);
        }
        return this;
    }

    /** {@code value} with a leading apostrophe when a spreadsheet would take it as a formula. */
    static String inert(String value) {
        if (!Names.startsLikeFormula(value) || isPlainNumber(value)) {
            return value;
        }
        return "'" + value;
    }

    /** A signed decimal such as {@code -0.5} or {@code +1e-3}: a spreadsheet reads it as a number. */
    private static boolean isPlainNumber(String value) {
        return PLAIN_NUMBER.matcher(value).matches();
    }

    CsvWriter number(double value) {
        sep();
        if (Double.isFinite(value)) {
            line.append(value);
        }
        return this;
    }

    CsvWriter number(OptionalDouble value) {
        return value.isPresent() ? number(value.getAsDouble()) : empty();
    }

    CsvWriter integer(long value) {
        sep();
        line.append(value);
        return this;
    }

    CsvWriter integer(OptionalInt value) {
        return value.isPresent() ? integer(value.getAsInt()) : empty();
    }

    CsvWriter empty() {
        sep();
        return this;
    }

    private void sep() {
        if (!first) {
            line.append(',');
        }
        first = false;
    }

    void end() {
        line.append('\n');
        try {
            out.append(line);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write CSV row", e);
        }
        line.setLength(0);
        first = true;
    }

    @Override
    public void close() {
        try {
            out.close();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot close CSV file", e);
        }
    }
}
