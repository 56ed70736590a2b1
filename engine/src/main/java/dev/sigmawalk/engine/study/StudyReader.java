package dev.sigmawalk.engine.study;

import dev.sigmawalk.engine.data.InputException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * Reads a study file (CONTRACT "Study file") into a {@link Study}. Unknown keys are errors that
 * suggest the nearest valid key; bad values name their key path and what was expected; relative
 * paths resolve against the study file's folder. Defaults come from {@link StudyDefaults} only.
 * Checks that need the data (bounds against the number of assets, windows against the number of
 * rows) happen when the data are loaded.
 */
public final class StudyReader {
    private static final Set<String> ROOT = Set.of("title", "data", "walkforward", "strategies", "evidence", "output",
            "report");
    private static final Set<String> DATA = Set.of("assets", "layout", "values", "market", "riskfree", "periods_per_year",
            "sectors");
    private static final Set<String> WALK = Set.of("windows", "rebalance_every", "rebalance", "start", "end", "cost_bps");
    /** A cost of 10 000 bps takes the whole traded value; more is no longer a cost. */
    private static final double MAX_COST_BPS = 10_000;
    private static final Set<String> EVIDENCE = Set.of("resamples", "seed", "block_length");
    private static final Set<String> REPORT = Set.of("paper");

    private StudyReader() {
    }

    /**
     * @param studyFile the YAML study file
     * @throws InputException naming the file, line, column, key path and value of the first problem
     */
    public static Study read(Path studyFile) {
        Path file = studyFile.toAbsolutePath().normalize();
        return readTree(file, YamlTree.parse(file));
    }

    /**
     * Reads {@code text} as the study file {@code studyFile} would be read if it held that text:
     * relative paths resolve against its folder and messages name it. Lets a derived study be
     * validated before it is written anywhere.
     *
     * @throws InputException naming the file, line, column, key path and value of the first problem
     */
    public static Study read(Path studyFile, String text) {
        Path file = studyFile.toAbsolutePath().normalize();
        return readTree(file, YamlTree.parse(file, text));
    }

    /**
     * Reads a study given as a tree of nodes rather than as text, for a study built in code: the
     * same keys, defaults and messages as a file. Messages name {@code studyFile} and the key path;
     * a node's line and column are named when they are above 0. Relative paths resolve against
     * the folder of {@code studyFile}, which need not exist.
     *
     * @throws InputException naming the key path and value of the first problem
     */
    public static Study read(Path studyFile, YamlNode document) {
        return readTree(studyFile.toAbsolutePath().normalize(), document);
    }

    private static Study readTree(Path file, YamlNode document) {
        Section root = Section.of(file, "", document, ROOT);
        String title = root.has("title") ? root.text("title") : defaultTitle(file);
        DataSpec data = data(Section.of(file, "data", root.node("data"), DATA));
        WalkForwardSpec walk = walkForward(Section.of(file, "walkforward", root.node("walkforward"), WALK));
        List<StrategySpec> strategies = StrategyReader.readAll(root, data.sectors().isPresent());
        EvidenceSpec evidence = root.has("evidence")
                ? evidence(Section.of(file, "evidence", root.node("evidence"), EVIDENCE))
                : EvidenceSpec.defaults();
        Path output = root.resolve(root.has("output") ? root.text("output") : StudyDefaults.OUTPUT);
        ReportSpec report = root.has("report")
                ? report(Section.of(file, "report", root.node("report"), REPORT))
                : ReportSpec.defaults();
        return new Study(file, title, data, walk, strategies, evidence, output, report);
    }

