package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Names and titles from user files are text, never markup, in the page and inside its SVG. */
class ReportEscapingTest {
    private static final String SCRIPT = "<script>alert(1)</script>";
    private static final String ATTRIBUTE = "\" onload=\"x";
    private static final String ENTITY = "&amp;";

    @Test
    void hostileNames_appearAsLiteralText(@TempDir Path dir) throws Exception {
        ReportData data = ReportFixture.data("Title " + SCRIPT + " " + ENTITY, SCRIPT, ATTRIBUTE, ENTITY);
        Path out = dir.resolve("report.html");
        new ReportWriter().write(data, out, dir.resolve("charts"));
        String html = Files.readString(out, StandardCharsets.UTF_8);
        Document doc = Jsoup.parse(html);

        assertTrue(doc.select("script").isEmpty(), "no script element");
        assertTrue(doc.select("[onload]").isEmpty(), "no onload attribute");
        assertFalse(html.contains(SCRIPT), "raw markup never reaches the page");
        assertEquals("Title " + SCRIPT + " " + ENTITY, doc.selectFirst("h1").text(), "title shown literally");
        assertEquals("Title " + SCRIPT + " " + ENTITY, doc.title());

        Element table = doc.getElementById("headline-table");
        assertEquals(SCRIPT, table.select("tbody tr").get(0).selectFirst("td").text());
        assertEquals(ATTRIBUTE, table.select("tbody tr").get(1).selectFirst("td").text());
        assertEquals(ENTITY, table.select("tbody tr").get(2).selectFirst("td").text(), "entity text not decoded");

        Element legendText = doc.select("figure svg text").stream().filter(t -> t.text().equals(SCRIPT)).findFirst()
                .orElse(null);
        assertTrue(legendText != null, "the SVG legend shows the name as text");
        assertTrue(doc.select("svg script").isEmpty(), "no script inside SVG");
        assertNull(doc.selectFirst("svg [onload]"), "no onload inside SVG");
    }
}
