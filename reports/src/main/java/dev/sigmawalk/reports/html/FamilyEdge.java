package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Whether an edge the report names survives the family correction (Method §9): the Romano-Wolf
 * p-value of a pair's volatility (variance) test, adjusted over every comparison the report chose
 * among, in words fit for the end of the sentence that names the edge.
 */
final class FamilyEdge {
    private final List<Comparison> comparisons;

    FamilyEdge(List<Comparison> comparisons) {
        this.comparisons = List.copyOf(comparisons);
    }

    /** How many tests the family correction covered (every Sharpe and variance test that ran). */
    int familySize() {
        int n = 0;
        for (Comparison c : comparisons) {
            n += (c.sharpe().isPresent() ? 1 : 0) + (c.variance().isPresent() ? 1 : 0);
        }
        return n;
    }

    /** The family p-value of the variance test of the two strategies at the window, in either order. */
    OptionalDouble variance(String first, String second, int window) {
        return find(first, second, window).filter(c -> c.variance().isPresent() && Double.isFinite(c.familyVariance()))
                .map(c -> OptionalDouble.of(c.familyVariance())).orElse(OptionalDouble.empty());
    }

    /** The comparison of the two strategies at the window, in either order. */
    Optional<Comparison> find(String first, String second, int window) {
        return comparisons.stream().filter(c -> c.window() == window
                && (c.strategy().equals(first) && c.baseline().equals(second)
                || c.strategy().equals(second) && c.baseline().equals(first))).findFirst();
    }

    /**
     * "the gap is not significant after correcting for the 12 comparisons scanned, p = 0.69" (or
     * "is significant ..."), or, when the pair was not tested, that no test backs the ranking.
     */
    String volatilityGap(String first, String second, int window) {
        OptionalDouble p = variance(first, second, window);
        if (p.isEmpty()) {
            return "no significance test of this gap was run, so the ranking may be chance";
        }
        return verdict("the gap", p.getAsDouble());
    }

    /** "{what} is [not] significant after correcting for the N comparisons scanned, p = x". */
    String verdict(String what, double familyP) {
        int n = familySize();
        return what + " is " + (familyP <= EvidenceSections.LEVEL ? "" : "not ") + "significant at 5 % after correcting for the "
                + n + (n == 1 ? " comparison" : " comparisons") + " scanned, " + pText(familyP);
    }

    /** "p = 0.690" or "p < 0.001". */
    static String pText(double p) {
        return p < 0.001 ? "p < 0.001" : "p = " + Formats.pValue(p);
    }
}
