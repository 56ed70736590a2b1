package dev.sigmawalk.engine.study;

/**
 * Recognises the one spelling of a number that sigmawalk accepts everywhere, in study files and
 * data files alike: an optional sign, digits with at most one point (a digit on at least one side)
 * and an optional exponent. Words ({@code NaN}, {@code Infinity}), hexadecimal forms and digit
 * separators are not numbers here, although {@link Double#parseDouble} or a YAML reader may take
 * some of them.
 */
public final class DecimalSpelling {

    private DecimalSpelling() {
    }

    /** Whether {@code s} is a plain decimal, with an optional leading {@code +} or {@code -}. */
    public static boolean isPlain(String s) {
        int i = 0;
        int n = s.length();
        if (n > 0 && (s.charAt(0) == '+' || s.charAt(0) == '-')) {
            i++;
        }
        int digits = 0;
        boolean point = false;
        for (; i < n; i++) {
            char c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
            } else if (c == '.' && !point) {
                point = true;
            } else {
                break;
            }
        }
        if (digits == 0) {
            return false;
        }
        return i == n || exponent(s, i);
    }

    /** {@code e} or {@code E}, an optional sign, then at least one digit to the end of {@code s}. */
    private static boolean exponent(String s, int at) {
        int n = s.length();
        char e = s.charAt(at);
        if (e != 'e' && e != 'E') {
            return false;
        }
        int i = at + 1;
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int expDigits = 0;
        for (; i < n; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return false;
            }
            expDigits++;
        }
        return expDigits > 0;
    }
}
