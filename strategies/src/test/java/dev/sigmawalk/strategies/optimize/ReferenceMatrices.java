package dev.sigmawalk.strategies.optimize;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Check values computed outside the project for a 60-period window of 12 invented assets: the
 * sample covariance ({@code numpy.cov(X, rowvar=False, ddof=1)}, numpy 1.24.2), the single-index
 * parameters and covariance (numpy {@code cov} moments), and minimum-variance weights
 * ({@code numpy.linalg.solve} for the closed form; {@code cvxopt.solvers.qp} (cvxopt 1.3.0)
 * polished by an exact active-set KKT solve for bounds [0, 0.25]).
 */
public final class ReferenceMatrices {
    /** n of the reference window. */
    public static final int ASSETS = 12;
    /** s_mm, the sample variance of the market column (values.json "market_variance", numpy.cov ddof=1). */
    public static final double MARKET_VARIANCE = 0.0020662230409840094;

    private ReferenceMatrices() {
    }

    /** The sample covariance, row-major 12×12. */
    public static double[] sampleCovariance() {
        return flatten(rows("sample_cov.csv", 0));
    }

    /** s_mm ββ' + diag(residual variance), row-major 12×12. */
    public static double[] singleIndexCovariance() {
        return flatten(rows("single_index_cov.csv", 0));
    }

    /** β per asset. */
    public static double[] betas() {
        return column(rows("single_index.csv", 1), 1);
    }

    /** Residual variance per asset. */
    public static double[] residualVariances() {
        return column(rows("single_index.csv", 1), 2);
    }

    /**
     * A reference weight column: 0 sample unbounded, 1 sample bounds [0, 0.25], 2 single-index
     * unbounded, 3 single-index bounds [0, 0.25].
     */
    public static double[] minVarianceWeights(int column) {
        return column(rows("min_variance_weights.csv", 1), column);
    }

    /** The single-index form from the reference parameters. */
    public static SingleFactorForm singleIndexForm() {
        double[] beta = betas();
        double[] d = residualVariances();
        return RandomProblems.form(MARKET_VARIANCE, beta, d);
    }

    private static List<double[]> rows(String name, int skipColumns) {
        try (InputStream in = ReferenceMatrices.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + name);
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<double[]> rows = new ArrayList<>();
            reader.readLine();
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                String[] cells = line.split(",");
                double[] row = new double[cells.length - skipColumns];
                for (int j = skipColumns; j < cells.length; j++) {
                    row[j - skipColumns] = Double.parseDouble(cells[j]);
                }
                rows.add(row);
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static double[] flatten(List<double[]> rows) {
        int n = rows.size();
        double[] out = new double[n * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(rows.get(i), 0, out, i * n, n);
        }
        return out;
    }

    private static double[] column(List<double[]> rows, int index) {
        double[] out = new double[rows.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = rows.get(i)[index];
        }
        return out;
    }
}
