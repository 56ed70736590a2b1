package dev.sigmawalk.reports.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file-system failure is told in words with its path, never as a Java class name. */
class FileProblemTest {
    @TempDir
    Path dir;

    @Test
    void theSystemsOwnReason_comesFirst() {
        assertEquals("Operation not permitted (/sys/x)",
                FileProblem.describe(new FileSystemException("/sys/x", null, "Operation not permitted")));
    }

    @Test
    void withoutAReason_theKindIsSaid() {
        assertEquals("no such file or folder, or the file system does not allow one here (/proc/.x)",
                FileProblem.describe(new NoSuchFileException("/proc/.x")));
        assertEquals("permission denied (/data)", FileProblem.describe(new AccessDeniedException("/data")));
        assertEquals("the file system refused the operation (/a)", FileProblem.describe(new FileSystemException("/a")));
        assertEquals("an input/output error", FileProblem.describe(new IOException()));
    }

    /** A real failure: a folder under a regular file cannot be created. */
    @Test
    void aRealFailure_namesNoClass() throws IOException {
        Path file = Files.writeString(dir.resolve("plain.txt"), "x");
        IOException e = org.junit.jupiter.api.Assertions.assertThrows(IOException.class,
                () -> Files.createDirectory(file.resolve("sub")));
        String said = FileProblem.describe(e);
        assertFalse(said.contains("Exception"), said);
        assertFalse(said.contains("java."), said);
    }
}
