package dev.sigmawalk.engine.evidence;

/**
 * One resample of a series made of circular blocks (Politis &amp; Romano 1992), kept with the sum
 * and the sum of squares of its values. The sums are added in period order, exactly as
 * {@link PairMoments#of} adds them, so moments taken from them are the same bit for bit as moments
 * taken from the resample afterwards; drawing and summing in one pass reads each value once.
 */
final class CircularResample {
    private final double[] values;
    private double sum;
    private double sumOfSquares;

    /** @param length the resample's length: whole blocks, ⌊T/b⌋·b */
    CircularResample(int length) {
        this.values = new double[length];
    }

    /**
     * Fills the resample with the blocks of {@code block} consecutive periods of {@code x}
     * starting at {@code starts}, wrapping past the end of {@code x}, and adds up the sums as it
     * goes, in period order.
     */
    void draw(double[] x, int[] starts, int block) {
        int length = x.length;
        int at = 0;
        double s = 0;
        double q = 0;
        for (int start : starts) {
            // A block that runs past the end continues at the start: two plain runs, no modulo.
            // Element by element rather than by array copies: the data-driven block is often
            // one to a few periods, where a copy call per block costs more than the copy.
            int head = Math.min(block, length - start);
            for (int k = start; k < start + head; k++, at++) {
                double v = x[k];
                values[at] = v;
                s += v;
                q += v * v;
            }
            for (int k = 0; k < block - head; k++, at++) {
                double v = x[k];
                values[at] = v;
                s += v;
                q += v * v;
            }
        }
        sum = s;
        sumOfSquares = q;
    }

    double[] values() {
        return values;
    }

    double sum() {
        return sum;
    }

    double sumOfSquares() {
        return sumOfSquares;
    }

    /** v of two resamples drawn from the same starts, as {@link PairMoments#of} gives it. */
    static PairMoments moments(CircularResample a, CircularResample b) {
        int length = a.values.length;
        return new PairMoments(a.sum / length, b.sum / length, a.sumOfSquares / length, b.sumOfSquares / length);
    }
}
