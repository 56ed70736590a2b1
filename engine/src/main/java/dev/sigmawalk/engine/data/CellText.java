package dev.sigmawalk.engine.data;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** Turns a cell's bytes into text after checking they are UTF-8 without control bytes. */
final class CellText {
    private CellText() {
    }

    /**
     * @throws InputException at {@code line} for a byte that is not UTF-8 or is a control byte
     */
    static String decode(byte[] b, int s, int e, Path file, int line) {
        boolean ascii = true;
        for (int i = s; i < e; i++) {
            int c = b[i];
            if (c < 0) {
                int len = TextEncoding.sequenceLength(b, i, e);
                if (len <= 0) {
                    throw TextEncoding.notUtf8(file, line, b, i, e);
                }
                i += len - 1;
                ascii = false;
            } else if (c < 0x20 && c != '\t') {
                throw TextEncoding.controlByte(file, line, c);
            }
        }
        return new String(b, s, e - s, ascii ? StandardCharsets.ISO_8859_1 : StandardCharsets.UTF_8);
    }
}
