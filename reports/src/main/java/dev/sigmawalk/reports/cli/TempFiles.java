package dev.sigmawalk.reports.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/** Removes a temporary folder the tool created itself. */
final class TempFiles {
    private TempFiles() {
    }

    static void deleteQuietly(Path root) {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            // A leftover temporary folder is harmless; the run's own outputs are unaffected.
            System.err.println("sigmawalk: could not remove temporary folder " + root + ": " + e.getMessage());
        }
    }
}
