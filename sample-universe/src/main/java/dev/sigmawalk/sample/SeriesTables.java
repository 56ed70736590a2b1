package dev.sigmawalk.sample;

import java.io.Closeable;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The three tables of one frequency: company returns (wide), index returns and risk-free rates. */
final class SeriesTables implements Closeable {
    private final CsvTable assets;
    private final CsvTable market;
    private final CsvTable riskFree;

    SeriesTables(Path dir, String frequency, List<Company> companies, SignificantDigits digits) throws IOException {
        List<String> header = new ArrayList<>(companies.size() + 1);
        header.add("date");
        for (Company c : companies) {
            header.add(c.id());
        }
        this.assets = new CsvTable(dir.resolve(UniverseFiles.assets(frequency)), header, digits);
        this.market = new CsvTable(dir.resolve(UniverseFiles.market(frequency)),
                List.of("date", UniverseFiles.INDEX_COLUMN), digits);
        this.riskFree = new CsvTable(dir.resolve(UniverseFiles.riskFree(frequency)),
                List.of("date", UniverseFiles.RISK_FREE_COLUMN), digits);
    }

    void write(DayValues row) throws IOException {
        String date = row.date().toString();
        assets.begin(date);
        for (int i = 0; i < row.size(); i++) {
            assets.number(row.asset(i));
        }
        assets.end();
        market.begin(date).number(row.index()).end();
        riskFree.begin(date).number(row.riskFree()).end();
    }

    /** Closes all three tables, even when one fails; the first failure is thrown. */
    @Override
    public void close() throws IOException {
        IOException first = null;
        for (CsvTable table : new CsvTable[] {assets, market, riskFree}) {
            try {
                table.close();
            } catch (IOException e) {
                if (first == null) {
                    first = e;
                } else {
                    first.addSuppressed(e);
                }
            }
        }
        if (first != null) {
            throw first;
        }
    }
}
