package dev.sigmawalk.engine.evidence;

/** Argument checks shared by the estimators of this package. */
final class SeriesChecks {
    private SeriesChecks() {
    }

    /** Every value finite, at least {@code minLength} of them. */
    static void requireFinite(String role, double[] values, int minLength) {
        if (values == null) {
            throw new IllegalArgumentException(role + " must not be null");
        }
        if (!(values.length >= minLength)) {
            throw new IllegalArgumentException(role + " has " + values.length + " values; at least " + minLength + " are needed");
        }
        for (int t = 0; t < values.length; t++) {
            if (!Double.isFinite(values[t])) {
                throw new IllegalArgumentException(role + " value " + t + " (" + values[t] + ") must be finite");
            }
        }
    }

    /** Two series of one length. */
    static void requireSameLength(String roleA, double[] a, String roleB, double[] b) {
        if (a.length != b.length) {
            throw new IllegalArgumentException(roleA + " (" + a.length + " values) and " + roleB + " (" + b.length
                    + " values) must be aligned, one value per period each");
        }
    }
}
