package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.sample.SampleUniverse;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The walk's CSV files are written by several tasks beside the PDF; one that cannot write its file
 * fails the whole run with its own error, whatever the thread count, and the run writes no
 * manifest (so the staging folder is never published).
 */
class FileTaskFailureTest {
    @TempDir
    static Path data;
    static Study study;
    static StudyData loaded;

    @BeforeAll
    static void readStudy() throws IOException {
        SampleUniverse.extractTo(data);
        Path file = data.resolve("small.yaml");
        Files.writeString(file, String.join("\n",
                "title: Small invented study",
                "data:",
                "  assets: assets-monthly.csv",
                "  values: returns",
                "  market: market-monthly.csv",
                "  riskfree: riskfree-monthly.csv",
                "walkforward:",
                "  windows: [24]",
                "  rebalance_every: 6",
                "  start: 2016-01-01",
                "  end: 2019-12-31",
                "strategies:",
                "  - name: index-model",
                "    risk: single-index",
                "    objective: min-variance",
                "    bounds: [0, 0.10]",
                "evidence:",
                "  resamples: 100",
                ""), StandardCharsets.UTF_8);
        study = StudyReader.read(file);
        loaded = StudyData.load(study);
    }

    @ParameterizedTest(name = "{0} at {1} threads")
    @CsvSource({"estimates.csv, 1", "estimates.csv, 2", "weights.csv, 2", "returns.csv, 2", "diagnostics.csv, 2",
        "sector_correlations.csv, 3"})
    void aFileThatCannotBeWritten_failsTheRun_withItsName(String blocked, int threads, @TempDir Path dir)
            throws IOException {
        Files.createDirectory(dir.resolve(blocked));
        UncheckedIOException e = assertThrows(UncheckedIOException.class, () -> StudyRun.writeInto(dir, study, loaded,
                threads, ProgressListener.NONE, w -> { }, Instant.now(), System.nanoTime()));
        assertTrue(e.getMessage().contains(blocked), e.getMessage());
        assertFalse(Files.exists(dir.resolve("manifest.json")), "no manifest after a failed file");
    }
}
