package dev.sigmawalk.engine.compare;

import dev.sigmawalk.engine.evidence.DifferenceMeasure;
import dev.sigmawalk.engine.evidence.DifferenceTest;
import dev.sigmawalk.engine.evidence.DifferenceTests;
import dev.sigmawalk.engine.evidence.FamilyContrast;
import dev.sigmawalk.engine.evidence.HolmAdjustment;
import dev.sigmawalk.engine.evidence.JobsonKorkieMemmel;
import dev.sigmawalk.engine.evidence.JobsonKorkieTest;
import dev.sigmawalk.engine.evidence.RomanoWolfStepdown;
import dev.sigmawalk.engine.evidence.SharedOut;
import dev.sigmawalk.engine.measures.SeriesStats;
import dev.sigmawalk.engine.run.RunResult;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.function.Supplier;

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
        return of(run, baselines, windows, tests, scanned, 1);
    }

    /**
     * The same comparisons, their bootstrap tests shared out over {@code threads} threads: each
     * test draws from its own seeded generator and the family draws all its block starts first,
     * so every value is bit for bit that of one thread.
     *
     * @param threads >= 1
     */
    public static List<Comparison> of(RunResult<?> run, Map<String, String> baselines, List<Integer> windows,
                                      DifferenceTests tests, List<ScannedPair> scanned, int threads) {
        // Which pairs are compared, and which of them Holm adjusts together, depends on the
        // names alone: the groups are fixed first, then every test of every pair runs at once.
        List<List<Pair>> groups = new ArrayList<>();
        List<Pair> all = new ArrayList<>();
        for (Map.Entry<String, String> e : baselines.entrySet()) {
            List<Pair> group = new ArrayList<>();
            for (int w : windows) {
                group.add(new Pair(e.getKey(), e.getValue(), w));
            }
            groups.add(group);
            all.addAll(group);
        }
        for (ScannedPair s : scanned) {
            boolean covered = all.stream().anyMatch(c -> s.sameAs(c.strategy(), c.baseline(), c.window()));
            if (!covered) {
                Pair p = new Pair(s.strategy(), s.other(), s.window());
                groups.add(List.of(p));
                all.add(p);
            }
        }
        List<Callable<Attempt<DifferenceTest>>> bootstrapped = new ArrayList<>(2 * all.size());
        for (Pair p : all) {
            double[] netA = run.path(p.strategy(), p.window()).net();
            double[] netB = run.path(p.baseline(), p.window()).net();
            bootstrapped.add(() -> attempt(() -> tests.sharpeRatio(SeriesStats.minus(netA, run.riskFree()),
                    SeriesStats.minus(netB, run.riskFree())), "Sharpe ratio"));
            bootstrapped.add(() -> attempt(() -> tests.variance(netA, netB), "variance"));
        }
        List<Attempt<DifferenceTest>> done = SharedOut.all(bootstrapped, threads, "running the difference tests");
        List<Comparison> out = new ArrayList<>(all.size());
        int k = 0;
        for (List<Pair> group : groups) {
            List<Comparison> pairs = new ArrayList<>(group.size());
            for (Pair p : group) {
                pairs.add(compare(run, p, done.get(k), done.get(k + 1)));
                k += 2;
            }
            out.addAll(withHolm(pairs));
        }
        return withFamily(run, out, tests, threads);
    }

    /** A strategy, the one it is compared with, and the window of both. */
    private record Pair(String strategy, String baseline, int window) {
    }

    /** A test's result, or why it could not run. */
    private record Attempt<T>(Optional<T> result, Optional<String> problem) {
    }

    /** The Romano-Wolf p-values of every Sharpe and variance test that ran, over them all at once. */
    private static List<Comparison> withFamily(RunResult<?> run, List<Comparison> all, DifferenceTests tests,
                                               int threads) {
        List<FamilyContrast> family = new ArrayList<>();
        for (Comparison c : all) {
            double[] netA = run.path(c.strategy(), c.window()).net();
            double[] netB = run.path(c.baseline(), c.window()).net();
            c.sharpe().ifPresent(t -> family.add(new FamilyContrast(DifferenceMeasure.SHARPE_RATIO,
                    SeriesStats.minus(netA, run.riskFree()), SeriesStats.minus(netB, run.riskFree()), t)));
            c.variance().ifPresent(t -> family.add(new FamilyContrast(DifferenceMeasure.VARIANCE, netA, netB, t)));
        }
        double[] adjusted = RomanoWolfStepdown.adjust(family, tests.evidence().resamples(), tests.evidence().seed(),
                threads);
        List<Comparison> out = new ArrayList<>(all.size());
        int k = 0;
        for (Comparison c : all) {
            double sharpe = c.sharpe().isPresent() ? adjusted[k++] : Double.NaN;
            double variance = c.variance().isPresent() ? adjusted[k++] : Double.NaN;
            out.add(c.withFamily(sharpe, variance));
        }
        return out;
    }

    /** The pair's comparison from its two bootstrap tests, with the Jobson-Korkie test beside them. */
    private static Comparison compare(RunResult<?> run, Pair p, Attempt<DifferenceTest> sharpe,
                                      Attempt<DifferenceTest> variance) {
        double[] excessA = SeriesStats.minus(run.path(p.strategy(), p.window()).net(), run.riskFree());
        double[] excessB = SeriesStats.minus(run.path(p.baseline(), p.window()).net(), run.riskFree());
        Attempt<JobsonKorkieTest> jk = attempt(() -> JobsonKorkieMemmel.test(excessA, excessB), "Jobson-Korkie");
        List<String> problems = new ArrayList<>();
        sharpe.problem().ifPresent(problems::add);
        variance.problem().ifPresent(problems::add);
        jk.problem().ifPresent(problems::add);
        return new Comparison(p.strategy(), p.baseline(), p.window(), sharpe.result(), variance.result(), jk.result(),
                Double.NaN, Double.NaN, problems.isEmpty() ? Optional.empty() : Optional.of(String.join("; ", problems)));
    }

    private static <T> Attempt<T> attempt(Supplier<T> test, String what) {
        try {
            return new Attempt<>(Optional.of(test.get()), Optional.empty());
        } catch (IllegalArgumentException ex) {
            return new Attempt<>(Optional.empty(), Optional.of(what + " test not run: " + ex.getMessage()));
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
