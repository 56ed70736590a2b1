package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * Where a run's outputs go. Everything is written into a fresh staging folder beside the target
 * and moved into place only when the whole run succeeded, so a failed run leaves nothing
 * half-written. A non-empty target that sigmawalk did not write (it carries no
 * {@value #MARKER} file) is refused unless forced; even then only files of the same names are
 * replaced, and nothing else in the folder is touched.
 */
public final class OutputFolder implements AutoCloseable {
    /** Marks a folder as written by sigmawalk; lists the files it wrote. */
    public static final String MARKER = ".sigmawalk-output";

    private final Path target;
    private final Path staging;
    private boolean committed;

    private OutputFolder(Path target, Path staging) {
        this.target = target;
        this.staging = staging;
    }

    /**
     * Checks the target and creates the staging folder.
     *
     * @throws InputException when the target is a file, or a non-empty folder sigmawalk did not
     *                        write and {@code force} is false
     */
    public static OutputFolder prepare(Path target, boolean force) {
        Path abs = target.toAbsolutePath().normalize();
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new InputException("output " + abs + " is a file, not a folder; choose another --out");
        }
        if (!force && Files.isDirectory(abs) && !isEmpty(abs) && !Files.exists(abs.resolve(MARKER))) {
            throw new InputException("output folder " + abs + " is not empty and was not written by sigmawalk;"
                    + " choose another --out, or add --force to write into it (files of the same names are replaced,"
                    + " nothing else is touched)");
        }
        try {
            Path parent = abs.getParent();
            Files.createDirectories(parent);
            return new OutputFolder(abs, createStaging(parent, "." + abs.getFileName() + ".partial-"));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a staging folder beside " + abs, e);
        }
    }

    /** A fresh sibling folder with the default permissions (not the owner-only ones of a temp folder). */
    private static Path createStaging(Path parent, String prefix) throws IOException {
        long salt = ProcessHandle.current().pid() * 1_000_003L + System.nanoTime();
        for (int attempt = 0; attempt < 100; attempt++) {
            Path candidate = parent.resolve(prefix + Long.toHexString(salt + attempt));
            try {
                return Files.createDirectory(candidate);
            } catch (java.nio.file.FileAlreadyExistsException e) {
                // another run picked the same name; try the next one
            }
        }
        throw new IOException("no free staging folder name under " + parent);
    }

    private static boolean isEmpty(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + dir, e);
        }
    }

    /** The staging folder to write into. */
    public Path staging() {
        return staging;
    }

    /** The final folder. */
    public Path target() {
        return target;
    }

    /** Moves every staged file into the target, replacing files of the same names. */
    public void commit() {
        try {
            List<String> written = new ArrayList<>();
            try (Stream<Path> s = Files.walk(staging)) {
                for (Path p : (Iterable<Path>) s.sorted()::iterator) {
                    if (Files.isRegularFile(p)) {
                        written.add(staging.relativize(p).toString().replace('\\', '/'));
                    }
                }
            }
            Files.write(staging.resolve(MARKER), written, StandardCharsets.UTF_8);
            if (!Files.exists(target)) {
                Files.move(staging, target, StandardCopyOption.ATOMIC_MOVE);
            } else {
                moveInto(staging, target);
                deleteTree(staging);
            }
            committed = true;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot move outputs into " + target, e);
        }
    }

    private static void moveInto(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : (Iterable<Path>) s.sorted()::iterator) {
                Path dest = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(dest);
                } else {
                    Files.move(p, dest, StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
    }

    /** Removes the staging folder unless the outputs were committed. */
    @Override
    public void close() {
        if (!committed && Files.exists(staging)) {
            try {
                deleteTree(staging);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot remove staging folder " + staging, e);
            }
        }
    }

    private static void deleteTree(Path root) throws IOException {
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
