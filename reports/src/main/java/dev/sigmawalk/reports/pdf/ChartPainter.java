package dev.sigmawalk.reports.pdf;

import com.openhtmltopdf.css.sheet.FontFaceRule;
import com.openhtmltopdf.css.style.CssContext;
import com.openhtmltopdf.extend.SVGDrawer;
import com.openhtmltopdf.extend.UserAgentCallback;
import com.openhtmltopdf.layout.SharedContext;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder;
import com.openhtmltopdf.render.Box;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer;
import dev.sigmawalk.reports.charts.RenderedChart;
import java.awt.FontFormatException;
import java.io.File;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.w3c.dom.Element;

/**
 * Draws the report's charts straight from their chart objects into the PDF, as vector graphics,
 * instead of parsing their SVG markup again: the same drawing calls that wrote the SVG, so the
 * same picture, without an SVG toolkit reading thousands of path elements back. An {@code <svg>}
 * that is not one of the given charts is drawn from its markup by Batik, which is loaded only
 * then.
 */
final class ChartPainter implements SVGDrawer {
    private final Map<String, RenderedChart> charts = new LinkedHashMap<>();
    private final List<FontFaceRule> fontFaces = new ArrayList<>();
    private SharedContext fontContext;
    private UserAgentCallback userAgent;
    private SVGDrawer markup;

    /** @param charts the charts to draw by their SVG element's id */
    ChartPainter(List<RenderedChart> charts) {
        for (RenderedChart c : charts) {
            if (this.charts.put(c.id(), c) != null) {
                throw new IllegalArgumentException("two charts have the id '" + c.id() + "'");
            }
        }
    }

    /** Whether the {@code <svg>} element with this id is drawn from its chart, so its markup is not needed. */
    boolean draws(String id) {
        return charts.containsKey(id);
    }

    @Override
    public SVGImage buildSVGImage(Element svg, Box box, CssContext css, double cssWidth, double cssHeight,
                                  double dotsPerPixel) {
        RenderedChart chart = charts.get(svg.getAttribute("id"));
        if (chart == null) {
            return markup().buildSVGImage(svg, box, css, cssWidth, cssHeight, dotsPerPixel);
        }
        return new ChartImage(chart, box, dotsPerPixel);
    }

    @Override
    public void importFontFaceRules(List<FontFaceRule> rules, SharedContext context) {
        fontFaces.addAll(rules);
        fontContext = context;
        if (markup != null) {
            markup.importFontFaceRules(rules, context);
        }
    }

    @Override
    public void withUserAgent(UserAgentCallback callback) {
        userAgent = callback;
        if (markup != null) {
            markup.withUserAgent(callback);
        }
    }

    @Override
    public void addFontFile(File file, String family, Integer weight, BaseRendererBuilder.FontStyle style)
            throws IOException, FontFormatException {
        markup().addFontFile(file, family, weight, style);
    }

    @Override
    public void close() throws IOException {
        if (markup != null) {
            markup.close();
        }
    }

    /** The markup drawer for any other SVG, set up as the renderer set up this one. */
    private SVGDrawer markup() {
        if (markup == null) {
            markup = new BatikSVGDrawer();
            if (userAgent != null) {
                markup.withUserAgent(userAgent);
            }
            if (fontContext != null) {
                markup.importFontFaceRules(fontFaces, fontContext);
            }
        }
        return markup;
    }
}
