package dev.sigmawalk.engine.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The defaults a study actually received: one line for each key the study file leaves out and
 * the reader filled in, found by reading the file's keys again, so that {@code sigmawalk check}
 * prints what applies to this study and not the whole catalogue of {@link StudyDefaults}.
 */
public final class AppliedDefaults {
    private AppliedDefaults() {
    }

    /** @param study a study read by {@link StudyReader#read} (its file is read again for the keys) */
    public static List<String> of(Study study) {
        YamlNode.Mapping root = (YamlNode.Mapping) YamlTree.parse(study.file());
        List<String> out = new ArrayList<>();
        Map<String, YamlNode.Entry> top = root.entries();
        if (!top.containsKey("title")) {
            out.add("title: '" + study.title() + "' (the study file's name)");
        }
        data(keys(top, "data"), out);
        walkForward(keys(top, "walkforward"), out);
        strategies(top.get("strategies"), study.strategies(), out);
        evidence(keys(top, "evidence"), study.evidence(), out);
        if (!keys(top, "report").containsKey("paper")) {
            out.add("report.paper: " + study.report().paper().spelling());
        }
        if (!top.containsKey("output")) {
            out.add("output: " + StudyDefaults.OUTPUT + " beside the study file");
        }
        return List.copyOf(out);
    }

    private static Map<String, YamlNode.Entry> keys(Map<String, YamlNode.Entry> parent, String key) {
        YamlNode.Entry e = parent.get(key);
        return e != null && e.value() instanceof YamlNode.Mapping m ? m.entries() : Map.of();
    }

    private static void data(Map<String, YamlNode.Entry> data, List<String> out) {
        if (!data.containsKey("layout")) {
            out.add("data.layout: " + StudyDefaults.LAYOUT.spelling());
        }
        if (!data.containsKey("periods_per_year")) {
            out.add("data.periods_per_year: inferred from the median spacing of the dates");
        }
    }

    private static void walkForward(Map<String, YamlNode.Entry> walk, List<String> out) {
        if (!walk.containsKey("rebalance_every") && !walk.containsKey("rebalance")) {
            out.add("walkforward.rebalance_every: " + StudyDefaults.REBALANCE_EVERY);
        }
        if (!walk.containsKey("start")) {
            out.add("walkforward.start: the first row where the longest window is full");
        }
        if (!walk.containsKey("end")) {
            out.add("walkforward.end: the last date of the data");
        }
        if (!walk.containsKey("cost_bps")) {
            out.add("walkforward.cost_bps: " + StudyDefaults.COST_BPS + " (no trading cost)");
        }
    }

    private static void strategies(YamlNode.Entry entry, List<StrategySpec> specs, List<String> out) {
        if (entry == null || !(entry.value() instanceof YamlNode.Sequence seq)) {
            return;
        }
        for (int i = 0; i < specs.size() && i < seq.items().size(); i++) {
            if (seq.items().get(i) instanceof YamlNode.Mapping m) {
                strategy("strategies[" + i + "] (" + specs.get(i).name() + ")", m.entries(), specs.get(i), out);
            }
        }
    }

    private static void strategy(String at, Map<String, YamlNode.Entry> keys, StrategySpec s, List<String> out) {
        if (!keys.containsKey("risk")) {
            out.add(at + ".risk: " + s.risk().spelling());
        }
        if (s.risk() == RiskKind.SHRINKAGE && !keys.containsKey("shrinkage_target")) {
            out.add(at + ".shrinkage_target: " + s.shrinkageTarget().spelling());
        }
        if (s.risk() == RiskKind.MULTI_INDEX && !keys.containsKey("factors")) {
            out.add(at + ".factors: " + StudyDefaults.FACTORS.spelling());
        }
        if (!keys.containsKey("bounds")) {
            out.add(at + ".bounds: none (short sales allowed)");
        }
        if (s.objective().needsExpectedReturns()) {
            if (!keys.containsKey("expected_returns")) {
                out.add(at + ".expected_returns: " + s.expectedReturns().spelling());
            }
            if (!keys.containsKey("alphas")) {
                out.add(at + ".alphas: none (every alpha 0)");
            }
            if (s.expectedReturns() == ExpectedReturnKind.SINGLE_INDEX && !keys.containsKey("market_premium")) {
                out.add(at + ".market_premium: the window's mean market excess return");
            }
        }
        if (!keys.containsKey("baseline")) {
            out.add(at + ".baseline: the default rule (its result is on the strategy's line above)");
        }
    }

    private static void evidence(Map<String, YamlNode.Entry> evidence, EvidenceSpec spec, List<String> out) {
        if (!evidence.containsKey("resamples")) {
            out.add("evidence.resamples: " + spec.resamples());
        }
        if (!evidence.containsKey("seed")) {
            out.add("evidence.seed: " + spec.seed());
        }
        if (!evidence.containsKey("block_length")) {
            out.add("evidence.block_length: chosen from the data");
        }
    }
}
