package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.data.InputException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sweep file's own shape: every message names the file, line and column, and what was expected. */
class SweepReaderTest {
    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path f = dir.resolve("s.yaml");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    private void assertProblem(String text, String where, String what) throws IOException {
        Path f = write(text);
        InputException e = assertThrows(InputException.class, () -> SweepReader.read(f));
        assertTrue(e.getMessage().startsWith(where) && e.getMessage().contains(what), e.getMessage());
    }

    @Test
    void reads_axesInFileOrder_withPathsAgainstTheSweepFile() throws IOException {
        SweepFile s = SweepReader.read(write("study: sub/base.yaml\nvary:\n  b.x: [1, 2, 3]\n  a.y: [[36], [60, 120]]\n"));
        assertEquals(dir.resolve("sub/base.yaml"), s.study());
        assertEquals(dir.resolve("sweep-out"), s.output());
        assertEquals("b.x", s.axes().get(0).key());
        assertEquals("[60, 120]", s.axes().get(1).label(1));
        assertEquals("3", s.axes().get(0).label(2));
        assertEquals(6, s.size());
        SweepFile dates = SweepReader.read(write("study: b.yaml\nvary:\n  walkforward.start: [2012-01-01, 'a b']\n"));
        assertEquals(java.util.List.of("2012-01-01", "a b"), java.util.List.of(dates.axes().get(0).label(0),
                dates.axes().get(0).label(1)), "texts shown as they read, without the quotes a study needs");
        assertEquals(java.util.List.of(2, 1), java.util.Arrays.stream(s.coordinates(5)).boxed().toList());
    }

    @Test
    void problems_areLocated() throws IOException {
        assertProblem("study: b.yaml\nvary:\n  a.b: [1]\nextra: 1\n", "s.yaml line 4, column 1", "unknown key 'extra'");
        assertProblem("vary:\n  a.b: [1]\n", "s.yaml line 1, column 1", "missing key 'study'");
        assertProblem("study: b.yaml\nvary: [1, 2]\n", "s.yaml line 2, column 7", "expected a mapping of dotted study keys");
        assertProblem("study: b.yaml\nvary:\n  a.b: 5\n", "s.yaml line 3, column 8", "expected a non-empty list");
        assertProblem("study: b.yaml\nvary:\n  a.b: []\n", "s.yaml line 3, column 8", "expected a non-empty list");
        assertProblem("study: b.yaml\nvary:\n  a.b: [5, 6, 5]\n", "s.yaml line 3, column 15", "listed twice");
        assertProblem("study: b.yaml\nvary:\n  output: [a, b]\n", "s.yaml line 3, column 3", "cannot be varied");
        assertProblem("study: b.yaml\nvary:\n  a..b: [1]\n", "s.yaml line 3, column 3", "not a dotted study key");
    }

    /** A study given where a sweep is expected, or a sweep as the base study, is named as such. */
    @Test
    void studyAndSweepFiles_mistakenForEachOther_areNamed() throws IOException {
        assertProblem("title: t\ndata:\n  assets: a.csv\nstrategies: []\n", "s.yaml line 1, column 1",
                "this is a study file, not a sweep (it has no vary:); `sigmawalk run s.yaml` runs it, or a sweep file"
                        + " names it as its study: s.yaml");
        Files.writeString(dir.resolve("inner.yaml"), "study: b.yaml\nvary:\n  a.b: [1]\n", StandardCharsets.UTF_8);
        assertProblem("study: inner.yaml\nvary:\n  a.b: [1, 2]\n", "s.yaml line 1, column 8",
                "study: inner.yaml is itself a sweep file (it has vary:); expected a study file, the one study a sweep"
                        + " varies");
        assertProblem("study: s.yaml\nvary:\n  a.b: [1, 2]\n", "s.yaml line 1, column 8",
                "study: s.yaml is itself a sweep file");
    }

    @Test
    void runOnASweepFile_pointsToTheSweepCommand() throws IOException {
        Path sweep = write("study: b.yaml\nvary:\n  a.b: [1, 2]\n");
        SweepFixture.Result r = SweepFixture.sigmawalk("run", sweep.toString(), "--out", dir.resolve("out").toString());
        assertEquals(2, r.code(), r.err());
        assertEquals("sigmawalk: s.yaml is a sweep file (it has vary:); `sigmawalk run` takes a study file, and"
                + " `sigmawalk sweep s.yaml` runs a sweep", r.err().strip());
        assertTrue(Files.notExists(dir.resolve("out")));
        InputException e = assertThrows(InputException.class, () -> dev.sigmawalk.reports.api.Study.fromYaml(sweep));
        assertEquals("s.yaml is a sweep file (it has vary:); Study.fromYaml takes a study file, and `sigmawalk sweep"
                + " s.yaml` runs a sweep", e.getMessage());
    }
}
