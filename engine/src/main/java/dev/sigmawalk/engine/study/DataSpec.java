package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.Objects;
import java.util.OptionalInt;

/** The {@code data:} section: paths are already resolved against the study file's folder. */
public record DataSpec(Path assets, ValueKind values, SeriesSource market, SeriesSource riskFree,
                       OptionalInt periodsPerYear) {
    public DataSpec {
        Objects.requireNonNull(assets, "assets");
        Objects.requireNonNull(values, "values");
        Objects.requireNonNull(market, "market");
        Objects.requireNonNull(riskFree, "riskFree");
        Objects.requireNonNull(periodsPerYear, "periodsPerYear");
        if (market instanceof SeriesSource.AnnualRate) {
            throw new IllegalArgumentException("data.market cannot be a number");
        }
    }
}
