package dev.sigmawalk.reports.files;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Takes back what an earlier run published in a folder that no run will write again (a grid
 * point the current sweep no longer has): the files its {@value OutputFolder#MARKER} lists, the
 * marker, then every folder left empty. Files sigmawalk did not write, and the given inputs,
 * stay where they are.
 */
public final class Retraction {
    private Retraction() {
    }

    /**
     * @param dir a folder an earlier run published; without a marker nothing is removed
     * @param inputs files that must stay even where the marker lists them
     * @return whether {@code dir} is gone (it held nothing but the earlier run's files)
     * @throws IOException when a file cannot be removed; what was removed before stays removed,
     *                     and nothing the user wrote has been touched
     */
    public static boolean retract(Path dir, List<Path> inputs) throws IOException {
        Set<String> listed = Publication.previous(dir);
        if (listed.isEmpty()) {
            return false;
        }
        for (String rel : listed) {
            Path p = dir.resolve(rel).normalize();
            if (p.startsWith(dir) && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS) && !isInput(p, inputs)) {
                Files.delete(p);
            }
        }
        List<Path> folders = new ArrayList<>();
        try (Stream<Path> s = Files.walk(dir)) {
            s.filter(p -> Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)).forEach(folders::add);
        }
        folders.sort(Comparator.comparingInt(Path::getNameCount).reversed());
        for (Path f : folders) {
            try (Stream<Path> s = Files.list(f)) {
                if (s.findAny().isEmpty()) {
                    Files.delete(f);
                }
            }
        }
        return !Files.exists(dir, LinkOption.NOFOLLOW_LINKS);
    }

    private static boolean isInput(Path p, List<Path> inputs) throws IOException {
        for (Path in : inputs) {
            if (Files.exists(in) && Files.isSameFile(p, in)) {
                return true;
            }
        }
        return false;
    }
}
