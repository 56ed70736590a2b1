package dev.sigmawalk.engine.data;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.ValueKind;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The byte-level wide reader on files larger than its first chunk (1 MiB), so rows straddle
 * chunk ends: every value must be the double {@link Double#parseDouble} gives for the cell's
 * text, every row keep the line a text editor shows, and the fingerprint match a separate read.
 */
class WideCsvReaderTest {
    @TempDir
    Path dir;

    private record Written(Path file, List<String[]> cells, List<Integer> lines) {
    }

    /**
     * A seeded file of {@code rows} × {@code cols} in every spelling a spreadsheet export uses:
     * LF, CRLF and CR line ends, blanks around cells, blank lines, quoted cells, empty cells,
     * leading '+', exponents and up to 17 significant digits.
     */
    private Written write(long seed, int rows, int cols) throws IOException {
        SplittableRandom rng = new SplittableRandom(seed);
        StringBuilder sb = new StringBuilder("\uFEFFdate");
        for (int j = 0; j < cols; j++) {
            sb.append(j == 3 ? ",\"A" + j + "\"" : ",A" + j);
        }
        sb.append("\r\n");
        int line = 2;
        List<String[]> cells = new ArrayList<>();
        List<Integer> lines = new ArrayList<>();
        LocalDate d = LocalDate.of(1900, 1, 1);
        for (int t = 0; t < rows; t++) {
            if (rng.nextInt(50) == 0) {
                // An empty line right after a CR would make CR LF, one line end.
                boolean afterCr = sb.charAt(sb.length() - 1) == '\r';
                sb.append(rng.nextBoolean() && !afterCr ? "" : "  \t").append('\n');
                line++;
            }
            String[] row = new String[cols];
            boolean quoted = rng.nextInt(40) == 0;
            sb.append(quoted ? "\"" + d + "\"" : d.toString());
            for (int j = 0; j < cols; j++) {
                // Returns from -0.9 to 1 in size 1e-5 to 1, and now and then a large gain.
                double v = rng.nextInt(20) == 0 ? rng.nextDouble() * 1e3
                        : (rng.nextDouble() * 1.9 - 0.9) * Math.pow(10, rng.nextInt(-5, 1));
                String text = switch (rng.nextInt(8)) {
                    case 0 -> "";
                    case 1 -> Double.toString(v);
                    case 2 -> "+" + String.format(Locale.ROOT, "%.9g", Math.abs(v));
                    case 3 -> String.format(Locale.ROOT, "%.3e", v);
                    default -> String.format(Locale.ROOT, "%." + rng.nextInt(1, 16) + "g", v);
                };
                row[j] = text;
                String blank = rng.nextInt(10) == 0 ? " " : "";
                sb.append(',').append(blank).append(quoted && !text.isEmpty() ? "\"" + text + "\"" : text).append(blank);
            }
            sb.append(switch (rng.nextInt(3)) {
                case 0 -> "\n";
                case 1 -> "\r\n";
                default -> "\r";
            });
            cells.add(row);
            lines.add(line);
            line++;
            d = d.plusDays(1);
        }
        Path file = dir.resolve("wide-" + seed + ".csv");
        Files.writeString(file, sb, StandardCharsets.UTF_8);
        return new Written(file, cells, lines);
    }

    @Test
    void largeFileInEverySpelling_givesParseDoubleBitsAndEditorLines() throws IOException {
        for (long seed = 1; seed <= 1; seed++) {
            Written w = write(seed, 9000, 17);
            assertTrue(Files.size(w.file()) > (1 << 20) * 1.5, "the file spans several chunks");
            WideCsvReader.Read read = WideCsvReader.read(w.file(), ValueKind.RETURNS, null);
            WideTable t = read.table();
            assertEquals(w.cells().size(), t.rows());
            assertEquals("A3", t.columns().get(3), "quoted header cell");
            for (int r = 0; r < t.rows(); r++) {
                assertEquals((int) w.lines().get(r), t.lines()[r], "line of row " + r);
                for (int j = 0; j < t.columnCount(); j++) {
                    String text = w.cells().get(r)[j];
                    double expected = text.isEmpty() ? Double.NaN : Double.parseDouble(text);
                    assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(t.value(r, j)),
                            "row " + r + " column " + j + ": " + text);
                }
            }
            assertEquals(FileFingerprint.of(w.file()), read.fingerprint());
        }
    }

    @Test
    void windows1252ByteFarIntoTheFile_isRefusedAtItsLine() throws IOException {
        Written w = write(3, 6500, 17);
        assertTrue(Files.size(w.file()) > (1 << 20), "the bad byte lies beyond the first chunk");
        byte[] bytes = Files.readAllBytes(w.file());
        int at = bytes.length - 100;
        while (bytes[at] != ',') {
            at++;
        }
        bytes[at + 1] = (byte) 0xE9;
        Files.write(w.file(), bytes);
        int line = 1;
        for (int i = 0; i <= at; i++) {
            line += bytes[i] == '\n' || bytes[i] == '\r' && bytes[i + 1] != '\n' ? 1 : 0;
        }
        InputException e = assertThrows(InputException.class, () -> WideCsvReader.read(w.file(), ValueKind.RETURNS, null));
        assertEquals(line, e.location().line(), e.getMessage());
        assertTrue(e.getMessage().contains("the file is not UTF-8: byte 0xE9"), e.getMessage());
    }

    @Test
    void unclosedQuoteInAWideFile_isReportedAtTheLineWhereItOpened() throws IOException {
        Path file = dir.resolve("q.csv");
        Files.writeString(file, "date,A,B\n2020-01-31,0.1,0.2\n2020-02-29,\"0.1,0.2\n2020-03-31,0.1,0.2\n"
                + "2020-04-30,0.1,0.2\"\n");
        InputException e = assertThrows(InputException.class, () -> WideCsvReader.read(file, ValueKind.RETURNS, null));
        assertEquals("q.csv line 3: a quote opens a cell here and is not closed on this line (the next quote is on"
                + " line 5); expected a closing quote before the end of the line, or no quote", e.getMessage());
    }

    @Test
    void quotedNumbersAndBlankLines_areReadLikePlainOnes() throws IOException {
        Path file = dir.resolve("p.csv");
        Files.writeString(file, "date , \"A\" ,B\n\n 2020-01-31 , \"-0.5\" , +1e-3 \n   \n2020-02-29,,7.\n");
        WideTable t = WideCsvReader.read(file, ValueKind.RETURNS, null).table();
        assertEquals(List.of("A", "B"), t.columns());
        assertArrayEquals(new int[] {3, 5}, t.lines());
        assertEquals(-0.5, t.value(0, 0), 0.0);
        assertEquals(0.001, t.value(0, 1), 0.0);
        assertTrue(Double.isNaN(t.value(1, 0)));
        assertEquals(7.0, t.value(1, 1), 0.0);
    }

    @Test
    void rowsOfTheWrongWidth_areRefusedWithTheirCellCount() throws IOException {
        Path file = dir.resolve("w.csv");
        Files.writeString(file, "date,A,B\n2020-01-31,0.1,0.2\n2020-02-29,0.1\n");
        InputException e = assertThrows(InputException.class, () -> WideCsvReader.read(file, ValueKind.RETURNS, null));
        assertEquals("w.csv line 3: the row has 2 cells but the header has 3", e.getMessage());
        Files.writeString(file, "date,A,B\n2020-01-31,0.1,0.2,\n");
        e = assertThrows(InputException.class, () -> WideCsvReader.read(file, ValueKind.RETURNS, null));
        assertEquals("w.csv line 2: the row has 4 cells but the header has 3", e.getMessage());
    }

    /**
     * Empty cells ending the header are read past in rows that leave them empty, quoted or not,
     * or that stop before them; a row longer than the header with them, or with a value in one,
     * is refused naming the cell.
     */
    @Test
    void emptyCellsEndingTheHeader_areReadPast() throws IOException {
        Path file = dir.resolve("t.csv");
        Files.writeString(file, "date,A,B,,\n2020-01-31,0.1,0.2,,\n2020-02-29,0.3,0.4\n2020-03-31,\"0.5\",0.6,,\"\"\n"
                + "2020-04-30,0.7,0.8, ,\n");
        WideTable t = WideCsvReader.read(file, ValueKind.RETURNS, null).table();
        assertEquals(List.of("A", "B"), t.columns());
        assertArrayEquals(new int[] {2, 3, 4, 5}, t.lines());
        assertEquals(0.4, t.value(1, 1), 0.0);
        assertEquals(0.5, t.value(2, 0), 0.0);
        assertEquals(0.8, t.value(3, 1), 0.0);
        Files.writeString(file, "date,A,B,,\n2020-01-31,0.1,0.2,,x\n");
        InputException e = assertThrows(InputException.class, () -> WideCsvReader.read(file, ValueKind.RETURNS, null));
        assertEquals("t.csv line 2: cell 5 holds 'x' but the header names no column there (it names 3 cells, then 2"
                + " empty); name the column or delete the value", e.getMessage());
        Files.writeString(file, "date,A,B,,\n2020-01-31,\"0.1\",0.2,7,\n");
        e = assertThrows(InputException.class, () -> WideCsvReader.read(file, ValueKind.RETURNS, null));
        assertEquals("t.csv line 2: cell 4 holds '7' but the header names no column there (it names 3 cells, then 2"
                + " empty); name the column or delete the value", e.getMessage());
        Files.writeString(file, "date,A,B,,\n2020-01-31,0.1,0.2,,,\n");
        e = assertThrows(InputException.class, () -> WideCsvReader.read(file, ValueKind.RETURNS, null));
        assertEquals("t.csv line 2: the row has 6 cells but the header has 5 (3 named, then 2 empty)", e.getMessage());
    }

    /** A header and a row longer than the first chunk (1 MiB) make the buffer grow rather than loop. */
    @Test
    void linesLongerThanAChunk_areRead() throws IOException {
        int cols = 120_000;
        StringBuilder header = new StringBuilder("date");
        StringBuilder row = new StringBuilder("2020-01-31");
        for (int j = 0; j < cols; j++) {
            header.append(",ASSET").append(j);
            row.append(',').append(j % 7 == 0 ? "" : "0.0" + (j % 10));
        }
        Path file = dir.resolve("long-lines.csv");
        Files.writeString(file, header + "\n" + row + "\n" + row.toString().replace("2020-01-31", "2020-02-29") + "\n");
        assertTrue(Files.size(file) > 2 * (1 << 20), "lines longer than a chunk");
        WideTable t = WideCsvReader.read(file, ValueKind.RETURNS, null).table();
        assertEquals(cols, t.columnCount());
        assertEquals(2, t.rows());
        assertTrue(Double.isNaN(t.value(1, 0)));
        assertEquals(0.08, t.value(1, cols - 2), 0.0, "ASSET119998 holds 0.0 + (119998 mod 10)");
    }
}
