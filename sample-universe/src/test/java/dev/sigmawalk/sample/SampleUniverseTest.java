package dev.sigmawalk.sample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SampleUniverseTest {
    @TempDir
    Path tmp;

    @Test
    void extractTo_copiesEveryFileUnchanged_andReturnsTheMonthlyStudy() throws IOException {
        Path study = SampleUniverse.extractTo(tmp.resolve("demo"));
        assertEquals(tmp.resolve("demo").resolve("demo-monthly.yaml"), study);
        for (String name : SampleUniverse.fileNames()) {
            assertArrayEquals(Files.readAllBytes(ModuleFolder.file(name)), Files.readAllBytes(tmp.resolve("demo").resolve(name)),
                    name);
        }
    }

    @Test
    void extractTo_withDailyStudy_returnsIt_andReplacesOldFiles() throws IOException {
        Files.writeString(tmp.resolve("sectors.csv"), "stale");
        Path study = SampleUniverse.extractTo(tmp, SampleUniverse.DAILY_STUDY);
        assertEquals(tmp.resolve("demo-daily.yaml"), study);
        assertTrue(Files.exists(study), "daily study written");
        assertArrayEquals(Files.readAllBytes(ModuleFolder.file("sectors.csv")), Files.readAllBytes(tmp.resolve("sectors.csv")));
    }

    @Test
    void extractTo_refusesAnUnknownStudyName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SampleUniverse.extractTo(tmp, "other.yaml"));
        assertTrue(e.getMessage().contains("'other.yaml' is not a demo study"), e.getMessage());
    }

    /** The packaged list matches the folder, so a new committed file cannot be left out. */
    @Test
    void fileNames_listEveryTopLevelDataAndStudyFile() throws IOException {
        try (Stream<Path> files = Files.list(ModuleFolder.path())) {
            List<String> onDisk = files.map(p -> p.getFileName().toString())
                    .filter(n -> n.endsWith(".csv") || (n.startsWith("demo-") && n.endsWith(".yaml")))
                    .sorted().toList();
            assertEquals(onDisk, SampleUniverse.fileNames().stream().sorted().toList());
        }
    }
}
