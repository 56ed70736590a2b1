package dev.sigmawalk.reports.files;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * The few file-system operations that publishing an output folder performs, behind an interface
 * so that tests can make any one of them fail and check that the old folder survives.
 */
public interface FileOps {
    /** Renames {@code from} to {@code to}, which must not exist; atomic on one file system. */
    void rename(Path from, Path to) throws IOException;

    /** Creates one folder (its parent must exist). */
    void createDirectory(Path dir) throws IOException;

    /** Deletes a file or an empty folder. */
    void delete(Path path) throws IOException;

    /** The real file system. */
    FileOps SYSTEM = new FileOps() {
        @Override
        public void rename(Path from, Path to) throws IOException {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        }

        @Override
        public void createDirectory(Path dir) throws IOException {
            Files.createDirectory(dir);
        }

        @Override
        public void delete(Path path) throws IOException {
            Files.delete(path);
        }
    };
}
