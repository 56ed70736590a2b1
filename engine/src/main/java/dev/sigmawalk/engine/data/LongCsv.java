package dev.sigmawalk.engine.data;

import java.util.List;

/** Checks shared by the long (one fact per row) CSV readers. */
final class LongCsv {
    private LongCsv() {
    }

    static void requireHeader(CsvSource source, List<String> expected) {
        if (!source.header().equals(expected)) {
            throw new InputException(new InputException.Location(source.file(), 1, null),
                    "the header is '" + String.join(",", source.header()) + "'; expected '"
                            + String.join(",", expected) + "'");
        }
    }

    static void requireWidth(CsvSource source, String[] cells, int width, int line) {
        if (cells.length != width) {
            throw new InputException(new InputException.Location(source.file(), line, null),
                    "the row has " + cells.length + " cells but the header has " + width);
        }
    }

    static String requireText(CsvSource source, String cell, int line, String column) {
        if (cell.isEmpty()) {
            throw new InputException(new InputException.Location(source.file(), line, column),
                    "'' is empty; expected a name");
        }
        return cell;
    }
}
