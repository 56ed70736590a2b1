package dev.sigmawalk.reports.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The output folder's rules: inputs are never touched, publication is all or nothing, nothing is left behind. */
class OutputFolderTest {
    @TempDir
    Path dir;

    /** Fails the n-th call (0-based) of one kind of operation, counting from construction. */
    private static final class FailingOps implements FileOps {
        private final int failRename;
        private final int failCreate;
        private int renames;
        private int creates;

        FailingOps(int failRename, int failCreate) {
            this.failRename = failRename;
            this.failCreate = failCreate;
        }

        @Override
        public void rename(Path from, Path to) throws IOException {
            if (renames++ == failRename) {
                throw new IOException("injected failure renaming " + from.getFileName());
            }
            FileOps.SYSTEM.rename(from, to);
        }

        @Override
        public void createDirectory(Path d) throws IOException {
            if (creates++ == failCreate) {
                throw new IOException("injected failure creating " + d.getFileName());
            }
            FileOps.SYSTEM.createDirectory(d);
        }

        @Override
        public void delete(Path path) throws IOException {
            FileOps.SYSTEM.delete(path);
        }
    }

    private static void write(Path file, String text) throws IOException {
        Files.createDirectories(file.getParent());
        Files.writeString(file, text, StandardCharsets.UTF_8);
    }

