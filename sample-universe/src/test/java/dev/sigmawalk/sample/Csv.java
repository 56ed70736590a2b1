package dev.sigmawalk.sample;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A small reader of the generated CSV files for tests: header plus rows of plain cells. Number
 * columns are parsed once, on first use, and handed out as copies.
 */
final class Csv {
    private final List<String> header;
    private final List<String[]> rows;
    private final Map<String, double[]> parsed = new HashMap<>();

    private Csv(List<String> header, List<String[]> rows) {
        this.header = header;
        this.rows = rows;
    }

    static Csv read(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        List<String> header = List.of(lines.get(0).split(",", -1));
        List<String[]> rows = new ArrayList<>(lines.size() - 1);
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            if (cells.length != header.size()) {
                throw new IllegalStateException(file + ": row '" + line + "' has " + cells.length + " cells");
            }
            rows.add(cells);
        }
        return new Csv(header, List.copyOf(rows));
    }

    List<String> header() {
        return header;
    }

    List<String[]> rows() {
        return rows;
    }

    int column(String name) {
        int index = header.indexOf(name);
        if (index < 0) {
            throw new IllegalArgumentException("no column '" + name + "' in " + header);
        }
        return index;
    }

    List<String> texts(String name) {
        int c = column(name);
        return rows.stream().map(r -> r[c]).toList();
    }

    /** The column as numbers, NaN for an empty cell. */
    double[] numbers(String name) {
        double[] values = parsed.computeIfAbsent(name, n -> {
            int c = column(n);
            return rows.stream().mapToDouble(r -> r[c].isEmpty() ? Double.NaN : Double.parseDouble(r[c])).toArray();
        });
        return values.clone();
    }

    /** The asset columns (every column after {@code date}). */
    List<String> assets() {
        return header.subList(1, header.size());
    }

    static double[] minus(double[] a, double[] b) {
        double[] d = Arrays.copyOf(a, a.length);
        for (int i = 0; i < d.length; i++) {
            d[i] -= b[i];
        }
        return d;
    }
}
