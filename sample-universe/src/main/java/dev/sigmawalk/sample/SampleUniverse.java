package dev.sigmawalk.sample;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The committed demo files of the invented Brennmark market, packaged in this module's jar under
 * {@code dev/sigmawalk/sample/data/}, and a way to copy them to disk so a study can read them.
 * The data are invented for the demo; see the module's README for how they were generated.
 */
public final class SampleUniverse {
    /** Study file of the month-end demo. */
    public static final String MONTHLY_STUDY = UniverseFiles.MONTHLY_STUDY;
    /** Study file of the daily demo. */
    public static final String DAILY_STUDY = UniverseFiles.DAILY_STUDY;
    private static final String RESOURCE_FOLDER = "data/";

    private SampleUniverse() {
    }

    /** Names of every packaged file: the generated data files, then the study files. */
    public static List<String> fileNames() {
        List<String> names = new ArrayList<>(UniverseFiles.DATA);
        names.addAll(UniverseFiles.STUDIES);
        return List.copyOf(names);
    }

    /**
     * Copies every packaged file into {@code dir} (created if missing; files of the same names are
     * replaced) and returns the path of the month-end study file there.
     *
     * @throws UncheckedIOException when a file cannot be written
     * @throws IllegalStateException when the demo files are missing from the class path
     */
    public static Path extractTo(Path dir) {
        return extractTo(dir, MONTHLY_STUDY);
    }

    /**
     * Copies every packaged file into {@code dir}, as {@link #extractTo(Path)}, and returns the
     * path there of the study file named {@code studyFileName}.
     *
     * @param studyFileName {@value #MONTHLY_STUDY} or {@value #DAILY_STUDY}
     * @throws IllegalArgumentException when {@code studyFileName} is not one of those
     */
    public static Path extractTo(Path dir, String studyFileName) {
        Objects.requireNonNull(dir, "dir");
        if (!UniverseFiles.STUDIES.contains(studyFileName)) {
            throw new IllegalArgumentException("study file '" + studyFileName + "' is not a demo study; expected one of "
                    + UniverseFiles.STUDIES);
        }
        try {
            Files.createDirectories(dir);
            for (String name : fileNames()) {
                copy(name, dir.resolve(name));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the demo files to " + dir, e);
        }
        return dir.resolve(studyFileName);
    }

    private static void copy(String name, Path target) throws IOException {
        try (InputStream in = SampleUniverse.class.getResourceAsStream(RESOURCE_FOLDER + name)) {
            if (in == null) {
                throw new IllegalStateException("demo file '" + name + "' is missing from the class path (expected "
                        + "dev/sigmawalk/sample/" + RESOURCE_FOLDER + name + ")");
            }
            Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
