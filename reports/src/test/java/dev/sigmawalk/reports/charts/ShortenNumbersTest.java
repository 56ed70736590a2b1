package dev.sigmawalk.reports.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class ShortenNumbersTest {
    private static final Pattern ATTRIBUTE = Pattern.compile("(\\s[A-Za-z:-]+=')([^']*)(')");
    private static final Pattern LONG_DECIMAL = Pattern.compile("(\\d\\.\\d\\d)\\d+");
    private static final String[] PIECES = {" ", "\t", "\n", "'", "=", "='", " d='", " stroke-width='", " a:b-c='",
        ":", "-", ".", "x", "Z", "\"", "<g", "/>", "7", ".5"};

    /** Worked by hand: coordinates cut after two decimals, text and double-quoted values untouched. */
    @Test
    void longDecimalsInSingleQuotedAttributes_keepTwoPlaces() {
        assertEquals("<path d='M 1.23 45.67 L 0.5 12.34'/><text x=\"1.23456\">3.14159</text>",
                ChartRenderer.shortenNumbers(
                        "<path d='M 1.23456 45.6789 L 0.5 12.345'/><text x=\"1.23456\">3.14159</text>"));
        assertEquals("<g  stroke-width='1.00' style='a:2.50;b:7'>", ChartRenderer.shortenNumbers(
                "<g  stroke-width='1.0000001' style='a:2.5001;b:7'>"));
    }

    /**
     * The one-pass scanner gives exactly what the two regular expressions it replaces give
     * (java.util.regex: attributes {@code (\s[A-Za-z:-]+=')([^']*)(')}, inside them
     * {@code (\d\.\d\d)\d+} replaced by its group), on 2,000 seeded strings made of
     * pieces of markup and numbers of zero to six decimals (quotes, '=', ':', '-', white space,
     * digits, points in every order).
     */
    @Test
    void scanner_agreesWithTheRegularExpressions_onSeededMarkup() {
        SplittableRandom random = new SplittableRandom(20_261_202L);
        int shortened = 0;
        for (int c = 0; c < 2_000; c++) {
            StringBuilder s = new StringBuilder();
            int pieces = random.nextInt(0, 30);
            for (int k = 0; k < pieces; k++) {
                if (random.nextInt(3) == 0) {
                    s.append(random.nextInt(1000)).append('.');
                    for (int d = random.nextInt(7); d > 0; d--) {
                        s.append(random.nextInt(10));
                    }
                } else {
                    s.append(PIECES[random.nextInt(PIECES.length)]);
                }
            }
            String markup = s.toString();
            String expected = byPatterns(markup);
            assertEquals(expected, ChartRenderer.shortenNumbers(markup), "case " + c + ": " + markup);
            shortened += expected.equals(markup) ? 0 : 1;
        }
        assertTrue(shortened >= 20, "cases with a decimal cut: " + shortened);
    }

    private static String byPatterns(String svg) {
        Matcher m = ATTRIBUTE.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        while (m.find()) {
            String value = LONG_DECIMAL.matcher(m.group(2)).replaceAll("$1");
            m.appendReplacement(out, Matcher.quoteReplacement(m.group(1) + value + m.group(3)));
        }
        m.appendTail(out);
        return out.toString();
    }
}
