package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * A factor file ({@code factors: FILE}, Method §11) aligned to the panel's rows: per-period factor
 * returns used as given, complete on every row a window can read (rows before that are NaN).
 *
 * @param file the file read
 * @param names the factor columns' header names, in file order
 * @param values panel rows × K, row-major (owned by this record, read-only)
 */
public record FactorTable(Path file, List<String> names, double[] values) {
    public FactorTable {
        Objects.requireNonNull(file, "file");
        names = List.copyOf(names);
        if (names.isEmpty() || values.length % names.size() != 0) {
            throw new IllegalArgumentException("factor values (" + values.length + ") must be rows × " + names.size());
        }
    }

    /** K. */
    public int factorCount() {
        return names.size();
    }

    /** Panel rows covered. */
    public int rows() {
        return values.length / names.size();
    }

    /** Factor {@code factor}'s return in panel row {@code row}. */
    public double value(int row, int factor) {
        return values[row * names.size() + factor];
    }
}
