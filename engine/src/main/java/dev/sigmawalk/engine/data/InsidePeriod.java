package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.time.LocalDate;

/**
 * A per-period series (the market's returns, the risk-free rate, factor returns) joined on the
 * assets' dates. Method §1: row t holds the return over (d_{t−1}, d_t], so a row of the series
 * dated strictly inside that interval means the series is finer than the assets file (daily
 * against monthly, or a day the assets file skips) and its value on d_t covers only part of the
 * period. Ignoring that row would silently misstate every period it falls in.
 */
final class InsidePeriod {
    private InsidePeriod() {
    }

    /**
     * @param file the series' file
     * @param line the line of the row dated {@code date}
     * @param previous the assets' date before {@code date}
     * @param next the assets' date after {@code date}
     * @param assets the assets file
     */
    static InputException refusal(Path file, int line, LocalDate date, LocalDate previous, LocalDate next,
                                  Path assets) {
        return new InputException(new InputException.Location(file, line, "date"),
                "'" + date + "' falls between the dates " + previous + " and " + next + " of " + assets.getFileName()
                        + ", so this file's value on " + next + " would cover only part of that period;"
                        + " expected one row per period of " + assets.getFileName() + ", on its dates, each the"
                        + " return (or rate) over the whole period");
    }
}
