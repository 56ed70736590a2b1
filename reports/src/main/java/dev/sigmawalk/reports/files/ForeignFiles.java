package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;

/**
 * Files in an output folder that sigmawalk did not write (not listed in the folder's
 * {@link OutputFolder#MARKER}; every file, when there is no marker) but that sit where a run
 * writes. Such a file is the user's, and no run replaces it, with or without {@code --force}: the
 * run is refused instead, naming the files, so that nothing the user put there is lost.
 */
final class ForeignFiles {
    /** How many names a refusal lists before it counts the rest. */
    private static final int LISTED = 5;

    private ForeignFiles() {
    }

    /**
     * The entries of {@code dir} at the top-level names a run writes (and a {@code charts} entry
     * that is not a folder) that no earlier run listed, in name order. Chart files are checked at
     * publication, when their names are known ({@link #among}).
     */
    static List<String> atOutputNames(Path dir) {
        Set<String> previous = previous(dir);
        List<String> out = new ArrayList<>();
        for (String name : OutputNames.files()) {
            if (!name.equals(OutputFolder.MARKER) && !previous.contains(name) && present(dir.resolve(name))) {
                out.add(name);
            }
        }
        for (String folder : OutputNames.folders()) {
            Path p = dir.resolve(folder);
            if (present(p) && !Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                out.add(folder);
            }
        }
        out.sort(null);
        return out;
    }

    /**
     * The names among {@code fresh} (relative paths the run is about to publish) that already
     * exist in {@code dir} and that no earlier run listed, in the order given.
     */
    static List<String> among(Path dir, Collection<String> fresh, Set<String> previous) {
        List<String> out = new ArrayList<>();
        for (String f : fresh) {
            if (!f.equals(OutputFolder.MARKER) && !previous.contains(f) && present(dir.resolve(f))) {
                out.add(f);
            }
        }
        return out;
    }

    /** The refusal for {@code foreign} in {@code dir} (exit 2). */
    static InputException refusal(Path dir, List<String> foreign) {
        List<String> shown = foreign.subList(0, Math.min(LISTED, foreign.size()));
        String names = String.join(", ", shown)
                + (foreign.size() > LISTED ? " and " + (foreign.size() - LISTED) + " more" : "");
        return new InputException("output folder " + dir + " holds " + (foreign.size() == 1 ? "a file" : "files")
                + " sigmawalk did not write under " + (foreign.size() == 1 ? "a name" : "names") + " a run writes ("
                + names + "); sigmawalk never replaces a file it did not write, with or without --force: move "
                + (foreign.size() == 1 ? "it" : "them") + " elsewhere or choose another --out");
    }

    private static Set<String> previous(Path dir) {
        try {
            return Publication.previous(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the list of files sigmawalk wrote in " + dir, e);
        }
    }

    private static boolean present(Path p) {
        return Files.exists(p, LinkOption.NOFOLLOW_LINKS);
    }
}
