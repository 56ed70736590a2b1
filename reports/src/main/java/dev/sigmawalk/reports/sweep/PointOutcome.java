package dev.sigmawalk.reports.sweep;

import java.io.Serializable;
import java.util.Objects;

/**
 * How one grid point ended.
 *
 * @param number the point's 1-based grid position
 * @param status ran, reused (complete outputs of the same study and inputs were already there) or failed
 * @param reason why it failed; empty otherwise
 * @param seconds wall time the point took on its worker (0 when reused)
 */
public record PointOutcome(int number, Status status, String reason, double seconds) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** The closed set of endings; {@link #spelling()} is what {@code sweep.csv} writes. */
    public enum Status {
        RAN("ran"), REUSED("reused"), FAILED("failed");

        private final String spelling;

        Status(String spelling) {
            this.spelling = spelling;
        }

        public String spelling() {
            return spelling;
        }
    }

    public PointOutcome {
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(reason, "reason");
        if ((status == Status.FAILED) == reason.isEmpty()) {
            throw new IllegalArgumentException("a failed point needs a reason and only a failed point has one");
        }
    }

    /** Whether the point's folder holds a complete run. */
    public boolean hasOutputs() {
        return status != Status.FAILED;
    }
}
