package dev.sigmawalk.reports.charts;

import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * Draws charts as inline SVG markup and as PNG files at twice the chart's pixel size.
 *
 * <p>The SVG has a {@code viewBox} and no fixed width or height, so a style sheet can scale it to
 * the page width. Namespace declarations are removed: inline SVG in HTML needs none, and the
 * report must not contain any web address. Ids inside the SVG (clip paths, gradients) start with
 * the given prefix, so several charts can share one page and the output is the same on every run
 * (the library's default prefix contains the clock).
 */
public final class ChartRenderer {
    /** PNG copies are drawn at this multiple of the chart's size in pixels. */
    public static final int PNG_SCALE = 2;

    private final int width;
    private final int height;

    /**
     * @param width picture width in pixels, > 0
     * @param height picture height in pixels, > 0
     */
    public ChartRenderer(int width, int height) {
        if (!(width > 0 && height > 0)) {
            throw new IllegalArgumentException("chart size (" + width + " x " + height + ") must be positive");
        }
        this.width = width;
        this.height = height;
    }

    /**
     * The chart as an {@code <svg>} element. Text is escaped by the SVG writer.
     *
     * @param idPrefix letters, digits, '-' or '_', starting with a letter; unique on the page
     */
    public String svg(JFreeChart chart, String idPrefix) {
        if (!idPrefix.matches("[A-Za-z][A-Za-z0-9_-]*")) {
            throw new IllegalArgumentException("SVG id prefix '" + idPrefix + "' must be a letter then letters, digits, - or _");
        }
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(idPrefix + "-");
        chart.draw(g, new Rectangle(0, 0, width, height));
        String element = g.getSVGElement(idPrefix, false, new ViewBox(0, 0, width, height), null, null);
        return shortenNumbers(withoutNamespaces(element));
    }

    /**
     * {@code svg} without its namespace declarations: every white-space run followed by
     * {@code xmlns}, an optional {@code :prefix} of letters, {@code =} and a value in double or
     * single quotes is removed, as the pattern {@code \s+xmlns(:[A-Za-z]+)?=("[^"]*"|'[^']*')}
     * replaced by nothing would remove it. One pass from one {@code xmlns} to the next instead of
     * a pattern matcher tried at every white space of several hundred kilobytes of markup.
     */
    static String withoutNamespaces(String svg) {
        int at = svg.indexOf("xmlns");
        if (at < 0) {
            return svg;
        }
        StringBuilder out = new StringBuilder(svg.length());
        int copied = 0;
        while (at >= 0) {
            int start = at;
            while (start > copied && isWhiteSpace(svg.charAt(start - 1))) {
                start--;
            }
            int end = start < at ? declarationEnd(svg, at + "xmlns".length()) : -1;
            if (end < 0) {
                at = svg.indexOf("xmlns", at + 1);
                continue;
            }
            out.append(svg, copied, start);
            copied = end;
            at = svg.indexOf("xmlns", end);
        }
        return out.append(svg, copied, svg.length()).toString();
    }

    /** After {@code xmlns}: the end of {@code (:letters)?=} and a quoted value, or -1 when none follows. */
    private static int declarationEnd(String svg, int from) {
        int k = from;
        int n = svg.length();
        if (k < n && svg.charAt(k) == ':') {
            int letters = ++k;
            while (k < n && isLetter(svg.charAt(k))) {
                k++;
            }
            if (k == letters) {
                return -1;
            }
        }
        if (k + 1 >= n || svg.charAt(k) != '=' || (svg.charAt(k + 1) != '"' && svg.charAt(k + 1) != '\'')) {
            return -1;
        }
        int close = svg.indexOf(svg.charAt(k + 1), k + 2);
        return close < 0 ? -1 : close + 1;
    }

    private static boolean isLetter(char c) {
        return c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z';
    }

    /**
     * Cuts decimals in attribute values (coordinates, stroke widths) after the second place:
     * 0.01 px is far below what a screen or printer shows, and full double precision makes the
     * markup several times larger. Text content is left alone: user text never sits inside a
     * single-quoted attribute because the SVG writer escapes quotes.
     *
     * <p>An attribute is a white-space character, a name of letters, ':' and '-', then
     * {@code ='}, its value, and the closing {@code '}; in its value every digit followed by a
     * point and three or more digits keeps only the first two of them. One pass over the markup,
     * without a pattern matcher: the markup of a report's charts is several hundred kilobytes.
     */
    static String shortenNumbers(String svg) {
        StringBuilder out = new StringBuilder(svg.length());
        int n = svg.length();
        int copied = 0;
        int k = 0;
        while (k < n) {
            int value = isWhiteSpace(svg.charAt(k)) ? valueStart(svg, k + 1) : -1;
            int close = value < 0 ? -1 : svg.indexOf('\'', value);
            if (close < 0) {
                k++;
                continue;
            }
            out.append(svg, copied, value);
            shortenValue(svg, value, close, out);
            out.append('\'');
            k = close + 1;
            copied = k;
        }
        return out.append(svg, copied, n).toString();
    }

    /** Where an attribute's value starts when {@code from} begins {@code name='}, else -1. */
    private static int valueStart(String svg, int from) {
        int k = from;
        while (k < svg.length() && isNameChar(svg.charAt(k))) {
            k++;
        }
        if (k == from || k + 1 >= svg.length() || svg.charAt(k) != '=' || svg.charAt(k + 1) != '\'') {
            return -1;
        }
        return k + 2;
    }

    /** Appends {@code svg[from..to)} with every d.ddd… cut to d.dd. */
    private static void shortenValue(String svg, int from, int to, StringBuilder out) {
        int k = from;
        while (k < to) {
            if (k + 4 < to && isDigit(svg.charAt(k)) && svg.charAt(k + 1) == '.' && isDigit(svg.charAt(k + 2))
                    && isDigit(svg.charAt(k + 3)) && isDigit(svg.charAt(k + 4))) {
                out.append(svg, k, k + 4);
                k += 5;
                while (k < to && isDigit(svg.charAt(k))) {
                    k++;
                }
            } else {
                out.append(svg.charAt(k));
                k++;
            }
        }
    }

    private static boolean isWhiteSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == 0x0B || c == '\f' || c == '\r';
    }

    private static boolean isNameChar(char c) {
        return c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z' || c == ':' || c == '-';
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    /**
     * Writes the chart as a PNG of {@code 2 width × 2 height} pixels: the same layout as the SVG,
     * drawn at twice the resolution so it stays sharp on a slide or a high-density screen.
     */
    public void png(JFreeChart chart, Path file) throws IOException {
        BufferedImage image = new BufferedImage(PNG_SCALE * width, PNG_SCALE * height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.scale(PNG_SCALE, PNG_SCALE);
            chart.draw(g, new Rectangle(0, 0, width, height));
        } finally {
            g.dispose();
        }
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file))) {
            PngEncoder.write(image, out);
        }
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }
}
