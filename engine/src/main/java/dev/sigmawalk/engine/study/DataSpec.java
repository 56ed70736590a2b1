package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The {@code data:} section: paths are already resolved against the study file's folder.
 *
 * @param assets the wide CSV of asset returns or prices
 * @param values what the assets and market files hold
 * @param market the market series (a file or a column of the assets file)
 * @param riskFree the per-period risk-free rate (a file, a column, or an annual number)
 * @param periodsPerYear given periods per year; empty = inferred from the dates
 * @param sectors optional CSV {@code asset,sector}
 * @param layout how the assets file is laid out (wide by default)
 */
public record DataSpec(Path assets, ValueKind values, SeriesSource market, SeriesSource riskFree,
                       OptionalInt periodsPerYear, Optional<Path> sectors, DataLayout layout) {
    public DataSpec {
        Objects.requireNonNull(layout, "layout");
        Objects.requireNonNull(assets, "assets");
        Objects.requireNonNull(values, "values");
        Objects.requireNonNull(market, "market");
        Objects.requireNonNull(riskFree, "riskFree");
        Objects.requireNonNull(periodsPerYear, "periodsPerYear");
        Objects.requireNonNull(sectors, "sectors");
        if (market instanceof SeriesSource.AnnualRate) {
            throw new IllegalArgumentException("data.market cannot be a number");
        }
        if (periodsPerYear.isPresent() && !(periodsPerYear.getAsInt() >= 1)) {
            throw new IllegalArgumentException("data.periods_per_year (" + periodsPerYear.getAsInt() + ") must be >= 1");
        }
    }

    /** A wide assets file. */
    public DataSpec(Path assets, ValueKind values, SeriesSource market, SeriesSource riskFree,
                    OptionalInt periodsPerYear, Optional<Path> sectors) {
        this(assets, values, market, riskFree, periodsPerYear, sectors, StudyDefaults.LAYOUT);
    }

    /** A wide assets file and no sectors file. */
    public DataSpec(Path assets, ValueKind values, SeriesSource market, SeriesSource riskFree,
                    OptionalInt periodsPerYear) {
        this(assets, values, market, riskFree, periodsPerYear, Optional.empty(), StudyDefaults.LAYOUT);
    }
}
