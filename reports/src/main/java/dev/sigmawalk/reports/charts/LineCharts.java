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
    /** Lines longer than this are thinned by {@link Decimation} before drawing. */
    static final int MAX_POINTS = 1200;

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

    private static JFreeChart build(String title, ValueAxis x, NumberAxis y, List<ChartLine> lines,
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
