package dev.sigmawalk.reports.sweep;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.function.ToDoubleFunction;

/**
 * One measure of one strategy over the grid's two main axes: the first two varied keys, or the
 * first varied key and the estimation window when only one key is varied. A cell holds the
 * median over everything else that varies (further keys, and windows when the window is not an
 * axis), so that a cell's value is never one lucky draw among many hidden ones.
 *
 * @param strategy the strategy (a model with its objective and bounds)
 * @param measure what the cells hold
 * @param rowKey the first axis's key
 * @param rowLabels its values, in file order
 * @param columnKey the second axis's key, or {@code window}
 * @param columnLabels its values
 * @param cells {@code cells[i][j]} the median at row value i and column value j, NaN where no point ran
 * @param pooled the most values any one cell's median was taken over
 */
public record HeatMap(String strategy, Measure measure, String rowKey, List<String> rowLabels, String columnKey,
                      List<String> columnLabels, double[][] cells, int pooled) {
    /** The measures drawn, and which end of each is better. */
    public enum Measure {
        VOLATILITY("Realised volatility", "% a year", PointRow::volatility, false),
        SHARPE("Sharpe ratio", "a year", PointRow::sharpe, true);

        private final String title;
        private final String unit;
        private final ToDoubleFunction<PointRow> value;
        private final boolean higherIsBetter;

        Measure(String title, String unit, ToDoubleFunction<PointRow> value, boolean higherIsBetter) {
            this.title = title;
            this.unit = unit;
            this.value = value;
            this.higherIsBetter = higherIsBetter;
        }

        public String title() {
            return title;
        }

        public String unit() {
            return unit;
        }

        public boolean higherIsBetter() {
            return higherIsBetter;
        }

        double of(PointRow r) {
            return value.applyAsDouble(r);
        }
    }

    public HeatMap {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(measure, "measure");
        rowLabels = List.copyOf(rowLabels);
        columnLabels = List.copyOf(columnLabels);
        if (cells.length != rowLabels.size()) {
            throw new IllegalArgumentException("cells has " + cells.length + " rows for " + rowLabels.size() + " labels");
        }
    }

    /** One heat map per strategy (in first-seen order) and measure. */
    static List<HeatMap> of(SweepFile sweep, List<PointRow> rows) {
        Axis first = sweep.axes().get(0);
        boolean byWindow = sweep.axes().size() < 2;
        List<String> columns = byWindow ? windows(rows) : labels(sweep.axes().get(1));
        String columnKey = byWindow ? "window" : sweep.axes().get(1).key();
        List<HeatMap> maps = new ArrayList<>();
        for (String s : strategies(rows)) {
            for (Measure m : Measure.values()) {
                List<List<List<Double>>> pools = new ArrayList<>();
                for (int i = 0; i < first.values().size(); i++) {
                    List<List<Double>> line = new ArrayList<>();
                    for (int j = 0; j < columns.size(); j++) {
                        line.add(new ArrayList<>());
                    }
                    pools.add(line);
                }
                for (PointRow r : rows) {
                    if (!r.strategy().equals(s) || !Double.isFinite(m.of(r))) {
                        continue;
                    }
                    int[] at = sweep.coordinates(r.point().number() - 1);
                    int j = byWindow ? columns.indexOf(r.window()) : at[1];
                    pools.get(at[0]).get(j).add(m.of(r));
                }
                maps.add(reduce(s, m, first.key(), labels(first), columnKey, columns, pools));
            }
        }
        return maps;
    }

    private static HeatMap reduce(String strategy, Measure m, String rowKey, List<String> rowLabels, String columnKey,
                                  List<String> columns, List<List<List<Double>>> pools) {
        double[][] cells = new double[rowLabels.size()][columns.size()];
        int pooled = 0;
        for (int i = 0; i < cells.length; i++) {
            for (int j = 0; j < columns.size(); j++) {
                List<Double> pool = pools.get(i).get(j);
                cells[i][j] = median(pool);
                pooled = Math.max(pooled, pool.size());
            }
        }
        return new HeatMap(strategy, m, rowKey, rowLabels, columnKey, columns, cells, pooled);
    }

    /** The middle value, or the mean of the two middle values; NaN for none. */
    static double median(List<Double> values) {
        if (values.isEmpty()) {
            return Double.NaN;
        }
        double[] v = values.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(v);
        int n = v.length;
        return n % 2 == 1 ? v[n / 2] : (v[n / 2 - 1] + v[n / 2]) / 2;
    }

    private static List<String> labels(Axis axis) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < axis.values().size(); i++) {
            out.add(axis.label(i));
        }
        return out;
    }

    private static List<String> strategies(List<PointRow> rows) {
        return rows.stream().filter(r -> !r.isMarket()).map(PointRow::strategy).distinct().toList();
    }

    /** Window lengths seen, shortest first. */
    private static List<String> windows(List<PointRow> rows) {
        return rows.stream().filter(r -> !r.isMarket()).map(PointRow::window).distinct()
                .sorted((a, b) -> Integer.compare(Integer.parseInt(a), Integer.parseInt(b))).toList();
    }
}
