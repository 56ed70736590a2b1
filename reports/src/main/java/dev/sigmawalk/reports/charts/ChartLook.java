package dev.sigmawalk.reports.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.RenderingHints;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * The house look of every chart: white ground, thin light grid, dark grey text in the logical
 * SansSerif font (no font files are embedded or fetched), title at top left, legend below the
 * plot without a frame. The library's default grey plot area and bevelled legend box are replaced
 * because they lower the contrast of thin coloured lines.
 */
final class ChartLook {
    static final Color INK = new Color(0x26, 0x26, 0x26);
    static final Color MUTED = new Color(0x55, 0x55, 0x55);
    static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    /*
     * Sizes for a chart about 480 px wide: drawn on a 400 px phone at about 0.77 of its size,
     * tick, and on a desktop column of about 640 px near 17 px.
     */
    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    static final Font TICK = new Font(Font.SANS_SERIF, Font.PLAIN, 13);

    static {
        /*
         * The library draws rotated text (the vertical axis's label) through a text layout by
         * default, a workaround for rotated-text bugs of early Java releases; an SVG or PDF canvas
         * then receives glyph outlines instead of text. Plain drawString keeps the label as text
         * that can be selected, searched and read aloud. The switch is the library's own and is
         * set once, to the same value, before any chart of this program is drawn.
         */
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private ChartLook() {
    }

    static void apply(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        chart.setPadding(new RectangleInsets(6, 6, 6, 12));
        TextTitle title = chart.getTitle();
        if (title != null) {
            title.setFont(TITLE);
            title.setPaint(INK);
            title.setHorizontalAlignment(HorizontalAlignment.LEFT);
            title.setPadding(new RectangleInsets(2, 4, 8, 4));
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setFrame(BlockBorder.NONE);
            legend.setBackgroundPaint(Color.WHITE);
            legend.setItemFont(TICK);
            legend.setItemPaint(INK);
            legend.setPosition(RectangleEdge.BOTTOM);
            legend.setHorizontalAlignment(HorizontalAlignment.LEFT);
        }
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlineVisible(false);
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setDomainGridlineStroke(new BasicStroke(0.8f));
        plot.setRangeGridlineStroke(new BasicStroke(0.8f));
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        axis(plot.getDomainAxis());
        axis(plot.getRangeAxis());
    }

    private static void axis(ValueAxis axis) {
        axis.setLabelFont(LABEL);
        axis.setLabelPaint(INK);
        axis.setTickLabelFont(TICK);
        axis.setTickLabelPaint(MUTED);
        axis.setAxisLinePaint(MUTED);
        axis.setTickMarkPaint(MUTED);
    }
}
