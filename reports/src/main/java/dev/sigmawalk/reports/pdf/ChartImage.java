package dev.sigmawalk.reports.pdf;

import com.openhtmltopdf.extend.OutputDevice;
import com.openhtmltopdf.extend.SVGDrawer;
import com.openhtmltopdf.render.Box;
import com.openhtmltopdf.render.RenderingContext;
import dev.sigmawalk.reports.charts.RenderedChart;
import java.awt.Rectangle;

/**
 * One chart as a replaced element of the PDF: its box is sized by the style sheet, and the chart's
 * pixel layout is scaled to fill the box's content area, as a browser scales an SVG with a
 * {@code viewBox} and a CSS width and height.
 */
final class ChartImage implements SVGDrawer.SVGImage {
    private final RenderedChart chart;
    private final Box box;
    private final double dotsPerPixel;

    ChartImage(RenderedChart chart, Box box, double dotsPerPixel) {
        this.chart = chart;
        this.box = box;
        this.dotsPerPixel = dotsPerPixel;
    }

    /** The chart's size in pixels, in the renderer's dots (the size its {@code viewBox} states). */
    @Override
    public int getIntrinsicWidth() {
        return (int) (chart.renderer().width() * dotsPerPixel);
    }

    @Override
    public int getIntrinsicHeight() {
        return (int) (chart.renderer().height() * dotsPerPixel);
    }

    @Override
    public void drawSVG(OutputDevice device, RenderingContext context, double x, double y) {
        Rectangle content = box.getContentAreaEdge(box.getAbsX(), box.getAbsY(), context);
        double width = content.width / dotsPerPixel;
        double height = content.height / dotsPerPixel;
        device.drawWithGraphics((float) x, (float) y, (float) width, (float) height,
                g -> chart.paint(g, width, height));
    }
}
