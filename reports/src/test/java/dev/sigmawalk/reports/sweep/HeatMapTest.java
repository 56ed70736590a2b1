package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.YamlNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Heat maps over the first two axes, with the median over everything else (common practice for a robust cell). */
class HeatMapTest {
    private static final double EXACT = 1e-15;

    private static Axis axis(String key, String... values) {
        List<YamlNode> nodes = new ArrayList<>();
        for (String v : values) {
            nodes.add(new YamlNode.Scalar(v, YamlNode.Scalar.Kind.INTEGER, 1, 1));
        }
        return new Axis(key, 1, 1, nodes);
    }

    private static GridPoint point(SweepFile sweep, int n) {
        int[] at = sweep.coordinates(n - 1);
        List<String> values = new ArrayList<>();
        for (int a = 0; a < at.length; a++) {
            values.add(sweep.axes().get(a).label(at[a]));
        }
        return new GridPoint(n, String.format("%03d", n), values, Path.of("/g/" + n), "");
    }

    @Test
    void cells_areMediansOverTheThirdAxisAndWindows() {
        SweepFile sweep = new SweepFile(Path.of("/g/s.yaml"), "t", Path.of("/g/b.yaml"),
                List.of(axis("a", "1", "2"), axis("b", "10", "20", "30"), axis("c", "7", "8")), Path.of("/g/out"));
        List<PointRow> rows = new ArrayList<>();
        for (int n = 1; n <= sweep.size(); n++) {
            GridPoint p = point(sweep, n);
            // volatility = n / 100 in window 36 and n / 100 + 0.5 in window 60: the median over c and
            // window of cell (i, j) is the mean of the four values, (n1 + n2) / 200 + 0.25
            rows.add(new PointRow(p, "m", "36", n / 100.0, -n, 0, 1));
            rows.add(new PointRow(p, "m", "60", n / 100.0 + 0.5, -n, 0, 1));
            rows.add(new PointRow(p, "market", "", 9, 9, 0, Double.NaN));
        }
        List<HeatMap> maps = HeatMap.of(sweep, rows);
        assertEquals(2, maps.size(), "one strategy x two measures; the market is no strategy");
        HeatMap vol = maps.get(0);
        assertEquals(HeatMap.Measure.VOLATILITY, vol.measure());
        assertEquals(List.of("10", "20", "30"), vol.columnLabels());
        assertEquals(4, vol.pooled());
        // points are numbered with c fastest: (a=1, b=10) holds points 1 and 2
        assertArrayEquals(new double[] {(1 + 2) / 200.0 + 0.25, (3 + 4) / 200.0 + 0.25, (5 + 6) / 200.0 + 0.25},
                vol.cells()[0], EXACT);
        assertArrayEquals(new double[] {(7 + 8) / 200.0 + 0.25, (9 + 10) / 200.0 + 0.25, (11 + 12) / 200.0 + 0.25},
                vol.cells()[1], EXACT);
        assertEquals(-1.5, maps.get(1).cells()[0][0], EXACT, "Sharpe median of -1, -1, -2, -2");
    }

    @Test
    void oneAxis_isDrawnAgainstTheWindow() {
        SweepFile sweep = new SweepFile(Path.of("/g/s.yaml"), "t", Path.of("/g/b.yaml"), List.of(axis("a", "1", "2")),
                Path.of("/g/out"));
        List<PointRow> rows = List.of(new PointRow(point(sweep, 1), "m", "120", 0.3, 0, 0, 1),
                new PointRow(point(sweep, 1), "m", "36", 0.1, 0, 0, 1), new PointRow(point(sweep, 2), "m", "36", 0.2, 0, 0, 1));
        HeatMap vol = HeatMap.of(sweep, rows).get(0);
        assertEquals("window", vol.columnKey());
        assertEquals(List.of("36", "120"), vol.columnLabels(), "windows shortest first");
        assertArrayEquals(new double[] {0.1, 0.3}, vol.cells()[0], EXACT);
        assertEquals(0.2, vol.cells()[1][0], EXACT);
        assertTrue(Double.isNaN(vol.cells()[1][1]), "no result there");
    }

    @Test
    void median_ofEvenAndOddCounts() {
        assertEquals(2.0, HeatMap.median(List.of(3.0, 1.0, 2.0)), EXACT);
        assertEquals(2.5, HeatMap.median(List.of(4.0, 1.0, 2.0, 3.0)), EXACT);
        assertTrue(Double.isNaN(HeatMap.median(List.of())));
    }
}
