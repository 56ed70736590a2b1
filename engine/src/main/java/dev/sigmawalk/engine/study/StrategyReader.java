package dev.sigmawalk.engine.study;

import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.Names;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Reads {@code strategies:}. A key that the strategy's objective or model would ignore is an
 * error rather than silently dropped (for example {@code alphas} on a min-variance strategy), so
 * a study means what it says.
 */
final class StrategyReader {
    private static final Set<String> KEYS = Set.of("name", "risk", "shrinkage_target", "objective", "bounds",
            "risk_aversion", "expected_returns", "alphas", "market_premium", "baseline", "factors", "components",
            "half_life");
    private static final String RESERVED = "market";

    private StrategyReader() {
    }

    /**
     * @param sectorsGiven whether the study has {@code data.sectors}, which {@code factors: sectors}
     *                     needs
     */
    static List<StrategySpec> readAll(Section root, boolean sectorsGiven) {
        List<YamlNode> items = root.list("strategies");
        if (items.isEmpty()) {
            throw root.bad("strategies", "is empty; expected at least one strategy");
        }
        List<StrategySpec> out = new ArrayList<>();
        Map<String, Integer> names = new HashMap<>();
        List<Section> sections = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Section s = Section.of(root.file(), "strategies[" + i + "]", items.get(i), KEYS);
            StrategySpec spec = read(s, sectorsGiven);
            Integer earlier = names.putIfAbsent(spec.name(), i);
            if (earlier != null) {
                throw s.bad("name", "is already the name of strategies[" + earlier + "]; expected a unique name");
            }
            out.add(spec);
            sections.add(s);
        }
        for (int i = 0; i < out.size(); i++) {
            Optional<String> baseline = out.get(i).baseline();
            if (baseline.isPresent() && (!names.containsKey(baseline.get()) || baseline.get().equals(out.get(i).name()))) {
                throw sections.get(i).bad("baseline", out.size() == 1
                        ? "names no other strategy; the study has no other strategy to compare with, so remove the key"
                        : "names no other strategy; expected one of " + String.join(", ", otherNames(out, i)));
            }
        }
        return out;
    }

    private static List<String> otherNames(List<StrategySpec> all, int except) {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            if (i != except) {
                names.add(all.get(i).name());
            }
        }
        return names;
    }

    private static StrategySpec read(Section s, boolean sectorsGiven) {
        String name = s.text("name");
        if (RESERVED.equals(name)) {
            throw s.bad("name", "is reserved for the benchmark; expected another name");
        }
        if (Names.startsLikeFormula(name)) {
            throw s.bad("name", Names.formulaProblem("strategy"));
        }
        int control = firstLineBreaker(name);
        if (control >= 0) {
            YamlNode n = s.node("name");
            throw InputException.at(s.file(), n.line(), n.column(), s.pathOf("name") + ": '" + escaped(name)
                    + "' holds the control character " + String.format("U+%04X", control) + ", which would break the"
                    + " rows of the output CSV files; expected a name of printable characters on one line");
        }
        Objective objective = s.choice("objective", Objective.class);
        RiskKind risk = objective == Objective.EQUAL_WEIGHT && !s.has("risk")
                ? StudyDefaults.EQUAL_WEIGHT_RISK
                : s.choice("risk", RiskKind.class);
        ShrinkageTarget target = shrinkageTarget(s, risk);
        Optional<Bounds> bounds = s.has("bounds") ? Optional.of(bounds(s)) : Optional.empty();
        double riskAversion = riskAversion(s, objective);
        ExpectedReturnKind expected = expectedReturns(s, objective);
        boolean singleIndexInputs = objective.needsExpectedReturns() && expected == ExpectedReturnKind.SINGLE_INDEX;
        Optional<Path> alphas = onlyWith(s, "alphas", singleIndexInputs) ? Optional.of(s.path("alphas")) : Optional.empty();
        OptionalDouble premium = onlyWith(s, "market_premium", singleIndexInputs)
                ? OptionalDouble.of(s.number("market_premium")) : OptionalDouble.empty();
        Optional<String> baseline = s.has("baseline") ? Optional.of(s.text("baseline")) : Optional.empty();
        RiskSettings settings = RiskSettingsReader.read(s, risk, sectorsGiven);
        return new StrategySpec(name, risk, target, objective, bounds, riskAversion, expected, alphas, premium, baseline,
                settings);
    }

    /**
     * The first character of {@code name} that a CSV reader may take as the end of a row or that
     * no text cell should hold (a control character, a Unicode line or paragraph separator), or -1.
     */
    private static int firstLineBreaker(String name) {
        return name.codePoints().filter(StrategyReader::breaksLines).findFirst().orElse(-1);
    }

    private static boolean breaksLines(int c) {
        int type = Character.getType(c);
        return Character.isISOControl(c) || type == Character.LINE_SEPARATOR || type == Character.PARAGRAPH_SEPARATOR;
    }

    /** {@code name} with those characters spelled as escapes, so the message stays on one line. */
    private static String escaped(String name) {
        StringBuilder out = new StringBuilder();
        name.codePoints().forEach(c -> {
            switch (c) {
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> {
                    if (breaksLines(c)) {
                        out.append(String.format("\\u%04X", c));
                    } else {
                        out.appendCodePoint(c);
                    }
                }
            }
        });
        return out.toString();
    }

    private static ShrinkageTarget shrinkageTarget(Section s, RiskKind risk) {
        if (!s.has("shrinkage_target")) {
            return StudyDefaults.SHRINKAGE_TARGET;
        }
        if (risk != RiskKind.SHRINKAGE) {
            throw s.bad("shrinkage_target", "is only used with risk: shrinkage; remove it or set risk: shrinkage");
        }
        return s.choice("shrinkage_target", ShrinkageTarget.class);
    }

    private static Bounds bounds(Section s) {
        List<YamlNode> pair = s.list("bounds");
        String path = s.pathOf("bounds");
        if (pair.size() != 2) {
            throw s.bad("bounds", "has " + pair.size() + " values; expected [lower, upper], such as [0, 0.10]");
        }
        double lower = s.number(pair.get(0), path + "[0]");
        double upper = s.number(pair.get(1), path + "[1]");
        if (!(lower <= upper)) {
            throw InputException.at(s.file(), pair.get(0).line(), pair.get(0).column(), path + ": [" + lower + ", "
                    + upper + "] has lower > upper; expected [lower, upper] with lower <= upper, such as [0, 0.10]");
        }
        return new Bounds(lower, upper);
    }

    private static double riskAversion(Section s, Objective objective) {
        if (objective != Objective.MEAN_VARIANCE) {
            onlyWith(s, "risk_aversion", false);
            return StudyDefaults.UNUSED_RISK_AVERSION;
        }
        if (!s.has("risk_aversion")) {
            throw s.bad("objective", "needs " + s.pathOf("risk_aversion") + " (λ > 0), which has no default");
        }
        double lambda = s.number("risk_aversion");
        if (!(lambda > 0)) {
            throw s.bad("risk_aversion", "is not positive; expected λ > 0, such as 4");
        }
        return lambda;
    }

    private static ExpectedReturnKind expectedReturns(Section s, Objective objective) {
        if (!onlyWith(s, "expected_returns", objective.needsExpectedReturns())) {
            return StudyDefaults.EXPECTED_RETURNS;
        }
        return s.choice("expected_returns", ExpectedReturnKind.class);
    }

    /**
     * Whether {@code key} is given, rejecting it when {@code allowed} is false: these keys feed
     * the single-index expected returns of mean-variance and max-sharpe and nothing else.
     */
    private static boolean onlyWith(Section s, String key, boolean allowed) {
        if (!s.has(key)) {
            return false;
        }
        if (!allowed) {
            throw s.bad(key, "is not used by this strategy; " + usedBy(key));
        }
        return true;
    }

    private static String usedBy(String key) {
        switch (key) {
            case "risk_aversion":
                return "it is used by objective: mean-variance only";
            case "expected_returns":
                return "it is used by objective: mean-variance or max-sharpe only";
            default:
                return "it is used with objective: mean-variance or max-sharpe and expected_returns: single-index only";
        }
    }
}
