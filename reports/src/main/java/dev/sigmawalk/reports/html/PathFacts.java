package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.reports.charts.Concentration;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Figures about one path that the summary row does not hold, computed from its rebalance records
 * and forecast series.
 *
 * @param rebalances number of rebalances
 * @param failures rebalances where no portfolio could be formed
 * @param totalCost Σ c · TO over all rebalances, as a fraction of wealth (simple sum)
 * @param annualCost totalCost divided by the out-of-sample years N / p
 * @param meanEffectiveHoldings mean over rebalances with holdings of 1 / Σ w²
 * @param minEffectiveHoldings the smallest 1 / Σ w² seen
 * @param meanLargestWeight mean over those rebalances of max w
 * @param maxLargestWeight the largest single weight seen
 * @param meanEligible mean number of eligible assets
 * @param shrinkage mean, min and max of δ; empty when the path reports none
 * @param forecastRows held rows with a forecast volatility > 0 (the N of the bias statistic)
 */
public record PathFacts(int rebalances, long failures, double totalCost, double annualCost,
                        double meanEffectiveHoldings, double minEffectiveHoldings, double meanLargestWeight,
                        double maxLargestWeight, double meanEligible, Optional<ShrinkageRange> shrinkage,
                        int forecastRows) {
    public PathFacts {
        java.util.Objects.requireNonNull(shrinkage, "shrinkage");
    }

    /**
     * Mean, least and greatest shrinkage intensity over a path's rebalances.
     *
     * @param mean mean δ
     * @param min least δ
     * @param max greatest δ
     */
    public record ShrinkageRange(double mean, double min, double max) {
    }

    /** The facts of {@code path}, with p periods a year. */
    public static PathFacts of(PathResult path, int periodsPerYear) {
        int count = path.rebalances().size();
        double cost = 0;
        double eligible = 0;
        double sumEffective = 0;
        double minEffective = Double.POSITIVE_INFINITY;
        double sumLargest = 0;
        double maxLargest = Double.NEGATIVE_INFINITY;
        int held = 0;
        for (RebalanceRecord r : path.rebalances()) {
            cost += r.cost();
            eligible += r.eligible();
            if (hasHoldings(r.weights())) {
                double eff = Concentration.effectiveHoldings(r.weights());
                double top = Concentration.largestWeight(r.weights());
                sumEffective += eff;
                minEffective = Math.min(minEffective, eff);
                sumLargest += top;
                maxLargest = Math.max(maxLargest, top);
                held++;
            }
        }
        double years = (double) path.net().length / periodsPerYear;
        return new PathFacts(count, path.failures(), cost, cost / years,
                held == 0 ? Double.NaN : sumEffective / held, held == 0 ? Double.NaN : minEffective,
                held == 0 ? Double.NaN : sumLargest / held, held == 0 ? Double.NaN : maxLargest,
                count == 0 ? Double.NaN : eligible / count, shrinkage(path), forecastRows(path));
    }

    private static boolean hasHoldings(double[] w) {
        for (double v : w) {
            if (v != 0) {
                return true;
            }
        }
        return false;
    }

    private static Optional<ShrinkageRange> shrinkage(PathResult path) {
        double sum = 0;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        int n = 0;
        for (RebalanceRecord r : path.rebalances()) {
            OptionalDouble d = r.shrinkage();
            if (d.isPresent()) {
                sum += d.getAsDouble();
                min = Math.min(min, d.getAsDouble());
                max = Math.max(max, d.getAsDouble());
                n++;
            }
        }
        return n == 0 ? Optional.empty() : Optional.of(new ShrinkageRange(sum / n, min, max));
    }

    private static int forecastRows(PathResult path) {
        int n = 0;
        for (double s : path.forecastVolatility()) {
            if (s > 0) {
                n++;
            }
        }
        return n;
    }
}
