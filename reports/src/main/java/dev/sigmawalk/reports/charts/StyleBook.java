package dev.sigmawalk.reports.charts;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * Gives every named line a style that stays the same on every chart of a report: the colour
 * comes from its {@link ModelFamily}; the first line of a family uses the family's own dash, and
 * further lines of the same family cycle through alternative dashes so that two strategies on the
 * same risk model can still be told apart.
 */
public final class StyleBook {
    private static final float MAIN_WIDTH = 2.2f;
    private static final float[][] ALTERNATIVE_DASHES = {{1.5f, 2.5f}, {10f, 3f, 2f, 3f}, {5f, 5f}, {16f, 4f}};
    /** Two dash patterns whose first dashes differ by less than this many pixels look alike. */
    private static final float ALIKE = 2f;

    private final Map<String, SeriesStyle> styles;

    private StyleBook(Map<String, SeriesStyle> styles) {
        this.styles = Map.copyOf(styles);
    }

    /**
     * @param families line names in display order, each with its family; the order decides which
     *                 line of a family keeps the family's base dash
     */
    public static StyleBook of(Map<String, ModelFamily> families) {
        Map<ModelFamily, Integer> seen = new EnumMap<>(ModelFamily.class);
        Map<String, SeriesStyle> styles = new LinkedHashMap<>();
        for (Map.Entry<String, ModelFamily> e : families.entrySet()) {
            ModelFamily f = Objects.requireNonNull(e.getValue(), "family of '" + e.getKey() + "'");
            int k = seen.merge(f, 1, Integer::sum) - 1;
            styles.put(e.getKey(), new SeriesStyle(f, MAIN_WIDTH, dashFor(f, k)));
        }
        return new StyleBook(styles);
    }

    /**
     * The k-th (0-based) dash pattern of a family: its own for k = 0, then the alternatives in
     * turn, skipping any that looks like the family's own (first dash within {@value #ALIKE} px, or
     * both solid).
     */
    static float[] dashFor(ModelFamily family, int k) {
        float[] own = family.dash();
        if (k == 0) {
            return own;
        }
        java.util.List<float[]> usable = new java.util.ArrayList<>();
        for (float[] d : ALTERNATIVE_DASHES) {
            boolean alike = own.length > 0 && Math.abs(own[0] - d[0]) < ALIKE;
            if (!alike) {
                usable.add(d);
            }
        }
        return usable.get((k - 1) % usable.size()).clone();
    }

    /** The style of {@code name}; throws when the name was not registered. */
    public SeriesStyle style(String name) {
        SeriesStyle s = styles.get(name);
        if (s == null) {
            throw new IllegalArgumentException("no line style registered for '" + name + "'");
        }
        return s;
    }

    /** The family of {@code name}. */
    public ModelFamily family(String name) {
        return style(name).family();
    }

    /**
     * The k-th (0-based) variant of a line's style: same colour and width, the k-th dash of its
     * family (k = 0 is the line's own family dash). Used when one strategy appears once per window.
     */
    public SeriesStyle variant(String name, int k) {
        if (!(k >= 0)) {
            throw new IllegalArgumentException("style variant (" + k + ") must be >= 0");
        }
        SeriesStyle s = style(name);
        return new SeriesStyle(s.family(), s.width(), dashFor(s.family(), k));
    }

    /**
     * A variant of a line's style for a second quantity drawn beside it (for example a forecast
     * beside the realised value): same colour, thinner, dashed.
     */
    public SeriesStyle companion(String name) {
        SeriesStyle s = style(name);
        return new SeriesStyle(s.family(), 1.6f, new float[] {4f, 3f});
    }
}
