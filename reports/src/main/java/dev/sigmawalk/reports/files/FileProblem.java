package dev.sigmawalk.reports.files;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;

/**
 * What went wrong with a file-system call, in words for a message line: the operating system's
 * own reason when it gave one ("Operation not permitted", "No space left on device"), else the
 * kind of failure, with the path it concerned; never the name of a Java exception class.
 */
final class FileProblem {
    private FileProblem() {
    }

    static String describe(IOException e) {
        if (e instanceof FileSystemException f) {
            String where = f.getFile() == null ? "" : " (" + f.getFile() + ")";
            if (f.getReason() != null && !f.getReason().isBlank()) {
                return f.getReason() + where;
            }
            return kind(f) + where;
        }
        return e.getMessage() == null ? "an input/output error" : e.getMessage();
    }

    private static String kind(FileSystemException f) {
        if (f instanceof NoSuchFileException) {
            return "no such file or folder, or the file system does not allow one here";
        }
        if (f instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (f instanceof FileAlreadyExistsException) {
            return "something of that name already exists";
        }
        if (f instanceof NotDirectoryException) {
            return "not a folder";
        }
        if (f instanceof DirectoryNotEmptyException) {
            return "the folder is not empty";
        }
        return "the file system refused the operation";
    }
}
