package dev.sigmawalk.engine.study;

/** Per-asset weight bounds lower ≤ w_i ≤ upper. */
public record Bounds(double lower, double upper) {
    public Bounds {
        if (!(lower <= upper) || Double.isNaN(lower) || Double.isNaN(upper)) {
            throw new IllegalArgumentException("bounds [" + lower + ", " + upper + "] need lower <= upper");
        }
    }

    /** Whether n assets can hold weights summing to 1 within these bounds. */
    public boolean feasibleFor(int n) {
        return n * lower <= 1 + 1e-12 && n * upper >= 1 - 1e-12;
    }
}
