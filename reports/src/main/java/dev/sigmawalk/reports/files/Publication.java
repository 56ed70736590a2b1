package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * Moves a complete staging folder into an existing output folder as one transaction. First every
 * file the new outputs replace, and every file an earlier sigmawalk run wrote that this run does
 * not (listed in the old marker), is renamed into a backup folder; then every new file is renamed
 * into place, the marker last. Each rename is journalled; when any step fails, the journal is
 * undone in reverse, so the folder is as it was. Files sigmawalk never wrote are never touched:
 * when one sits where a new file goes, nothing is moved and the run is refused ({@link ForeignFiles}).
 */
final class Publication {
    private final FileOps ops;
    private final Path staging;
    private final Path target;
    private final Path backup;
    private final List<Path> inputs;
    private final Deque<Step> journal = new ArrayDeque<>();

    /** One done step and how to undo it. */
    private record Step(Path from, Path to, boolean createdFolder) {
    }

    Publication(FileOps ops, Path staging, Path target, Path backup, List<Path> inputs) {
        this.ops = ops;
        this.staging = staging;
        this.target = target;
        this.backup = backup;
        this.inputs = List.copyOf(inputs);
    }

    /** The staged files, relative, in a fixed order with the marker last. */
    static List<String> files(Path root) throws IOException {
        List<String> out = new ArrayList<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : (Iterable<Path>) s.sorted()::iterator) {
                String rel = root.relativize(p).toString().replace('\\', '/');
                if (Files.isRegularFile(p) && !rel.equals(OutputFolder.MARKER)) {
                    out.add(rel);
                }
            }
        }
        return out;
    }

    /** The files an earlier run listed in the target's marker; none when there is no marker. */
    static Set<String> previous(Path target) throws IOException {
        Path marker = target.resolve(OutputFolder.MARKER);
        Set<String> out = new TreeSet<>();
        if (Files.isRegularFile(marker)) {
            for (String line : Files.readAllLines(marker, StandardCharsets.UTF_8)) {
                String rel = line.strip();
                if (!rel.isEmpty() && !rel.startsWith("/") && !rel.contains("..")) {
                    out.add(rel);
                }
            }
            out.add(OutputFolder.MARKER);
        }
        return out;
    }

    /** Runs the transaction; on failure the target is restored and the error says so. */
    void run() {
        List<String> fresh;
        Set<String> leaving;
        try {
            fresh = new ArrayList<>(files(staging));
            fresh.add(OutputFolder.MARKER);
            Set<String> previous = previous(target);
            List<String> foreign = ForeignFiles.among(target, fresh, previous);
            if (!foreign.isEmpty()) {
                throw ForeignFiles.refusal(target, foreign);
            }
            leaving = new TreeSet<>(previous);
            for (String f : fresh) {
                if (Files.exists(target.resolve(f), java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                    leaving.add(f);
                }
            }
            leaving.removeIf(f -> !Files.isRegularFile(target.resolve(f), java.nio.file.LinkOption.NOFOLLOW_LINKS));
            refuseInputs(leaving);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the output folder " + target + " before replacing its files", e);
        }
        try {
            createFolder(backup);
            for (String f : leaving) {
                move(target.resolve(f), backup.resolve(f), backup);
            }
            for (String f : fresh) {
                move(staging.resolve(f), target.resolve(f), target);
            }
        } catch (IOException e) {
            List<String> stuck = undo();
            String where = stuck.isEmpty() ? "the folder was left as it was"
                    : "restoring it failed too (" + String.join("; ", stuck) + "); the previous files are in " + backup;
            throw new UncheckedIOException("cannot move the outputs into " + target + ": " + e.getMessage() + "; "
                    + where, e);
        }
        cleanUp(leaving);
    }

    /** Final guard: a file about to be replaced or removed must not be one the run reads. */
    private void refuseInputs(Set<String> leaving) throws IOException {
        for (String f : leaving) {
            Path p = target.resolve(f);
            for (Path in : inputs) {
                if (Files.exists(in) && Files.isSameFile(p, in)) {
                    throw new InputException("output folder " + target + " holds the input file " + in
                            + " under a name sigmawalk writes; inputs are never overwritten: choose another --out");
                }
            }
        }
    }

    private void move(Path from, Path to, Path root) throws IOException {
        ensureFolders(to.getParent(), root);
        ops.rename(from, to);
        journal.push(new Step(from, to, false));
    }

    private void ensureFolders(Path dir, Path root) throws IOException {
        if (dir == null || Files.isDirectory(dir) || !dir.startsWith(root)) {
            return;
        }
        ensureFolders(dir.getParent(), root);
        createFolder(dir);
    }

    private void createFolder(Path dir) throws IOException {
        ops.createDirectory(dir);
        journal.push(new Step(null, dir, true));
    }

    /** Undoes the journal in reverse; returns what could not be undone. */
    private List<String> undo() {
        List<String> stuck = new ArrayList<>();
        while (!journal.isEmpty()) {
            Step s = journal.pop();
            try {
                if (s.createdFolder()) {
                    ops.delete(s.to());
                } else {
                    ops.rename(s.to(), s.from());
                }
            } catch (IOException e) {
                stuck.add((s.createdFolder() ? "removing " + s.to() : "moving " + s.to() + " back") + ": " + e);
            }
        }
        return stuck;
    }

    /**
     * After success: the backup and the emptied staging folder go, and so do folders of the
     * target that only held files of the earlier run. A failure here loses nothing (the next
     * run removes what is left), so it is not an error of this run.
     */
    private void cleanUp(Set<String> leaving) {
        try {
            WorkFolders.deleteTree(backup);
            WorkFolders.deleteTree(staging);
            for (String f : leaving) {
                for (Path dir = target.resolve(f).getParent(); dir != null && !dir.equals(target)
                        && dir.startsWith(target); dir = dir.getParent()) {
                    if (!isEmptyFolder(dir)) {
                        break;
                    }
                    ops.delete(dir);
                }
            }
        } catch (IOException e) {
            // Left-overs are hidden work folders or empty folders; the next run sweeps the former.
        }
    }

    private static boolean isEmptyFolder(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return false;
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        }
    }
}
