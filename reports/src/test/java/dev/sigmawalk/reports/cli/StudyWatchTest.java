package dev.sigmawalk.reports.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The watch loop's rules on real files, with the pause between polls replaced by scripted edits:
 * which saves start a run, that a save must settle first, that a save during a run counts, that
 * the loop stops after the asked number of runs and returns the last run's code.
 */
class StudyWatchTest {
    @TempDir
    Path dir;

    /** Runs the scripted edit of each poll (by poll number, from 1) instead of sleeping. */
    private static final class Script implements StudyWatch.Pause {
        final Map<Integer, Runnable> edits = new TreeMap<>();
        int polls;

        @Override
        public void sleep(long millis) {
            polls++;
            if (polls > 1000) {
                throw new AssertionError("the watch is still polling after 1000 polls");
            }
            Runnable edit = edits.get(polls);
            if (edit != null) {
                edit.run();
            }
        }
    }

    private static void write(Path file, String text) {
        try {
            Files.writeString(file, text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void aSaveStartsOneRunOnceTheFileHasSettled() throws Exception {
        Path study = dir.resolve("study.yaml");
        Path data = dir.resolve("assets.csv");
        write(study, "a");
        write(data, "1");
        Script script = new Script();
        List<Integer> runAtPoll = new ArrayList<>();
        List<String> status = new ArrayList<>();
        // Poll 3: the data file is saved; poll 4 sees it again changed (a second write of the
        // same save); poll 5 sees it unchanged, so the run starts after poll 5.
        script.edits.put(3, () -> write(data, "12"));
        script.edits.put(4, () -> write(data, "123"));
        StudyWatch watch = new StudyWatch(10, script, status::add);
        int code = watch.watch(List.of(study), () -> {
            runAtPoll.add(script.polls);
            return new StudyWatch.Result(runAtPoll.size() == 1 ? 0 : 2, List.of(study, data));
        }, 2);
        assertEquals(List.of(0, 5), runAtPoll);
        assertEquals(2, code, "the last run's exit code");
        assertEquals(List.of("watching 2 files; save one to run again (Ctrl-C stops)",
                "assets.csv changed; running again"), status);
    }

    @Test
    void aSaveDuringARunStartsTheNextRun() throws Exception {
        Path study = dir.resolve("study.yaml");
        write(study, "first");
        Script script = new Script();
        List<Integer> runAtPoll = new ArrayList<>();
        StudyWatch watch = new StudyWatch(10, script, s -> { });
        watch.watch(List.of(study), () -> {
            runAtPoll.add(script.polls);
            if (runAtPoll.size() == 1) {
                write(study, "saved while the first run was under way");
            }
            return new StudyWatch.Result(0, List.of(study));
        }, 2);
        // The change is seen at the first poll and has settled at the second.
        assertEquals(List.of(0, 2), runAtPoll);
    }

    @Test
    void aFileThatAppearsIsAChange_andOneRestoredBeforeItSettledIsNot() throws Exception {
        Path study = dir.resolve("study.yaml");
        Path alphas = dir.resolve("alphas.csv");
        write(study, "s");
        FileTime then = FileTime.from(Instant.parse("2020-01-02T03:04:05Z"));
        Files.setLastModifiedTime(study, then);
        Script script = new Script();
        List<Integer> runAtPoll = new ArrayList<>();
        List<String> status = new ArrayList<>();
        // Poll 2: the study is changed; poll 3: its bytes and time are put back before the change
        // settled, so nothing has changed. Poll 6: the alphas file, missing so far, appears.
        script.edits.put(2, () -> write(study, "changed"));
        script.edits.put(3, () -> {
            write(study, "s");
            setTime(study, then);
        });
        script.edits.put(6, () -> write(alphas, "asset,alpha\n"));
        StudyWatch watch = new StudyWatch(10, script, status::add);
        watch.watch(List.of(study, alphas), () -> {
            runAtPoll.add(script.polls);
            return new StudyWatch.Result(0, List.of(study, alphas));
        }, 2);
        assertEquals(List.of(0, 7), runAtPoll);
        assertEquals(List.of("watching 2 files; save one to run again (Ctrl-C stops)",
                "alphas.csv changed; running again"), status);
    }

    private static void setTime(Path file, FileTime time) {
        try {
            Files.setLastModifiedTime(file, time);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void stopAfterOneRunsOnce_andBadSettingsAreRefused() throws Exception {
        Path study = dir.resolve("study.yaml");
        write(study, "s");
        Script script = new Script();
        int[] runs = {0};
        int code = new StudyWatch(10, script, s -> { }).watch(List.of(study), () -> {
            runs[0]++;
            return new StudyWatch.Result(1, List.of(study));
        }, 1);
        assertEquals(1, runs[0]);
        assertEquals(1, code);
        assertEquals(0, script.polls, "no poll after the last run");
        assertThrows(IllegalArgumentException.class, () -> new StudyWatch(0, script, s -> { }));
        assertThrows(IllegalArgumentException.class,
                () -> new StudyWatch(10, script, s -> { }).watch(List.of(study), () -> null, -1));
        assertThrows(IllegalArgumentException.class, () -> new StudyWatch.Result(0, List.of()));
    }

    @Test
    void anInterruptEndsTheWatch() {
        Path study = dir.resolve("study.yaml");
        write(study, "s");
        StudyWatch watch = new StudyWatch(10, millis -> {
            throw new InterruptedException("stopped");
        }, s -> { });
        assertThrows(InterruptedException.class,
                () -> watch.watch(List.of(study), () -> new StudyWatch.Result(0, List.of(study)), 0));
    }
}
