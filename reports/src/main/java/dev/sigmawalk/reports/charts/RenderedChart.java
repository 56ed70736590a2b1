package dev.sigmawalk.reports.charts;

import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.geom.AffineTransform;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.Executor;
import org.jfree.chart.JFreeChart;

/**
 * One chart drawn for every medium from the same chart object: its PNG copy and its SVG markup
 * on a worker thread as soon as the chart is built, then, on request, as vector drawing on any
 * {@link Graphics2D} (the PDF). Charts of a report are independent, so they render side by side.
 *
 * <p>A chart changes its own axes while it is drawn (tick units are chosen anew at every draw),
 * so one chart is never drawn by two threads at once: the worker draws the PNG, then the SVG, in
 * the order a single thread would, and {@link #paint} first waits for the worker and then draws
 * under the chart's lock. Every medium therefore gets the bytes it would get from one thread.
 */
public final class RenderedChart {
    private final String id;
    private final JFreeChart chart;
    private final ChartRenderer renderer;
    private final CompletableFuture<String> svg;

    private RenderedChart(String id, JFreeChart chart, ChartRenderer renderer, Path png, Executor workers) {
        this.id = id;
        this.chart = chart;
        this.renderer = renderer;
        this.svg = CompletableFuture.supplyAsync(() -> {
            synchronized (chart) {
                try {
                    renderer.png(chart, png);
                } catch (IOException e) {
                    throw new UncheckedIOException("could not write chart " + png + ": " + e.getMessage(), e);
                }
                return renderer.svg(chart, id);
            }
        }, workers);
    }

    /**
     * Starts drawing the chart's PNG copy and SVG markup on {@code workers} ({@code Runnable::run}
     * draws them at once, on the calling thread).
     *
     * @param id the SVG id prefix, unique on the page (see {@link ChartRenderer#svg})
     * @param png the PNG file to create or replace
     */
    public static RenderedChart start(String id, JFreeChart chart, ChartRenderer renderer, Path png,
                                      Executor workers) {
        return new RenderedChart(id, chart, renderer, png, workers);
    }

    public String id() {
        return id;
    }

    /** Pixel size the chart is laid out at, in every medium. */
    public ChartRenderer renderer() {
        return renderer;
    }

    /**
     * The chart's {@code <svg>} element without its drawing: its id and {@code viewBox}, as the
     * full markup starts. A page can be laid out around it before the worker has drawn the chart.
     */
    public String outline() {
        return "<svg id='" + id + "' viewBox='0 0 " + renderer.width() + " " + renderer.height() + "'></svg>";
    }

    /**
     * The chart's inline SVG markup, waiting for the worker if it is still drawing.
     *
     * @throws UncheckedIOException when its PNG copy could not be written
     */
    public String svg() {
        try {
            return svg.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw e;
        }
    }

    /**
     * Draws the chart as vector graphics into a {@code width × height} rectangle at the origin of
     * {@code g}: the layout of the {@code renderer()} size, scaled, as a browser scales the SVG.
     */
    public void paint(Graphics2D g, double width, double height) {
        svg();
        synchronized (chart) {
            AffineTransform before = g.getTransform();
            g.scale(width / renderer.width(), height / renderer.height());
            chart.draw(g, new Rectangle(0, 0, renderer.width(), renderer.height()));
            g.setTransform(before);
        }
    }
}
