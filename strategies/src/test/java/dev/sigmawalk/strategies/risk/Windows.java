package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/** Small estimation windows for tests: explicit data, or seeded simulated returns. */
final class Windows {
    private Windows() {
    }

    /** A window over the given L×n row-major excess returns and L market returns, p = 12. */
    static EstimationWindow of(double[] excess, double[] market) {
        int len = market.length;
        int n = excess.length / len;
        List<String> assets = new ArrayList<>();
        int[] columns = new int[n];
        for (int i = 0; i < n; i++) {
            assets.add(String.format("Z%02d", i + 1));
            columns[i] = i;
        }
        return new EstimationWindow(LocalDate.of(2031, 1, 31), len - 1, assets, columns, excess, market, 12, null);
    }

    /**
     * Seeded returns with a market factor, a second common factor shared by the first half of
     * the assets (so residuals co-move and no target is exact) and Student-t-like noise (a normal
     * divided by the square root of a scaled chi-squared with 5 degrees of freedom).
     */
    static EstimationWindow simulated(long seed, int length, int assets) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] beta = new double[assets];
        double[] load = new double[assets];
        double[] vol = new double[assets];
        for (int i = 0; i < assets; i++) {
            beta[i] = 0.3 + 1.4 * rng.nextDouble();
            load[i] = i < assets / 2 ? 0.5 + rng.nextDouble() : 0.0;
            vol[i] = 0.02 + 0.06 * rng.nextDouble();
        }
        double[] excess = new double[length * assets];
        double[] market = new double[length];
        for (int t = 0; t < length; t++) {
            double m = 0.005 + 0.045 * heavyTailed(rng);
            double sector = 0.03 * gaussian(rng);
            market[t] = m;
            for (int i = 0; i < assets; i++) {
                excess[t * assets + i] = beta[i] * m + load[i] * sector + vol[i] * heavyTailed(rng);
            }
        }
        return of(excess, market);
    }

    static double gaussian(SplittableRandom rng) {
        // Box-Muller; 1 - u keeps the logarithm's argument in (0, 1].
        double u = 1.0 - rng.nextDouble();
        double v = rng.nextDouble();
        return Math.sqrt(-2.0 * Math.log(u)) * Math.cos(2.0 * Math.PI * v);
    }

    private static double heavyTailed(SplittableRandom rng) {
        double chi = 0;
        for (int k = 0; k < 5; k++) {
            double z = gaussian(rng);
            chi += z * z;
        }
        return gaussian(rng) / Math.sqrt(chi / 5.0) * Math.sqrt(3.0 / 5.0);
    }
}
