package dev.sigmawalk.reports.files;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * A temporary folder named after the process that made it, {@code PREFIX-PID-START-TAG} (as the
 * work folders beside an output are, {@link WorkFolders}). A process killed outright cannot
 * remove its own, so each new one first removes those whose process is gone: a killed demo
 * does not leave its unpacked sample data in the temporary folder for good.
 */
public final class ScratchFolder {
    private ScratchFolder() {
    }

    /**
     * @param parent where to create it, such as the system's temporary folder
     * @param prefix the start of its name, such as {@code sigmawalk-sample-}
     * @return the new, empty folder, readable by this user alone where the file system allows it
     */
    public static Path create(Path parent, String prefix) throws IOException {
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(parent, prefix + "*")) {
            for (Path p : entries) {
                String suffix = p.getFileName().toString().substring(prefix.length());
                // Only names of this form are known to be ours; PID-START-TAG has exactly three parts.
                if (suffix.split("-", -1).length == 3 && Files.isDirectory(p) && !WorkFolders.alive(suffix)) {
                    WorkFolders.deleteTree(p);
                }
            }
        }
        Path dir = parent.resolve(prefix + WorkFolders.newSuffix());
        if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
            return Files.createDirectory(dir, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwx------")));
        }
        return Files.createDirectory(dir);
    }
}
