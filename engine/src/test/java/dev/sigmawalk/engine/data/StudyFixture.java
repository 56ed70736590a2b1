package dev.sigmawalk.engine.data;

import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A small invented monthly study written into a temporary folder: three assets, eight rows, a
 * market file and a risk-free file. Tests replace one file or one study line to make it wrong.
 */
final class StudyFixture {
    static final String ASSETS = String.join("\n",
            "date,A01,A02,A03",
            "2020-01-31,0.01,0.02,-0.01",
            "2020-02-29,0.02,-0.01,0.00",
            "2020-03-31,-0.03,0.01,0.02",
            "2020-04-30,0.04,0.00,0.01",
            "2020-05-31,0.01,0.03,-0.02",
            "2020-06-30,-0.02,0.01,0.01",
            "2020-07-31,0.00,0.02,0.03",
            "2020-08-31,0.03,-0.01,0.00", "");
    static final String MARKET = String.join("\n",
            "date,IDX",
            "2020-01-31,0.011",
            "2020-02-29,0.004",
            "2020-03-31,-0.012",
            "2020-04-30,0.021",
            "2020-05-31,0.003",
            "2020-06-30,-0.006",
            "2020-07-31,0.015",
            "2020-08-31,0.007", "");
    static final String RISK_FREE = String.join("\n",
            "date,rf",
            "2020-01-31,0.001",
            "2020-02-29,0.001",
            "2020-03-31,0.001",
            "2020-04-30,0.001",
            "2020-05-31,0.001",
            "2020-06-30,0.001",
            "2020-07-31,0.001",
            "2020-08-31,0.001", "");
    static final String STUDY = String.join("\n",
            "title: Invented three-asset study",
            "data:",
            "  assets: assets.csv",
            "  values: returns",
            "  market: market.csv",
            "  riskfree: riskfree.csv",
            "walkforward:",
            "  windows: [3]",
            "  rebalance_every: 1",
            "strategies:",
            "  - name: minvar",
            "    risk: sample",
            "    objective: min-variance", "");

    private final Path dir;

    StudyFixture(Path dir) {
        this.dir = dir;
        write("assets.csv", ASSETS);
        write("market.csv", MARKET);
        write("riskfree.csv", RISK_FREE);
        write("study.yaml", STUDY);
    }

    Path dir() {
        return dir;
    }

    StudyFixture write(String name, String content) {
        try {
            Files.writeString(dir.resolve(name), content);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return this;
    }

    /**
     * Replaces the assets and market files with prices and the study's values with prices; the
     * risk-free rate becomes the annual number 0.0, since the fixture's rate file has no row for
     * a first date that only the prices hold.
     */
    StudyFixture prices(String assets, String market) {
        return write("assets.csv", assets).write("market.csv", market)
                .edit("study.yaml", "values: returns", "values: prices")
                .edit("study.yaml", "  riskfree: riskfree.csv", "  riskfree: 0.0");
    }

    /** Replaces the first occurrence of {@code from} in file {@code name}. */
    StudyFixture edit(String name, String from, String to) {
        try {
            String text = Files.readString(dir.resolve(name));
            if (!text.contains(from)) {
                throw new IllegalArgumentException(name + " does not contain '" + from + "'");
            }
            return write(name, text.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    Study study() {
        return StudyReader.read(dir.resolve("study.yaml"));
    }

    StudyData load() {
        return StudyData.load(study());
    }
}
