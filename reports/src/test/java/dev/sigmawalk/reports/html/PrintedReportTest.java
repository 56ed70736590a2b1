package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.reports.pdf.PdfStrokes;
import dev.sigmawalk.reports.pdf.ReportPdf;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
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
 * The committee pack: {@code report.pdf} is read back with PDFBox's text extraction and must hold
 * what the HTML holds (every section, every column of every table, every chart including the
 * folded ones) on numbered A4 pages; the HTML's print style sheet must keep every column on the
 * paper, keep rows, callouts and charts whole, and repeat table headings.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PrintedReportTest {
    /** A4 in PostScript points (210 x 297 mm at 72 points an inch), ISO 216. */
    private static final float A4_WIDTH = 595.3f;
    private static final float A4_HEIGHT = 841.9f;
    private static final float POINT_TOLERANCE = 1f;

    private ReportData data;
    private Document html;
    private String style;
    private String text;
    private int pages;
    private PDRectangle firstPage;
    private int strokes;

    @BeforeAll
    void render(@TempDir Path dir) throws Exception {
        data = ReportFixture.data();
        Path report = dir.resolve("report.html");
        ReportPage assembled = new ReportWriter().assemble(data, dir.resolve("charts"), Runnable::run);
        assembled.writeHtml(report);
        html = Jsoup.parse(Files.readString(report, StandardCharsets.UTF_8));
        style = html.select("style").html();
        Path pdf = dir.resolve("report.pdf");
        ReportPdf.write(assembled.outline(), dir, assembled.charts(), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            pages = doc.getNumberOfPages();
            firstPage = doc.getPage(0).getMediaBox();
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            strokes = PdfStrokes.of(doc);
        }
    }

    @Test
    void pdf_isOnNumberedA4Pages() {
        assertTrue(pages > 3, "pages: " + pages);
        assertEquals(A4_WIDTH, firstPage.getWidth(), POINT_TOLERANCE, "A4 width");
        assertEquals(A4_HEIGHT, firstPage.getHeight(), POINT_TOLERANCE, "A4 height");
        for (int p = 1; p <= pages; p++) {
            assertTrue(text.contains("Page " + p + " of " + pages), "page number " + p + " of " + pages);
        }
    }

    /**
     * The charts' words are text in the PDF, not outlines: every {@code <text>} of every chart's
     * SVG (titles, axis labels including the rotated vertical ones, tick labels, legends) is found
     * by the text extraction. Spaces are ignored on both sides, since a rotated label comes back
     * a few letters to a line.
     */
    @Test
    void pdf_holdsEveryChartWord_asText() {
        String flat = text.replace(" ", "");
        java.util.Set<String> words = new java.util.LinkedHashSet<>();
        for (Element t : html.select("figure svg text")) {
            words.add(t.text().replace(" ", ""));
        }
        assertTrue(words.contains("Valueof1invested(logscale)"), "the growth chart's vertical axis label: " + words);
        assertTrue(words.contains("Date"), "the horizontal axis label");
        for (String w : words) {
            assertTrue(flat.contains(w), "chart text in the PDF: " + w);
        }
    }

    @Test
    void pdf_holdsEverySectionHeadingAndAnswer() {
        for (Element h2 : html.select("section > h2")) {
            assertTrue(text.contains(h2.text()), "heading in the PDF: " + h2.text());
        }
        for (Element answer : html.select("p.answer")) {
            String start = answer.text().substring(0, Math.min(60, answer.text().length()));
            assertTrue(text.contains(start), "answer in the PDF: " + start);
        }
        assertTrue(text.contains("not investment advice"), "the cautions are printed too");
    }

    /** No column is lost on paper: the last heading and the last cell of every row of the wide tables are printed. */
    @Test
    void pdf_losesNoColumn() {
        for (String id : new String[] {"headline-table", "strategy-table"}) {
            Element table = html.getElementById(id);
            for (Element th : table.select("thead th")) {
                assertTrue(text.contains(th.ownText()), id + ": heading '" + th.ownText() + "' printed");
            }
            for (Element row : table.select("tbody tr")) {
                // A cell of several lines is read back line by line beside its neighbours: its first word suffices.
                String last = row.select("td").last().text().split(" ")[0];
                assertTrue(text.contains(last), id + ": last cell '" + last + "' printed");
            }
        }
        for (StrategySpec s : data.study().strategies()) {
            assertTrue(text.contains(s.name()), "strategy " + s.name());
        }
    }

    /**
     * Every chart is drawn, the folded ones too: each figure's caption is printed as often as the
     * HTML holds it, and the pages carry at least one stroked path per line of every chart (the
     * charts are vector drawings, so their lines are stroke operators in the page content).
     */
    @Test
    void pdf_drawsEveryChart_includingFoldedOnes() throws Exception {
        assertTrue(html.select("details:not([open]) figure").size() > 0, "the fixture has folded charts");
        for (Element caption : html.select("figure figcaption")) {
            String words = caption.ownText();
            long inHtml = html.select("figure figcaption").stream().filter(c -> c.ownText().equals(words)).count();
            assertTrue(occurrences(text, words.substring(0, Math.min(50, words.length()))) >= inHtml,
                    "caption printed " + inHtml + " times: " + words);
        }
        int lines = 0;
        for (Element svg : html.select("figure svg")) {
            lines += svg.select("path").size();
        }
        assertTrue(strokes >= lines, "stroked paths " + strokes + " for " + lines
                + " SVG paths in " + html.select("figure").size() + " charts");
    }

    private static long occurrences(String haystack, String needle) {
        long n = 0;
        for (int at = haystack.indexOf(needle); at >= 0; at = haystack.indexOf(needle, at + 1)) {
            n++;
        }
        return n;
    }

    @Test
    void printStyle_keepsEveryColumn_wholeRowsCalloutsAndCharts_andRepeatsHeadings() {
        String print = style.substring(style.indexOf("@media print"));
        assertTrue(print.contains(".scroll { overflow: visible; }"), "no scrolling box hides columns on paper");
        assertTrue(print.contains("white-space: normal"), "cells may wrap on paper");
        assertTrue(print.contains("thead { display: table-header-group; }"), "table headings repeat on every page");
        assertTrue(print.contains("tr, th, td { break-inside: avoid;"), "no table row is split");
        assertTrue(print.contains("p.answer { break-inside: avoid;"), "no callout is split");
        assertTrue(style.contains("figure { margin: 1rem 0 1.2rem; break-inside: avoid;"), "no chart is split");
        assertTrue(style.contains("@bottom-right { content: \"Page \" counter(page) \" of \" counter(pages);"),
                "pages are numbered");
        assertTrue(style.contains("@page {\n  size: a4 portrait;"), "the study's paper, A4 by default, as in the PDF");
    }
}
