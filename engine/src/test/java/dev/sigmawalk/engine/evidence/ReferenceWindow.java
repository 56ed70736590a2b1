package dev.sigmawalk.engine.evidence;

import dev.sigmawalk.engine.model.EstimationWindow;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The invented 60-period window of 12 fictional assets (A01..A12, excess returns, with a
 * market column) whose residual diagnostics were computed outside the project with numpy
 * 1.24.2 and scipy 1.10.1. A copy of the shared reference file {@code window.csv}.
 */
final class ReferenceWindow {
    private ReferenceWindow() {
    }

    static EstimationWindow load() {
        return load("window.csv");
    }

    /** A window file of the same layout (row, market, then one column per asset). */
    static EstimationWindow load(String resource) {
        try (InputStream in = ReferenceWindow.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("test resource " + resource + " is missing");
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String[] header = reader.readLine().split(",");
            List<String> assets = Arrays.asList(header).subList(2, header.length);
            List<double[]> rows = new ArrayList<>();
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (!line.isBlank()) {
                    rows.add(Arrays.stream(line.split(",")).mapToDouble(Double::parseDouble).toArray());
                }
            }
            int n = assets.size();
            double[] excess = new double[rows.size() * n];
            double[] market = new double[rows.size()];
            for (int t = 0; t < rows.size(); t++) {
                market[t] = rows.get(t)[1];
                System.arraycopy(rows.get(t), 2, excess, t * n, n);
            }
            int[] columns = new int[n];
            Arrays.setAll(columns, i -> i);
            return new EstimationWindow(LocalDate.of(2020, 12, 31), rows.size() - 1, assets, columns, excess, market,
                    12, null);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
