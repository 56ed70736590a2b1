package dev.sigmawalk.engine.study;

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

/**
 * Study files written the way people and other tools write them: YAML's non-decimal number
 * forms, costs and resample counts beyond reason, the study file's own encoding and whether it
 * can be opened at all. Each is refused with the study file, line, column, value and what was
 * expected. Line and column numbers were counted by hand in {@link #STUDY}.
 */
class StudyFileFaultsTest {
    private static final String STUDY = String.join("\n",
            "data:",                                 // line 1
            "  assets: assets.csv",                  // 2
            "  values: returns",                     // 3
            "  market: market.csv",                  // 4
            "  riskfree: 0.02",                      // 5
            "walkforward:",                          // 6
            "  windows: [36, 60]",                   // 7
            "  cost_bps: 10",                        // 8
            "strategies:",                           // 9
            "  - name: plain",                       // 10
            "    risk: sample",                      // 11
            "    objective: min-variance",           // 12
            "    bounds: [0, 0.1]",                  // 13
            "");

    @TempDir
    Path dir;

    private Path write(String yaml) throws IOException {
        Path file = dir.resolve("study.yaml");
        Files.writeString(file, yaml);
        return file;
    }

    private InputException fails(String yaml) throws IOException {
        Path file = write(yaml);
        return assertThrows(InputException.class, () -> StudyReader.read(file));
    }

    @Test
    void yamlInfinity_isRefusedAtItsLineAndColumn() throws IOException {
        InputException e = fails(STUDY.replace("cost_bps: 10", "cost_bps: .inf"));
        assertEquals("study.yaml line 8, column 13: walkforward.cost_bps: .inf is infinite; expected a finite number",
                e.getMessage());
    }

    /**
     * A double-quoted YAML escape can spell half a character (a lone surrogate): in a strategy
     * name it used to end the run with an internal error when the first CSV file was written, in
     * the title with an unmappable-character failure of the report. Refused at its line and column.
     */
    @Test
    void loneSurrogateInAText_isRefusedAtItsCell() throws IOException {
        InputException e = fails(STUDY.replace("  - name: plain", "  - name: \"pl\\uD800ain\""));
        assertEquals("study.yaml line 10, column 11: the text holds a lone UTF-16 surrogate (U+D800, character 3),"
                + " which is half of a character and cannot be written to any output file; expected whole characters:"
                + " write the character itself, or both halves of its escape pair", e.getMessage());
        InputException title = fails("title: \"risk \\uDC00\"\n" + STUDY);
        assertTrue(title.getMessage().startsWith("study.yaml line 1, column 8: the text holds a lone UTF-16 surrogate"
                + " (U+DC00, character 6)"), title.getMessage());
    }

    /** Both halves of a pair are one character (U+1D70E, mathematical italic small sigma): accepted. */
    @Test
    void surrogatePair_isOneCharacterAndAccepted() throws IOException {
        Study s = StudyReader.read(write(STUDY.replace("  - name: plain", "  - name: \"\\uD835\\uDF0E-minvar\"")));
        assertEquals("\uD835\uDF0E-minvar", s.strategies().get(0).name());
    }

