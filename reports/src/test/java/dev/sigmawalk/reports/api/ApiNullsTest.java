package dev.sigmawalk.reports.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sigmawalk.engine.run.ProgressListener;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** The run steps of the library refuse a null by naming it and what to pass, never with a NullPointerException. */
class ApiNullsTest {
    private static final String STUDY = "the study is null; expected a study as read, such as Study.fromYaml(file).spec()";
    private static final String DATA = "the data is null; expected the study's data, StudyData.load(study)";
    private static final String RUN = "the run is null; expected the result of Runs.walk";

    /** Building reads no data, so the files need not exist. */
    private static dev.sigmawalk.engine.study.Study spec() {
        return Study.builder().data("assets", Path.of("assets.csv")).data("values", "returns")
                .data("market", Path.of("market.csv")).data("riskfree", 0.02).windows(36)
                .strategy("equal", Map.of("objective", "equal-weight")).build().spec();
    }

    @Test
    void nulls_areNamedWithWhatToPass() {
        record Case(String message, Executable call) {
        }
        var spec = spec();
        List<Case> cases = List.of(
                new Case(STUDY, () -> Runs.walk(null, null, 1, ProgressListener.NONE)),
                new Case(DATA, () -> Runs.walk(spec, null, 1, ProgressListener.NONE)),
                new Case(DATA, () -> Runs.walk(spec, null, List.of(), 1, ProgressListener.NONE)),
                new Case(RUN, () -> Runs.summaries(null)),
                new Case(STUDY, () -> Runs.comparisons(null, null, 1)),
                new Case(RUN, () -> Runs.comparisons(spec, null, 1)),
                new Case(DATA, () -> Runs.warningsBeforeWalk(spec, null)),
                new Case(RUN, () -> Runs.warningsOfResults(null)),
                new Case(STUDY, () -> RunPreview.of(null, null)),
                new Case(DATA, () -> RunPreview.of(spec, null)),
                new Case("the list of windows is null; expected window lengths such as windows(36, 60)",
                        () -> Study.builder().windows((int[]) null)));
        for (Case c : cases) {
            assertEquals(c.message(), assertThrows(IllegalArgumentException.class, c.call()).getMessage());
        }
    }
}
