package dev.sigmawalk.engine.data;

import java.io.IOException;
import java.io.InputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.Charset;
import java.nio.file.Path;

/**
 * Every text file sigmawalk reads must be UTF-8 (a UTF-8 byte-order mark is allowed). Asset
 * names are matched across the assets, alphas and sectors files, so one encoding for all of
 * them is what makes "the same name" mean the same bytes; no {@code encoding:} key is offered.
 * Anything else is refused with the line of the first offending byte, what the bytes look like
 * (UTF-16, Windows-1252 or Latin-1, a workbook, binary) and how to re-save the file.
 *
 * <p>Validation follows RFC 3629 §4 (the UTF-8 byte-sequence table): overlong forms,
 * surrogates and code points above U+10FFFF are invalid.
 */
public final class TextEncoding {
    /** Bytes at the start of a file examined for a byte-order mark or a binary format. */
    static final int SNIFF_BYTES = 4096;
    private static final String FIX = "re-save the file as UTF-8 (a spreadsheet's \"CSV, UTF-8\" export, or a text"
            + " editor's \"save with encoding: UTF-8\")";
    private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");
    private static final int BUFFER = 1 << 16;

    private TextEncoding() {
    }

    /**
     * Reads {@code file} to its end and throws at the first byte that is not UTF-8 text.
     *
     * @param what what the file is, for messages ("data file", "study file")
     * @throws InputException naming the file, the line, what the bytes look like and the fix
     */
    public static void requireUtf8(Path file, String what) {
        try (FileChannel channel = InputFile.open(file, what); InputStream in = Channels.newInputStream(channel)) {
            byte[] buf = new byte[BUFFER + 4];
            int carry = 0;
            int line = 1;
            boolean first = true;
            int n;
            while ((n = in.readNBytes(buf, carry, BUFFER)) > 0 || carry > 0) {
                int end = carry + n;
                boolean last = n < BUFFER;
                if (first) {
                    String problem = sniff(buf, end);
                    if (problem != null) {
                        throw new InputException(new InputException.Location(file, 1, null), problem);
                    }
                    first = false;
                }
                int i = 0;
                while (i < end) {
                    int b = buf[i];
                    if (b >= 0x20 || b == '\t' || b == '\r') {
                        i++;
                    } else if (b == '\n') {
                        line++;
                        i++;
                    } else if (b >= 0) {
                        throw controlByte(file, line, b);
                    } else {
                        int len = sequenceLength(buf, i, end);
                        if (len == 0 && !last) {
                            break;
                        }
                        if (len <= 0) {
                            throw notUtf8(file, line, buf, i, end);
                        }
                        i += len;
                    }
                }
                carry = end - i;
                System.arraycopy(buf, i, buf, 0, carry);
                if (last) {
                    if (carry > 0) {
                        throw notUtf8(file, line, buf, 0, carry);
                    }
                    return;
                }
            }
        } catch (IOException e) {
            throw InputFile.unreadable(file, e);
        }
    }

