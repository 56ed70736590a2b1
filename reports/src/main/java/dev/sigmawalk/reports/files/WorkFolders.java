package dev.sigmawalk.reports.files;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ThreadLocalRandom;

/**
 * The hidden folders a run keeps beside its output folder {@code out}: the staging folder
 * {@code .out.sigmawalk-staging-PID-START-TAG} it writes into, and the backup folder
 * {@code .out.sigmawalk-backup-PID-START-TAG} that holds the replaced files while they are
 * swapped. PID and START (the process's start time in epoch milliseconds) name the process, so a
 * later run can tell a folder left by a killed run (its process is gone) from one of a run still
 * going, and remove the first kind only; TAG (random) keeps two runs of one process apart.
 */
final class WorkFolders {
    static final String STAGING = ".sigmawalk-staging-";
    static final String BACKUP = ".sigmawalk-backup-";

    private WorkFolders() {
    }

    /** A suffix for one run of this process: PID-START-TAG. */
    static String newSuffix() {
        ProcessHandle self = ProcessHandle.current();
        long start = self.info().startInstant().map(Instant::toEpochMilli).orElse(0L);
        return self.pid() + "-" + start + "-" + Integer.toHexString(ThreadLocalRandom.current().nextInt());
    }

    static Path staging(Path target, String suffix) {
        return target.resolveSibling("." + target.getFileName() + STAGING + suffix);
    }

    static Path backup(Path target, String suffix) {
        return target.resolveSibling("." + target.getFileName() + BACKUP + suffix);
    }

    /**
     * Removes the work folders of {@code target} whose run is no longer alive.
     *
     * @return the folders removed
     */
    static List<Path> removeAbandoned(Path target) {
        Path parent = target.getParent();
        List<Path> removed = new ArrayList<>();
        if (parent == null || !Files.isDirectory(parent)) {
            return removed;
        }
        String base = "." + target.getFileName();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(parent, base + ".sigmawalk-*")) {
            for (Path p : entries) {
                String name = p.getFileName().toString();
                Optional<String> suffix = suffix(name, base + STAGING).or(() -> suffix(name, base + BACKUP));
                if (suffix.isPresent() && Files.isDirectory(p) && !alive(suffix.get())) {
                    deleteTree(p);
                    removed.add(p);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove the folders a stopped run left beside " + target, e);
        }
        return removed;
    }

    private static Optional<String> suffix(String name, String prefix) {
        return name.startsWith(prefix) ? Optional.of(name.substring(prefix.length())) : Optional.empty();
    }

    /** Whether the run PID-START-TAG may still run: a process of that id, started at that instant. */
    static boolean alive(String suffix) {
        String[] parts = suffix.split("-", -1);
        if (parts.length != 3) {
            return false;
        }
        try {
            long pid = Long.parseLong(parts[0]);
            long start = Long.parseLong(parts[1]);
            return ProcessHandle.of(pid).filter(ProcessHandle::isAlive)
                    .map(h -> h.info().startInstant().map(Instant::toEpochMilli).orElse(start) == start)
                    .orElse(false);
        } catch (NumberFormatException e) {
            return false;
        }
    }

    /** Deletes a folder and everything in it, without following links out of it. */
    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                if (exc != null) {
                    throw exc;
                }
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
