package dev.sigmawalk.reports.files;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * Keeps a run's outputs away from its inputs. An input whose name is one the run writes (an
 * exported {@code returns.csv}, a {@code report.html}, anything in a {@code charts/} folder)
 * marks its folder as out of bounds: the output folder may not be that folder, contain it, or lie
 * inside it, with or without {@code --force}. Paths are compared after resolving symbolic links,
 * so a link cannot smuggle the output onto an input.
 */
final class InputOverlap {
    private InputOverlap() {
    }

    /**
     * @param target the output folder (absolute, normalised; it need not exist)
     * @param inputs every file the run reads
     * @throws InputException naming the input and the rule when the target overlaps one
     */
    static void check(Path target, List<Path> inputs) {
        Path real = realOrLexical(target);
        for (Path input : inputs) {
            Path file = realOrLexical(input.toAbsolutePath().normalize());
            Path folder = file.getParent();
            if (folder == null || !writtenName(file)) {
                continue;
            }
            Optional<String> how = relation(real, folder);
            if (how.isPresent()) {
                throw new InputException("output folder " + target + " " + how.get() + " the folder " + folder
                        + " that holds the input file '" + file.getFileName() + "', a name sigmawalk writes;"
                        + " inputs are never overwritten, with or without --force: choose an output folder outside "
                        + folder);
            }
        }
    }

    private static boolean writtenName(Path file) {
        Path parent = file.getParent();
        return OutputNames.isOutputFile(file.getFileName().toString())
                || (parent != null && parent.getFileName() != null
                        && OutputNames.isOutputFolder(parent.getFileName().toString()));
    }

    private static Optional<String> relation(Path target, Path folder) {
        if (target.equals(folder)) {
            return Optional.of("is");
        }
        if (folder.startsWith(target)) {
            return Optional.of("contains");
        }
        if (target.startsWith(folder)) {
            return Optional.of("is inside");
        }
        return Optional.empty();
    }

    /** The real path of the longest existing prefix, with the rest appended (the target may not exist yet). */
    static Path realOrLexical(Path path) {
        Path existing = path;
        Path rest = null;
        while (existing != null && !Files.exists(existing)) {
            Path name = existing.getFileName();
            rest = rest == null ? name : name.resolve(rest);
            existing = existing.getParent();
        }
        if (existing == null) {
            return path;
        }
        try {
            Path real = existing.toRealPath();
            return rest == null ? real : real.resolve(rest);
        } catch (IOException e) {
            return path;
        }
    }
}
