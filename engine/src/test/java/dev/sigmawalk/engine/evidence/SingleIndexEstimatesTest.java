package dev.sigmawalk.engine.evidence;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class SingleIndexEstimatesTest {
    /** Estimates from moments against numpy's: rounding only. */
    private static final double NUMPY = 1e-12;

    /**
     * α, β and residual variance of the 12 assets of the reference window, per period. Source: the
     * shared check file {@code single_index.csv} (numpy 1.24.2 {@code cov} moments, cross-checked
     * there against {@code numpy.linalg.lstsq} with an intercept and the residuals' variance,
     * ddof = 1), copied beside this test.
     */
    @Test
    void referenceWindow_matchesNumpyLeastSquares() throws IOException {
        var window = ReferenceWindow.load();
        SingleIndexEstimates e = SingleIndexEstimates.of(window.moments(), window.assets());
        List<String> lines;
        try (InputStream in = SingleIndexEstimatesTest.class.getResourceAsStream("single_index.csv")) {
            lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().skip(1).toList();
        }
        assertEquals(12, lines.size());
        for (int i = 0; i < lines.size(); i++) {
            String[] f = lines.get(i).split(",");
            assertEquals(f[0], e.assets().get(i));
            assertEquals(Double.parseDouble(f[1]), e.alpha()[i], NUMPY, "alpha " + f[0]);
            assertEquals(Double.parseDouble(f[2]), e.beta()[i], NUMPY, "beta " + f[0]);
            assertEquals(Double.parseDouble(f[3]), e.residualVariance()[i], NUMPY, "residual variance " + f[0]);
        }
    }

    @Test
    void constantMarket_isRejected() {
        var m = new dev.sigmawalk.engine.model.WindowMoments(1, 5, new double[] {0.01}, 0.0, 0.0, new double[] {0.0},
                new double[] {0.001});
        assertThrows(IllegalArgumentException.class, () -> SingleIndexEstimates.of(m, List.of("X1")));
    }
}
