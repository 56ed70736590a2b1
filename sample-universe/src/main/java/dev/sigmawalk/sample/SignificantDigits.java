package dev.sigmawalk.sample;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Rounds to a fixed number of significant decimal digits and writes the result in plain decimal
 * notation ({@code -0.012345678}, never an exponent), so files are compact and byte-stable.
 *
 * <p>For d digits and x ≠ 0 the written value is m·10^(-k) with the integer m = round(|x|·10^k)
 * in [10^(d-1), 10^d) (ties away from zero, as {@link Math#round}); {@link #round} returns the
 * double nearest to that decimal, which is what parsing the written text gives back. Values whose
 * k falls outside the exactly representable powers 10^0..10^22 (|x| below about 10^(d-23) or at
 * least 10^(d-1)) take a slower exact {@link BigDecimal} path with HALF_UP rounding. Zero is
 * written {@code 0}; non-finite values are refused.
 */
final class SignificantDigits {
    private static final double[] POWERS_OF_TEN = new double[23];

    static {
        double p = 1;
        for (int k = 0; k < POWERS_OF_TEN.length; k++) {
            POWERS_OF_TEN[k] = p;
            p *= 10;
        }
    }

    private final int digits;
    private final long lowest;
    private final long highest;

    SignificantDigits(int digits) {
        if (!(digits >= 1 && digits <= 15)) {
            throw new IllegalArgumentException("significant digits (" + digits + ") must be in [1, 15]");
        }
        this.digits = digits;
        this.lowest = (long) POWERS_OF_TEN[digits - 1];
        this.highest = (long) POWERS_OF_TEN[digits];
    }

    /** The double nearest to x rounded to the significant digits. */
    double round(double x) {
        requireFinite(x);
        if (x == 0) {
            return 0;
        }
        int k = scalePower(Math.abs(x));
        if (k < 0 || k >= POWERS_OF_TEN.length) {
            return exact(x).doubleValue();
        }
        // Both m and 10^k are exact doubles, so the division is correctly rounded.
        return Math.copySign(mantissa(Math.abs(x), k) / POWERS_OF_TEN[k], x);
    }

    /** Appends x rounded to the significant digits, in plain notation without trailing zeros. */
    void append(StringBuilder out, double x) {
        requireFinite(x);
        if (x == 0) {
            out.append('0');
            return;
        }
        int k = scalePower(Math.abs(x));
        if (k < 0 || k >= POWERS_OF_TEN.length) {
            out.append(exact(x).stripTrailingZeros().toPlainString());
            return;
        }
        if (x < 0) {
            out.append('-');
        }
        appendScaled(out, mantissa(Math.abs(x), k), k);
    }

    String format(double x) {
        StringBuilder out = new StringBuilder(24);
        append(out, x);
        return out.toString();
    }

    /**
     * The power k with round(abs·10^k) in [10^(d-1), 10^d): a first guess from log10, corrected
     * where rounding lands on the neighbouring decade (e.g. 9.9999999996 → 10.000000).
     */
    private int scalePower(double abs) {
        int k = digits - 1 - (int) Math.floor(Math.log10(abs));
        for (int step = 0; step < 3 && k >= 0 && k < POWERS_OF_TEN.length; step++) {
            long m = mantissa(abs, k);
            if (m >= highest) {
                k--;
            } else if (m < lowest) {
                k++;
            } else {
                return k;
            }
        }
        return k;
    }

    private static long mantissa(double abs, int k) {
        return Math.round(abs * POWERS_OF_TEN[k]);
    }

    /**
     * Writes m·10^(-k) for m with exactly d digits, e.g. m = 12345678, k = 10 → 0.0012345678,
     * without trailing zeros after the point.
     */
    private void appendScaled(StringBuilder out, long m, int k) {
        char[] figures = new char[digits];
        long rest = m;
        for (int i = digits - 1; i >= 0; i--) {
            figures[i] = (char) ('0' + rest % 10);
            rest /= 10;
        }
        int integerDigits = digits - k;
        int end = digits;
        while (end > Math.max(1, integerDigits) && figures[end - 1] == '0') {
            end--;
        }
        if (integerDigits <= 0) {
            out.append("0.");
            for (int i = 0; i < -integerDigits; i++) {
                out.append('0');
            }
            out.append(figures, 0, end);
        } else if (end <= integerDigits) {
            out.append(figures, 0, integerDigits);
        } else {
            out.append(figures, 0, integerDigits).append('.').append(figures, integerDigits, end - integerDigits);
        }
    }

    private BigDecimal exact(double x) {
        return new BigDecimal(x).round(new MathContext(digits, RoundingMode.HALF_UP));
    }

    private static void requireFinite(double x) {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException("value (" + x + ") must be finite to be written");
        }
    }
}
