package dev.sigmawalk.reports.sweep;

import com.univocity.parsers.csv.CsvParser;
import com.univocity.parsers.csv.CsvParserSettings;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads back what the sweep needs from a finished point's folder ({@code summary.csv},
 * {@code tests.csv}), by column name, so that a reused point and a point just run are read the
 * same way.
 */
final class PointFiles {
    /** The measure of {@code tests.csv} whose difference is the volatility comparison. */
    static final String VARIANCE = "variance";

    private PointFiles() {
    }

    static List<PointRow> summary(GridPoint point) {
        Table t = Table.read(point.folder().resolve("summary.csv"));
        List<PointRow> rows = new ArrayList<>();
        for (String[] r : t.rows()) {
            rows.add(new PointRow(point, t.text(r, "strategy"), t.text(r, "window"), t.number(r, "volatility"),
                    t.number(r, "sharpe"), t.number(r, "mean_turnover"), t.number(r, "bias")));
        }
        return rows;
    }

    static List<PointComparison> varianceTests(GridPoint point) {
        Table t = Table.read(point.folder().resolve("tests.csv"));
        List<PointComparison> out = new ArrayList<>();
        for (String[] r : t.rows()) {
            double p = t.number(r, "bootstrap_pvalue");
            if (VARIANCE.equals(t.text(r, "measure")) && p >= 0 && p <= 1) {
                out.add(new PointComparison(point, t.text(r, "strategy"), t.text(r, "baseline"), t.text(r, "window"), p));
            }
        }
        return out;
    }

    /** A CSV file with a header row, cells by column name. */
    private record Table(Path file, List<String> header, List<String[]> rows) {
        static Table read(Path file) {
            CsvParserSettings settings = new CsvParserSettings();
            settings.setLineSeparatorDetectionEnabled(true);
            settings.setNullValue("");
            settings.setEmptyValue("");
            settings.setMaxCharsPerColumn(-1);
            List<String[]> all = new CsvParser(settings).parseAll(file.toFile(), StandardCharsets.UTF_8);
            if (all.isEmpty()) {
                throw new IllegalStateException(file + " has no header row");
            }
            return new Table(file, Arrays.asList(all.get(0)), all.subList(1, all.size()));
        }

        String text(String[] row, String column) {
            int i = header.indexOf(column);
            if (i < 0) {
                throw new IllegalStateException(file + " has no column '" + column + "'");
            }
            return i < row.length && row[i] != null ? row[i] : "";
        }

        double number(String[] row, String column) {
            String t = text(row, column);
            return t.isEmpty() ? Double.NaN : Double.parseDouble(t);
        }
    }
}