    @Test
    void yamlNotANumber_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("bounds: [0, 0.1]", "bounds: [0, .NaN]"));
        assertEquals("study.yaml line 13, column 17: strategies[0].bounds[1]: .NaN is YAML's not-a-number;"
                + " expected a finite number", e.getMessage());
    }

    @Test
    void negativeInfinityRate_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("riskfree: 0.02", "riskfree: -.inf"));
        assertTrue(e.getMessage().startsWith("study.yaml line 5, column 13: data.riskfree: -.inf is infinite"),
                e.getMessage());
    }

    @Test
    void underscoreDigitSeparators_areRefusedWithThePlainSpelling() throws IOException {
        InputException e = fails(STUDY.replace("[36, 60]", "[36, 6_0]"));
        assertEquals("study.yaml line 7, column 17: walkforward.windows[1]: 6_0 uses '_' between digits, which YAML"
                + " readers disagree on; expected plain digits such as 60", e.getMessage());
    }

    @Test
    void hexadecimalNumber_isRefusedWithItsDecimalValue() throws IOException {
        InputException e = fails(STUDY.replace("cost_bps: 10", "cost_bps: 0x10"));
        assertEquals("study.yaml line 8, column 13: walkforward.cost_bps: 0x10 is written in base 16;"
                + " expected a plain decimal number, such as 16", e.getMessage());
    }

    @Test
    void leadingZeroInteger_isRefusedAsPossiblyOctal() throws IOException {
        InputException e = fails(STUDY.replace("[36, 60]", "[036, 60]"));
        assertTrue(e.getMessage().startsWith("study.yaml line 7, column 13: walkforward.windows[0]: 036 has a leading zero"),
                e.getMessage());
        assertTrue(e.getMessage().endsWith("such as 36"), e.getMessage());
    }

    @Test
    void exponentBeyondDoubleRange_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("cost_bps: 10", "cost_bps: 1e400"));
        assertEquals("study.yaml line 8, column 13: walkforward.cost_bps: 1e400 is beyond the range of a double"
                + " (about 1.8e308); expected a finite number", e.getMessage());
    }

    @Test
    void exponentBelowDoubleRange_isRefusedRatherThanReadAsZero() throws IOException {
        InputException e = fails(STUDY.replace("bounds: [0, 0.1]", "bounds: [1e-400, 0.1]"));
        assertTrue(e.getMessage().contains("strategies[0].bounds[0]: 1e-400 is too small to be told apart from 0"),
                e.getMessage());
    }

    @Test
    void plainDecimalForms_areStillAccepted() throws IOException {
        Study s = StudyReader.read(write(STUDY.replace("cost_bps: 10", "cost_bps: 1.5e1")
                .replace("bounds: [0, 0.1]", "bounds: [-0.0, +.1]")));
        assertEquals(15.0, s.walkForward().costBps(), 0.0);
        assertEquals(new Bounds(-0.0, 0.1), s.strategies().get(0).bounds().orElseThrow());
    }

    @Test
    void costAbove100PercentOfTradedValue_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("cost_bps: 10", "cost_bps: 30000"));
        assertTrue(e.getMessage().startsWith("study.yaml line 8, column 13: walkforward.cost_bps: 30000 basis points"
                + " would cost more than the whole traded value"), e.getMessage());
        assertEquals(10_000.0, StudyReader.read(write(STUDY.replace("cost_bps: 10", "cost_bps: 10000")))
                .walkForward().costBps(), 0.0, "exactly 100 % is the limit, still allowed");
    }

    @Test
    void resamplesBeyondAMillion_areRefused() throws IOException {
        InputException e = fails(STUDY + "evidence:\n  resamples: 5000000\n");
        assertTrue(e.getMessage().startsWith("study.yaml line 15, column 14: evidence.resamples: 5000000 is beyond reason"),
                e.getMessage());
    }

    @Test
    void resamplesBelowTheFloor_areRefused() throws IOException {
        InputException e = fails(STUDY + "evidence:\n  resamples: 20\n");
        assertTrue(e.getMessage().contains("evidence.resamples: 20 is not allowed; expected a whole number >= 100"),
                e.getMessage());
    }

    @Test
    void longLayout_isReadAndWideIsTheDefault() throws IOException {
        assertEquals(DataLayout.WIDE, StudyReader.read(write(STUDY)).data().layout());
        assertEquals(DataLayout.LONG, StudyReader.read(write(STUDY.replace("  values: returns",
                "  values: returns\n  layout: long"))).data().layout());
    }

    @Test
    void unknownLayout_isRefusedWithTheChoices() throws IOException {
        InputException e = fails(STUDY.replace("  values: returns", "  values: returns\n  layout: tall"));
        assertEquals("study.yaml line 4, column 11: data.layout: 'tall' is not one of the choices; expected wide | long",
                e.getMessage());
    }

    @Test
    void windows1252StudyFile_isRefusedWithLineAndHint() throws IOException {
        Path file = dir.resolve("study.yaml");
        Files.write(file, ("title: Caf\u00e9 universe\n" + STUDY).getBytes("windows-1252"));
        InputException e = assertThrows(InputException.class, () -> StudyReader.read(file));
        assertEquals(1, e.location().line());
        assertTrue(e.getMessage().startsWith("study.yaml line 1: the file is not UTF-8: byte 0xE9 in 'title: Caf\u00e9 universe'"),
                e.getMessage());
        assertTrue(e.getMessage().contains("Windows-1252 or Latin-1"), e.getMessage());
        assertTrue(e.getMessage().contains("re-save the file as UTF-8"), e.getMessage());
    }

    @Test
    void utf16StudyFile_isRefusedNamingUtf16() throws IOException {
        Path file = dir.resolve("study.yaml");
        Files.write(file, ("\uFEFF" + STUDY).getBytes(StandardCharsets.UTF_16LE));
        InputException e = assertThrows(InputException.class, () -> StudyReader.read(file));
        assertTrue(e.getMessage().startsWith("study.yaml line 1: the file is UTF-16 text"), e.getMessage());
    }

    @Test
    void utf8StudyFileWithByteOrderMark_isRead() throws IOException {
        Path file = dir.resolve("study.yaml");
        Files.write(file, ("\uFEFFtitle: Caf\u00e9\n" + STUDY).getBytes(StandardCharsets.UTF_8));
        assertEquals("Caf\u00e9", StudyReader.read(file).title());
    }

    @Test
    void folderGivenAsStudyFile_isRefusedAsAFolder() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("study-folder.yaml"));
        InputException e = assertThrows(InputException.class, () -> StudyReader.read(folder));
        assertTrue(e.getMessage().startsWith("study-folder.yaml: is a folder"), e.getMessage());
        assertTrue(e.getMessage().endsWith("expected a study file"), e.getMessage());
    }

    /** A line break in a name would split its row in every output CSV file. */
    @Test
    void strategyNameWithALineBreak_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("name: plain", "name: \"plain\\nold\""));
        assertEquals("study.yaml line 10, column 11: strategies[0].name: 'plain\\nold' holds the control character"
                + " U+000A, which would break the rows of the output CSV files; expected a name of printable"
                + " characters on one line", e.getMessage());
    }

    @Test
    void strategyNameWithANulCharacter_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("name: plain", "name: \"pl\\0ain\""));
        assertEquals("study.yaml line 10, column 11: strategies[0].name: 'pl\\u0000ain' holds the control character"
                + " U+0000, which would break the rows of the output CSV files; expected a name of printable"
                + " characters on one line", e.getMessage());
    }

    @Test
    void baselineOfTheOnlyStrategy_saysThereIsNoOther() throws IOException {
        InputException e = fails(STUDY + "    baseline: plain\n");
        assertEquals("study.yaml line 14, column 15: strategies[0].baseline: 'plain' names no other strategy;"
                + " the study has no other strategy to compare with, so remove the key", e.getMessage());
    }

    /**
     * The premium is annual and divided by periods_per_year (Method §4); -100 made the market's
     * expected return per period a loss of more than everything, and the run took it.
     */
    @Test
    void marketPremiumBeyondAPlausibleAnnualRate_isRefused() throws IOException {
        InputException e = fails(STUDY.replace("    objective: min-variance", "    objective: max-sharpe\n"
                + "    market_premium: -100"));
        assertEquals("study.yaml line 13, column 21: strategies[0].market_premium: -100 is not a plausible annual"
                + " premium; expected a decimal in (-1, 1), such as 0.05 for 5 %", e.getMessage());
    }

    /** Line 14 is the '---' and line 15 the second document's first key. */
    @Test
    void aSecondYamlDocument_isRefusedWhereItStarts() throws IOException {
        InputException e = fails(STUDY + "---\ntitle: another study\n");
        assertEquals("study.yaml line 15, column 1: a second YAML document starts here, after a '---' line;"
                + " expected one document per file: remove it, or move it into a file of its own", e.getMessage());
    }

    @Test
    void aLeadingMarkerOrAnEmptyTrailingDocument_isStillOneStudy() throws IOException {
        assertEquals("plain", StudyReader.read(write("---\n" + STUDY)).strategies().get(0).name());
        assertEquals("plain", StudyReader.read(write(STUDY + "---\n# nothing here\n")).strategies().get(0).name());
    }

    /** Every failure is one line on standard error, at the line and column of the problem itself. */
    @Test
    void yamlSyntaxError_isOneLineAtTheProblem() throws IOException {
        InputException e = fails(STUDY.replace("  values: returns", "\tvalues: returns"));
        assertEquals("study.yaml line 3, column 1: not valid YAML (while scanning for the next token; found character"
                + " '\\t(TAB)' that cannot start any token. (Do not use \\t(TAB) for indentation))", e.getMessage());
    }

    @Test
    void yamlIndentError_isOneLine() throws IOException {
        InputException e = fails(STUDY.replace("  values: returns", "   values: returns"));
        assertEquals("study.yaml line 3, column 10: not valid YAML (mapping values are not allowed here)",
                e.getMessage());
    }
}
