package dev.sigmawalk.reports.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The byte-level writer against the formatting the files had before it: each row built as text
 * with {@link Double#toString}, {@link Long#toString} and the inert/quote rule, then encoded by
 * the JDK's UTF-8 {@link BufferedWriter} ({@link Reference}, a second implementation kept here
 * as the oracle). Seeded loops; the rows are long enough that the writer's buffer fills and
 * flushes at many different offsets.
 */
class CsvWriterBytesTest {
    private static final long SEED = 20261202L;
    private static final int ROWS = 20_000;

    @TempDir
    Path dir;

    /** One cell, given to both writers. */
    private sealed interface Cell permits Text, Number, Whole, Blank {
        void to(CsvWriter csv);

        void to(Reference ref);
    }

    private record Text(String value) implements Cell {
        public void to(CsvWriter csv) {
            csv.text(value);
        }

        public void to(Reference ref) {
            ref.text(value);
        }
    }

    private record Number(double value) implements Cell {
        public void to(CsvWriter csv) {
            csv.number(value);
        }

        public void to(Reference ref) {
            ref.number(value);
        }
    }

    private record Whole(long value) implements Cell {
        public void to(CsvWriter csv) {
            csv.integer(value);
        }

        public void to(Reference ref) {
            ref.integer(value);
        }
    }

    private record Blank() implements Cell {
        public void to(CsvWriter csv) {
            csv.empty();
        }

        public void to(Reference ref) {
            ref.empty();
        }
    }

    /** The row-as-text writer the files were written with before the byte-level writer. */
    private static final class Reference {
        private final StringBuilder file = new StringBuilder();
        private boolean first = true;

        void text(String value) {
            sep();
            String v = CsvCell.inert(value);
            if (v.indexOf(',') >= 0 || v.indexOf('"') >= 0 || v.indexOf('\n') >= 0 || v.indexOf('\r') >= 0) {
                file.append('"').append(v.replace("\"", "\"\"")).append('"');
            } else {
                file.append(v);
            }
        }

        void number(double value) {
            sep();
            if (Double.isFinite(value)) {
                file.append(Double.toString(value));
            }
        }

        void integer(long value) {
            sep();
            file.append(value);
        }

        void empty() {
            sep();
        }

        void end() {
            file.append('\n');
            first = true;
        }

        private void sep() {
            if (!first) {
                file.append(',');
            }
            first = false;
        }

        byte[] bytes(Path path) throws IOException {
            try (BufferedWriter w = Files.newBufferedWriter(path, StandardCharsets.UTF_8)) {
                w.append(file);
            }
            return Files.readAllBytes(path);
        }
    }

    private byte[][] bothWriters(List<List<Cell>> rows) throws IOException {
        Path mine = dir.resolve("new.csv");
        Reference ref = new Reference();
        try (CsvWriter csv = new CsvWriter(mine, "a", "b")) {
            ref.text("a");
            ref.text("b");
            ref.end();
            for (List<Cell> row : rows) {
                row.forEach(c -> c.to(csv));
                row.forEach(c -> c.to(ref));
                csv.end();
                ref.end();
            }
        }
        return new byte[][] {Files.readAllBytes(mine), ref.bytes(dir.resolve("old.csv"))};
    }

    /** Values of the sizes the walk writes: returns, weights, costs, betas, variances, statistics. */
    private static double walkSized(SplittableRandom random) {
        switch (random.nextInt(5)) {
            case 0:
                return random.nextDouble(-0.2, 0.2);
            case 1:
                return random.nextInt(51) * 0.0004;
            case 2:
                return Math.exp(random.nextDouble(-25, 25)) * (random.nextBoolean() ? 1 : -1);
            case 3:
                return random.nextDouble(0, 2.5);
            default:
                return random.nextInt(1_000_000) / 1e6;
        }
    }

    @Test
    void walkSizedNumbers_integersAndNames_giveTheSameBytesAsTheTextWriter() throws IOException {
        SplittableRandom random = new SplittableRandom(SEED);
        List<List<Cell>> rows = new ArrayList<>();
        String[] names = {"TW01", "index-minvar", "2005-10-31", "Ærø Shipping", "ok", "market", ""};
        for (int r = 0; r < ROWS; r++) {
            List<Cell> row = new ArrayList<>();
            row.add(new Text(names[random.nextInt(names.length)]));
            row.add(new Whole(random.nextInt(-5000, 5000)));
            for (int k = 0; k < 3; k++) {
                row.add(new Number(walkSized(random)));
            }
            row.add(random.nextInt(10) == 0 ? new Blank() : new Number(Double.NaN));
            rows.add(row);
        }
        byte[][] files = bothWriters(rows);
        assertArrayEquals(files[1], files[0]);
    }

