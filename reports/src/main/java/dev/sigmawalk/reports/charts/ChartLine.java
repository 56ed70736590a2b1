package dev.sigmawalk.reports.charts;

import java.util.Arrays;
import java.util.Objects;

/**
 * One line of a chart: points (x_k, y_k). A NaN y leaves a gap. On time charts x is the epoch
 * millisecond of the date at 00:00 UTC (see {@link TimeAxisValues}).
 *
 * @param label legend text (user text is fine: the renderers escape it)
 * @param style how it is drawn
 * @param x abscissae, finite
 * @param y ordinates, same length; NaN allowed
 */
public record ChartLine(String label, SeriesStyle style, double[] x, double[] y) {
    public ChartLine {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(style, "style");
        if (x.length != y.length) {
            throw new IllegalArgumentException("line '" + label + "': x (" + x.length + ") and y (" + y.length
                    + ") must have the same length");
        }
        for (double v : x) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("line '" + label + "': x values must be finite, got " + v);
            }
        }
        x = x.clone();
        y = y.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    int size() {
        return x.length;
    }

    double xAt(int k) {
        return x[k];
    }

    double yAt(int k) {
        return y[k];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ChartLine c && c.label.equals(label) && c.style.equals(style) && Arrays.equals(c.x, x)
                && Arrays.equals(c.y, y);
    }

    @Override
    public int hashCode() {
        return Objects.hash(label, style, Arrays.hashCode(x), Arrays.hashCode(y));
    }

    @Override
    public String toString() {
        return "ChartLine[" + label + ", " + x.length + " points]";
    }
}