    /** Every path under root with its content ("/" for folders). */
    private static Map<String, String> snapshot(Path root) throws IOException {
        Map<String, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : (Iterable<Path>) s::iterator) {
                out.put(root.relativize(p).toString(), Files.isDirectory(p) ? "/" : Files.readString(p));
            }
        }
        return out;
    }

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /** An earlier run's folder: two listed outputs (one a chart this run no longer makes) and a user's note. */
    private Path earlierRun() throws IOException {
        Path out = dir.resolve("out");
        write(out.resolve("summary.csv"), "old summary");
        write(out.resolve("charts/growth-36.png"), "old chart 36");
        write(out.resolve("charts/growth-120.png"), "old chart 120");
        write(out.resolve("my-notes.txt"), "the user's own file");
        write(out.resolve(OutputFolder.MARKER), "charts/growth-120.png\ncharts/growth-36.png\nsummary.csv\n");
        return out;
    }

    private static void stageNewRun(OutputFolder f) throws IOException {
        write(f.staging().resolve("summary.csv"), "new summary");
        write(f.staging().resolve("tests.csv"), "new tests");
        write(f.staging().resolve("charts/growth-36.png"), "new chart 36");
    }

    @Test
    void rerun_replacesItsOwnFiles_removesStaleOnes_andKeepsTheUsersFile() throws IOException {
        Path out = earlierRun();
        try (OutputFolder f = OutputFolder.prepare(out, false, List.of())) {
            stageNewRun(f);
            f.commit();
        }
        assertEquals(Map.of("", "/", "charts", "/", "charts/growth-36.png", "new chart 36", "summary.csv", "new summary",
                "tests.csv", "new tests", "my-notes.txt", "the user's own file",
                OutputFolder.MARKER, "charts/growth-36.png\nsummary.csv\ntests.csv\n"), snapshot(out));
        assertEquals(List.of("out"), names(dir), "no work folder is left beside the output");
    }

    /**
     * An I/O error injected at each rename in turn, and at each folder creation: the old folder
     * survives byte for byte, and no work folder is left once the run closes.
     */
    @Test
    void renameFailure_leavesOldFolderIntact() throws IOException {
        Path out = earlierRun();
        Map<String, String> before = snapshot(out);
        int renames = countOperations(true);
        int creates = countOperations(false);
        assertTrue(renames >= 7, "moves out and in: " + renames);
        for (int k = 0; k < renames + creates; k++) {
            FailingOps ops = k < renames ? new FailingOps(k, -1) : new FailingOps(-1, k - renames);
            try (OutputFolder f = OutputFolder.prepare(out, false, List.of(), ops)) {
                stageNewRun(f);
                UncheckedIOException e = assertThrows(UncheckedIOException.class, f::commit, "failure " + k);
                assertTrue(e.getMessage().contains("injected failure"), e.getMessage());
                assertTrue(e.getMessage().endsWith("the folder was left as it was"), e.getMessage());
            }
            assertEquals(before, snapshot(out), "old folder intact after failure " + k);
            assertEquals(List.of("out"), names(dir), "nothing left beside the output after failure " + k);
        }
    }

    /** How many renames (or folder creations) one successful publication over a copy of the earlier run makes. */
    private int countOperations(boolean renames) throws IOException {
        Path copy = dir.resolve("count");
        write(copy.resolve("summary.csv"), "old summary");
        write(copy.resolve("charts/growth-36.png"), "old chart 36");
        write(copy.resolve("charts/growth-120.png"), "old chart 120");
        write(copy.resolve(OutputFolder.MARKER), "charts/growth-120.png\ncharts/growth-36.png\nsummary.csv\n");
        FailingOps counting = new FailingOps(-1, -1);
        try (OutputFolder f = OutputFolder.prepare(copy, false, List.of(), counting)) {
            stageNewRun(f);
            f.commit();
        }
        WorkFolders.deleteTree(copy);
        return renames ? counting.renames : counting.creates;
    }

    @Test
    void newFolder_isPublishedByOneRename() throws IOException {
        FailingOps counting = new FailingOps(-1, -1);
        Path out = dir.resolve("fresh/out");
        try (OutputFolder f = OutputFolder.prepare(out, false, List.of(), counting)) {
            stageNewRun(f);
            f.commit();
        }
        assertEquals(1, counting.renames);
        assertEquals("new summary", Files.readString(out.resolve("summary.csv")));
        assertEquals(List.of("out"), names(dir.resolve("fresh")));
    }

    @Test
    void failureBeforeCommit_leavesNoStagingFolder() throws IOException {
        Path out = earlierRun();
        Map<String, String> before = snapshot(out);
        try (OutputFolder f = OutputFolder.prepare(out, false, List.of())) {
            stageNewRun(f);
        }
        assertEquals(before, snapshot(out));
        assertEquals(List.of("out"), names(dir));
    }

    @Test
    void foreignFolder_isRefusedWithoutForce() throws IOException {
        write(dir.resolve("mine/thesis.tex"), "a user's file");
        InputException e = assertThrows(InputException.class,
                () -> OutputFolder.prepare(dir.resolve("mine"), false, List.of()));
        assertTrue(e.getMessage().contains("is not empty and was not written by sigmawalk"), e.getMessage());
        assertEquals(List.of("mine"), names(dir), "no staging folder created");
    }

    @Test
    void forceIntoForeignFolder_writesBesideTheUsersFiles() throws IOException {
        Path mine = dir.resolve("mine");
        write(mine.resolve("thesis.tex"), "a user's file");
        write(mine.resolve("charts/figure.png"), "a user's figure");
        try (OutputFolder f = OutputFolder.prepare(mine, true, List.of())) {
            stageNewRun(f);
            f.commit();
        }
        Map<String, String> after = snapshot(mine);
        assertEquals("a user's file", after.get("thesis.tex"));
        assertEquals("a user's figure", after.get("charts/figure.png"));
        assertEquals("new summary", after.get("summary.csv"));
        assertEquals("new chart 36", after.get("charts/growth-36.png"));
    }

    /**
     * A file of the user's under a name a run writes (here summary.csv and report.html) is never
     * replaced, not even with --force: the folder is refused before any work, naming the files,
     * and nothing in it changes.
     */
    @Test
    void usersFileAtAnOutputName_isRefusedWithOrWithoutForce() throws IOException {
        Path mine = dir.resolve("mine");
        write(mine.resolve("summary.csv"), "a user's summary");
        write(mine.resolve("report.html"), "a user's page");
        write(mine.resolve("thesis.tex"), "a user's file");
        Map<String, String> before = snapshot(mine);
        InputException e = assertThrows(InputException.class, () -> OutputFolder.prepare(mine, true, List.of()));
        assertEquals("output folder " + mine.toRealPath() + " holds files sigmawalk did not write under names a run"
                + " writes (report.html, summary.csv); sigmawalk never replaces a file it did not write, with or"
                + " without --force: move them elsewhere or choose another --out", e.getMessage());
        assertEquals(before, snapshot(mine));
        assertEquals(List.of("mine"), names(dir), "no staging folder created");
    }

    /**
     * In a folder an earlier run wrote, a file the user added later under a name the run writes
     * (not in the marker's list) is the user's as well: refused, kept.
     */
    @Test
    void usersFileAddedToARunsFolder_isRefused() throws IOException {
        Path out = earlierRun();
        write(out.resolve("report.pdf"), "the user's own printout");
        Map<String, String> before = snapshot(out);
        InputException e = assertThrows(InputException.class, () -> OutputFolder.prepare(out, false, List.of()));
        assertTrue(e.getMessage().contains("holds a file sigmawalk did not write under a name a run writes (report.pdf)"),
                e.getMessage());
        assertEquals(before, snapshot(out));
    }

    /**
     * A chart's name is known only once the run has drawn it: a user's file of that name in
     * charts/ is found at publication, which then moves nothing, removes its staging folder and
     * refuses; the folder is as it was.
     */
    @Test
    void usersChartAtTheNameOfANewChart_isRefusedAtPublication() throws IOException {
        Path mine = dir.resolve("mine");
        write(mine.resolve("charts/growth-36.png"), "a user's own growth chart");
        write(mine.resolve("thesis.tex"), "a user's file");
        Map<String, String> before = snapshot(mine);
        try (OutputFolder f = OutputFolder.prepare(mine, true, List.of())) {
            stageNewRun(f);
            InputException e = assertThrows(InputException.class, f::commit);
            assertTrue(e.getMessage().contains("(charts/growth-36.png)"), e.getMessage());
        }
        assertEquals(before, snapshot(mine));
        assertEquals(List.of("mine"), names(dir), "staging folder removed");
    }

    @Test
    void forceIntoDataFolder_neverReplacesAnInput() throws IOException {
        Path data = dir.resolve("data");
        write(data.resolve("returns.csv"), "the user's returns");
        write(data.resolve("study.yaml"), "title: x");
        List<Path> inputs = List.of(data.resolve("study.yaml"), data.resolve("returns.csv"));
        for (boolean force : new boolean[] {false, true}) {
            InputException e = assertThrows(InputException.class, () -> OutputFolder.prepare(data, force, inputs));
            assertEquals("output folder " + data.toRealPath() + " is the folder " + data.toRealPath()
                    + " that holds the input file 'returns.csv', a name sigmawalk writes; inputs are never overwritten,"
                    + " with or without --force: choose an output folder outside " + data.toRealPath(), e.getMessage());
        }
        assertEquals("the user's returns", Files.readString(data.resolve("returns.csv")));
        assertEquals(List.of("data"), names(dir));
    }

    @Test
    void outputInsideOrAroundADataFolderWithAnOutputName_isRefused() throws IOException {
        Path data = dir.resolve("project/data");
        write(data.resolve("summary.csv"), "the user's summary, read as alphas");
        List<Path> inputs = List.of(data.resolve("summary.csv"));
        InputException inside = assertThrows(InputException.class,
                () -> OutputFolder.prepare(data.resolve("results"), true, inputs));
        assertTrue(inside.getMessage().contains(" is inside the folder "), inside.getMessage());
        InputException around = assertThrows(InputException.class,
                () -> OutputFolder.prepare(dir.resolve("project"), true, inputs));
        assertTrue(around.getMessage().contains(" contains the folder "), around.getMessage());
    }

    @Test
    void symbolicLinkOntoAnInputFolder_isRefused() throws IOException {
        Path data = dir.resolve("data");
        write(data.resolve("weights.csv"), "the user's weights");
        Files.createSymbolicLink(dir.resolve("link"), data);
        assertThrows(InputException.class, () -> OutputFolder.prepare(dir.resolve("link"), true,
                List.of(data.resolve("weights.csv"))));
    }

    @Test
    void forceIntoFolderWithAnInputOfAnotherName_leavesTheInputAlone() throws IOException {
        Path data = dir.resolve("data");
        write(data.resolve("assets.csv"), "the user's assets");
        try (OutputFolder f = OutputFolder.prepare(data, true, List.of(data.resolve("assets.csv")))) {
            stageNewRun(f);
            f.commit();
        }
        assertEquals("the user's assets", Files.readString(data.resolve("assets.csv")));
    }

    @Test
    void oldMarkerListingAnInput_neverRemovesIt() throws IOException {
        Path out = earlierRun();
        write(out.resolve("alphas.txt"), "the user's alphas");
        write(out.resolve(OutputFolder.MARKER), "alphas.txt\nsummary.csv\n");
        Map<String, String> before = snapshot(out);
        try (OutputFolder f = OutputFolder.prepare(out, false, List.of(out.resolve("alphas.txt")))) {
            stageNewRun(f);
            assertThrows(InputException.class, f::commit);
        }
        assertEquals(before, snapshot(out));
    }

    @Test
    void stagingLeftByAKilledRun_isRemovedByTheNextRun() throws IOException, InterruptedException {
        Process gone = new ProcessBuilder("java", "-version").redirectErrorStream(true).start();
        gone.getInputStream().readAllBytes();
        gone.waitFor();
        long start = gone.info().startInstant().map(Instant::toEpochMilli).orElse(1L);
        Path killed = dir.resolve(".out" + WorkFolders.STAGING + gone.pid() + "-" + start + "-1f2e");
        Path killedBackup = dir.resolve(".out" + WorkFolders.BACKUP + gone.pid() + "-" + start + "-1f2e");
        write(killed.resolve("weights.csv"), "30 MB of a run that was killed");
        write(killedBackup.resolve("summary.csv"), "a killed publication's backup");
        Path live = WorkFolders.staging(dir.resolve("out"), WorkFolders.newSuffix());
        write(live.resolve("weights.csv"), "a run of this process still writing");
        write(dir.resolve(".out.sigmawalk-staging-notes"), "not a work folder name");
        try (OutputFolder f = OutputFolder.prepare(dir.resolve("out"), false, List.of())) {
            assertFalse(Files.exists(killed), "killed run's staging removed");
            assertFalse(Files.exists(killedBackup), "killed run's backup removed");
            assertTrue(Files.exists(live), "a live run's staging is kept");
            stageNewRun(f);
            f.commit();
        }
        assertTrue(Files.exists(dir.resolve(".out.sigmawalk-staging-notes")));
    }

    @Test
    void danglingSymlinkOut_isRefusedBeforeAnyWork() throws IOException {
        Files.createSymbolicLink(dir.resolve("out"), dir.resolve("nowhere"));
        InputException e = assertThrows(InputException.class, () -> OutputFolder.prepare(dir.resolve("out"), false, List.of()));
        assertEquals("output folder " + dir.resolve("out") + " is a symbolic link to " + dir.resolve("nowhere")
                + ", which does not exist; create that folder or choose another --out", e.getMessage());
    }

    @Test
    void outUnderARegularFile_isRefused() throws IOException {
        write(dir.resolve("report.txt"), "a file");
        InputException e = assertThrows(InputException.class,
                () -> OutputFolder.prepare(dir.resolve("report.txt/deeper/out"), false, List.of()));
        assertEquals("output folder " + dir.resolve("report.txt/deeper/out") + " cannot be created: "
                + dir.resolve("report.txt") + " is a file, not a folder; choose another --out", e.getMessage());
    }

    @Test
    void outThatIsAFile_isRefused() throws IOException {
        write(dir.resolve("out"), "a file");
        InputException e = assertThrows(InputException.class, () -> OutputFolder.prepare(dir.resolve("out"), true, List.of()));
        assertTrue(e.getMessage().endsWith(" is a file, not a folder; choose another --out"), e.getMessage());
    }

    @Test
    void readOnlyFolder_isRefused() throws IOException {
        Path locked = dir.resolve("locked");
        Files.createDirectory(locked);
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            Assumptions.assumeFalse(Files.isWritable(locked), "the super-user can write anywhere");
            InputException e = assertThrows(InputException.class,
                    () -> OutputFolder.prepare(locked.resolve("out"), false, List.of()));
            assertEquals("output folder " + locked.resolve("out") + " cannot be created: folder " + locked
                    + " is not writable; choose another --out", e.getMessage());
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }
}