    @Test
    void edgeNumbers_giveTheSameBytesAsTheTextWriter() throws IOException {
        double[] edges = {0.0, -0.0, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL, Math.nextDown(Double.MIN_NORMAL),
            Double.MAX_VALUE, -Double.MAX_VALUE, 1e-3, Math.nextDown(1e-3), 1e7, Math.nextDown(1e7), 1.0, -1.0, 0.1,
            0.02, 1e-300, 3.0e-320, 1e300, 123456789012.0, 6.191552950165839E-4, Double.NaN,
            Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        long[] integers = {0, -1, 1, 9, 10, -10, 99, 100, Integer.MAX_VALUE, Integer.MIN_VALUE, Long.MAX_VALUE,
            Long.MIN_VALUE, Long.MIN_VALUE + 1, 1_000_000_000_000L};
        List<List<Cell>> rows = new ArrayList<>();
        for (double e : edges) {
            rows.add(List.of(new Number(e), new Number(-e)));
        }
        for (long i : integers) {
            rows.add(List.of(new Whole(i), new Blank()));
        }
        byte[][] files = bothWriters(rows);
        assertArrayEquals(files[1], files[0]);
        String text = new String(files[0], StandardCharsets.US_ASCII);
        assertTrue(text.contains("\n-0.0,0.0\n"), "negative zero keeps its sign");
        assertTrue(text.contains("\n,\n"), "NaN and infinities are empty cells");
        assertTrue(text.contains("\n-9223372036854775808,\n"), "the most negative long");
    }

    /**
     * Any double at all, its bits drawn at random (subnormals, huge and tiny exponents included):
     * each cell reads back as the same double, bit for bit, and is {@link Double#toString}'s text
     * except where that text keeps more digits than the double needs (Java 17 does for some
     * values, such as {@code 2.0E23}, which it prints {@code 1.9999999999999998E23}); then the
     * cell has fewer digits and the same form.
     */
    @Test
    void anyDouble_roundTrips_andDiffersFromDoubleToStringOnlyByDroppingSurplusDigits() throws IOException {
        SplittableRandom random = new SplittableRandom(SEED + 1);
        double[] values = new double[ROWS];
        for (int i = 0; i < ROWS; i++) {
            values[i] = Double.longBitsToDouble(random.nextLong());
        }
        values[0] = 2.0e23;
        Path file = dir.resolve("bits.csv");
        try (CsvWriter csv = new CsvWriter(file, "x")) {
            for (double v : values) {
                csv.number(v).end();
            }
        }
        List<String> lines = Files.readAllLines(file, StandardCharsets.US_ASCII);
        assertEquals(ROWS + 1, lines.size());
        assertEquals("2.0E23", lines.get(1), "the shortest digits of 2e23");
        for (int i = 0; i < ROWS; i++) {
            double v = values[i];
            String cell = lines.get(i + 1);
            if (!Double.isFinite(v)) {
                assertEquals("", cell, "non-finite " + v);
                continue;
            }
            assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(cell)),
                    "round trip of " + cell);
            String jdk = Double.toString(v);
            if (!cell.equals(jdk)) {
                assertTrue(digits(cell) < digits(jdk), cell + " differs from " + jdk + " without being shorter");
                assertEquals(jdk.contains("E"), cell.contains("E"), "same notation as " + jdk);
            }
        }
    }

    private static int digits(String number) {
        String mantissa = number.contains("E") ? number.substring(0, number.indexOf('E')) : number;
        return mantissa.replace("-", "").replace(".", "").replaceAll("^0+", "").replaceAll("0+$", "").length();
    }

    @Test
    void textCells_quotedInertAndEncoded_asTheTextWriter() throws IOException {
        String[] texts = {"plain", "", "a,b", "say \"hi\"", "two\nlines", "cr\rhere", "=1+2", "+cmd", "-2+3", "-0.25",
            "+1e-3", "@SUM(A1)", "\tx", "\rx", "café", "名前", "emoji \uD83D\uDE00",
            "'quoted", "ends,", "\"", "-", "+", "="};
        List<List<Cell>> rows = new ArrayList<>();
        for (String t : texts) {
            rows.add(List.of(new Text(t), new Text(t + t)));
        }
        rows.add(List.of(new Text("long,".repeat(30_000)), new Text("y".repeat(70_000))));
        byte[][] files = bothWriters(rows);
        assertArrayEquals(files[1], files[0]);
    }

    /** The text writer failed on such a cell too (its encoder reports malformed input); now the message says why. */
    @Test
    void unpairedSurrogate_isRefused_withTheCellInTheMessage() {
        for (String bad : List.of("lone \uD800 surrogate", "x\uDC00", "\uD83D")) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> written(csv -> csv.text(bad)), bad);
            assertTrue(e.getMessage().contains("unpaired UTF-16 surrogate"), e.getMessage());
            assertThrows(IllegalArgumentException.class, () -> CsvCell.of(bad), "prepared " + bad);
        }
    }

    @Test
    void preparedCell_writesTheSameBytesAsText() throws IOException {
        String[] texts = {"TW01", "a,b", "=x", "-0.5", "naïve", "q\"q", ""};
        assertEquals(written(csv -> {
            for (String t : texts) {
                csv.text(t);
            }
        }), written(csv -> {
            CsvCell.Cache cache = new CsvCell.Cache();
            for (String t : texts) {
                csv.cell(cache.of(t));
            }
        }));
    }

    @Test
    void joinedCells_writeTheSameBytesAsTheCellsOneByOne() throws IOException {
        long[] windows = {0, 7, 250, -3, Long.MIN_VALUE};
        for (long w : windows) {
            CsvCell start = CsvCell.of("2005-10-31").then(CsvCell.of("a,b")).then(CsvCell.integer(w));
            assertEquals(written(csv -> csv.text("2005-10-31").text("a,b").integer(w).text("TW01").number(0.0)),
                    written(csv -> csv.cell(start).cell(CsvCell.of("TW01")).number(0.0)), "window " + w);
        }
    }

    private String written(Consumer<CsvWriter> row) throws IOException {
        Path file = dir.resolve("row.csv");
        try (CsvWriter csv = new CsvWriter(file, "h")) {
            for (int r = 0; r < 3; r++) {
                row.accept(csv);
                csv.end();
            }
        }
        return Files.readString(file);
    }
}
