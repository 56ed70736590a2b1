package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Chart file names made from strategy names. */
class FileNamesTest {

    @Test
    void accentsAndPunctuation_becomeOneDash() {
        FileNames names = FileNames.of(List.of("Min var", "min-var", "Übergewicht/2"));
        assertEquals("min-var", names.of("Min var"));
        assertEquals("min-var-2", names.of("min-var"));
        assertEquals("ubergewicht-2", names.of("Übergewicht/2"));
    }

    /**
     * A strategy name of any length still gives a chart file name within the 255 bytes most file
     * systems allow for one name (common practice: ext4, XFS, APFS and NTFS all cap it there).
     */
    @Test
    void longNames_areCutAndStayUnique() {
        String a = "x".repeat(5000);
        String b = "x".repeat(4000) + "y";
        FileNames names = FileNames.of(List.of(a, b));
        assertEquals("x".repeat(FileNames.LONGEST), names.of(a));
        assertEquals("x".repeat(FileNames.LONGEST) + "-2", names.of(b));
        String chart = "rolling-volatility-w1000000000-" + names.of(b) + ".png";
        assertEquals(true, chart.length() < 255, chart.length() + " characters");
    }

    @Test
    void aCutEndingInADash_losesTheDash() {
        String name = "a".repeat(FileNames.LONGEST - 1) + " b";
        assertEquals("a".repeat(FileNames.LONGEST - 1), FileNames.slug(name));
    }
}
