package dev.sigmawalk.engine.data;

import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Splits one line of CSV bytes into trimmed cells, honouring quotes as RFC 4180 §2 writes them:
 * a quote opens a cell only at its start (after optional blanks), {@code ""} inside stands for
 * one quote, and the cell must close on the same line. Used for header lines and for the rare
 * data line with quoted cells; plain data lines take the byte-level path of {@link WideCsvReader}.
 */
final class CsvLine {
    private CsvLine() {
    }

    /**
     * @param b the bytes
     * @param s the line's first byte
     * @param e one past its last byte, before the line end
     * @param line the line number, for messages
     */
    static List<String> split(byte[] b, int s, int e, Path file, int line) {
        List<String> cells = new ArrayList<>();
        int p = s;
        while (true) {
            while (p < e && (b[p] == ' ' || b[p] == '\t')) {
                p++;
            }
            String cell;
            if (p < e && b[p] == '"') {
                ByteArrayOutputStream inside = new ByteArrayOutputStream();
                p++;
                boolean closed = false;
                while (p < e) {
                    if (b[p] == '"') {
                        if (p + 1 < e && b[p + 1] == '"') {
                            inside.write('"');
                            p += 2;
                            continue;
                        }
                        p++;
                        closed = true;
                        break;
                    }
                    inside.write(b[p]);
                    p++;
                }
                if (!closed) {
                    QuoteScan.Span span = QuoteScan.firstMultiLine(file);
                    throw QuoteScan.unclosed(file, span != null && span.opened() == line ? span : new QuoteScan.Span(line, 0));
                }
                while (p < e && (b[p] == ' ' || b[p] == '\t')) {
                    p++;
                }
                if (p < e && b[p] != ',') {
                    throw new InputException(new InputException.Location(file, line, null),
                            "text follows the closing quote of cell " + (cells.size() + 1)
                                    + "; expected a comma or the end of the line after a quoted cell");
                }
                byte[] text = inside.toByteArray();
                cell = CellText.decode(text, 0, text.length, file, line).strip();
            } else {
                int from = p;
                while (p < e && b[p] != ',') {
                    p++;
                }
                cell = CellText.decode(b, from, p, file, line).strip();
            }
            cells.add(stripByteOrderMark(cell));
            if (p >= e) {
                return cells;
            }
            p++;
        }
    }

    private static String stripByteOrderMark(String cell) {
        return !cell.isEmpty() && cell.charAt(0) == '\uFEFF' ? cell.substring(1).strip() : cell;
    }
}
