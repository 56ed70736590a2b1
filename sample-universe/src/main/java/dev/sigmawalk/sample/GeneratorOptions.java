package dev.sigmawalk.sample;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.Objects;

/**
 * The generator's command line, parsed. Options not given take the values of
 * {@link UniverseSpec#demo()}; only {@code --into} is required.
 *
 * @param into folder to write into (created if missing)
 * @param spec what to generate
 */
record GeneratorOptions(Path into, UniverseSpec spec) {
    static final String USAGE = String.join("\n",
            "usage: UniverseGenerator --into DIR [--seed N] [--companies N] [--trading-days N]",
            "                         [--first-day YYYY-MM-DD] [--digits N]",
            "  --into DIR           folder for the files (created if missing)",
            "  --seed N             seed of every random draw (default " + UniverseSpec.demo().seed() + ")",
            "  --companies N        number of invented companies (default " + UniverseSpec.demo().companies() + ")",
            "  --trading-days N     daily rows, Monday to Friday (default " + UniverseSpec.demo().tradingDays() + ")",
            "  --first-day DATE     date of the first daily row, a weekday (default " + UniverseSpec.demo().firstDay() + ")",
            "  --digits N           significant digits of written values (default " + UniverseSpec.demo().digits() + ")");

    GeneratorOptions {
        Objects.requireNonNull(into, "into");
        Objects.requireNonNull(spec, "spec");
    }

    /** @throws IllegalArgumentException naming the option and the offending value */
    static GeneratorOptions parse(String... args) {
        UniverseSpec demo = UniverseSpec.demo();
        Path into = null;
        long seed = demo.seed();
        int companies = demo.companies();
        int days = demo.tradingDays();
        LocalDate firstDay = demo.firstDay();
        int digits = demo.digits();
        for (int i = 0; i < args.length; i += 2) {
            String option = args[i];
            if (i + 1 >= args.length) {
                throw new IllegalArgumentException("option " + option + " needs a value");
            }
            String value = args[i + 1];
            switch (option) {
                case "--into" -> into = Path.of(value);
                case "--seed" -> seed = parseLong(option, value);
                case "--companies" -> companies = (int) parseLong(option, value);
                case "--trading-days" -> days = (int) parseLong(option, value);
                case "--first-day" -> firstDay = parseDate(option, value);
                case "--digits" -> digits = (int) parseLong(option, value);
                default -> throw new IllegalArgumentException("unknown option '" + option + "'");
            }
        }
        if (into == null) {
            throw new IllegalArgumentException("option --into DIR is required");
        }
        return new GeneratorOptions(into, new UniverseSpec(seed, companies, days, firstDay, digits));
    }

    private static long parseLong(String option, String value) {
        try {
            long parsed = Long.parseLong(value);
            if (!option.equals("--seed") && (parsed < Integer.MIN_VALUE || parsed > Integer.MAX_VALUE)) {
                throw new IllegalArgumentException("option " + option + ": '" + value + "' is out of range");
            }
            return parsed;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("option " + option + ": '" + value + "' is not a whole number", e);
        }
    }

    private static LocalDate parseDate(String option, String value) {
        try {
            return LocalDate.parse(value);
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException("option " + option + ": '" + value + "' is not a date YYYY-MM-DD", e);
        }
    }
}
