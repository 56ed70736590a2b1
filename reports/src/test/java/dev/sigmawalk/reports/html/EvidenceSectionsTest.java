package dev.sigmawalk.reports.html;

import dev.sigmawalk.engine.compare.Comparison;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class EvidenceSectionsTest {
    private ReportData data;
    private Document doc;

    /** One report with evidence serves every test that reads it: rendering is the slow part. */
    @BeforeAll
    void renderWithEvidence(@TempDir Path dir) throws Exception {
        data = EvidenceFixture.data();
        doc = render(data, dir);
    }

    private static Document render(ReportData data, Path dir) throws Exception {
        Path out = dir.resolve("report.html");
        new ReportWriter().write(data, out, dir.resolve("charts"));
        return Jsoup.parse(Files.readString(out, StandardCharsets.UTF_8));
    }

    /**
     * Input-list sizes: for n = 50 the full model needs 50 + 50·51/2 = 1 325 estimates and the
     * single-index model 3·50 + 2 = 152 (common practice, no published source; the check values'
     * README lists the same), 1 − 152/1325 = 88.53 % fewer.
     */
    @Test
    void givenEvidence_rendersItsThreeSections() {
        for (String id : new String[] {"single-index-check", "differences", "input-list"}) {
            Element s = doc.getElementById(id);
            assertNotNull(s, id);
            assertTrue(s.selectFirst("p.answer").text().length() > 30, id);
            assertFalse(s.select("tbody tr").isEmpty(), id + " has rows");
        }
        String answer = doc.getElementById("input-list").selectFirst("p.answer").text();
        assertTrue(answer.contains("1,325") && answer.contains("152") && answer.contains("88.53 %"), answer);
        assertFalse(doc.getElementById("single-index-check").select("figure svg path").isEmpty(), "residual chart");
    }

    /** The Sharpe ratios shown are the tests' per-period estimates times √12, two decimals. */
    @Test
    void differencesTable_showsAnnualisedSharpeRatiosOfTheTests() {
        Elements rows = doc.getElementById("differences").select("tbody tr");
        assertEquals(data.evidence().comparisons().size(), rows.size());
        for (int k = 0; k < rows.size(); k++) {
            Comparison c = data.evidence().comparisons().get(k);
            var t = c.sharpe().orElseThrow();
            String expected = String.format(Locale.ROOT, "%.2f vs %.2f", Math.sqrt(12) * t.first(), Math.sqrt(12) * t.second());
            assertEquals(expected, rows.get(k).select("td").get(3).text(), "row " + k);
            assertEquals(c.strategy(), rows.get(k).select("td").get(0).text());
        }
    }

    /**
     * A variance test whose dependence outlasts its bandwidth (Method §9) is marked in its row's
     * note, and the notes under the table say what the mark means; the fixture's own tests (a
     * monthly history too short for the check) carry no mark.
     */
    @Test
    void varianceTestsWhoseDependenceOutlastsTheBandwidth_areMarked(@TempDir Path dir) throws Exception {
        Elements plain = doc.getElementById("differences").select("tbody tr");
        for (Element row : plain) {
            assertFalse(row.text().contains(EvidenceSections.LINGERING_NOTE), row.text());
        }
        java.util.List<Comparison> marked = new java.util.ArrayList<>();
        for (Comparison c : data.evidence().comparisons()) {
            marked.add(c.variance().isPresent() && marked.isEmpty() && c.skipped().isEmpty() ? flagged(c) : c);
        }
        ReportEvidence e = data.evidence();
        Document flaggedDoc = render(new ReportData(data.study(), data.run(), data.summaries(), data.record(),
                new ReportEvidence(e.diagnostics(), marked, e.inputList(), e.factorDiagnostics())), dir);
        Element section = flaggedDoc.getElementById("differences");
        Elements rows = section.select("tbody tr");
        assertEquals(EvidenceSections.LINGERING_NOTE, rows.get(0).select("td").last().text());
        for (int k = 1; k < rows.size(); k++) {
            assertFalse(rows.get(k).text().contains(EvidenceSections.LINGERING_NOTE), rows.get(k).text());
        }
        assertTrue(section.select("p.sub").text().contains("Marked \"variance p-values may be too small\": in 1 of"
                + " these comparisons"), section.select("p.sub").text());
    }

    private static Comparison flagged(Comparison c) {
        var v = c.variance().orElseThrow();
        var t = new dev.sigmawalk.engine.evidence.DifferenceTest(v.measure(), v.kernel(), v.periods(), v.first(),
                v.second(), v.difference(), v.standardError(), v.statistic(), v.hacPValue(), v.bootstrapPValue(),
                v.bandwidth(), v.blockLength(), v.resamples(), 5.0);
        return new Comparison(c.strategy(), c.baseline(), c.window(), c.sharpe(), java.util.Optional.of(t),
                c.jobsonKorkie(), c.holmSharpe(), c.holmVariance(), c.skipped(), c.familySharpe(), c.familyVariance());
    }

    /**
     * Counts of rejections at 5 % in the diagnostics table agree with the diagnostics given: CD and
     * the adjusted LM first, Breusch-Pagan last (over-sized, shown for continuity).
     */
    @Test
    void diagnosticsTable_countsRejectionsAtFivePercent() {
        Elements rows = doc.getElementById("single-index-check").select("tbody tr");
        assertEquals(data.evidence().diagnostics().size(), rows.size());
        for (int k = 0; k < rows.size(); k++) {
            WindowDiagnostics w = data.evidence().diagnostics().get(k);
            int n = w.points().size();
            long cd = w.points().stream().filter(p -> p.diagnostics().cdPValue() <= 0.05).count();
            long adj = w.points().stream().filter(p -> p.diagnostics().lmAdjPValue() <= 0.05).count();
            long lm = w.points().stream().filter(p -> p.diagnostics().lmPValue() <= 0.05).count();
            Elements cells = rows.get(k).select("td");
            assertEquals(String.format(Locale.ROOT, "%.2f %%", 100.0 * cd / n), cells.get(4).text(), "CD " + w.window());
            assertEquals(String.format(Locale.ROOT, "%.2f %%", 100.0 * adj / n), cells.get(5).text(), "LM_adj " + w.window());
            assertEquals(String.format(Locale.ROOT, "%.2f %%", 100.0 * lm / n), cells.get(8).text(), "LM " + w.window());
        }
    }

    @Test
    void noEvidence_leavesTheDiagnosticSectionsOut_butSaysTheTestsWereNotRun(@TempDir Path dir) throws Exception {
        Document doc = render(ReportFixture.data(), dir);
        assertNull(doc.getElementById("single-index-check"));
        assertNull(doc.getElementById("input-list"));
        Element differences = doc.getElementById("differences");
        assertNotNull(differences, "the significance section never disappears silently");
        assertEquals("The significance tests were not run for this report.", differences.selectFirst("p.answer").text());
        assertFalse(doc.select("nav a[href=#differences]").isEmpty(), "and it keeps its contents entry");
    }

    @Test
    void noShrinkageStrategy_leavesTheShrinkageSectionOut(@TempDir Path dir) throws Exception {
        Document doc = render(ReportFixture.withoutShrinkage(), dir);
        assertNull(doc.getElementById("shrinkage"));
        assertTrue(doc.select("nav a[href=#shrinkage]").isEmpty(), "no contents entry either");
        assertNotNull(doc.getElementById("windows"));
    }

    /**
     * Where a large window's mean |ρ| and largest pairs were computed at some rebalances only
     * (every other one here), the table's average uses those rebalances, the chart draws them,
     * the test counts use every rebalance and a note says how many rebalances had the mean.
     */
    @Test
    void thinnedAllPairsStatistics_areAveragedWhereComputed_andSaidSo(@TempDir Path dir) throws Exception {
        java.util.List<WindowDiagnostics> thinned = new java.util.ArrayList<>();
        for (WindowDiagnostics w : data.evidence().diagnostics()) {
            java.util.List<DiagnosticsPoint> points = new java.util.ArrayList<>();
            for (int k = 0; k < w.points().size(); k++) {
                DiagnosticsPoint p = w.points().get(k);
                boolean keep = k % 2 == 0 || k == w.points().size() - 1;
                points.add(keep ? p : new DiagnosticsPoint(p.date(), p.diagnostics().withMeanAbsCorrelation(Double.NaN),
                        java.util.List.of(), p.sectors()));
            }
            thinned.add(new WindowDiagnostics(w.window(), points));
        }
        ReportEvidence base = data.evidence();
        ReportData thin = new ReportData(data.study(), data.run(), data.summaries(), data.record(),
                new ReportEvidence(thinned, base.comparisons(), base.inputList(), base.factorDiagnostics()));
        Element section = render(thin, dir).getElementById("single-index-check");
        Elements rows = section.select("tbody tr");
        for (int k = 0; k < thinned.size(); k++) {
            WindowDiagnostics w = thinned.get(k);
            double mean = w.points().stream().filter(p -> p.diagnostics().hasMeanAbsCorrelation())
                    .mapToDouble(p -> p.diagnostics().meanAbsCorrelation()).average().orElseThrow();
            assertEquals(Formats.ratio(mean), rows.get(k).select("td").get(2).text(), "window " + w.window());
            assertEquals(Integer.toString(w.points().size()), rows.get(k).select("td").get(1).text());
            long with = w.points().stream().filter(p -> p.diagnostics().hasMeanAbsCorrelation()).count();
            assertTrue(section.text().contains(with + " of " + w.points().size() + " rebalances with the " + w.window()
                    + "-period window"), section.text());
        }
        assertFalse(section.text().contains("NaN"), "no NaN reaches the page");
        assertFalse(section.select("figure svg path").isEmpty(), "residual chart");
    }
}
