package dev.sigmawalk.reports.sweep;

import dev.sigmawalk.engine.data.FileFingerprint;
import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.StudyData;
import dev.sigmawalk.engine.run.ProgressListener;
import dev.sigmawalk.engine.study.Study;
import dev.sigmawalk.engine.study.StudyReader;
import dev.sigmawalk.reports.cli.StudyRun;
import dev.sigmawalk.reports.files.OutputFolder;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

/**
 * Runs one grid point on whichever worker the engine chose: the study is read as if from its
 * final {@code points/NNN/point.yaml}, so every file it writes is what {@code sigmawalk run} on
 * that file writes. The point folder is staged and published whole, or not at all; a failure
 * becomes an outcome with its reason, never an exception, so the other points go on.
 */
public final class PointRunner {
    /** The derived study's file name inside a point folder. */
    public static final String STUDY_FILE = "point.yaml";

    private PointRunner() {
    }

    /**
     * @param threads worker threads inside this point's walk-forward
     * @param force write into a point folder sigmawalk did not write (as {@code run --force})
     */
    public static PointOutcome run(PointTask task, int threads, boolean force) {
        Instant started = Instant.now();
        long begin = System.nanoTime();
        Path target = Path.of(task.folder());
        try {
            Study study = StudyReader.read(target.resolve(STUDY_FILE), task.yaml());
            StudyData data = StudyData.load(study);
            return publish(task, target, study, data, threads, force, started, begin);
        } catch (InputException e) {
            return failed(task, e.getMessage(), begin);
        } catch (RuntimeException e) {
            // Any other failure of one point (a solver error, a full disk) is that point's alone.
            return failed(task, e.toString(), begin);
        }
    }

    /** Stages and publishes the point's folder; the inputs kept out of it are its data files. */
    private static PointOutcome publish(PointTask task, Path target, Study study, StudyData data, int threads,
                                        boolean force, Instant started, long begin) {
        List<Path> inputs = data.fingerprints().stream().map(FileFingerprint::path).toList();
        try (OutputFolder folder = OutputFolder.prepare(target, force, inputs)) {
            Files.writeString(folder.staging().resolve(STUDY_FILE), task.yaml(), StandardCharsets.UTF_8);
            // Warnings go to the point's manifest and report; the sweep's progress lines stay one per point.
            StudyRun.writeInto(folder.staging(), study, data, threads, ProgressListener.NONE, w -> { }, started, begin);
            folder.commit();
            return new PointOutcome(task.number(), PointOutcome.Status.RAN, "", (System.nanoTime() - begin) / 1e9);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + STUDY_FILE + " for point " + task.number(), e);
        }
    }

    private static PointOutcome failed(PointTask task, String reason, long begin) {
        String text = reason == null || reason.isBlank() ? "failed without a message" : reason;
        return new PointOutcome(task.number(), PointOutcome.Status.FAILED, text, (System.nanoTime() - begin) / 1e9);
    }
}
