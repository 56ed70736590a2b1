package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Where a run's outputs go, and the rules that keep a user's files safe.
 *
 * <p>Before any computation, {@link #prepare} refuses (as an {@link InputException}, exit 2) an
 * output folder that overlaps an input with a name the run writes ({@link InputOverlap}, with or
 * without {@code --force}), a path that is a file or lies under one, a dangling symbolic link, a
 * folder that cannot be written, a non-empty folder that sigmawalk did not write (no
 * {@value #MARKER} file) unless forced, and, forced or not, a folder holding a file sigmawalk did
 * not write (not listed in the marker) under a name a run writes ({@link ForeignFiles}). It removes work folders that killed runs left beside the
 * target, and creates this run's staging folder there.
 *
 * <p>Everything is written into the staging folder; {@link #commit} publishes it whole: one
 * atomic rename when the target does not exist, else a journalled {@link Publication} that
 * restores the old folder if any rename fails. Files an earlier sigmawalk run wrote and this run
 * did not are removed; files sigmawalk did not write are never touched, and the publication
 * refuses to replace one (a chart name that only the finished run knows). A shutdown hook removes
 * the staging folder when the process is stopped (SIGTERM, Ctrl-C) before the outputs are
 * published; it waits for a publication under way to finish first.
 */
public final class OutputFolder implements AutoCloseable {
    /** Marks a folder as written by sigmawalk; lists the files it wrote. */
    public static final String MARKER = ".sigmawalk-output";

    private final Path target;
    private final Path staging;
    private final Path backup;
    private final List<Path> inputs;
    private final FileOps ops;
    private final Object lock = new Object();
    private final Thread hook;
    private boolean committed;

    private OutputFolder(Path target, String suffix, List<Path> inputs, FileOps ops) {
        this.target = target;
        this.staging = WorkFolders.staging(target, suffix);
        this.backup = WorkFolders.backup(target, suffix);
        this.inputs = List.copyOf(inputs);
        this.ops = ops;
        this.hook = new Thread(this::discard, "sigmawalk-staging-cleanup");
    }

    /** {@link #prepare(Path, boolean, List, FileOps)} on the real file system. */
    public static OutputFolder prepare(Path target, boolean force, List<Path> inputs) {
        return prepare(target, force, inputs, FileOps.SYSTEM);
    }

    /**
     * Checks the target and creates the staging folder.
     *
     * @param target the output folder
     * @param force write into a non-empty folder sigmawalk did not write (never replacing a file it did not write)
     * @param inputs every file the run reads (study file, data files); none may be overwritten
     * @param ops the file-system operations used to publish
     * @throws InputException when the target is refused; the message names the path and the rule
     */
    public static OutputFolder prepare(Path target, boolean force, List<Path> inputs, FileOps ops) {
        Path abs = target.toAbsolutePath().normalize();
        Path resolved = requireAllowed(abs, force, inputs);
        if (!Files.isDirectory(resolved)) {
            createParents(abs);
        }
        WorkFolders.removeAbandoned(resolved);
        OutputFolder folder = new OutputFolder(resolved, WorkFolders.newSuffix(), inputs, ops);
        folder.createStaging();
        return folder;
    }

    /**
     * Why {@link #prepare} without {@code --force} would refuse {@code target}, found without
     * writing anything (for {@code sigmawalk check}); empty when a run could write there.
     */
    public static Optional<String> problem(Path target, List<Path> inputs) {
        try {
            requireAllowed(target.toAbsolutePath().normalize(), false, inputs);
            return Optional.empty();
        } catch (InputException e) {
            return Optional.of(e.getMessage());
        }
    }

    /** Every rule on the target that needs no writing; returns the target with links resolved. */
    private static Path requireAllowed(Path abs, boolean force, List<Path> inputs) {
        if (Files.isSymbolicLink(abs) && !Files.exists(abs)) {
            throw new InputException("output folder " + abs + " is a symbolic link to " + linkTarget(abs)
                    + ", which does not exist; create that folder or choose another --out");
        }
        Path resolved = Files.exists(abs) ? real(abs) : abs;
        InputOverlap.check(resolved, inputs);
        if (Files.exists(resolved) && !Files.isDirectory(resolved)) {
            throw new InputException("output " + abs + " is a file, not a folder; choose another --out");
        }
        if (Files.isDirectory(resolved)) {
            requireUsable(resolved, force);
        } else {
            requireCreatable(abs);
        }
        return resolved;
    }

    private static void requireUsable(Path dir, boolean force) {
        if (!force && !isEmpty(dir) && !Files.exists(dir.resolve(MARKER))) {
            throw new InputException("output folder " + dir + " is not empty and was not written by sigmawalk;"
                    + " choose another --out, or add --force to write into it (beside its files: a file"
                    + " sigmawalk did not write is never replaced)");
        }
        List<String> foreign = ForeignFiles.atOutputNames(dir);
        if (!foreign.isEmpty()) {
            throw ForeignFiles.refusal(dir, foreign);
        }
        if (!Files.isWritable(dir)) {
            throw new InputException("output folder " + dir + " is not writable; choose another --out or change"
                    + " its permissions");
        }
    }

    /** Names a file or a read-only folder in the way of the missing folders above the target. */
    private static void requireCreatable(Path abs) {
        Path existing = abs.getParent();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing != null && !Files.isDirectory(existing)) {
            throw new InputException("output folder " + abs + " cannot be created: " + existing
                    + " is a file, not a folder; choose another --out");
        }
        if (existing != null && !Files.isWritable(existing)) {
            throw new InputException("output folder " + abs + " cannot be created: folder " + existing
                    + " is not writable; choose another --out");
        }
    }

    /** Creates the missing folders above the target (checked by {@link #requireCreatable}). */
    private static void createParents(Path abs) {
        try {
            Files.createDirectories(abs.getParent());
        } catch (IOException e) {
            throw new InputException("output folder " + abs + " cannot be created: " + FileProblem.describe(e)
                    + "; choose another --out");
        }
    }

    private void createStaging() {
        try {
            Files.createDirectory(staging);
        } catch (AccessDeniedException e) {
            throw new InputException("output folder " + target + ": cannot write in " + staging.getParent()
                    + " (permission denied); choose another --out");
        } catch (IOException e) {
            throw new InputException("output folder " + target + ": cannot create its staging folder beside it in "
                    + staging.getParent() + ": " + FileProblem.describe(e) + "; choose another --out");
        }
        try {
            Runtime.getRuntime().addShutdownHook(hook);
        } catch (IllegalStateException e) {
            // Already shutting down: close() removes the staging folder.
        }
    }

    private static Path real(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            throw new InputException("output folder " + p + " cannot be resolved: " + FileProblem.describe(e));
        }
    }

    private static String linkTarget(Path link) {
        try {
            return String.valueOf(Files.readSymbolicLink(link));
        } catch (IOException e) {
            return "an unreadable target";
        }
    }

    private static boolean isEmpty(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        } catch (IOException e) {
            throw new InputException("output folder " + dir + " cannot be listed: " + FileProblem.describe(e));
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

    /** Publishes the staged outputs: the old folder is replaced whole, or left as it was. */
    public void commit() {
        synchronized (lock) {
            try {
                List<String> written = Publication.files(staging);
                Files.write(staging.resolve(MARKER), written, StandardCharsets.UTF_8);
                if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                    ops.rename(staging, target);
                } else {
                    new Publication(ops, staging, target, backup, inputs).run();
                }
                committed = true;
            } catch (IOException e) {
                throw new UncheckedIOException("cannot move the outputs into " + target + ": " + e.getMessage()
                        + "; nothing was changed there", e);
            }
        }
    }

    /** Removes the staging folder unless the outputs were published (also on SIGTERM, through the hook). */
    private void discard() {
        synchronized (lock) {
            if (!committed) {
                try {
                    WorkFolders.deleteTree(staging);
                } catch (IOException e) {
                    // The next run into this folder removes it (its process is gone by then).
                }
            }
        }
    }

    @Override
    public void close() {
        discard();
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException e) {
            // The process is shutting down; the hook runs discard() itself.
        }
    }
}
