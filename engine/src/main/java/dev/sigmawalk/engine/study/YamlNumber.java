package dev.sigmawalk.engine.study;

import java.util.Locale;

/**
 * Decides whether a YAML scalar that the parser resolved to a number is written as a plain
 * decimal, the only form a study file takes. YAML 1.1 and 1.2 readers disagree about the other
 * forms ({@code 0x10}, {@code 0o17}, {@code 012}, {@code 1_000}, {@code .inf}, {@code .nan}),
 * so a study that uses one would mean different things to different tools; each is refused with
 * a hint that names the plain spelling.
 */
final class YamlNumber {
    private YamlNumber() {
    }

    /**
     * What is wrong with {@code text} as a number, phrased to follow the value in a message
     * ({@code "0x10 is written in base 16; ..."}), or {@code null} when it is a plain finite
     * decimal whose value a double holds.
     */
    static String problem(String text) {
        String t = text.strip();
        String unsigned = t.startsWith("+") || t.startsWith("-") ? t.substring(1) : t;
        String lower = unsigned.toLowerCase(Locale.ROOT);
        if (lower.equals(".inf")) {
            return "is infinite; expected a finite number";
        }
        if (lower.equals(".nan")) {
            return "is YAML's not-a-number; expected a finite number";
        }
        if (unsigned.indexOf('_') >= 0) {
            return "uses '_' between digits, which YAML readers disagree on; expected plain digits such as "
                    + t.replace("_", "");
        }
        if (lower.startsWith("0x") || lower.startsWith("0o") || lower.startsWith("0b")) {
            int base = lower.charAt(1) == 'x' ? 16 : lower.charAt(1) == 'o' ? 8 : 2;
            return "is written in base " + base + "; expected a plain decimal number" + decimalHint(t, unsigned, base);
        }
        if (!DecimalSpelling.isPlain(t)) {
            return "is not a plain decimal number; expected digits with an optional sign, point and exponent, such as 0.05";
        }
        if (unsigned.length() > 1 && unsigned.charAt(0) == '0' && Character.isDigit(unsigned.charAt(1))) {
            return "has a leading zero, which some YAML readers take as octal; expected it without the zero, such as "
                    + withoutLeadingZeros(t);
        }
        double v = Double.parseDouble(t);
        if (Double.isInfinite(v)) {
            return "is beyond the range of a double (about 1.8e308); expected a finite number";
        }
        if (v == 0 && hasNonZeroDigit(unsigned)) {
            return "is too small to be told apart from 0 (below about 4.9e-324); expected 0 or a larger number";
        }
        return null;
    }

    private static String decimalHint(String t, String unsigned, int base) {
        try {
            long v = Long.parseLong(unsigned.substring(2), base);
            return ", such as " + (t.startsWith("-") ? "-" : "") + v;
        } catch (NumberFormatException e) {
            return "";
        }
    }


    private static String withoutLeadingZeros(String t) {
        String sign = t.startsWith("-") || t.startsWith("+") ? t.substring(0, 1) : "";
        String rest = t.substring(sign.length()).replaceFirst("^0+(?=\\d)", "");
        return sign + rest;
    }

    private static boolean hasNonZeroDigit(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == 'e' || c == 'E') {
                return false;
            }
            if (c >= '1' && c <= '9') {
                return true;
            }
        }
        return false;
    }
}
