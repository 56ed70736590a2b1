package dev.sigmawalk.strategies.risk;

import dev.sigmawalk.engine.data.FactorTable;
import dev.sigmawalk.engine.evidence.SectorPairMean;
import dev.sigmawalk.engine.model.EstimationWindow;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The Method §8 diagnostics on factor-model residuals (Method §11) of the reference window. */
class FactorResidualsTest {
    /** Agreement with numpy on the same rows: only summation order differs. */
    private static final double REFERENCE_TOL = 1e-9;

    /**
     * A factor file holding only the market column leaves the market-model residuals, so the
     * diagnostics must equal values.json's single-index ones: {@code mean_abs_residual_corr} and
     * {@code pesaran_cd} (numpy {@code corrcoef} of the least-squares residuals, scipy p-value)
     * and {@code lm_adj_stat_puy2008} (numpy from the paper's exact moments, k = 2).
     */
    @Test
    void marketOnlyFactorFile_reproducesSingleIndexDiagnostics() {
        EstimationWindow w = ReferenceData.window();
        FactorTable table = new FactorTable(Path.of("m.csv"), List.of("market"), w.marketExcess().clone());
        FactorDiagnostics d = FactorResiduals.diagnose("multi-index:m.csv",
                new MultiIndexRiskModel(new FactorColumns.File(table, "m.csv")), w, Map.of()).orElseThrow();

        Close.relative(ReferenceData.value("mean_abs_residual_corr"), d.meanAbsCorrelation(), REFERENCE_TOL, "mean |rho|");
        Close.relative(ReferenceData.value("pesaran_cd"), d.cdStatistic(), REFERENCE_TOL, "CD");
        Close.relative(ReferenceData.value("pesaran_cd_pvalue_two_sided_scipy"), d.cdPValue(), REFERENCE_TOL, "CD p");
        Close.relative(ReferenceData.value("lm_adj_stat_puy2008"), d.lmAdj().orElseThrow().statistic(), REFERENCE_TOL,
                "LM_adj");
        assertEquals(12, d.assets());
    }

    /**
     * Sector multi-index and two principal components against factor_diagnostics_reference.csv,
     * written by this folder's factor_diagnostics_check.py (numpy 2.4: explicit residuals by
     * {@code numpy.linalg.lstsq} and {@code numpy.linalg.eigh}, {@code numpy.corrcoef}, and the
     * exact pair moments from the explicit L×L residual makers), including the means of the
     * correlations within each sector and across each two sectors. With four assets per sector and
     * the asset inside its own sector mean, within-sector correlations sit near -1/3.
     */
    @Test
    void sectorAndComponentModels_matchNumpyScript() throws IOException {
        EstimationWindow w = ReferenceData.window();
        Map<String, String> sectors = NewRiskModelReferenceTest.referenceSectors();
        FactorDiagnostics mi = FactorResiduals.diagnose("multi-index:sectors",
                new MultiIndexRiskModel(new FactorColumns.Sectors(sectors)), w, sectors).orElseThrow();
        FactorDiagnostics pc = FactorResiduals.diagnose("principal-components:2", new PrincipalComponentsRiskModel(2), w,
                sectors).orElseThrow();
        String[] lines = text("factor_diagnostics_reference.csv").split("\\R");

        check(lines[1].split(","), mi);
        check(lines[2].split(","), pc);
        assertTrue(mi.withinSector().get("third") < 0, "the sector factor takes up A09-A12's shared shock");
    }

    private static void check(String[] expected, FactorDiagnostics d) {
        assertEquals(expected[0], d.model());
        Close.relative(Double.parseDouble(expected[1]), d.meanAbsCorrelation(), REFERENCE_TOL, d.model() + " mean |rho|");
        Close.relative(Double.parseDouble(expected[2]), d.lmAdj().orElseThrow().statistic(), REFERENCE_TOL,
                d.model() + " LM_adj");
        Close.relative(Double.parseDouble(expected[3]), d.cdStatistic(), REFERENCE_TOL, d.model() + " CD");
        Close.relative(Double.parseDouble(expected[4]), d.withinSector().get("first"), REFERENCE_TOL, d.model() + " first");
        Close.relative(Double.parseDouble(expected[5]), d.withinSector().get("second"), REFERENCE_TOL, d.model() + " second");
        Close.relative(Double.parseDouble(expected[6]), d.withinSector().get("third"), REFERENCE_TOL, d.model() + " third");
        String[][] pairs = {{"first", "second"}, {"first", "third"}, {"second", "third"}};
        for (int k = 0; k < pairs.length; k++) {
            String a = pairs[k][0];
            String b = pairs[k][1];
            SectorPairMean cell = d.sectors().orElseThrow().betweenSectors().stream()
                    .filter(c -> c.first().equals(a) && c.second().equals(b)).findFirst().orElseThrow();
            assertEquals(16, cell.pairs(), d.model() + " " + a + " x " + b + ": four assets times four");
            // Absolute: the sector model's cross-sector means are near 0, where relative error means nothing.
            assertEquals(Double.parseDouble(expected[7 + k]), cell.meanCorrelation(), REFERENCE_TOL,
                    d.model() + " " + a + " x " + b);
        }
        assertEquals(48, d.sectors().orElseThrow().acrossPairs(), d.model() + " pairs across sectors");
    }

    private static String text(String file) throws IOException {
        try (InputStream in = FactorResidualsTest.class.getResourceAsStream(file)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
