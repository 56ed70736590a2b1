package dev.sigmawalk.engine.data;

import java.nio.file.Path;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the optional {@code data.sectors} file, a CSV {@code asset,sector}. */
final class SectorMap {
    private static final List<String> HEADER = List.of("asset", "sector");

    private SectorMap() {
    }

    /**
     * Every row of the file, asset to sector, in the file's order. An asset listed twice, an empty asset or an empty
     * sector is an input error naming file, line, column and value.
     */
    static Map<String, String> read(Path file) {
        Map<String, String> sectors = new LinkedHashMap<>();
        Map<String, Integer> firstLine = new HashMap<>();
        try (CsvSource source = CsvSource.open(file)) {
            LongCsv.requireHeader(source, HEADER);
            String[] cells;
            while ((cells = source.next()) != null) {
                int line = source.line();
                LongCsv.requireWidth(source, cells, HEADER.size(), line);
                String asset = Names.requireInert(LongCsv.requireText(source, cells[0], line, "asset"), file, line,
                        "asset", "asset");
                String sector = Names.requireInert(LongCsv.requireText(source, cells[1], line, "sector"), file, line,
                        "sector", "sector");
                Integer earlier = firstLine.putIfAbsent(asset, line);
                if (earlier != null) {
                    throw new InputException(new InputException.Location(file, line, "asset"),
                            "'" + asset + "' is already given a sector on line " + earlier
                                    + "; expected each asset on one line");
                }
                sectors.put(asset, sector);
            }
        }
        return sectors;
    }

    /** The sectors of {@code assets}, in their order; assets the file does not list are left out. */
    static Map<String, String> restrictTo(Map<String, String> sectors, List<String> assets) {
        Map<String, String> out = new LinkedHashMap<>();
        for (String a : assets) {
            String s = sectors.get(a);
            if (s != null) {
                out.put(a, s);
            }
        }
        return Collections.unmodifiableMap(out);
    }
}
