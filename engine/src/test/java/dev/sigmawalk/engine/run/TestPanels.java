package dev.sigmawalk.engine.run;

import dev.sigmawalk.engine.data.ReturnPanel;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/** Small invented panels for engine tests. */
public final class TestPanels {
    private TestPanels() {
    }

    /** Month-end dates starting at the end of January 2001. */
    public static LocalDate[] monthEnds(int rows) {
        LocalDate[] d = new LocalDate[rows];
        LocalDate first = LocalDate.of(2001, 1, 31);
        for (int t = 0; t < rows; t++) {
            d[t] = first.plusMonths(t).withDayOfMonth(first.plusMonths(t).lengthOfMonth());
        }
        return d;
    }

    /** A random one-factor panel: r = rf + β m + e, with seeded noise. */
    public static ReturnPanel random(int rows, int assets, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] m = new double[rows];
        double[] rf = new double[rows];
        double[] r = new double[rows * assets];
        for (int t = 0; t < rows; t++) {
            rf[t] = 0.002;
            m[t] = 0.006 + 0.045 * gaussian(rng);
            for (int i = 0; i < assets; i++) {
                double beta = 0.5 + i * 1.0 / assets;
                r[t * assets + i] = rf[t] + beta * (m[t] - rf[t]) + 0.05 * gaussian(rng);
            }
        }
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < assets; i++) {
            ids.add(String.format("Q%02d", i + 1));
        }
        return new ReturnPanel(monthEnds(rows), ids, r, m, rf, "index", 12);
    }

    static double gaussian(SplittableRandom rng) {
        // Box-Muller; adequate for invented test data.
        double u = rng.nextDouble();
        double v = rng.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }
}
