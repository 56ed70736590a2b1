package dev.sigmawalk.engine.data;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Opens a file the user named, turning every way that can fail (missing, a folder, no read
 * permission, an I/O error) into an {@link InputException} that names the file and the cause.
 */
public final class InputFile {
    private InputFile() {
    }

    /**
     * Checks that {@code file} is a regular file this process may read.
     *
     * @param what what the file is for messages, such as "data file" or "study file"
     * @throws InputException naming the file and what is wrong with it
     */
    public static void requireReadable(Path file, String what) {
        if (Files.isDirectory(file)) {
            throw new InputException(new InputException.Location(file, 0, null),
                    "is a folder (" + file.toAbsolutePath() + "); expected a " + what);
        }
        if (!Files.exists(file)) {
            throw new InputException(new InputException.Location(file, 0, null),
                    what + " not found (looked for " + file.toAbsolutePath() + ")");
        }
        if (!Files.isRegularFile(file)) {
            throw new InputException(new InputException.Location(file, 0, null),
                    "is not a regular file (" + file.toAbsolutePath() + "); expected a " + what);
        }
        if (!Files.isReadable(file)) {
            throw new InputException(new InputException.Location(file, 0, null),
                    "cannot be read: permission denied; expected a " + what + " this user may read");
        }
    }

    /** Opens {@code file} for reading after {@link #requireReadable}. */
    static FileChannel open(Path file, String what) {
        requireReadable(file, what);
        try {
            return FileChannel.open(file, StandardOpenOption.READ);
        } catch (IOException e) {
            throw unreadable(file, e);
        }
    }

    /** An I/O failure while reading {@code file}, as an input error naming it. */
    public static InputException unreadable(Path file, IOException e) {
        String cause = e instanceof AccessDeniedException ? "permission denied"
                : e instanceof NoSuchFileException ? "the file disappeared while it was read"
                : e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return new InputException(new InputException.Location(file, 0, null), "cannot be read (" + cause + ")");
    }
}
