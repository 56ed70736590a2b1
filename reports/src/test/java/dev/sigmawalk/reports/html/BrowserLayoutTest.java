package dev.sigmawalk.reports.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report in a real browser, headless Chromium, at a phone's 400 px and a desktop's 1,400 px:
 * the page never scrolls sideways (only a wide table may, inside its own box), and at 1,400 px no
 * table hides a column. Each width is also saved as a screenshot under
 * {@code target/browser-layout/} for a person to look at. The report is laid out in a frame of
 * the exact width (a headless window has a minimum width of its own), and a short script in the
 * frame's parent measures it; the report itself carries no script. Skipped, saying so, where no
 * Chromium is installed; {@code SIGMAWALK_BROWSER} names one that is not on the path.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class BrowserLayoutTest {
    private static final List<String> BROWSERS = List.of("chromium", "chromium-browser", "google-chrome",
            "chrome-headless-shell");
    private static final Path SCREENSHOTS = Path.of("target", "browser-layout");
    private static final int PHONE = 400;
    private static final int DESKTOP = 1400;
    /** A box may overhang by a rounding pixel. */
    private static final int SLACK = 1;
    private static final long TIMEOUT_SECONDS = 120;

    /**
     * Measures the framed report once it has loaded: the page's and the viewport's width, the
     * elements outside a scrolling box whose right edge passes the viewport, and every scrolling
     * box whose content is wider than the box.
     */
    private static final String PROBE = "<script>\n"
            + "document.getElementById('f').addEventListener('load', () => {\n"
            + "  const w = document.getElementById('f').contentWindow, d = w.document, root = d.documentElement;\n"
            + "  const name = e => e.tagName.toLowerCase() + (e.id ? '#' + e.id : '') + (e.className ? '.' + e.className : '');\n"
            + "  const past = [...d.querySelectorAll('body *')].filter(e => !e.closest('.scroll')"
            + " && e.getBoundingClientRect().right > root.clientWidth + " + SLACK + ").map(name);\n"
            + "  const hidden = [...d.querySelectorAll('.scroll')].filter(e => e.scrollWidth > e.clientWidth + " + SLACK
            + ").map(e => name(e.firstElementChild) + ' ' + e.scrollWidth + '>' + e.clientWidth);\n"
            + "  const out = d.createElement('pre');\n"
            + "  out.textContent = JSON.stringify({viewport: root.clientWidth, page: root.scrollWidth, past, hidden});\n"
            + "  out.id = 'probe'; document.body.appendChild(out);\n"
            + "});\n"
            + "</script>";

    private Optional<String> browser;
    private Path dir;

    @BeforeAll
    void writeReport(@TempDir Path dir) throws IOException {
        this.dir = dir;
        browser = findBrowser();
        if (browser.isPresent()) {
            new ReportWriter().write(ReportFixture.data(), dir.resolve("report.html"), dir.resolve("charts"));
        }
    }

    @Test
    void phone_400px_neverScrollsSideways() throws Exception {
        JsonNode m = measure(PHONE);
        assertTrue(m.get("page").asInt() <= m.get("viewport").asInt() + SLACK, "page " + m);
        assertEquals(0, m.get("past").size(), "elements past the right edge: " + m.get("past"));
    }

    @Test
    void desktop_1400px_hidesNoColumn() throws Exception {
        JsonNode m = measure(DESKTOP);
        assertTrue(m.get("page").asInt() <= m.get("viewport").asInt() + SLACK, "page " + m);
        assertEquals(0, m.get("past").size(), "elements past the right edge: " + m.get("past"));
        assertEquals(0, m.get("hidden").size(), "tables wider than their box: " + m.get("hidden"));
    }

    private JsonNode measure(int width) throws Exception {
        Assumptions.assumeTrue(browser.isPresent(), "no Chromium or headless shell found (looked for " + BROWSERS
                + " on the PATH and SIGMAWALK_BROWSER): the browser layout check at 400 and 1,400 px is skipped");
        Path frame = dir.resolve("frame-" + width + ".html");
        Files.writeString(frame, "<!DOCTYPE html><html><body style=\"margin:0\"><iframe id=\"f\" src=\"report.html\""
                + " style=\"width:" + width + "px;height:1000px;border:0\"></iframe>" + PROBE + "</body></html>",
                StandardCharsets.UTF_8);
        Files.createDirectories(SCREENSHOTS);
        Path shot = SCREENSHOTS.resolve("report-" + width + "px.png").toAbsolutePath();
        Files.deleteIfExists(shot);
        List<String> command = new ArrayList<>(List.of(browser.get(), "--headless", "--no-sandbox", "--disable-gpu",
                "--allow-file-access-from-files", "--user-data-dir=" + dir.resolve("profile-" + width),
                "--window-size=" + (width + 40) + ",1040", "--virtual-time-budget=5000",
                "--screenshot=" + shot, "--dump-dom", frame.toUri().toString()));
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String dom = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS), "the browser finished");
        Element probe = Jsoup.parse(dom).getElementById("probe");
        assertTrue(probe != null, "the browser laid out the report (exit " + p.exitValue() + ")");
        assertTrue(Files.size(shot) > 0, "screenshot " + shot);
        return new ObjectMapper().readTree(probe.text());
    }

    private static Optional<String> findBrowser() {
        String named = System.getenv("SIGMAWALK_BROWSER");
        if (named != null && !named.isBlank()) {
            return Optional.of(named);
        }
        String path = System.getenv("PATH");
        for (String name : BROWSERS) {
            for (String folder : path == null ? new String[0] : path.split(File.pathSeparator)) {
                Path candidate = Path.of(folder, name);
                if (Files.isExecutable(candidate)) {
                    return Optional.of(candidate.toString());
                }
            }
        }
        return Optional.empty();
    }
}