    /**
     * What the first bytes of a file say about it when it is not UTF-8 text, or {@code null}.
     * Checks byte-order marks of UTF-16 and UTF-32, zip and gzip signatures, and NUL bytes.
     */
    static String sniff(byte[] b, int n) {
        if (n >= 4 && (b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE && b[2] == 0 && b[3] == 0
                || n >= 4 && b[0] == 0 && b[1] == 0 && (b[2] & 0xFF) == 0xFE && (b[3] & 0xFF) == 0xFF) {
            return "the file is UTF-32 text (it starts with a UTF-32 byte-order mark), not UTF-8; " + FIX;
        }
        if (n >= 2 && ((b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE || (b[0] & 0xFF) == 0xFE && (b[1] & 0xFF) == 0xFF)) {
            return "the file is UTF-16 text (it starts with a UTF-16 byte-order mark, as \"Unicode text\" exports do),"
                    + " not UTF-8; " + FIX;
        }
        if (n >= 4 && b[0] == 'P' && b[1] == 'K' && b[2] == 3 && b[3] == 4) {
            return "the file is a zip archive, such as a spreadsheet workbook (.xlsx, .ods), not CSV text;"
                    + " export the sheet as CSV, UTF-8";
        }
        if (n >= 2 && (b[0] & 0xFF) == 0x1F && (b[1] & 0xFF) == 0x8B) {
            return "the file is gzip-compressed, not CSV text; decompress it first";
        }
        int zerosEven = 0;
        int zerosOdd = 0;
        int m = Math.min(n, SNIFF_BYTES);
        for (int i = 0; i < m; i++) {
            if (b[i] == 0) {
                if ((i & 1) == 0) {
                    zerosEven++;
                } else {
                    zerosOdd++;
                }
            }
        }
        // ASCII text in UTF-16 has a zero in every other byte.
        if (m >= 8 && Math.max(zerosEven, zerosOdd) >= m / 2 - 2) {
            return "the file looks like UTF-16 text without a byte-order mark (every other byte is zero), not UTF-8; "
                    + FIX;
        }
        if (zerosEven + zerosOdd > 0) {
            return "the file holds NUL bytes, so it is binary, not CSV text; expected a UTF-8 text file";
        }
        return null;
    }

    /**
     * The length of the valid UTF-8 sequence that starts at {@code b[i]} (a byte &gt;= 0x80), -1
     * when it is invalid, or 0 when {@code end} cuts it short (more bytes may follow).
     */
    static int sequenceLength(byte[] b, int i, int end) {
        int lead = b[i] & 0xFF;
        int len;
        int lo = 0x80;
        int hi = 0xBF;
        if (lead >= 0xC2 && lead <= 0xDF) {
            len = 2;
        } else if (lead >= 0xE0 && lead <= 0xEF) {
            len = 3;
            lo = lead == 0xE0 ? 0xA0 : 0x80;
            hi = lead == 0xED ? 0x9F : 0xBF;
        } else if (lead >= 0xF0 && lead <= 0xF4) {
            len = 4;
            lo = lead == 0xF0 ? 0x90 : 0x80;
            hi = lead == 0xF4 ? 0x8F : 0xBF;
        } else {
            return -1;
        }
        for (int k = 1; k < len; k++) {
            if (i + k >= end) {
                return 0;
            }
            int c = b[i + k] & 0xFF;
            int min = k == 1 ? lo : 0x80;
            int max = k == 1 ? hi : 0xBF;
            if (c < min || c > max) {
                return -1;
            }
        }
        return len;
    }

    /** The error for the invalid UTF-8 sequence at {@code b[i]}, saying what the bytes look like. */
    static InputException notUtf8(Path file, int line, byte[] b, int i, int end) {
        int value = b[i] & 0xFF;
        String looks;
        String shown = new String(b, i, 1, WINDOWS_1252);
        if (value >= 0x80 && value <= 0x9F && !"\uFFFD".equals(shown)) {
            looks = "Windows-1252 (there it is '" + shown + "')";
        } else if (value >= 0xA0) {
            looks = "Windows-1252 or Latin-1 (ISO-8859-1) (there it is '" + shown + "')";
        } else {
            looks = "neither UTF-8 nor any common text encoding";
        }
        return new InputException(new InputException.Location(file, line, null),
                String.format(java.util.Locale.ROOT, "the file is not UTF-8: byte 0x%02X in '%s' is not valid UTF-8; it"
                        + " looks like %s; %s", value, context(b, i, end), looks, FIX));
    }

    /** Up to 20 bytes either side of {@code i} on the same line, shown as Windows-1252. */
    private static String context(byte[] b, int i, int end) {
        int from = i;
        while (from > 0 && i - from < 20 && b[from - 1] != '\n' && b[from - 1] != '\r') {
            from--;
        }
        int to = i + 1;
        while (to < end && to - i < 20 && b[to] != '\n' && b[to] != '\r') {
            to++;
        }
        return new String(b, from, to - from, WINDOWS_1252);
    }

    static InputException controlByte(Path file, int line, int value) {
        return new InputException(new InputException.Location(file, line, null), String.format(java.util.Locale.ROOT,
                "the file holds the control byte 0x%02X, so it is binary or damaged, not CSV text;"
                        + " expected a UTF-8 text file", value));
    }
}
