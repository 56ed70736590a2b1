package dev.sigmawalk.reports.browser;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Element;

/**
 * Lays a report out in headless Chromium at an exact width and measures it: the report is shown
 * in a frame of that width (a headless window has a minimum width of its own), and a short
 * script in the frame's parent measures it once it has loaded, so the report itself carries no
 * script. Each layout is also saved as a screenshot for a person to look at.
 */
public final class BrowserProbe {
    private static final List<String> BROWSERS = List.of("chromium", "chromium-browser", "google-chrome",
            "chrome-headless-shell");
    /** A box may overhang by a rounding pixel. */
    public static final int SLACK = 1;
    private static final long TIMEOUT_SECONDS = 120;

    /**
     * The page's and the viewport's width, the elements outside a scrolling box whose right edge
     * passes the viewport ({@code past}), and every scrolling box whose content is wider than the
     * box ({@code hidden}).
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

    private final String browser;

    private BrowserProbe(String browser) {
        this.browser = browser;
    }

    /** What {@link #find()} looks for, for a skip message. */
    public static String lookedFor() {
        return BROWSERS + " on the PATH, or the program SIGMAWALK_BROWSER names";
    }

    /** The browser {@code SIGMAWALK_BROWSER} names, else the first of {@link #BROWSERS} on the path. */
    public static Optional<BrowserProbe> find() {
        String named = System.getenv("SIGMAWALK_BROWSER");
        if (named != null && !named.isBlank()) {
            return Optional.of(new BrowserProbe(named));
        }
        String path = System.getenv("PATH");
        for (String name : BROWSERS) {
            for (String folder : path == null ? new String[0] : path.split(File.pathSeparator)) {
                Path candidate = Path.of(folder, name);
                if (Files.isExecutable(candidate)) {
                    return Optional.of(new BrowserProbe(candidate.toString()));
                }
            }
        }
        return Optional.empty();
    }

    /**
     * @param report the report file; the frame page and the browser's profile go beside it
     * @param width the layout width in CSS pixels
     * @param screenshot where the picture of the layout is written
     * @return {@code viewport}, {@code page} (widths), {@code past} and {@code hidden} (lists of elements)
     */
    public JsonNode measure(Path report, int width, Path screenshot) throws IOException, InterruptedException {
        Path dir = report.toAbsolutePath().getParent();
        Path frame = dir.resolve("frame-" + width + ".html");
        Files.writeString(frame, "<!DOCTYPE html><html><body style=\"margin:0\"><iframe id=\"f\" src=\""
                + report.getFileName() + "\" style=\"width:" + width + "px;height:1000px;border:0\"></iframe>" + PROBE
                + "</body></html>", StandardCharsets.UTF_8);
        Path shot = screenshot.toAbsolutePath();
        Files.createDirectories(shot.getParent());
        Files.deleteIfExists(shot);
        Process p = new ProcessBuilder(browser, "--headless", "--no-sandbox", "--disable-gpu",
                "--allow-file-access-from-files", "--user-data-dir=" + dir.resolve(".browser-profile-" + width),
                "--window-size=" + (width + 40) + ",1040", "--virtual-time-budget=5000", "--screenshot=" + shot,
                "--dump-dom", frame.toUri().toString()).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String dom = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS), "the browser finished");
        Element probe = Jsoup.parse(dom).getElementById("probe");
        assertTrue(probe != null, browser + " laid out the report (exit " + p.exitValue() + ")");
        assertTrue(Files.size(shot) > 0, "screenshot " + shot);
        return new ObjectMapper().readTree(probe.text());
    }
}
