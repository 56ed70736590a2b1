package dev.sigmawalk.reports.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Arrays;
import java.util.Objects;

/**
 * How one line is drawn.
 *
 * @param family the model family, which fixes the colour
 * @param width stroke width in pixels, > 0
 * @param dash dash pattern in pixels (on, off, ...); empty for a solid line; every entry > 0
 */
public record SeriesStyle(ModelFamily family, float width, float[] dash) {
    public SeriesStyle {
        Objects.requireNonNull(family, "family");
        if (!(width > 0)) {
            throw new IllegalArgumentException("line width (" + width + ") must be > 0");
        }
        dash = dash.clone();
        for (float d : dash) {
            if (!(d > 0)) {
                throw new IllegalArgumentException("dash entries (" + Arrays.toString(dash) + ") must be > 0");
            }
        }
    }

    /** The family's colour. */
    public Color colour() {
        return family.colour();
    }

    /** A copy of the dash pattern. */
    @Override
    public float[] dash() {
        return dash.clone();
    }

    /** The AWT stroke for this style, with round joins so thin dashed lines stay legible. */
    public BasicStroke stroke() {
        if (dash.length == 0) {
            return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash.clone(), 0f);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SeriesStyle s && s.family == family && Float.compare(s.width, width) == 0
                && Arrays.equals(s.dash, dash);
    }

    @Override
    public int hashCode() {
        return Objects.hash(family, width, Arrays.hashCode(dash));
    }

    @Override
    public String toString() {
        return "SeriesStyle[" + family + ", width " + width + ", dash " + Arrays.toString(dash) + "]";
    }
}
