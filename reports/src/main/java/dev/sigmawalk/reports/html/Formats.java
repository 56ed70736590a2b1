package dev.sigmawalk.reports.html;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * How numbers appear in the report. Every rule uses the root locale, so the decimal point is
 * always '.', and writes "n/a" for a value that does not apply or is not finite.
 *
 * <ul>
 *   <li>{@link #percent}: a fraction times 100 with two decimals and " %", 0.1234 → "12.34 %";</li>
 *   <li>{@link #ratio}: two decimals, 0.857 → "0.86";</li>
 *   <li>{@link #basisPoints}: whole numbers without decimals, others with up to two, "10 bp";</li>
 *   <li>{@link #oneDecimal}: one decimal, for averages of counts, 7.25 → "7.3";</li>
 *   <li>{@link #pValue}: three decimals, "&lt; 0.001" below 0.001, 0.0342 → "0.034";</li>
 *   <li>{@link #count}: a whole number with ',' between thousands, 1325 → "1,325".</li>
 * </ul>
 * Rounding is half-up on the decimal value as printed by {@link String#format}.
 */
public final class Formats {
    /** Shown where a measure does not apply (the benchmark's turnover) or is not finite. */
    public static final String NOT_APPLICABLE = "n/a";

    private Formats() {
    }

    public static String percent(double fraction) {
        return Double.isFinite(fraction) ? String.format(Locale.ROOT, "%.2f %%", 100 * fraction) : NOT_APPLICABLE;
    }

    public static String percent(OptionalDouble fraction) {
        return fraction.isPresent() ? percent(fraction.getAsDouble()) : NOT_APPLICABLE;
    }

    public static String ratio(double value) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%.2f", value) : NOT_APPLICABLE;
    }

    public static String ratio(OptionalDouble value) {
        return value.isPresent() ? ratio(value.getAsDouble()) : NOT_APPLICABLE;
    }

    public static String oneDecimal(double value) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%.1f", value) : NOT_APPLICABLE;
    }

    public static String pValue(double p) {
        if (!Double.isFinite(p)) {
            return NOT_APPLICABLE;
        }
        return p < 0.001 ? "< 0.001" : String.format(Locale.ROOT, "%.3f", p);
    }

    public static String count(long n) {
        return String.format(Locale.ROOT, "%,d", n);
    }

    public static String basisPoints(double bps) {
        if (!Double.isFinite(bps)) {
            return NOT_APPLICABLE;
        }
        if (bps == Math.rint(bps)) {
            return String.format(Locale.ROOT, "%.0f bp", bps);
        }
        String s = String.format(Locale.ROOT, "%.2f", bps).replaceAll("0+$", "");
        return s + " bp";
    }
}