    private static String defaultTitle(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    private static DataSpec data(Section s) {
        Path assets = s.path("assets");
        ValueKind values = s.choice("values", ValueKind.class);
        SeriesSource market = series(s, "market", false);
        SeriesSource riskFree = series(s, "riskfree", true);
        DataLayout layout = s.has("layout") ? s.choice("layout", DataLayout.class) : StudyDefaults.LAYOUT;
        return new DataSpec(assets, values, market, riskFree, s.optionalInteger("periods_per_year", 1),
                s.has("sectors") ? Optional.of(s.path("sectors")) : Optional.empty(), layout);
    }

    /** A file (text ending in .csv or holding a '/'), a column of the assets file, or (risk-free) an annual number. */
    private static SeriesSource series(Section s, String key, boolean numberAllowed) {
        YamlNode n = s.node(key);
        if (n instanceof YamlNode.Scalar sc
                && (sc.kind() == YamlNode.Scalar.Kind.INTEGER || sc.kind() == YamlNode.Scalar.Kind.DECIMAL)) {
            if (!numberAllowed) {
                throw s.bad(key, "is a number; expected a CSV file 'date,<name>' or a column of the assets file");
            }
            double rate = s.number(key);
            if (!(rate > -1 && rate < 1)) {
                throw s.bad(key, "is not a plausible annual rate; expected a decimal in (-1, 1), such as 0.02 for 2 %");
            }
            return new SeriesSource.AnnualRate(rate);
        }
        String text = s.text(key);
        if (text.toLowerCase(Locale.ROOT).endsWith(".csv") || text.contains("/")) {
            return new SeriesSource.File(s.resolve(text));
        }
        return new SeriesSource.Column(text);
    }

    private static WalkForwardSpec walkForward(Section s) {
        List<Integer> windows = new ArrayList<>();
        List<YamlNode> items = s.list("windows");
        if (items.isEmpty()) {
            throw s.bad("windows", "is empty; expected at least one window length, such as [36, 60]");
        }
        for (int i = 0; i < items.size(); i++) {
            int w = s.integer(items.get(i), s.pathOf("windows") + "[" + i + "]", 2);
            if (windows.contains(w)) {
                throw s.badAt(items.get(i), s.pathOf("windows") + "[" + i + "]", "is listed twice; expected distinct windows");
            }
            windows.add(w);
        }
        RebalanceRule rule = rebalance(s);
        var start = s.optionalDate("start");
        var end = s.optionalDate("end");
        if (start.isPresent() && end.isPresent() && !start.get().isBefore(end.get())) {
            throw s.bad("end", "is not after walkforward.start (" + start.get() + "); expected a later date");
        }
        double cost = s.has("cost_bps") ? s.number("cost_bps") : StudyDefaults.COST_BPS;
        if (!(cost >= 0)) {
            throw s.bad("cost_bps", "is negative; expected a cost >= 0 in basis points");
        }
        if (cost > MAX_COST_BPS) {
            throw s.bad("cost_bps", "basis points would cost more than the whole traded value (10000 bps = 100 %);"
                    + " expected basis points, such as 10 for 0.1 %");
        }
        return new WalkForwardSpec(windows, rule, start, end, cost);
    }

    private static RebalanceRule rebalance(Section s) {
        if (s.has("rebalance_every") && s.has("rebalance")) {
            throw s.bad("rebalance", "is given together with walkforward.rebalance_every; expected one of the two");
        }
        if (s.has("rebalance")) {
            return new RebalanceRule.CalendarEnd(s.choice("rebalance", Calendar.class));
        }
        int every = s.has("rebalance_every") ? s.integer("rebalance_every", 1) : StudyDefaults.REBALANCE_EVERY;
        return new RebalanceRule.EveryRows(every);
    }

    private static EvidenceSpec evidence(Section s) {
        EvidenceSpec d = EvidenceSpec.defaults();
        int resamples = s.has("resamples") ? s.integer("resamples", EvidenceSpec.MIN_RESAMPLES) : d.resamples();
        if (resamples > EvidenceSpec.MAX_RESAMPLES) {
            throw s.bad("resamples", "is beyond reason: p-values gain nothing past a few thousand resamples and each"
                    + " one repeats every test; expected at most " + EvidenceSpec.MAX_RESAMPLES + " (the default is "
                    + EvidenceSpec.DEFAULT_RESAMPLES + ")");
        }
        long seed = s.has("seed") ? s.wholeNumber("seed") : d.seed();
        int block = s.has("block_length") ? s.integer("block_length", 0) : d.blockLength();
        return new EvidenceSpec(resamples, seed, block);
    }

    private static ReportSpec report(Section s) {
        return new ReportSpec(s.has("paper") ? s.choice("paper", Paper.class) : StudyDefaults.PAPER);
    }
}
