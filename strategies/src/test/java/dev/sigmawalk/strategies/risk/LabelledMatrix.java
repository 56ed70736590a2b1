package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.model.EstimationWindow;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads the reference files with labelled rows ({@code asset,A01,...} then one row per asset) and
 * {@code wide_window.csv} ({@code row,B01..B40}, no market column).
 */
final class LabelledMatrix {
    private LabelledMatrix() {
    }

    /** The n×n values of a labelled matrix file, row-major, after checking the labels agree. */
    static double[] read(String file) {
        List<String[]> rows = rows(file);
        String[] header = rows.get(0);
        int n = header.length - 1;
        double[] m = new double[n * n];
        for (int i = 0; i < n; i++) {
            String[] r = rows.get(i + 1);
            if (!r[0].equals(header[i + 1])) {
                throw new IllegalStateException(file + " row " + (i + 1) + " is labelled " + r[0] + ", not " + header[i + 1]);
            }
            for (int j = 0; j < n; j++) {
                m[i * n + j] = Double.parseDouble(r[j + 1]);
            }
        }
        return m;
    }

    /**
     * wide_window.csv as an estimation window of 40 assets over 21 rows. It has no market column;
     * the market series here is a constant ramp that no model of these tests reads.
     */
    static EstimationWindow wideWindow() {
        List<String[]> rows = rows("wide_window.csv");
        String[] header = rows.get(0);
        List<String> assets = Arrays.asList(header).subList(1, header.length);
        int n = assets.size();
        int len = rows.size() - 1;
        double[] excess = new double[len * n];
        double[] market = new double[len];
        for (int t = 0; t < len; t++) {
            String[] r = rows.get(t + 1);
            market[t] = 0.001 * t;
            for (int i = 0; i < n; i++) {
                excess[t * n + i] = Double.parseDouble(r[i + 1]);
            }
        }
        int[] columns = new int[n];
        Arrays.setAll(columns, i -> i);
        return new EstimationWindow(LocalDate.of(2030, 6, 28), len - 1, assets, columns, excess, market, 12, null);
    }

    private static List<String[]> rows(String file) {
        try (InputStream in = LabelledMatrix.class.getResourceAsStream(file)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + file);
            }
            List<String[]> rows = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\\R")) {
                if (!line.isBlank()) {
                    rows.add(line.split(","));
                }
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
