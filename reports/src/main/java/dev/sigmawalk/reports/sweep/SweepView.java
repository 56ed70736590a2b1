package dev.sigmawalk.reports.sweep;

import java.util.List;

/**
 * What {@code sweep.mustache} shows; every text is escaped by the template except {@code style},
 * the report's own stylesheet.
 */
record SweepView(String style, String title, String subtitle, List<AxisLine> axes, String counts, String answer,
                 String method, boolean anyLeftOut, List<String> leftOut, List<HeatTable> maps, List<PointLine> points, String started, String finished) {

    /** A varied key and its values. */
    record AxisLine(String key, String values) {
    }

    /** A heat map as a table. */
    record HeatTable(String heading, String note, String rowKey, String columnKey, List<String> columns, List<Row> rows) {
    }

    record Row(String label, List<Cell> cells) {
    }

    /** A cell: its text, background and ink colours, and whether it is the map's best. */
    record Cell(String text, String background, String ink, boolean best) {
    }

    /** A grid point with its outcome; {@code link} is its report, relative to the page. */
    record PointLine(String label, String values, String status, String reason, String link) {
    }
}
