package dev.sigmawalk.reports.pdf;

import java.io.IOException;
import org.apache.pdfbox.contentstream.PDContentStream;
import org.apache.pdfbox.contentstream.operator.Operator;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdfparser.PDFStreamParser;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;

/** Counts the stroke operators a PDF's pages draw, those inside the form XObjects they use included (a chart is a form). */
public final class PdfStrokes {
    private static final int MAX_DEPTH = 4;

    private PdfStrokes() {
    }

    public static int of(PDDocument pdf) throws IOException {
        int n = 0;
        for (PDPage page : pdf.getPages()) {
            n += of(page, page.getResources(), 0);
        }
        return n;
    }

    private static int of(PDContentStream content, PDResources resources, int depth) throws IOException {
        int n = 0;
        for (Object token : new PDFStreamParser(content).parse()) {
            if (token instanceof Operator op && op.getName().equals("S")) {
                n++;
            }
        }
        if (resources != null && depth < MAX_DEPTH) {
            for (COSName name : resources.getXObjectNames()) {
                if (resources.getXObject(name) instanceof PDFormXObject form) {
                    n += of(form, form.getResources(), depth + 1);
                }
            }
        }
        return n;
    }
}
