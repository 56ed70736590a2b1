package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.Names;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * One text cell of a CSV file as the UTF-8 bytes {@link CsvWriter} writes for it: inert in a
 * spreadsheet, then quoted when it holds a comma, quote or line break (RFC 4180); or a few
 * adjacent cells joined ({@link #then}). A file writer prepares a cell once for a value it
 * repeats on many rows (a date, a strategy, an asset name), so the checks and the encoding are
 * not redone per row.
 *
 * <p>Inert: a text that starts with {@code =}, {@code +}, {@code -}, {@code @}, a tab or a
 * carriage return (which a spreadsheet runs as a formula) gets a leading apostrophe, as the OWASP
 * guidance on CSV injection advises, unless it is a plain signed decimal such as {@code -0.5},
 * which a spreadsheet reads as a number. Names from the inputs never need it, since intake
 * refuses them; the rule guards text the tool composes, such as notes.
 */
final class CsvCell {
    private static final Pattern PLAIN_NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private final byte[] bytes;

    private CsvCell(byte[] bytes) {
        this.bytes = bytes;
    }

    /** The cell that holds {@code value}. */
    static CsvCell of(String value) {
        return new CsvCell(encode(value));
    }

    /** The cell that holds the decimal digits of {@code value}, as {@link CsvWriter#integer} writes them. */
    static CsvCell integer(long value) {
        return new CsvCell(Long.toString(value).getBytes(StandardCharsets.US_ASCII));
    }

    /**
     * This cell and {@code next} as one piece of a row, comma between: a file writer joins the
     * cells that open every row of a rebalance (date, strategy, window) and writes them at once.
     */
    CsvCell then(CsvCell next) {
        byte[] joined = new byte[bytes.length + 1 + next.bytes.length];
        System.arraycopy(bytes, 0, joined, 0, bytes.length);
        joined[bytes.length] = ',';
        System.arraycopy(next.bytes, 0, joined, bytes.length + 1, next.bytes.length);
        return new CsvCell(joined);
    }

    /** The bytes written for this cell (not a copy: callers only read them). */
    byte[] bytes() {
        return bytes;
    }

    /**
     * Whether {@code value} is written byte for byte as its characters: ASCII, not formula-like,
     * nothing to quote. Most cells are; {@link CsvWriter} then copies them without encoding.
     */
    static boolean isPlain(String value) {
        if (Names.startsLikeFormula(value)) {
            return false;
        }
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            if (c >= 0x80 || c == ',' || c == '"' || c == '\n' || c == '\r') {
                return false;
            }
        }
        return true;
    }

    /**
     * The bytes of the cell holding {@code value}: inert, quoted where needed, UTF-8.
     *
     * @throws IllegalArgumentException if {@code value} holds an unpaired UTF-16 surrogate, which
     *         has no UTF-8 form (the file would otherwise get a silent {@code ?} in its place)
     */
    static byte[] encode(String value) {
        requireWhole(value);
        String text = inert(value);
        if (text.indexOf(',') >= 0 || text.indexOf('"') >= 0 || text.indexOf('\n') >= 0 || text.indexOf('\r') >= 0) {
            text = '"' + text.replace("\"", "\"\"") + '"';
        }
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private static void requireWhole(String value) {
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < value.length() && Character.isLowSurrogate(value.charAt(i + 1))) {
                i++;
            } else if (Character.isSurrogate(c)) {
                throw new IllegalArgumentException("text cell '" + value + "' has an unpaired UTF-16 surrogate (U+"
                        + Integer.toHexString(c).toUpperCase(Locale.ROOT) + ") at index " + i
                        + ", which UTF-8 cannot encode");
            }
        }
    }

    /** {@code value} with a leading apostrophe when a spreadsheet would take it as a formula. */
    static String inert(String value) {
        if (!Names.startsLikeFormula(value) || PLAIN_NUMBER.matcher(value).matches()) {
            return value;
        }
        return "'" + value;
    }

    /** Cells prepared once per distinct value, for values that recur in no known order (asset names). */
    static final class Cache {
        private final Map<String, CsvCell> cells = new HashMap<>();

        CsvCell of(String value) {
            return cells.computeIfAbsent(value, CsvCell::of);
        }
    }
}
