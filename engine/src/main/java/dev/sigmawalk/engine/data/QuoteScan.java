package dev.sigmawalk.engine.data;

import java.io.IOException;
import java.io.InputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.Path;

/**
 * Finds where a quoted CSV cell that spans a line break begins. No cell sigmawalk reads (a
 * date, a number, a name) holds a line break, so such a cell is an unclosed quote, and the place
 * to fix is the line where the quote opened, not the line where the parser gave up (which can
 * be hundreds of lines later, or the end of the file). Quoting follows RFC 4180 §2: a quote
 * opens a cell only at its start (after optional blanks), and {@code ""} inside stands for one
 * quote.
 */
final class QuoteScan {
    private static final int BUFFER = 1 << 16;

    private QuoteScan() {
    }

    /** Where a multi-line quoted cell opens and where it closes (0 when it never does). */
    record Span(int opened, int closed) {
    }

    /** The first quoted cell of {@code file} that spans a line break, or {@code null} when none does. */
    static Span firstMultiLine(Path file) {
        try (FileChannel channel = InputFile.open(file, "data file"); InputStream in = Channels.newInputStream(channel)) {
            byte[] buf = new byte[BUFFER];
            int line = 1;
            int opened = 0;
            boolean inQuote = false;
            boolean cellStart = true;
            boolean quotePending = false;
            int n;
            while ((n = in.read(buf)) > 0) {
                for (int i = 0; i < n; i++) {
                    byte c = buf[i];
                    if (quotePending) {
                        quotePending = false;
                        if (c == '"') {
                            continue;
                        }
                        inQuote = false;
                        if (line > opened) {
                            return new Span(opened, line);
                        }
                    }
                    if (c == '\n') {
                        line++;
                    }
                    if (inQuote) {
                        quotePending = c == '"';
                    } else if (c == '"' && cellStart) {
                        inQuote = true;
                        opened = line;
                    } else if (c == ',' || c == '\n') {
                        cellStart = true;
                    } else if (c != ' ' && c != '\t' && c != '\r') {
                        cellStart = false;
                    }
                }
            }
            if (inQuote && !quotePending) {
                return new Span(opened, 0);
            }
            return quotePending && line > opened ? new Span(opened, line) : null;
        } catch (IOException e) {
            throw InputFile.unreadable(file, e);
        }
    }

    /** The error for {@code span}, located at the line where the quote opened. */
    static InputException unclosed(Path file, Span span) {
        return new InputException(new InputException.Location(file, span.opened(), null),
                "a quote opens a cell here and is not closed on this line ("
                        + (span.closed() == 0 ? "it never closes" : "the next quote is on line " + span.closed())
                        + "); expected a closing quote before the end of the line, or no quote");
    }
}
