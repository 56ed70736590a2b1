package dev.sigmawalk.engine.data;

import java.nio.file.Path;

/**
 * Parses one trimmed CSV cell of ASCII bytes as a decimal number without building a string,
 * giving exactly the double {@link Double#parseDouble} gives (bit for bit), or the
 * {@link InputException} of {@link Cells#number} for anything that is not a number.
 *
 * <p>The fast path is Clinger's (W. D. Clinger, "How to read floating point numbers
 * accurately", PLDI 1990, §5): when the significant digits form an integer m &le; 2^53 and the
 * decimal exponent q has |q| &le; 22, both m and 10^|q| are exact doubles, so the one IEEE
 * multiplication or division m·10^q rounds correctly, which is what {@code parseDouble}
 * promises too. Spreadsheet exports (at most 15 significant digits) and the sample generator
 * (8) always take it. Longer mantissas, larger exponents and every malformed cell go to the
 * string path, which is rare and gives the same answer or the same message.
 */
final class DecimalBytes {
    /** The value found by the last successful {@link #scan}. */
    double value;
    /** One past the last byte of that number. */
    int end;

    /** 2^53: every integer up to it is an exact double. */
    private static final long EXACT_INTEGER = 1L << 53;
    /** Significant digits accumulated in a long before giving up the fast path (10^18 < 2^63). */
    private static final int MAX_DIGITS = 18;
    private static final int MAX_POWER = 22;
    private static final double[] POWERS = new double[MAX_POWER + 1];

    static {
        double p = 1.0;
        for (int i = 0; i <= MAX_POWER; i++) {
            POWERS[i] = p;
            p *= 10.0;
        }
    }

    /** A scanner for one reader; {@link #scan} leaves its result in the fields. */
    DecimalBytes() {
    }

    /**
     * @param b the bytes
     * @param s first byte of the cell, after leading blanks
     * @param e one past the last byte, before trailing blanks; {@code s == e} is an empty cell (NaN)
     */
    static double parse(byte[] b, int s, int e, Path file, int line, String column) {
        if (s == e) {
            return Double.NaN;
        }
        int i = s;
        boolean negative = false;
        if (b[i] == '-' || b[i] == '+') {
            negative = b[i] == '-';
            i++;
        }
        long m = 0;
        int significant = 0;
        int digits = 0;
        int scale = 0;
        boolean point = false;
        for (; i < e; i++) {
            int c = b[i] - '0';
            if (c >= 0 && c <= 9) {
                digits++;
                if (m != 0 || c != 0) {
                    significant++;
                    m = m * 10 + c;
                }
                if (point) {
                    scale--;
                }
            } else if (b[i] == '.' && !point) {
                point = true;
            } else {
                break;
            }
        }
        if (digits == 0) {
            return slow(b, s, e, file, line, column);
        }
        int exponent = 0;
        if (i < e) {
            if (b[i] != 'e' && b[i] != 'E') {
                return slow(b, s, e, file, line, column);
            }
            i++;
            boolean negativeExponent = false;
            if (i < e && (b[i] == '-' || b[i] == '+')) {
                negativeExponent = b[i] == '-';
                i++;
            }
            int expDigits = 0;
            for (; i < e; i++) {
                int c = b[i] - '0';
                if (c < 0 || c > 9 || expDigits == 4) {
                    return slow(b, s, e, file, line, column);
                }
                exponent = exponent * 10 + c;
                expDigits++;
            }
            if (expDigits == 0) {
                return slow(b, s, e, file, line, column);
            }
            exponent = negativeExponent ? -exponent : exponent;
        }
        if (significant > MAX_DIGITS || m > EXACT_INTEGER) {
            return slow(b, s, e, file, line, column);
        }
        int q = scale + exponent;
        if (!exact(m, q)) {
            return slow(b, s, e, file, line, column);
        }
        double v = assemble(m, q);
        return negative ? -v : v;
    }

    /**
     * Whether m · 10^q is one correctly rounded operation (Clinger 1990's fast path): m below 2^53
     * (checked by the callers) and 10^|q| exact in a double; 0 is exact at any scale.
     */
    private static boolean exact(long m, int q) {
        return m == 0 || q >= -MAX_POWER && q <= MAX_POWER;
    }

    /** m · 10^q for a case {@link #exact} accepts: one multiplication or division, so bit-identical to parseDouble. */
    private static double assemble(long m, int q) {
        if (m == 0) {
            return 0.0;
        }
        return q >= 0 ? m * POWERS[q] : m / POWERS[-q];
    }

    /**
     * The one-pass form for plain cells: reads a number starting at {@code b[p]} up to the first
     * byte that cannot continue it, without knowing where the cell ends. On success sets
     * {@link #value} and {@link #end} and returns true; returns false for anything the fast path
     * does not take (no digit, over 18 significant digits, a mantissa above 2^53, |q| &gt; 22, an
     * exponent of over four digits), and the caller then reads the cell through {@link #parse}.
     * The caller checks that the cell ends at {@code end}.
     */
    boolean scan(byte[] b, int p, int limit) {
        int i = p;
        boolean negative = false;
        if (i < limit && (b[i] == '-' || b[i] == '+')) {
            negative = b[i] == '-';
            i++;
        }
        int first = i;
        while (i < limit && b[i] == '0') {
            i++;
        }
        long m = 0;
        int from = i;
        for (; i < limit; i++) {
            int c = b[i] - '0';
            if (c < 0 || c > 9) {
                break;
            }
            m = m * 10 + c;
        }
        int significant = i - from;
        int scale = 0;
        boolean digit = i > first;
        if (i < limit && b[i] == '.') {
            i++;
            int fraction = i;
            if (m == 0) {
                while (i < limit && b[i] == '0') {
                    i++;
                }
            }
            int sigFrom = i;
            for (; i < limit; i++) {
                int c = b[i] - '0';
                if (c < 0 || c > 9) {
                    break;
                }
                m = m * 10 + c;
            }
            significant += i - sigFrom;
            scale = fraction - i;
            digit |= i > fraction;
        }
        if (!digit || significant > MAX_DIGITS) {
            return false;
        }
        int exponent = 0;
        if (i < limit && (b[i] == 'e' || b[i] == 'E')) {
            i++;
            boolean negativeExponent = false;
            if (i < limit && (b[i] == '-' || b[i] == '+')) {
                negativeExponent = b[i] == '-';
                i++;
            }
            int expFrom = i;
            for (; i < limit && i - expFrom < 4; i++) {
                int c = b[i] - '0';
                if (c < 0 || c > 9) {
                    break;
                }
                exponent = exponent * 10 + c;
            }
            if (i == expFrom || i < limit && b[i] >= '0' && b[i] <= '9') {
                return false;
            }
            exponent = negativeExponent ? -exponent : exponent;
        }
        if (m > EXACT_INTEGER) {
            return false;
        }
        int q = scale + exponent;
        if (!exact(m, q)) {
            return false;
        }
        double v = assemble(m, q);
        value = negative ? -v : v;
        end = i;
        return true;
    }

    /** The string path: the cell's text through {@link Cells#number}, after its bytes are checked. */
    private static double slow(byte[] b, int s, int e, Path file, int line, String column) {
        return Cells.number(CellText.decode(b, s, e, file, line), file, line, column);
    }
}
