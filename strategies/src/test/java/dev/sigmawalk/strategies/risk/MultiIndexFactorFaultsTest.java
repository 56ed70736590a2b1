package dev.sigmawalk.strategies.risk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sigmawalk.engine.data.FactorTable;
import dev.sigmawalk.engine.model.EstimationWindow;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Factor files whose columns cannot identify a multi-index model's loadings (Method §11). */
class MultiIndexFactorFaultsTest {

    private static MultiIndexRiskModel model(String name, double[] values, List<String> names) {
        return new MultiIndexRiskModel(new FactorColumns.File(new FactorTable(Path.of(name), names, values), name));
    }

    /**
     * A factor with one value in every row is the intercept again once centred: what is left of
     * it is rounding, and loadings fitted to rounding are noise however small the pivot check's
     * relative threshold. 0.01 is not a binary fraction, so its centred values are not all zero.
     */
    /** The window's market excess return beside a second factor that is 0.01 except {@code blip} (or nowhere, -1). */
    private static double[] marketAndFlat(EstimationWindow w, int blip) {
        int len = w.length();
        double[] values = new double[len * 2];
        double[] m = w.marketExcess();
        for (int t = 0; t < len; t++) {
            values[t * 2] = m[t];
            values[t * 2 + 1] = t == blip ? 0.02 : 0.01;
        }
        return values;
    }

    @Test
    void aFactorWithTheSameValueInEveryRow_isRefusedForTheWindow() {
        EstimationWindow w = ReferenceData.window();
        double[] values = marketAndFlat(w, -1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> model("f.csv", values, List.of("market", "flat")).estimate(w));
        assertEquals("factor 'flat' has the same value (0.01) in every row of the window, so its loadings are"
                + " not identified", e.getMessage());
    }

    @Test
    void aFactorThatMovesOnce_isStillFitted() {
        EstimationWindow w = ReferenceData.window();
        FactorCovariance c = model("f.csv", marketAndFlat(w, 7), List.of("market", "blip")).estimate(w);
        assertEquals(ReferenceData.ASSETS, c.size());
    }
}
