package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.FamilyContrast;
import dev.sigmawalk.engine.evidence.HolmAdjustment;
import dev.sigmawalk.engine.evidence.JobsonKorkieMemmel;
import dev.sigmawalk.engine.evidence.JobsonKorkieTest;
import dev.sigmawalk.engine.evidence.RomanoWolfStepdown;
import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RunResult;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Runs the difference tests of Method §9 for every strategy against its baseline at every
 * window, then adjusts each pair's bootstrap p-values across windows with Holm's method, since
 * trying several windows and reporting the best is itself a search.
 */
public final class Comparisons {
    private Comparisons() {
    }

    /**
     * @param run the walk-forward result
     * @param baselines strategy to baseline, from {@link Baselines#of}
     * @param windows the study's windows, in study order
     * @param tests configured tests (kernel, resamples, seed)
     */
    public static List<Comparison> of(RunResult<?> run, Map<String, String> baselines, List<Integer> windows,
                                      DifferenceTests tests) {
        return of(run, baselines, windows, tests, List.of());
    }

    /**
     * @param scanned pairs the report picks from the data, each compared at its one window and
     *        added to the family unless a baseline comparison already covers it (in either order)
     */
    public static List<Comparison> of(RunResult<?> run, Map<String, String> baselines, List<Integer> windows,
                                      DifferenceTests tests, List<ScannedPair> scanned) {
        List<Comparison> out = new ArrayList<>();
        for (Map.Entry<String, String> e : baselines.entrySet()) {
            List<Comparison> pair = new ArrayList<>();
            for (int w : windows) {
                pair.add(compare(run, e.getKey(), e.getValue(), w, tests));
            }
            out.addAll(withHolm(pair));
        }
        for (ScannedPair s : scanned) {
            boolean covered = out.stream().anyMatch(c -> s.sameAs(c.strategy(), c.baseline(), c.window()));
            if (!covered) {
                out.addAll(withHolm(List.of(compare(run, s.strategy(), s.other(), s.window(), tests))));
            }
        }
        return withFamily(run, out, tests);
    }

    /** The Romano-Wolf p-values of every Sharpe and variance test that ran, over them all at once. */
    private static List<Comparison> withFamily(RunResult<?> run, List<Comparison> all, DifferenceTests tests) {
        List<FamilyContrast> family = new ArrayList<>();
        for (Comparison c : all) {
            double[] netA = run.path(c.strategy(), c.window()).net();
            double[] netB = run.path(c.baseline(), c.window()).net();
            c.sharpe().ifPresent(t -> family.add(new FamilyContrast(DifferenceMeasure.SHARPE_RATIO,
                    SeriesStats.minus(netA, run.riskFree()), SeriesStats.minus(netB, run.riskFree()), t)));
            c.variance().ifPresent(t -> family.add(new FamilyContrast(DifferenceMeasure.VARIANCE, netA, netB, t)));
        }
        double[] adjusted = RomanoWolfStepdown.adjust(family, tests.evidence().resamples(), tests.evidence().seed());
        List<Comparison> out = new ArrayList<>(all.size());
        int k = 0;
        for (Comparison c : all) {
            double sharpe = c.sharpe().isPresent() ? adjusted[k++] : Double.NaN;
            double variance = c.variance().isPresent() ? adjusted[k++] : Double.NaN;
            out.add(c.withFamily(sharpe, variance));
        }
        return out;
    }

    private static Comparison compare(RunResult<?> run, String strategy, String baseline, int window,
                                      DifferenceTests tests) {
        PathResult a = run.path(strategy, window);
        PathResult b = run.path(baseline, window);
        double[] excessA = SeriesStats.minus(a.net(), run.riskFree());
        double[] excessB = SeriesStats.minus(b.net(), run.riskFree());
        List<String> problems = new ArrayList<>();
        Optional<DifferenceTest> sharpe = attempt(() -> tests.sharpeRatio(excessA, excessB), "Sharpe ratio", problems);
        Optional<DifferenceTest> variance = attempt(() -> tests.variance(a.net(), b.net()), "variance", problems);
        Optional<JobsonKorkieTest> jk = attempt(() -> JobsonKorkieMemmel.test(excessA, excessB), "Jobson-Korkie",
                problems);
        return new Comparison(strategy, baseline, window, sharpe, variance, jk, Double.NaN, Double.NaN,
                problems.isEmpty() ? Optional.empty() : Optional.of(String.join("; ", problems)));
    }

    private static <T> Optional<T> attempt(java.util.function.Supplier<T> test, String what, List<String> problems) {
        try {
            return Optional.of(test.get());
        } catch (IllegalArgumentException ex) {
            problems.add(what + " test not run: " + ex.getMessage());
            return Optional.empty();
        }
    }

    private static List<Comparison> withHolm(List<Comparison> pair) {
        double[] sharpe = holm(pair, true);
        double[] variance = holm(pair, false);
        List<Comparison> out = new ArrayList<>(pair.size());
        for (int i = 0; i < pair.size(); i++) {
            out.add(pair.get(i).withHolm(sharpe[i], variance[i]));
        }
        return out;
    }

    /** Holm across the windows where the test ran; NaN where it did not. */
    private static double[] holm(List<Comparison> pair, boolean sharpe) {
        List<Integer> idx = new ArrayList<>();
        List<Double> p = new ArrayList<>();
        for (int i = 0; i < pair.size(); i++) {
            Optional<DifferenceTest> t = sharpe ? pair.get(i).sharpe() : pair.get(i).variance();
            if (t.isPresent()) {
                idx.add(i);
                p.add(t.get().bootstrapPValue());
            }
        }
        double[] adjusted = HolmAdjustment.adjust(p.stream().mapToDouble(Double::doubleValue).toArray());
        double[] out = new double[pair.size()];
        java.util.Arrays.fill(out, Double.NaN);
        for (int k = 0; k < idx.size(); k++) {
            out[idx.get(k)] = adjusted[k];
        }
        return out;
    }
}
