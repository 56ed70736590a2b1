package dev.sigmawalk.reports.api;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.study.StudyReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A study to run in memory, for a researcher in JShell or a Java notebook: read it from a study
 * file, or build it in code with the same keys, then {@link #run()} it and slice the results as
 * Tablesaw tables. Nothing is written to disk.
 *
 * <pre>{@code
 * Study study = Study.fromYaml(Path.of("study.yaml"));
 * Results results = study.run();
 * Table summary = results.summary();
 * }</pre>
 *
 * <p>A study built in code is checked by the same reader as a study file, so every key, default
 * and error message is the same as in the README's "A study file".
 */
public final class Study {
    private final dev.sigmawalk.engine.study.Study spec;

    private Study(dev.sigmawalk.engine.study.Study spec) {
        this.spec = Objects.requireNonNull(spec, "spec");
    }

    /**
     * Reads and validates a study file; paths in it are relative to the file.
     *
     * @throws dev.sigmawalk.engine.data.InputException naming the file, line, column and value when it is not valid
     */
    public static Study fromYaml(Path file) {
        return new Study(StudyReader.read(file));
    }

    /** Starts a study in code; paths given to it are taken as they are (relative to the working folder). */
    public static Builder builder() {
        return new Builder();
    }

    /** The study as read, with every default applied. */
    public dev.sigmawalk.engine.study.Study spec() {
        return spec;
    }

    /** Loads the data and runs the study on every core. */
    public Results run() {
        return run(Runtime.getRuntime().availableProcessors());
    }

    /**
     * Loads the data and runs the study; the results do not depend on the thread count.
     *
     * @param threads worker threads, >= 1
     */
    public Results run(int threads) {
        if (!(threads >= 1)) {
            throw new IllegalArgumentException("threads (" + threads + ") must be >= 1");
        }
        StudyData data = StudyData.load(spec);
        var run = Runs.walk(spec, data, threads, ProgressListener.NONE);
        return new Results(spec, run, Runs.summaries(run), Runs.comparisons(spec, run), data.warnings());
    }

    /**
     * Builds a study with the keys of a study file. Each section is a map of keys to values as
     * they would be written in YAML (numbers, strings, lists); a {@link Path} value is written as
     * its absolute path.
     */
    public static final class Builder {
        /** The name error messages give a study built in code (it is read from a short-lived file of that name). */
        public static final String FILE_NAME = "study-from-code.yaml";

        private String title = "study";
        private final Map<String, Object> data = new LinkedHashMap<>();
        private final Map<String, Object> walkForward = new LinkedHashMap<>();
        private final List<Map<String, Object>> strategies = new ArrayList<>();
        private final Map<String, Object> evidence = new LinkedHashMap<>();

        private Builder() {
        }

        /** {@code title:}. */
        public Builder title(String title) {
            this.title = Objects.requireNonNull(title, "title");
            return this;
        }

        /** One key of {@code data:}, for example {@code data("assets", Path.of("assets.csv"))}. */
        public Builder data(String key, Object value) {
            data.put(key, yaml(value));
            return this;
        }

        /** {@code walkforward.windows:}. */
        public Builder windows(int... windows) {
            walkForward.put("windows", Arrays.stream(windows).boxed().toList());
            return this;
        }

        /** One key of {@code walkforward:}, for example {@code walkForward("cost_bps", 10)}. */
        public Builder walkForward(String key, Object value) {
            walkForward.put(key, yaml(value));
            return this;
        }

        /**
         * One entry of {@code strategies:}.
         *
         * @param settings the strategy's keys other than {@code name}, for example
         *                 {@code Map.of("risk", "single-index", "objective", "min-variance")}
         */
        public Builder strategy(String name, Map<String, ?> settings) {
            Map<String, Object> s = new LinkedHashMap<>();
            s.put("name", Objects.requireNonNull(name, "name"));
            settings.forEach((k, v) -> s.put(k, yaml(v)));
            strategies.add(s);
            return this;
        }

        /** One key of {@code evidence:}, for example {@code evidence("resamples", 500)}. */
        public Builder evidence(String key, Object value) {
            evidence.put(key, yaml(value));
            return this;
        }

        /**
         * Validates the study exactly as a study file is validated.
         *
         * @throws dev.sigmawalk.engine.data.InputException when a key or value is not valid
         */
        public Study build() {
            Map<String, Object> root = new LinkedHashMap<>();
            root.put("title", title);
            root.put("data", data);
            root.put("walkforward", walkForward);
            root.put("strategies", strategies);
            if (!evidence.isEmpty()) {
                root.put("evidence", evidence);
            }
            Path folder = null;
            try {
                folder = Files.createTempDirectory("sigmawalk-study-");
                Path file = folder.resolve(FILE_NAME);
                new ObjectMapper(new YAMLFactory()).writeValue(file.toFile(), root);
                return new Study(StudyReader.read(file));
            } catch (IOException e) {
                throw new UncheckedIOException("cannot stage the study for reading", e);
            } finally {
                deleteQuietly(folder);
            }
        }

        private static Object yaml(Object value) {
            Objects.requireNonNull(value, "value");
            if (value instanceof Path p) {
                return p.toAbsolutePath().normalize().toString();
            }
            return value;
        }

        private static void deleteQuietly(Path folder) {
            if (folder == null) {
                return;
            }
            try {
                Files.deleteIfExists(folder.resolve(FILE_NAME));
                Files.deleteIfExists(folder);
            } catch (IOException e) {
                // A leftover empty temporary folder is harmless; the study was already read.
            }
        }
    }
}
