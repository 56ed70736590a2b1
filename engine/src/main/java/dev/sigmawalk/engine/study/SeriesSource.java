package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.Objects;

/** Where the market or risk-free series comes from. */
public sealed interface SeriesSource permits SeriesSource.File, SeriesSource.Column, SeriesSource.AnnualRate {

    /** A CSV {@code date,<name>} (path already resolved against the study file's folder). */
    record File(Path path) implements SeriesSource {
        public File {
            Objects.requireNonNull(path, "path");
        }
    }

    /** A column of the assets file; that column is then not an asset. */
    record Column(String name) implements SeriesSource {
        public Column {
            Objects.requireNonNull(name, "name");
        }
    }

    /** Risk-free only: one annual rate R, converted to (1+R)^(1/p) - 1 per period. */
    record AnnualRate(double rate) implements SeriesSource {
        public AnnualRate {
            if (!(rate > -1 && rate < 1)) {
                throw new IllegalArgumentException("annual risk-free rate (" + rate + ") must be in (-1, 1)");
            }
        }
    }
}
