package dev.sigmawalk.engine.evidence;

import java.util.Locale;

/**
 * The size-and-power benchmark of the developer guide: empirical 5 % rejection rates of every test
 * the tool reports under three nulls at the demo studies' sizes, and power at one stated
 * alternative, printed as Markdown tables. Run by {@code bench/size-power.sh}; not a test.
 *
 * <p>Arguments (all optional): a draw multiplier (default 1.0, the counts of the developer guide's
 * table; 0.2 for a quick look) and a seed (default 20_050_101). The bootstrap cells use fewer
 * draws and resamples than the HAC ones, and the daily cells fewer than the monthly, to keep the
 * run to minutes on two cores.
 */
public final class SizeAndPower {
    /** Monthly demo: 72 companies; out-of-sample months of the longest window (276 - 120). */
    static final int ASSETS = 72;
    static final int MONTHLY_PERIODS = 156;
    /** Daily demo: out-of-sample days of the 500-day window (6,001 - 500). */
    static final int DAILY_PERIODS = 5_500;
    static final int[] MONTHLY_WINDOWS = {36, 60, 120};
    static final int DAILY_WINDOW = 250;

    private SizeAndPower() {
    }

    public static void main(String[] args) {
        double scale = args.length > 0 ? Double.parseDouble(args[0]) : 1.0;
        long seed = args.length > 1 ? Long.parseLong(args[1]) : 20_050_101L;
        int residualDraws = draws(500, scale);
        int hacMonthly = draws(1000, scale);
        int bootMonthly = draws(250, scale);
        int hacDaily = draws(150, scale);
        int bootDaily = draws(75, scale);
        int familyMonthly = draws(150, scale);
        int familyDaily = draws(30, scale);
        long started = System.nanoTime();
        StringBuilder out = new StringBuilder();
        out.append("Residual tests, n = ").append(ASSETS).append(", ").append(residualDraws)
                .append(" draws per cell (LM / LM_adj / CD rejection rates at 5 %):\n\n| null |");
        for (int w : MONTHLY_WINDOWS) {
            out.append(" L = ").append(w).append(" |");
        }
        out.append(" L = ").append(DAILY_WINDOW).append(" |\n|---|---|---|---|---|\n");
        for (NullModel m : NullModel.values()) {
            out.append("| ").append(m.label()).append(" |");
            for (int w : MONTHLY_WINDOWS) {
                out.append(' ').append(residual(RejectionRates.residual(m, ASSETS, w, 0, residualDraws, seed + w))).append(" |");
            }
            out.append(' ').append(residual(RejectionRates.residual(m, ASSETS, DAILY_WINDOW, 0, residualDraws,
                    seed + DAILY_WINDOW))).append(" |\n");
        }
        out.append("| power: sector shock, ρ = 0.05 within groups of 9, iid normal |");
        for (int w : MONTHLY_WINDOWS) {
            out.append(' ').append(residual(RejectionRates.residual(NullModel.NORMAL, ASSETS, w, 0.05, residualDraws,
                    seed + 7 * w))).append(" |");
        }
        out.append(' ').append(residual(RejectionRates.residual(NullModel.NORMAL, ASSETS, DAILY_WINDOW, 0.05,
                residualDraws, seed + 7 * DAILY_WINDOW))).append(" |\n\n");
        out.append("Difference tests (Sharpe HAC / Sharpe bootstrap / variance HAC / variance bootstrap / "
                + "Jobson-Korkie-Memmel), pair correlation ").append(RejectionRates.PAIR_CORRELATION)
                .append("; HAC and JK over ").append(hacMonthly).append(" draws (monthly) and ").append(hacDaily)
                .append(" (daily), bootstraps over ").append(bootMonthly).append(" draws with 499 resamples (monthly) and ")
                .append(bootDaily).append(" with 199 (daily):\n\n| null | T = ").append(MONTHLY_PERIODS)
                .append(" (monthly) | T = ").append(DAILY_PERIODS).append(" (daily) |\n|---|---|---|\n");
        for (NullModel m : NullModel.values()) {
            out.append("| ").append(m.label()).append(" | ")
                    .append(difference(RejectionRates.difference(m, MONTHLY_PERIODS, 1, 0, hacMonthly, bootMonthly, 499,
                            seed + 11)))
                    .append(" | ").append(difference(RejectionRates.difference(m, DAILY_PERIODS, 1, 0, hacDaily, bootDaily,
                            199, seed + 13))).append(" |\n");
        }
        out.append("| power: volatility 10 % lower and per-period Sharpe ratio 0.15 higher, iid normal | ")
                .append(difference(RejectionRates.difference(NullModel.NORMAL, MONTHLY_PERIODS, 0.9, 0.15, hacMonthly,
                        bootMonthly, 499, seed + 17)))
                .append(" | ").append(difference(RejectionRates.difference(NullModel.NORMAL, DAILY_PERIODS, 0.9, 0.15,
                        hacDaily, bootDaily, 199, seed + 19))).append(" |\n\n");
        out.append("Difference tests when the two series have their own volatility paths (the family's design), the same "
                + "columns and draws; the block length is the data-driven one unless given:\n\n| null | T = ")
                .append(MONTHLY_PERIODS).append(" (monthly) | T = ").append(DAILY_PERIODS).append(" (daily) |\n|---|---|---|\n");
        out.append("| iid normal | ")
                .append(difference(RejectionRates.separatePaths(NullModel.NORMAL, MONTHLY_PERIODS, hacMonthly, bootMonthly,
                        499, 0, seed + 31)))
                .append(" | ").append(difference(RejectionRates.separatePaths(NullModel.NORMAL, DAILY_PERIODS, hacDaily,
                        bootDaily, 199, 0, seed + 37))).append(" |\n");
        out.append("| GARCH(1,1) | ")
                .append(difference(RejectionRates.separatePaths(NullModel.GARCH, MONTHLY_PERIODS, hacMonthly, bootMonthly,
                        499, 0, seed + 41)))
                .append(" | ").append(difference(RejectionRates.separatePaths(NullModel.GARCH, DAILY_PERIODS, hacDaily,
                        bootDaily, 199, 0, seed + 43))).append(" |\n");
        out.append("| GARCH(1,1), block length 20 (monthly) and 40 (daily) | ")
                .append(difference(RejectionRates.separatePaths(NullModel.GARCH, MONTHLY_PERIODS, hacMonthly, bootMonthly,
                        499, 20, seed + 41)))
                .append(" | ").append(difference(RejectionRates.separatePaths(NullModel.GARCH, DAILY_PERIODS, hacDaily,
                        bootDaily, 199, 40, seed + 43))).append(" |\n\n");
        out.append("Family of 6 (3 strategies against one baseline, Sharpe and variance), any rejection at 5 % "
                + "(uncorrected bootstrap / Romano-Wolf), ").append(familyMonthly).append(" draws with 199 resamples (monthly), ")
                .append(familyDaily).append(" with 199 (daily):\n\n| null | T = ").append(MONTHLY_PERIODS)
                .append(" | T = ").append(DAILY_PERIODS).append(" |\n|---|---|---|\n");
        for (NullModel m : NullModel.values()) {
            out.append("| ").append(m.label()).append(" | ")
                    .append(family(RejectionRates.family(m, MONTHLY_PERIODS, 3, familyMonthly, 199, seed + 23)))
                    .append(" | ").append(family(RejectionRates.family(m, DAILY_PERIODS, 3, familyDaily, 199, seed + 29)))
                    .append(" |\n");
        }
        out.append(String.format(Locale.ROOT, "%nseed %d, draw multiplier %.2f, %.0f s%n", seed, scale,
                (System.nanoTime() - started) / 1e9));
        System.out.print(out);
    }

    private static int draws(int base, double scale) {
        return Math.max(20, (int) Math.round(base * scale));
    }

    private static String residual(RejectionRates.Residual r) {
        return percent(r.lm()) + " / " + percent(r.lmAdj()) + " / " + percent(r.cd());
    }

    private static String difference(RejectionRates.Difference d) {
        return percent(d.sharpeHac()) + " / " + percent(d.sharpeBootstrap()) + " / " + percent(d.varianceHac()) + " / "
                + percent(d.varianceBootstrap()) + " / " + percent(d.jobsonKorkie());
    }

    private static String family(RejectionRates.Family f) {
        return percent(f.uncorrected()) + " / " + percent(f.romanoWolf());
    }

    private static String percent(double share) {
        return String.format(Locale.ROOT, "%.1f %%", 100 * share);
    }
}
