package dev.sigmawalk.engine.evidence;

import java.util.Objects;

/**
 * One pair of assets and the correlation of their market-model residuals.
 *
 * @param first the asset that comes first in the window's order
 * @param second the other asset
 * @param correlation ρ, in [-1, 1]
 */
public record ResidualPair(String first, String second, double correlation) {
    public ResidualPair {
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        if (!(correlation >= -1.0 && correlation <= 1.0)) {
            throw new IllegalArgumentException("residual correlation of " + first + "/" + second + " ("
                    + correlation + ") must be in [-1, 1]");
        }
    }
}
