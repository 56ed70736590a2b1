package dev.sigmawalk.engine.study;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Where a multi-index model's factors come from ({@code factors:}, Method §11): the market plus
 * one factor per sector of {@code data.sectors}, or the columns of a factor file.
 */
public sealed interface FactorSource permits FactorSource.Sectors, FactorSource.File {

    /** How the study file names the source: {@code sectors}, or the file as written. */
    String spelling();

    /** {@code factors: sectors}. */
    record Sectors() implements FactorSource {
        @Override
        public String spelling() {
            return "sectors";
        }
    }

    /**
     * {@code factors: FILE}, a CSV {@code date,<f1>,...} of per-period factor returns.
     *
     * @param path the file, resolved against the study file's folder
     * @param written the value as the study file spells it (names the model in outputs)
     */
    record File(Path path, String written) implements FactorSource {
        public File {
            Objects.requireNonNull(path, "path");
            Objects.requireNonNull(written, "written");
        }

        @Override
        public String spelling() {
            return written;
        }
    }
}
