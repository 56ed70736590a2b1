package dev.sigmawalk.reports.charts;

import java.awt.Color;
import java.util.Locale;

/**
 * The families a chart line can belong to, each with one colour kept across every chart of a
 * report. The palette is chosen so that neighbouring families differ in lightness as well as hue
 * (a reader with red-green colour blindness still tells a dark blue from a light ochre), and each
 * family also has its own dash pattern so that a grey-scale print stays readable.
 *
 * <p>CIE lightness L* (sRGB, D65): single-index 26, other 42, sample 43, market 53, shrinkage 57,
 * equal weight 58; multi-index 40, principal components 44, exponentially weighted 41,
 * nonlinear shrinkage 39. Pairs closer than 10 in L* differ in dash pattern, and shrinkage (ochre) and
 * equal weight (blue) lie on opposite sides of the blue-yellow axis that colour-blind readers
 * still see. Every colour has a contrast of at least 3:1 against the white ground, the WCAG 2.1
 * minimum for graphical objects (success criterion 1.4.11).
 */
public enum ModelFamily {
    /** Full sample covariance. */
    SAMPLE("sample covariance", new Color(0xB0, 0x44, 0x1C), new float[0]),
    /** Single-index (market) model. */
    SINGLE_INDEX("single-index model", new Color(0x1C, 0x3E, 0x70), new float[] {9f, 4f}),
    /** Ledoit-Wolf shrinkage. */
    SHRINKAGE("shrinkage", new Color(0xB5, 0x7F, 0x00), new float[0]),
    /** Equal weights (a rule without a covariance input). */
    EQUAL_WEIGHT("equal weights", new Color(0x4C, 0x8F, 0xCB), new float[] {2f, 3f}),
    /** Multi-index model: market plus sector or user factors (green). */
    MULTI_INDEX("multi-index model", new Color(0x2E, 0x6B, 0x3A), new float[] {7f, 2f, 2f, 2f}),
    /** Statistical factor model from principal components (teal). */
    PRINCIPAL_COMPONENTS("principal components", new Color(0x00, 0x73, 0x7A), new float[] {4f, 4f}),
    /** Exponentially weighted covariance (rose). */
    EWMA("exponentially weighted", new Color(0xA8, 0x32, 0x6E), new float[] {10f, 2f, 2f, 2f, 2f, 2f}),
    /** Ledoit-Wolf nonlinear shrinkage (olive brown). */
    NONLINEAR_SHRINKAGE("nonlinear shrinkage", new Color(0x6B, 0x5A, 0x1E), new float[] {1f, 2f}),
    /** The market benchmark. */
    MARKET("market benchmark", new Color(0x7F, 0x7F, 0x7F), new float[] {12f, 3f, 2f, 3f}),
    /** A risk model this report does not know by name. */
    OTHER("other model", new Color(0x7A, 0x52, 0x9E), new float[] {5f, 2f});

    private final String label;
    private final Color colour;
    private final float[] dash;

    ModelFamily(String label, Color colour, float[] dash) {
        this.label = label;
        this.colour = colour;
        this.dash = dash;
    }

    /** Plain-English name for legends and tables. */
    public String label() {
        return label;
    }

    /** The family's line colour. */
    public Color colour() {
        return colour;
    }

    /** The colour as a CSS hex string, for example {@code #1c3e70}. */
    public String cssColour() {
        return String.format(Locale.ROOT, "#%02x%02x%02x", colour.getRed(), colour.getGreen(), colour.getBlue());
    }

    /** A CSS class name safe to place in markup, for example {@code fam-single-index}. */
    public String cssClass() {
        return "fam-" + name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The family's base dash pattern (empty = solid), a copy. */
    public float[] dash() {
        return dash.clone();
    }
}
