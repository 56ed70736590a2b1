package dev.sigmawalk.strategies.risk;

/** How model labels print their settings. */
final class Formats {
    private Formats() {
    }

    /** A whole number without a decimal point, other values as Java prints them. */
    static String number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
