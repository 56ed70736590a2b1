package dev.sigmawalk.reports.sweep;

import com.univocity.parsers.csv.CsvParser;
import com.univocity.parsers.csv.CsvParserSettings;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads back what the sweep needs from a finished point's folder ({@code summary.csv},
 * {@code rebalances.csv}, {@code tests.csv}, {@code returns.csv}), by column name, so that a reused point and a point just run are read the
 * same way.
 */
final class PointFiles {
    /** The measure of {@code tests.csv} whose difference is the volatility comparison. */
    static final String VARIANCE = "variance";
    /** The status of a rebalance of {@code rebalances.csv} that formed a portfolio. */
    static final String OK = "ok";

    private PointFiles() {
    }

    static List<PointRow> summary(GridPoint point) {
        Table t = Table.read(point.folder().resolve("summary.csv"));
        Set<String> invested = invested(point);
        List<PointRow> rows = new ArrayList<>();
        for (String[] r : t.rows()) {
            String strategy = t.text(r, "strategy");
            String window = t.text(r, "window");
            rows.add(new PointRow(point, strategy, window, t.number(r, "volatility"), t.number(r, "sharpe"),
                    t.number(r, "mean_turnover"), t.number(r, "bias"),
                    window.isEmpty() || invested.contains(key(strategy, window))));
        }
        return rows;
    }

    /**
     * The strategy and window paths of {@code rebalances.csv} with at least one rebalance whose
     * status is {@code ok}: those that formed a portfolio once at least.
     */
    private static Set<String> invested(GridPoint point) {
        Table t = Table.read(point.folder().resolve("rebalances.csv"));
        Set<String> out = new HashSet<>();
        for (String[] r : t.rows()) {
            if (OK.equals(t.text(r, "status"))) {
                out.add(key(t.text(r, "strategy"), t.text(r, "window")));
            }
        }
        return out;
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

    /**
     * The net returns of both sides of each comparison, from {@code returns.csv}, on the dates
     * both sides have. The file's numbers round-trip, so these are the values the point's own
     * tests used.
     */
    static List<ContrastReturns> contrasts(GridPoint point, List<PointComparison> tests) {
        Set<String> wanted = new HashSet<>();
        for (PointComparison c : tests) {
            wanted.add(key(c.strategy(), c.window()));
            wanted.add(key(c.baseline(), c.window()));
        }
        Table t = Table.read(point.folder().resolve("returns.csv"));
        Map<String, Series> paths = new HashMap<>();
        for (String[] r : t.rows()) {
            String k = key(t.text(r, "strategy"), t.text(r, "window"));
            if (wanted.contains(k)) {
                paths.computeIfAbsent(k, x -> new Series()).add(LocalDate.parse(t.text(r, "date")), t.number(r, "net_return"));
            }
        }
        List<ContrastReturns> out = new ArrayList<>();
        for (PointComparison c : tests) {
            Series a = paths.getOrDefault(key(c.strategy(), c.window()), new Series());
            Series b = paths.getOrDefault(key(c.baseline(), c.window()), new Series());
            out.add(a.pairedWith(b, c));
        }
        return out;
    }

    private static String key(String strategy, String window) {
        return strategy + "\u0000" + window;
    }

    /** One path's dated net returns as read, in file order (oldest first). */
    private static final class Series {
        private final List<Integer> days = new ArrayList<>();
        private final List<Double> values = new ArrayList<>();

        void add(LocalDate date, double value) {
            days.add(Math.toIntExact(date.toEpochDay()));
            values.add(value);
        }

        /** Both series on the dates both have. */
        ContrastReturns pairedWith(Series other, PointComparison c) {
            Map<Integer, Double> theirs = new HashMap<>();
            for (int i = 0; i < other.days.size(); i++) {
                theirs.put(other.days.get(i), other.values.get(i));
            }
            int shared = (int) days.stream().filter(theirs::containsKey).count();
            int[] dates = new int[shared];
            double[] first = new double[shared];
            double[] second = new double[shared];
            int k = 0;
            for (int i = 0; i < days.size(); i++) {
                Double b = theirs.get(days.get(i));
                if (b != null) {
                    dates[k] = days.get(i);
                    first[k] = values.get(i);
                    second[k] = b;
                    k++;
                }
            }
            return new ContrastReturns(c, dates, first, second);
        }
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
