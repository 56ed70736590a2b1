package dev.sigmawalk.reports.api;

import dev.sigmawalk.engine.compare.Comparison;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.reports.sweep.SweepReader;
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
 * <p>A study built in code is checked by the same reader as a study file, straight from the values
 * given (no file is written), so every key, default and error message is the same as in the
 * README's "A study file"; messages name {@link Builder#SOURCE_NAME} and the key path instead of
 * a file, line and column.
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
     * @throws IllegalArgumentException when {@code file} is null
     */
    public static Study fromYaml(Path file) {
        if (file == null) {
            throw new IllegalArgumentException("the study file is null; expected the path of a study file");
        }
        SweepReader.requireStudy(file, "Study.fromYaml");
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
        List<String> warnings = new ArrayList<>(Runs.warningsBeforeWalk(spec, data));
        warnings.addAll(Runs.warningsOfResults(run));
        List<Comparison> comparisons = Runs.comparisons(spec, run, threads);
        warnings.addAll(Runs.warningsOfTests(comparisons));
        return new Results(spec, run, Runs.summaries(run), comparisons, warnings);
    }

    /**
     * Builds a study with the keys of a study file. Each section is a map of keys to values as
     * they would be written in YAML (numbers, text, booleans, lists, maps); a {@link Path} (or
     * {@link java.io.File}) value stands for its absolute path, a {@link java.time.LocalDate} for
     * its ISO text and an option of the study's types ({@code RiskKind.SINGLE_INDEX}) for its
     * spelling in a file ({@code single-index}). A null key or value is refused where it is given.
     */
    public static final class Builder {
        /**
         * What error messages call a study built in code, in place of a file name. Relative paths
         * resolve against the working folder, as if the study were a file of that name there.
         */
        public static final String SOURCE_NAME = "study built in code";

        private String title = "study";
        private final Map<String, Object> data = new LinkedHashMap<>();
        private final Map<String, Object> walkForward = new LinkedHashMap<>();
        private final List<Map<String, Object>> strategies = new ArrayList<>();
        private final Map<String, Object> evidence = new LinkedHashMap<>();
        private final Map<String, Object> report = new LinkedHashMap<>();

        private Builder() {
        }

        /** {@code title:}. */
        public Builder title(String title) {
            if (title == null) {
                throw new IllegalArgumentException("title is null; expected a text such as \"Index model against the"
                        + " sample covariance\"");
            }
            this.title = title;
            return this;
        }

        /** One key of {@code data:}, for example {@code data("assets", Path.of("assets.csv"))}. */
        public Builder data(String key, Object value) {
            data.put(named("data", key, "assets"), checked("data." + key, value));
            return this;
        }

        /** {@code walkforward.windows:}. */
        public Builder windows(int... windows) {
            Given.required(windows, "the list of windows", "window lengths such as windows(36, 60)");
            walkForward.put("windows", Arrays.stream(windows).boxed().toList());
            return this;
        }

        /** One key of {@code walkforward:}, for example {@code walkForward("cost_bps", 10)}. */
        public Builder walkForward(String key, Object value) {
            walkForward.put(named("walkforward", key, "cost_bps"), checked("walkforward." + key, value));
            return this;
        }

        /**
         * One entry of {@code strategies:}.
         *
         * @param settings the strategy's keys other than {@code name}, for example
         *                 {@code Map.of("risk", "single-index", "objective", "min-variance")}
         */
        public Builder strategy(String name, Map<String, ?> settings) {
            if (name == null) {
                throw new IllegalArgumentException("a strategy's name is null; expected a text such as \"index-model\"");
            }
            if (settings == null) {
                throw new IllegalArgumentException("strategy " + name + ": its settings are null; expected a map of its"
                        + " keys, such as Map.of(\"objective\", \"equal-weight\")");
            }
            Map<String, Object> s = new LinkedHashMap<>();
            s.put("name", name);
            settings.forEach((k, v) -> {
                String key = named("strategy " + name, k, "objective");
                if (key.equals("name") && !name.equals(v)) {
                    throw new IllegalArgumentException("strategy " + name + ": its settings name it " + v + " too;"
                            + " expected the name once, as strategy's first argument");
                }
                s.put(key, checked("strategy " + name + ": " + key, v));
            });
            strategies.add(s);
            return this;
        }

        /** One key of {@code evidence:}, for example {@code evidence("resamples", 500)}. */
        public Builder evidence(String key, Object value) {
            evidence.put(named("evidence", key, "resamples"), checked("evidence." + key, value));
            return this;
        }

        /** One key of {@code report:}, for example {@code report("paper", "letter")}. */
        public Builder report(String key, Object value) {
            report.put(named("report", key, "paper"), checked("report." + key, value));
            return this;
        }

        /**
         * Validates the study exactly as a study file is validated, with the same messages; they
         * name {@link #SOURCE_NAME} and the key path.
         *
         * @throws dev.sigmawalk.engine.data.InputException when a key or value is not valid
         * @throws IllegalArgumentException when a value is null or of a type a study file cannot hold
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
            if (!report.isEmpty()) {
                root.put("report", report);
            }
            return new Study(StudyReader.read(Path.of(SOURCE_NAME), StudyTree.node("", root)));
        }

        /** A value is checked when it is given, so the message points at the call that gave it. */
        private static Object checked(String key, Object value) {
            if (value == null) {
                throw new IllegalArgumentException(key + " is null; leave the key out to take its default");
            }
            return value;
        }

        private static String named(String section, String key, String example) {
            if (key == null) {
                throw new IllegalArgumentException(section + ": a key is null; expected a key of a study file, such as "
                        + example);
            }
            return key;
        }
    }
}
