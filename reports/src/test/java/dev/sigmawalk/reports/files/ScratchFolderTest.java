package dev.sigmawalk.reports.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A scratch folder removes those of processes that are gone, and nothing else. */
class ScratchFolderTest {
    @TempDir
    Path dir;

    @Test
    void newFolder_removesThoseOfEndedProcesses_andKeepsTheRest() throws IOException, InterruptedException {
        Process ended = new ProcessBuilder(ProcessHandle.current().info().command().orElse("java"), "-version")
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        assertTrue(ended.waitFor(60, TimeUnit.SECONDS), "the short process ended");
        Path killed = Files.createDirectories(dir.resolve("s-" + ended.pid() + "-1700000000000-ab/data"));
        Files.writeString(killed.resolve("assets.csv"), "date,A\n");
        String self = WorkFolders.newSuffix();
        Path running = Files.createDirectory(dir.resolve("s-" + self.substring(0, self.lastIndexOf('-')) + "-cd"));
        Path otherForm = Files.createDirectory(dir.resolve("s-12345"));
        Path mine = Files.createDirectory(dir.resolve("notes"));

        Path made = ScratchFolder.create(dir, "s-");

        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of(mine, otherForm, made, running).stream().map(Path::getFileName).map(Path::toString)
                    .sorted().toList(), s.map(p -> p.getFileName().toString()).sorted().toList(),
                    "the ended process's folder is gone; a running one's, another name form and the user's stay");
        }
        assertTrue(made.getFileName().toString().startsWith("s-" + ProcessHandle.current().pid() + "-"), made.toString());
        try (Stream<Path> s = Files.list(made)) {
            assertTrue(s.findAny().isEmpty(), "new and empty");
        }
    }
}
