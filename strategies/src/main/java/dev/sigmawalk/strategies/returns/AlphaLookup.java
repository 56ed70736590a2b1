package dev.sigmawalk.strategies.returns;

import java.time.LocalDate;

/**
 * A user's per-period alpha forecasts: the latest value for an asset dated on or before a given
 * date, or 0 where none is given (Method §4). Implementations must be side-effect free and
 * return a finite value.
 */
@FunctionalInterface
public interface AlphaLookup {

    /** α for {@code asset} as known on {@code onOrBefore}; 0 where none is given. */
    double alpha(String asset, LocalDate onOrBefore);

    /** No alpha forecasts: 0 for every asset and date. */
    static AlphaLookup none() {
        return (asset, onOrBefore) -> 0.0;
    }
}
