package dev.sigmawalk.sample;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;

/** Writes what the returns were generated from: sectors, true parameters and stress periods. */
final class DescriptionTables {
    private DescriptionTables() {
    }

    /** {@code sectors.csv}: {@code asset,sector}, one row per company. */
    static void writeSectors(Path dir, List<Company> companies, SignificantDigits digits) throws IOException {
        try (CsvTable table = new CsvTable(dir.resolve(UniverseFiles.SECTORS), List.of("asset", "sector"), digits)) {
            for (Company c : companies) {
                table.begin(c.id()).text(c.sector().name()).end();
            }
        }
    }

    /**
     * {@code truth.csv}: per company its sector, true beta, annual alpha, annual residual
     * volatility in calm times, the sector's shared residual share ρ_s, and the first and last
     * dates with a return.
     */
    static void writeTruth(Path dir, List<Company> companies, LocalDate firstDay, SignificantDigits digits)
            throws IOException {
        List<String> header = List.of("asset", "sector", "beta", "alpha_annual", "residual_vol_annual",
                "sector_shared_share", "first_return", "last_return");
        try (CsvTable table = new CsvTable(dir.resolve(UniverseFiles.TRUTH), header, digits)) {
            for (Company c : companies) {
                table.begin(c.id()).text(c.sector().name())
                        .number(c.beta()).number(c.alpha()).number(c.residualVolatility())
                        .number(c.sector().sharedResidualShare())
                        .text(BusinessDays.plus(firstDay, c.firstRow()).toString())
                        .text(BusinessDays.plus(firstDay, c.lastRow()).toString())
                        .end();
            }
        }
    }

    /** {@code regimes.csv}: each stress period's dates (inclusive) and volatility multipliers. */
    static void writeRegimes(Path dir, VolatilityRegimes regimes, SignificantDigits digits) throws IOException {
        List<String> header = List.of("from", "to", "market_vol_multiplier", "residual_vol_multiplier");
        try (CsvTable table = new CsvTable(dir.resolve(UniverseFiles.REGIMES), header, digits)) {
            for (StressPeriod p : regimes.periods()) {
                table.begin(p.from().toString()).text(p.to().toString())
                        .number(p.marketMultiplier()).number(p.residualMultiplier()).end();
            }
        }
    }
}
