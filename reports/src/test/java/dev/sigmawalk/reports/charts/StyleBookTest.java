package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class StyleBookTest {
    /** Smallest CIE L* gap between two families drawn with the same dash pattern. */
    private static final double MIN_LIGHTNESS_GAP = 10;
    /** WCAG 2.1 minimum contrast of graphical objects. */
    private static final double MIN_CONTRAST = 3.0;

    @Test
    void sameFamily_keepsColour_butGetsAnotherDash() {
        Map<String, ModelFamily> f = new LinkedHashMap<>();
        f.put("first", ModelFamily.SINGLE_INDEX);
        f.put("second", ModelFamily.SINGLE_INDEX);
        f.put("third", ModelFamily.SHRINKAGE);
        StyleBook book = StyleBook.of(f);
        assertEquals(book.style("first").colour(), book.style("second").colour());
        assertFalse(Arrays.equals(book.style("first").dash(), book.style("second").dash()));
        assertEquals(ModelFamily.SHRINKAGE.colour(), book.style("third").colour());
    }

    /** Within every family, the first three variants have first dashes at least 2 px apart (or solid vs dashed). */
    @Test
    void variants_ofEveryFamily_lookDifferent() {
        for (ModelFamily f : ModelFamily.values()) {
            for (int a = 0; a < 3; a++) {
                for (int b = a + 1; b < 3; b++) {
                    float[] x = StyleBook.dashFor(f, a);
                    float[] y = StyleBook.dashFor(f, b);
                    boolean differ = (x.length == 0) != (y.length == 0)
                            || (x.length > 0 && Math.abs(x[0] - y[0]) >= 2f);
                    assertTrue(differ, f + " variants " + a + " and " + b + ": " + Arrays.toString(x) + " vs "
                            + Arrays.toString(y));
                }
            }
        }
    }

    @Test
    void unknownName_isRejectedWithItsName() {
        StyleBook book = StyleBook.of(Map.of("a", ModelFamily.SAMPLE));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> book.style("zz"));
        assertTrue(e.getMessage().contains("'zz'"), e.getMessage());
    }

    /**
     * Colour-blind safety: any two of the main families either differ by at least 10 in CIE L*
     * or are drawn with different dash patterns. L* from the sRGB transfer function and the
     * Rec. 709 luminance weights (CIE 1976 formula).
     */
    @Test
    void mainFamilies_differInLightnessOrDash() {
        List<ModelFamily> main = List.of(ModelFamily.SAMPLE, ModelFamily.SINGLE_INDEX, ModelFamily.SHRINKAGE,
                ModelFamily.EQUAL_WEIGHT, ModelFamily.MARKET, ModelFamily.MULTI_INDEX, ModelFamily.PRINCIPAL_COMPONENTS,
                ModelFamily.EWMA, ModelFamily.NONLINEAR_SHRINKAGE);
        for (int i = 0; i < main.size(); i++) {
            for (int j = i + 1; j < main.size(); j++) {
                ModelFamily a = main.get(i);
                ModelFamily b = main.get(j);
                double gap = Math.abs(lightness(a.colour()) - lightness(b.colour()));
                boolean dashDiffers = !Arrays.equals(a.dash(), b.dash());
                assertTrue(gap >= MIN_LIGHTNESS_GAP || dashDiffers, a + " vs " + b + ": L* gap " + gap);
            }
        }
    }

    /**
     * Every family colour stands out from the white ground by a contrast ratio of at least 3:1,
     * (L1 + 0.05) / (L2 + 0.05) with relative luminance L (WCAG 2.1, success criterion 1.4.11).
     */
    @Test
    void everyFamily_hasEnoughContrastOnWhite() {
        for (ModelFamily f : ModelFamily.values()) {
            double ratio = 1.05 / (luminance(f.colour()) + 0.05);
            assertTrue(ratio >= MIN_CONTRAST, f + " contrast " + ratio);
        }
    }

    /** Hand check of the L* formula: white 100, black 0, mid grey #777777 about 50 (sRGB tables). */
    @Test
    void lightness_formulaMatchesKnownPoints() {
        assertEquals(100, lightness(Color.WHITE), 0.01);
        assertEquals(0, lightness(Color.BLACK), 0.01);
        assertEquals(50.0, lightness(new Color(0x77, 0x77, 0x77)), 0.5);
    }

    @Test
    void cssNames_areSafeToPlaceInMarkup() {
        for (ModelFamily f : ModelFamily.values()) {
            assertTrue(f.cssClass().matches("[a-z-]+"), f.cssClass());
            assertTrue(f.cssColour().matches("#[0-9a-f]{6}"), f.cssColour());
        }
    }

    private static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double lightness(Color c) {
        double y = luminance(c);
        return y > 216.0 / 24389 ? 116 * Math.cbrt(y) - 16 : 24389.0 / 27 * y;
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
