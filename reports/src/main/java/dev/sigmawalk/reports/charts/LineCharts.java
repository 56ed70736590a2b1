package dev.sigmawalk.reports.charts;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.text.NumberFormat;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.DateAxis;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Builds line charts in the house look. Dates are shown in UTC and the root locale so that the
 * same data give the same picture on every machine.
 */
public final class LineCharts {
    /** Side of the square marker in pixels; squares need far less SVG markup than circles. */
    private static final double MARKER = 4.5;
    /** Lines longer than this are thinned by {@link Decimation} before drawing: under two points a pixel of a 480 px chart. */
    static final int MAX_POINTS = 800;

    private LineCharts() {
    }

    /** Axis format for fractions shown as percent, for example 0.125 → "12.5%". */
    public static NumberFormat percentAxis() {
        return new DecimalFormat("0.##%", DecimalFormatSymbols.getInstance(Locale.ROOT));
    }

    /** Axis format for plain numbers with up to two decimals. */
    public static NumberFormat plainAxis() {
        return new DecimalFormat("0.##", DecimalFormatSymbols.getInstance(Locale.ROOT));
    }

    /**
     * A chart with dates on the x axis.
     *
     * @param title chart title (shown in the picture, so slides keep it)
     * @param yLabel y-axis label with its unit
     * @param yFormat tick format of the y axis
     * @param lines x values from {@link TimeAxisValues}
     * @param options markers and zero baseline
     */
    public static JFreeChart overTime(String title, String yLabel, NumberFormat yFormat, List<ChartLine> lines,
                                      LineOptions options) {
        DateAxis x = new DateAxis("Date", TimeZone.getTimeZone("UTC"), Locale.ROOT);
        x.setLowerMargin(0.01);
        x.setUpperMargin(0.01);
        return build(title, x, yAxis(yLabel, yFormat, options), lines, options);
    }

    /**
     * A chart with dates on the x axis and a logarithmic y axis in base 2, so that equal
     * proportional moves look equal and each grid line up is a doubling (for growth of wealth,
     * where a linear axis lets the largest path squash the rest).
     *
     * @param lines y values must be > 0 where finite
     */
    public static JFreeChart overTimeLog(String title, String yLabel, List<ChartLine> lines) {
        DateAxis x = new DateAxis("Date", TimeZone.getTimeZone("UTC"), Locale.ROOT);
        x.setLowerMargin(0.01);
        x.setUpperMargin(0.01);
        LogAxis y = new PlainLogAxis(yLabel);
        y.setBase(2);
        y.setNumberFormatOverride(plainAxis());
        y.setSmallestValue(1e-6);
        y.setMinorTickCount(0);
        if (spread(lines) >= 3) {
            // Whole exponents: grid lines at 1, 2, 4, 8, ..., each a doubling.
            y.setStandardTickUnits(NumberAxis.createIntegerTickUnits(Locale.ROOT));
        }
        return build(title, x, y, lines, LineOptions.PLAIN);
    }

    /** Largest over smallest positive finite y of the lines; 1 when there are none. */
    private static double spread(List<ChartLine> lines) {
        double low = Double.POSITIVE_INFINITY;
        double high = 0;
        for (ChartLine l : lines) {
            for (int k = 0; k < l.size(); k++) {
                double y = l.yAt(k);
                if (Double.isFinite(y) && y > 0) {
                    low = Math.min(low, y);
                    high = Math.max(high, y);
                }
            }
        }
        return high > 0 ? high / low : 1;
    }

    /**
     * Fixes the y axis of a chart to [low, high], so that panels of one set share a scale and
     * can be compared by eye.
     */
    public static void fixRange(JFreeChart chart, double low, double high) {
        if (!(low < high)) {
            throw new IllegalArgumentException("axis range [" + low + ", " + high + "] needs low < high");
        }
        chart.getXYPlot().getRangeAxis().setRange(low, high);
    }

    /**
     * A chart with an integer x axis (for example the estimation window length): ticks fall on
     * whole numbers only.
     *
     * @param xLabel x-axis label with its unit
     */
    public static JFreeChart overNumber(String title, String xLabel, NumberFormat xFormat, String yLabel,
                                        NumberFormat yFormat, List<ChartLine> lines, LineOptions options) {
        NumberAxis x = new NumberAxis(xLabel);
        x.setStandardTickUnits(NumberAxis.createIntegerTickUnits(Locale.ROOT));
        x.setNumberFormatOverride(xFormat);
        x.setAutoRangeIncludesZero(false);
        x.setLowerMargin(0.05);
        x.setUpperMargin(0.05);
        return build(title, x, yAxis(yLabel, yFormat, options), lines, options);
    }

    private static NumberAxis yAxis(String label, NumberFormat format, LineOptions options) {
        NumberAxis y = new NumberAxis(label);
        y.setNumberFormatOverride(format);
        y.setAutoRangeIncludesZero(options.includeZero());
        y.setAutoRangeStickyZero(options.includeZero());
        return y;
    }

    private static JFreeChart build(String title, ValueAxis x, ValueAxis y, List<ChartLine> lines,
                                    LineOptions options) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, options.markers());
        // One path per series keeps the SVG small; NaN values still break the path into pieces.
        renderer.setDrawSeriesLineAsPath(true);
        renderer.setLegendLine(new Line2D.Double(-16, 0, 16, 0));
        for (int s = 0; s < lines.size(); s++) {
            ChartLine line = lines.get(s);
            XYSeries series = new XYSeries(new SeriesKey(s, line.label()), false, true);
            for (int k : Decimation.minMax(line.y(), MAX_POINTS)) {
                series.add(line.xAt(k), line.yAt(k), false);
            }
            data.addSeries(series);
            renderer.setSeriesPaint(s, line.style().colour());
            renderer.setSeriesStroke(s, line.style().stroke());
            renderer.setSeriesShape(s, new Rectangle2D.Double(-MARKER / 2, -MARKER / 2, MARKER, MARKER));
        }
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setOrientation(PlotOrientation.VERTICAL);
        JFreeChart chart = new JFreeChart(title, JFreeChart.DEFAULT_TITLE_FONT, plot, lines.size() > 1);
        ChartLook.apply(chart);
        return chart;
    }
}
