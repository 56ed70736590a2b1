package dev.sigmawalk.sample;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;

/**
 * Generates the invented Brennmark market: daily and month-end returns of its companies, its
 * published index and its risk-free rate, plus the sectors, the true parameters and the stress
 * periods. All data are invented for the demo and for benchmarks; none is market data.
 *
 * <p>Deterministic: the same {@link UniverseSpec} writes byte-identical files on any Java 17+
 * runtime. Memory stays bounded by the number of companies (rows are streamed to disk), so
 * 2,000 companies by 5,000 days take a few seconds.
 *
 * <p>Command line: see {@link GeneratorOptions#USAGE}. Exit code 0 on success, 2 for a bad
 * command line, 1 when the files cannot be written.
 */
public final class UniverseGenerator {
    private UniverseGenerator() {
    }

    public static void main(String[] args) {
        if (Arrays.asList(args).contains("--help")) {
            System.out.println(GeneratorOptions.USAGE);
            return;
        }
        GeneratorOptions options;
        try {
            options = GeneratorOptions.parse(args);
        } catch (IllegalArgumentException e) {
            System.err.println("universe generator: " + e.getMessage());
            System.err.println(GeneratorOptions.USAGE);
            System.exit(2);
            return;
        }
        try {
            generate(options.spec(), options.into());
            UniverseSpec spec = options.spec();
            System.err.println("wrote " + UniverseFiles.DATA.size() + " files to " + options.into() + ": "
                    + spec.companies() + " invented companies, " + spec.tradingDays() + " days from "
                    + spec.firstDay() + ", seed " + spec.seed());
        } catch (IOException | UncheckedIOException e) {
            System.err.println("universe generator: cannot write to " + options.into() + ": " + e.getMessage());
            System.exit(1);
        }
    }

    /**
     * Writes every file of {@link UniverseFiles#DATA} for {@code spec} into {@code dir}
     * (created if missing; files of the same names are replaced).
     *
     * @throws IOException when a file cannot be written
     */
    public static void generate(UniverseSpec spec, Path dir) throws IOException {
        Files.createDirectories(dir);
        MarketParameters market = MarketParameters.brennmark();
        List<Sector> sectors = SectorCatalog.brennmark();
        List<Company> companies = Roster.draw(spec.companies(), spec.tradingDays(), sectors, market,
                SplitMix64.stream(spec.seed(), MarketSimulator.Streams.ROSTER));
        VolatilityRegimes regimes = VolatilityRegimes.place(market.stresses(), spec.firstDay(), spec.tradingDays());
        SignificantDigits digits = new SignificantDigits(spec.digits());

        DescriptionTables.writeSectors(dir, companies, digits);
        DescriptionTables.writeTruth(dir, companies, spec.firstDay(), digits);
        DescriptionTables.writeRegimes(dir, regimes, digits);
        MarketSimulator simulator = new MarketSimulator(companies, sectors, market, regimes, spec.seed());
        writeSeries(spec, dir, companies, simulator, digits);
    }

    private static void writeSeries(UniverseSpec spec, Path dir, List<Company> companies,
                                    MarketSimulator simulator, SignificantDigits digits) throws IOException {
        DayValues day = new DayValues(companies.size());
        DayValues month = new DayValues(companies.size());
        MonthCompounder compounder = new MonthCompounder(companies.size());
        try (SeriesTables daily = new SeriesTables(dir, UniverseFiles.DAILY, companies, digits);
             SeriesTables monthly = new SeriesTables(dir, UniverseFiles.MONTHLY, companies, digits)) {
            LocalDate date = spec.firstDay();
            for (int row = 0; row < spec.tradingDays(); row++) {
                simulator.step(row, date, day);
                // Month returns compound the rounded daily values, so they agree with the daily file.
                day.roundWith(digits);
                daily.write(day);
                if (compounder.add(day, month)) {
                    monthly.write(month);
                }
                date = BusinessDays.next(date);
            }
        }
    }
}
