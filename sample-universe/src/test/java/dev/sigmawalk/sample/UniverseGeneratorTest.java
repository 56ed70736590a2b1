package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Generation on small invented cases: determinism, ranges, listing spans, sector shocks. */
class UniverseGeneratorTest {
    private static final UniverseSpec SMALL = new UniverseSpec(77, 16, 400, LocalDate.of(2010, 1, 1), 8);

    @TempDir
    Path tmp;

    @Test
    void sameSpec_writesByteIdenticalFiles() throws IOException {
        UniverseGenerator.generate(SMALL, tmp.resolve("a"));
        UniverseGenerator.generate(SMALL, tmp.resolve("b"));
        for (String name : UniverseFiles.DATA) {
            assertArrayEquals(Files.readAllBytes(tmp.resolve("a").resolve(name)),
                    Files.readAllBytes(tmp.resolve("b").resolve(name)), name);
        }
    }

    @Test
    void otherSeed_writesOtherReturns() throws IOException {
        UniverseGenerator.generate(SMALL, tmp.resolve("a"));
        UniverseGenerator.generate(new UniverseSpec(78, 16, 400, SMALL.firstDay(), 8), tmp.resolve("b"));
        String name = UniverseFiles.assets(UniverseFiles.DAILY);
        assertFalse(Arrays.equals(Files.readAllBytes(tmp.resolve("a").resolve(name)),
                Files.readAllBytes(tmp.resolve("b").resolve(name))), "seeds 77 and 78 give different returns");
    }

    @Test
    void smallCase_hasTheRequestedShape() throws IOException {
        UniverseGenerator.generate(SMALL, tmp);
        Csv daily = Csv.read(tmp.resolve(UniverseFiles.assets(UniverseFiles.DAILY)));
        Csv monthly = Csv.read(tmp.resolve(UniverseFiles.assets(UniverseFiles.MONTHLY)));
        assertEquals(16, daily.assets().size(), "companies");
        assertEquals(400, daily.rows().size(), "daily rows");
        assertEquals("2010-01-01", daily.rows().get(0)[0], "first day");
        // 400 weekdays from Friday 2010-01-01 end on Thursday 2011-07-14: January 2010 to June 2011.
        assertEquals(18, monthly.rows().size(), "whole months");
        assertEquals("2011-06-30", monthly.rows().get(17)[0], "last month-end");
    }

    /**
     * In a sector built with a shared residual share ρ_s, two residuals have population
     * correlation ρ_s (hand derivation: Cov = ρ_s σ_i σ_j k² with k the day's stress factor, and
     * each variance σ² k²); across the other sectors the population correlation is 0. The test
     * regresses each company's excess return on the generated index's (OLS with intercept) and
     * averages the residual correlations over the pairs of one sector. Under independence a
     * sample correlation over T rows has standard error about 1/√T (common practice); the
     * tolerance 4/√T ≈ 0.10 at T = 1,500 covers that with room for heavy tails and for the
     * small common part the index's own noise leaves in every residual (about 0.4 %).
     */
    @Test
    void residualCorrelation_isPositiveWithinShockSectors_andNearZeroElsewhere() throws IOException {
        int rows = 1500;
        UniverseGenerator.generate(new UniverseSpec(5, 64, rows, LocalDate.of(2001, 1, 1), 8), tmp);
        Csv assets = Csv.read(tmp.resolve(UniverseFiles.assets(UniverseFiles.DAILY)));
        Csv truth = Csv.read(tmp.resolve(UniverseFiles.TRUTH));
        double[] rf = Csv.read(tmp.resolve(UniverseFiles.riskFree(UniverseFiles.DAILY))).numbers(UniverseFiles.RISK_FREE_COLUMN);
        double[] market = Csv.minus(Csv.read(tmp.resolve(UniverseFiles.market(UniverseFiles.DAILY)))
                .numbers(UniverseFiles.INDEX_COLUMN), rf);
        double tolerance = 4 / Math.sqrt(rows);
        int shockSectors = 0;
        for (Sector sector : SectorCatalog.brennmark()) {
            double[][] residuals = truth.texts("asset").stream()
                    .filter(id -> id.startsWith(sector.code()))
                    .map(assets::numbers)
                    .filter(r -> !Double.isNaN(r[0]) && !Double.isNaN(r[rows - 1]))
                    .map(r -> Residuals.of(Csv.minus(r, rf), market))
                    .toArray(double[][]::new);
            double mean = Residuals.meanPairCorrelation(residuals);
            double rho = sector.sharedResidualShare();
            assertEquals(rho, mean, tolerance, sector.name() + ": mean residual correlation of "
                    + residuals.length + " companies");
            if (sector.hasSharedShock()) {
                shockSectors++;
                assertTrue(mean > tolerance, sector.name() + ": " + mean + " clearly above 0");
            }
        }
        assertEquals(3, shockSectors, "sectors with a shared shock");
    }

    /** Method §1: the index must be measured on its own, not the companies' equal-weighted mean. */
    @Test
    void index_isNotTheCrossSectionalMeanOfTheCompanies() throws IOException {
        UniverseGenerator.generate(SMALL, tmp);
        Csv assets = Csv.read(tmp.resolve(UniverseFiles.assets(UniverseFiles.DAILY)));
        double[] index = Csv.read(tmp.resolve(UniverseFiles.market(UniverseFiles.DAILY))).numbers(UniverseFiles.INDEX_COLUMN);
        double[][] columns = assets.assets().stream().map(assets::numbers).toArray(double[][]::new);
        double largestGap = 0;
        for (int t = 0; t < index.length; t++) {
            double sum = 0;
            int n = 0;
            for (double[] column : columns) {
                double r = column[t];
                if (!Double.isNaN(r)) {
                    sum += r;
                    n++;
                }
            }
            largestGap = Math.max(largestGap, Math.abs(index[t] - sum / n));
        }
        assertTrue(largestGap > 1e-3, "largest gap " + largestGap + " between index and mean");
    }
}
