package dev.sigmawalk.reports.files;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Output cells stay inert in a spreadsheet (the OWASP guidance on CSV injection: a cell starting
 * with = + - @, tab or carriage return is run as a formula), while numbers keep their exact
 * round-trip form.
 */
class CsvWriterTest {
    @TempDir
    Path dir;

    private String written(java.util.function.Consumer<CsvWriter> row) throws IOException {
        Path file = dir.resolve("t.csv");
        try (CsvWriter csv = new CsvWriter(file, "a", "b")) {
            row.accept(csv);
            csv.end();
        }
        return Files.readString(file).split("\n")[1];
    }

    @Test
    void formulaLikeTextCells_getALeadingApostrophe() throws IOException {
        assertEquals("\"'=HYPERLINK(\"\"x\"\")\",'@SUM(A1)", written(c -> c.text("=HYPERLINK(\"x\")").text("@SUM(A1)")));
        assertEquals("'+cmd,'-2+3", written(c -> c.text("+cmd").text("-2+3")));
        assertEquals("'\tx,\"'\rx\"", written(c -> c.text("\tx").text("\rx")));
    }

    @Test
    void negativeNumbersAndPlainText_areWrittenAsTheyAre() throws IOException {
        assertEquals("-0.5,-1.0E-7", written(c -> c.number(-0.5).number(-1e-7)));
        assertEquals("-0.25,plain text", written(c -> c.text("-0.25").text("plain text")));
        double tricky = -0.1 - 0.2;
        assertEquals(tricky, Double.parseDouble(written(c -> c.number(tricky).empty()).split(",")[0]), 0.0,
                "a negative number still round-trips");
    }
}
