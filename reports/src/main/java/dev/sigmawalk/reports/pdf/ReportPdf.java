package dev.sigmawalk.reports.pdf;

import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import com.openhtmltopdf.util.XRLog;
import dev.sigmawalk.reports.charts.RenderedChart;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;
import org.jsoup.helper.W3CDom;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;

/**
 * Writes {@code report.pdf} from {@code report.html}: the same content, laid out by the report's
 * own print style sheet on the paper its {@code @page} rule names (the study's
 * {@code report.paper}, A4 or Letter), with the charts drawn as vector graphics, every folded
 * section unfolded and every page numbered. The fonts (DejaVu Sans, under the Bitstream Vera
 * licence shipped beside them) are packed in the jar, so the PDF looks the same on every machine
 * and shows the Greek letters and marks the report uses.
 */
public final class ReportPdf {
    private static final String FONT_FAMILY = "DejaVu Sans";
    private static final String REGULAR = "DejaVuSans.ttf";
    private static final String BOLD = "DejaVuSans-Bold.ttf";
    /** Width of a chart on the page: two charts side by side fill the text width on A4 and on Letter. */
    private static final double CHART_MM = 88;
    private static final Pattern VIEW_BOX = Pattern.compile("\\s*[-0-9.]+\\s+[-0-9.]+\\s+([0-9.]+)\\s+([0-9.]+)\\s*");

    /**
     * Layout rules the PDF renderer needs beyond the print style sheet: it lays out neither grids
     * nor folded sections, so charts sit two to a row and every section is open.
     */
    private static final String PDF_STYLE = "body { font-family: '" + FONT_FAMILY + "', sans-serif; }\n"
            + "details, summary { display: block; }\n"
            + ".matrices, .figures { display: block; }\n"
            + ".figures figure { display: inline-block; width: 49%; vertical-align: top; margin: 0 0 3mm; }\n";

    private ReportPdf() {
    }

    /**
     * Writes the PDF from the report's page as the HTML writer wrote it.
     *
     * @param html the page's markup
     * @param folder the folder the page lives in (relative references resolve against it)
     * @param charts charts drawn from their chart objects, by the id of their {@code <svg>} element;
     *               any other SVG is drawn from its markup
     * @param pdf the PDF to create or replace
     */
    public static void write(String html, Path folder, List<RenderedChart> charts, Path pdf) throws IOException {
        // The renderer logs every font it loads and every style it skips on standard error; a
        // run's standard error is kept for the tool's own progress and warnings.
        XRLog.setLoggingEnabled(false);
        // PDFBox logs through Commons Logging, which would hand over to an SLF4J without a
        // backend and print a notice about it; the tool logs nothing of the PDF library's.
        System.getProperties().putIfAbsent("org.apache.commons.logging.LogFactory",
                "org.apache.commons.logging.impl.LogFactoryImpl");
        System.getProperties().putIfAbsent("org.apache.commons.logging.Log", "org.apache.commons.logging.impl.NoOpLog");
        String base = folder.toAbsolutePath().toUri().toString();
        Document doc = Jsoup.parse(html, base);
        ChartPainter painter = new ChartPainter(charts);
        prepare(doc, painter);
        try (OutputStream out = Files.newOutputStream(pdf)) {
            PdfRendererBuilder builder = new PdfRendererBuilder();
            builder.useFastMode();
            builder.useSVGDrawer(painter);
            builder.useFont(() -> font(REGULAR), FONT_FAMILY, 400, BaseRendererBuilder.FontStyle.NORMAL, true);
            builder.useFont(() -> font(BOLD), FONT_FAMILY, 700, BaseRendererBuilder.FontStyle.NORMAL, true);
            builder.withW3cDocument(new W3CDom().fromJsoup(doc), base);
            builder.withProducer("sigmawalk");
            builder.toStream(out);
            builder.run();
        }
    }

    /**
     * Unfolds every section, adds the PDF layout rules and gives every chart its size on paper;
     * the markup inside a chart the painter draws from its chart object is dropped, so the
     * renderer neither copies nor styles it.
     */
    static void prepare(Document doc, ChartPainter painter) {
        for (Element d : doc.select("details")) {
            d.attr("open", "");
        }
        doc.head().appendElement("style").appendText(PDF_STYLE);
        for (Element svg : doc.select("figure svg")) {
            Matcher m = VIEW_BOX.matcher(svg.attr("viewBox"));
            if (painter.draws(svg.id())) {
                svg.empty();
            }
            if (m.matches()) {
                double w = Double.parseDouble(m.group(1));
                double h = Double.parseDouble(m.group(2));
                // The renderer reads only whole numbers in a viewBox; the charts are drawn on whole pixels.
                svg.attr("viewBox", String.format(Locale.ROOT, "0 0 %d %d", Math.round(w), Math.round(h)));
                svg.attr("style", String.format(Locale.ROOT, "width: %.1fmm; height: %.1fmm;", CHART_MM,
                        CHART_MM * h / w));
            }
        }
    }

    private static InputStream font(String name) {
        InputStream in = ReportPdf.class.getResourceAsStream(name);
        if (in == null) {
            throw new UncheckedIOException(new IOException("font " + name + " is missing from the jar"));
        }
        return in;
    }
}
