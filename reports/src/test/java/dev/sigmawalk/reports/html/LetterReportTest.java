package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.Paper;
import dev.sigmawalk.reports.pdf.ReportPdf;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code report.paper: letter}: the HTML's print style sheet and {@code report.pdf} are both laid
 * out on US Letter, and the shorter, wider page loses nothing: every page is Letter and numbered,
 * every section heading is printed, and the widest table keeps its last column.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class LetterReportTest {
    /** US Letter in PostScript points: 8.5 x 11 inches at 72 points an inch (ANSI/ASME Y14.1). */
    private static final float LETTER_WIDTH = 612f;
    private static final float LETTER_HEIGHT = 792f;
    private static final float POINT_TOLERANCE = 1f;

    private Document html;
    private String text;
    private int pages;
    private boolean everyPageLetter = true;

    @BeforeAll
    void render(@TempDir Path dir) throws Exception {
        Path report = dir.resolve("report.html");
        ReportPage assembled = new ReportWriter().assemble(ReportFixture.data(Paper.LETTER), dir.resolve("charts"),
                Runnable::run);
        assembled.writeHtml(report);
        html = Jsoup.parse(Files.readString(report, StandardCharsets.UTF_8));
        Path pdf = dir.resolve("report.pdf");
        ReportPdf.write(assembled.outline(), dir, assembled.charts(), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            pages = doc.getNumberOfPages();
            for (PDPage page : doc.getPages()) {
                PDRectangle box = page.getMediaBox();
                everyPageLetter &= Math.abs(box.getWidth() - LETTER_WIDTH) <= POINT_TOLERANCE
                        && Math.abs(box.getHeight() - LETTER_HEIGHT) <= POINT_TOLERANCE;
            }
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }

    @Test
    void printStyle_namesLetter() {
        String style = html.select("style").html();
        assertTrue(style.contains("@page {\n  size: letter portrait;"), "the HTML prints on Letter too");
    }

    @Test
    void pdf_isOnNumberedLetterPages() {
        assertTrue(pages > 3, "pages: " + pages);
        assertTrue(everyPageLetter, "every page is 612 x 792 points");
        for (int p = 1; p <= pages; p++) {
            assertTrue(text.contains("Page " + p + " of " + pages), "page number " + p + " of " + pages);
        }
    }

    @Test
    void pdf_holdsEverySectionHeading() {
        assertTrue(html.select("section > h2").size() > 5, "the fixture has the report's sections");
        for (Element h2 : html.select("section > h2")) {
            assertTrue(text.contains(h2.text()), "heading in the PDF: " + h2.text());
        }
    }

    @Test
    void pdf_keepsTheLastColumnOfTheWidestTable() {
        Element widest = html.select("table").stream()
                .max(Comparator.comparingInt(t -> t.select("thead th").size())).orElseThrow();
        assertTrue(widest.select("thead th").size() >= 8, "a wide table: " + widest.select("thead th").size());
        String last = widest.select("thead th").last().ownText();
        assertTrue(text.contains(last), "last heading '" + last + "' of table " + widest.id() + " printed");
        for (Element row : widest.select("tbody tr")) {
            String cell = row.select("td").last().text().split(" ")[0];
            assertTrue(text.contains(cell), "last cell '" + cell + "' of table " + widest.id() + " printed");
        }
    }
}
