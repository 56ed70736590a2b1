package dev.sigmawalk.reports.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * Runs a study, then again each time one of its files is saved, in the same process: a rerun
 * finds the program's code already loaded and compiled, which is most of a short study's time.
 *
 * <p>The files are polled, not watched through the operating system, so the loop behaves the
 * same on every file system (a network share or a container mount may deliver no change events).
 * A change counts from the moment the run before it started: a file saved while a run was under
 * way starts another run once that one is done. Before a rerun the files must look the same in
 * two polls in a row, since an editor or a spreadsheet export may save a file in several writes.
 */
final class StudyWatch {
    /** Waits between polls; tests replace it to act between polls. */
    interface Pause {
        void sleep(long millis) throws InterruptedException;
    }

    /** One run of the study. */
    interface Attempt {
        /**
         * Runs the study once, reporting its own outcome.
         *
         * @return the exit code of the run (0 when it succeeded) and the files to watch next
         */
        Result run();
    }

    /**
     * @param code the run's exit code
     * @param files the files to watch until the next run, the study file first
     */
    record Result(int code, List<Path> files) {
        Result {
            files = List.copyOf(files);
            if (files.isEmpty()) {
                throw new IllegalArgumentException("a run must name at least the study file to watch");
            }
        }
    }

    private final long pollMillis;
    private final Pause pause;
    private final Consumer<String> status;

    /**
     * @param pollMillis time between two looks at the files, > 0
     * @param status receives a line when watching starts and when a change starts a run
     */
    StudyWatch(long pollMillis, Pause pause, Consumer<String> status) {
        if (!(pollMillis > 0)) {
            throw new IllegalArgumentException("poll interval (" + pollMillis + " ms) must be > 0");
        }
        this.pollMillis = pollMillis;
        this.pause = Objects.requireNonNull(pause, "pause");
        this.status = Objects.requireNonNull(status, "status");
    }

    /**
     * Runs until {@code stopAfter} runs have started (0: until the thread is interrupted).
     *
     * @param first the files to take stamps of before the first run (at least the study file)
     * @return the exit code of the last run
     * @throws InterruptedException when interrupted while waiting for a change
     */
    int watch(List<Path> first, Attempt attempt, int stopAfter) throws InterruptedException {
        if (stopAfter < 0) {
            throw new IllegalArgumentException("stop after (" + stopAfter + ") must be >= 0");
        }
        List<Path> watched = List.copyOf(first);
        for (int runs = 1; ; runs++) {
            Map<Path, FileStamp> before = byPath(FileStamp.of(watched));
            Result result = attempt.run();
            if (stopAfter > 0 && runs >= stopAfter) {
                return result.code();
            }
            watched = result.files();
            List<FileStamp> baseline = new ArrayList<>(watched.size());
            for (Path p : watched) {
                FileStamp known = before.get(p);
                baseline.add(known != null ? known : FileStamp.of(p));
            }
            status.accept("watching " + watched.size() + (watched.size() == 1 ? " file" : " files")
                    + "; save one to run again (Ctrl-C stops)");
            List<Path> changed = awaitChange(watched, baseline);
            status.accept(names(changed) + " changed; running again");
        }
    }

    /**
     * Polls until some file differs from its baseline and then looks the same twice in a row;
     * returns the files that differ then (a file that went back to its old state is no change).
     */
    private List<Path> awaitChange(List<Path> files, List<FileStamp> baseline) throws InterruptedException {
        while (true) {
            List<FileStamp> now;
            do {
                pause.sleep(pollMillis);
                now = FileStamp.of(files);
            } while (now.equals(baseline));
            while (true) {
                pause.sleep(pollMillis);
                List<FileStamp> again = FileStamp.of(files);
                if (again.equals(now)) {
                    break;
                }
                now = again;
            }
            List<Path> changed = new ArrayList<>();
            for (int k = 0; k < files.size(); k++) {
                if (!now.get(k).equals(baseline.get(k))) {
                    changed.add(files.get(k));
                }
            }
            if (!changed.isEmpty()) {
                return changed;
            }
        }
    }

    private static Map<Path, FileStamp> byPath(List<FileStamp> stamps) {
        Map<Path, FileStamp> out = new HashMap<>();
        for (FileStamp s : stamps) {
            out.put(s.path(), s);
        }
        return out;
    }

    private static String names(List<Path> files) {
        List<String> out = new ArrayList<>();
        for (Path p : files) {
            out.add(String.valueOf(p.getFileName()));
        }
        return String.join(", ", out);
    }
}
