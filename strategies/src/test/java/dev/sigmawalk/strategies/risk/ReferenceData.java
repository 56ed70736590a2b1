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
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the check values in this package's test resources. They were computed outside the
 * project with numpy 1.24.2 and scikit-learn 1.2.1 on an invented 60-period window of 12
 * fictional assets (A01..A12) with a market column; each test names the producing call.
 */
public final class ReferenceData {
    public static final int LENGTH = 60;
    public static final int ASSETS = 12;

    private ReferenceData() {
    }

    /** window.csv as an estimation window: column {@code market} = m_t, A01..A12 = x_t. */
    public static EstimationWindow window() {
        return window("window.csv");
    }

    /** A CSV of the window.csv layout ({@code row,market,<assets>}) as an estimation window. */
    public static EstimationWindow window(String file) {
        List<String[]> rows = rows(file);
        String[] header = rows.get(0);
        List<String> assets = Arrays.asList(header).subList(2, header.length);
        int n = assets.size();
        int len = rows.size() - 1;
        double[] excess = new double[len * n];
        double[] market = new double[len];
        for (int t = 0; t < len; t++) {
            String[] r = rows.get(t + 1);
            market[t] = Double.parseDouble(r[1]);
            for (int i = 0; i < n; i++) {
                excess[t * n + i] = Double.parseDouble(r[i + 2]);
            }
        }
        int[] columns = new int[n];
        Arrays.setAll(columns, i -> i);
        return new EstimationWindow(LocalDate.of(2030, 6, 28), len - 1, assets, columns, excess, market, 12, null);
    }

    /** A headed n×n CSV matrix, row-major. */
    public static double[] matrix(String file) {
        List<String[]> rows = rows(file);
        int n = rows.get(0).length;
        double[] m = new double[n * n];
        for (int i = 0; i < n; i++) {
            String[] r = rows.get(i + 1);
            for (int j = 0; j < n; j++) {
                m[i * n + j] = Double.parseDouble(r[j]);
            }
        }
        return m;
    }

    /** One column of single_index.csv ({@code alpha}, {@code beta} or {@code residual_variance}). */
    public static double[] singleIndexColumn(String name) {
        List<String[]> rows = rows("single_index.csv");
        int col = Arrays.asList(rows.get(0)).indexOf(name);
        if (col < 0) {
            throw new IllegalArgumentException("single_index.csv has no column " + name);
        }
        double[] v = new double[rows.size() - 1];
        for (int i = 0; i < v.length; i++) {
            v[i] = Double.parseDouble(rows.get(i + 1)[col]);
        }
        return v;
    }

    /** A numeric key at the top level of values.json. */
    public static double value(String key) {
        return value("values.json", key);
    }

    /** A numeric key at the top level of a JSON file of the values.json kind. */
    public static double value(String file, String key) {
        Matcher m = Pattern.compile("\"" + Pattern.quote(key) + "\"\\s*:\\s*([-+0-9.eE]+)").matcher(text(file));
        if (!m.find()) {
            throw new IllegalArgumentException(file + " has no numeric key " + key);
        }
        return Double.parseDouble(m.group(1));
    }

    private static List<String[]> rows(String file) {
        List<String[]> rows = new ArrayList<>();
        for (String line : text(file).split("\\R")) {
            if (!line.isBlank()) {
                rows.add(line.split(","));
            }
        }
        return rows;
    }

    /** A test resource beside this class, as text. */
    static String text(String file) {
        try (InputStream in = ReferenceData.class.getResourceAsStream(file)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + file);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
