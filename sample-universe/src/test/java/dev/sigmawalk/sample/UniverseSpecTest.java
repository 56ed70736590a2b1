package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import org.junit.jupiter.api.Test;

class UniverseSpecTest {
    private static final LocalDate MONDAY = LocalDate.of(2020, 1, 6);

    @Test
    void fewerCompaniesThanSectors_isRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new UniverseSpec(1, 7, 500, MONDAY, 8));
        assertTrue(e.getMessage().contains("companies (7) must be between 8"), e.getMessage());
    }

    @Test
    void weekendFirstDay_isRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new UniverseSpec(1, 10, 500, LocalDate.of(2020, 1, 4), 8));
        assertTrue(e.getMessage().contains("first day (2020-01-04) must be a weekday"), e.getMessage());
    }

    @Test
    void tooFewTradingDays_isRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new UniverseSpec(1, 10, 50, MONDAY, 8));
        assertTrue(e.getMessage().contains("trading days (50)"), e.getMessage());
    }

    @Test
    void options_fillUnnamedValuesFromTheDemoSpec() {
        GeneratorOptions options = GeneratorOptions.parse("--into", "out", "--companies", "500", "--trading-days", "3000");
        assertEquals(Path.of("out"), options.into());
        assertEquals(new UniverseSpec(UniverseSpec.demo().seed(), 500, 3000, UniverseSpec.demo().firstDay(), 8),
                options.spec());
    }

    @Test
    void options_readEveryValue() {
        GeneratorOptions options = GeneratorOptions.parse("--seed", "-3", "--first-day", "1999-03-01",
                "--digits", "6", "--into", "x", "--companies", "9", "--trading-days", "200");
        assertEquals(new UniverseSpec(-3, 9, 200, LocalDate.of(1999, 3, 1), 6), options.spec());
    }

    @Test
    void options_withoutInto_areRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> GeneratorOptions.parse("--seed", "4"));
        assertTrue(e.getMessage().contains("--into DIR is required"), e.getMessage());
    }

    @Test
    void options_withBadNumber_nameOptionAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GeneratorOptions.parse("--into", "x", "--companies", "many"));
        assertTrue(e.getMessage().contains("--companies: 'many' is not a whole number"), e.getMessage());
    }

    @Test
    void options_unknownOrDangling_areRefused() {
        IllegalArgumentException unknown = assertThrows(IllegalArgumentException.class,
                () -> GeneratorOptions.parse("--into", "x", "--rows", "5"));
        assertTrue(unknown.getMessage().contains("unknown option '--rows'"), unknown.getMessage());
        IllegalArgumentException dangling = assertThrows(IllegalArgumentException.class,
                () -> GeneratorOptions.parse("--into"));
        assertTrue(dangling.getMessage().contains("--into needs a value"), dangling.getMessage());
    }
}
