package dev.sigmawalk.reports.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sigmawalk.reports.cli.SigmawalkCommand;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sample universe's README shows how close the estimated betas come to the true ones: this
 * test runs the monthly sample data (one equal-weight strategy; the estimates do not depend on
 * the strategies), reads {@code estimates.csv} and {@code truth.csv}, and checks that the table
 * between the README's markers is exactly the one made from them. Run with
 * {@code -Dsigmawalk.regenerate=true} to write the table instead (after the data change).
 *
 * <p>Per sector: the mean true β of its companies; per window, the mean estimated β over every
 * company and monthly rebalance, and the mean absolute error |β̂ - β| (truth from the generator's {@code truth.csv}).
 * The estimates must also be close to the truth: overall mean absolute error below 0.25 with the
 * 120-month window (sampling error of β̂ with σ_i/σ_m ≈ 2 over 120 months is about 0.2; from memory,
 * common practice).
 */
class SampleBetaTableTest {
    static final String BEGIN = "<!-- beta table: made by SampleBetaTableTest from a run; do not edit by hand -->";
    static final String END = "<!-- end of beta table -->";
    private static final Path SAMPLE = Path.of("..", "sample-universe");
    private static final List<Integer> WINDOWS = List.of(36, 60, 120);

    @Test
    void readmeBetaTable_isTheOneARunGives(@TempDir Path dir) throws IOException {
        Path study = dir.resolve("betas.yaml");
        String data = SAMPLE.toAbsolutePath().normalize().toString().replace('\\', '/');
        Files.writeString(study, String.join("\n",
                "title: beta recovery on the sample universe",
                "data:",
                "  assets: " + data + "/assets-monthly.csv",
                "  values: returns",
                "  market: " + data + "/market-monthly.csv",
                "  riskfree: " + data + "/riskfree-monthly.csv",
                "  periods_per_year: 12",
                "walkforward:",
                "  windows: [36, 60, 120]",
                "  rebalance_every: 1",
                "  cost_bps: 10",
                "strategies:",
                "  - name: equal",
                "    objective: equal-weight",
                ""), StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        StringWriter err = new StringWriter();
        var cl = SigmawalkCommand.commandLine();
        cl.setErr(new PrintWriter(err));
        cl.setOut(new PrintWriter(new StringWriter()));
        assertEquals(0, cl.execute("run", study.toString(), "--out", out.toString(), "--quiet"), err.toString());
        Map<String, String[]> truth = truth();
        String table = table(Files.readAllLines(out.resolve("estimates.csv")), truth);
        Path readme = SAMPLE.resolve("README.md");
        String text = Files.readString(readme, StandardCharsets.UTF_8);
        int begin = text.indexOf(BEGIN);
        int end = text.indexOf(END);
        assertTrue(begin >= 0 && end > begin, "README.md of the sample universe must hold the table markers");
        String current = text.substring(begin + BEGIN.length(), end);
        if (Boolean.getBoolean("sigmawalk.regenerate")) {
            Files.writeString(readme, text.substring(0, begin + BEGIN.length()) + table + text.substring(end),
                    StandardCharsets.UTF_8);
        } else {
            assertEquals(table, current, "regenerate with -Dsigmawalk.regenerate=true");
        }
    }

    /** asset to {sector, beta} from truth.csv. */
    private static Map<String, String[]> truth() throws IOException {
        Map<String, String[]> out = new LinkedHashMap<>();
        List<String> lines = Files.readAllLines(SAMPLE.resolve("truth.csv"));
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            out.put(f[0], new String[] {f[1], f[2]});
        }
        return out;
    }

    /** The markdown table, with a blank line before and after so it renders between the markers. */
    static String table(List<String> estimates, Map<String, String[]> truth) {
        // sector -> window -> {sum true, sum estimated, sum |error|, count}
        Map<String, Map<Integer, double[]>> acc = new TreeMap<>();
        Map<Integer, double[]> all = new TreeMap<>();
        for (String line : estimates.subList(1, estimates.size())) {
            String[] f = line.split(",");
            int window = Integer.parseInt(f[1]);
            String[] t = truth.get(f[2]);
            double trueBeta = Double.parseDouble(t[1]);
            double beta = Double.parseDouble(f[4]);
            for (double[] a : new double[][] {acc.computeIfAbsent(t[0], k -> new TreeMap<>())
                    .computeIfAbsent(window, k -> new double[4]), all.computeIfAbsent(window, k -> new double[4])}) {
                a[0] += trueBeta;
                a[1] += beta;
                a[2] += Math.abs(beta - trueBeta);
                a[3]++;
            }
        }
        assertTrue(all.get(120)[2] / all.get(120)[3] < 0.25, "mean |beta error| at 120 months");
        StringBuilder b = new StringBuilder("\n\n| sector | companies | mean true β |");
        for (int w : WINDOWS) {
            b.append(" mean β̂, ").append(w).append(" months | mean \\|β̂ − β\\|, ").append(w).append(" months |");
        }
        b.append("\n|---|---|---|");
        b.append("---|---|".repeat(WINDOWS.size()));
        b.append('\n');
        for (Map.Entry<String, Map<Integer, double[]>> e : acc.entrySet()) {
            b.append(row(e.getKey(), trueBetas(truth, e.getKey()), e.getValue()));
        }
        b.append(row("all", trueBetas(truth, null), all));
        return b.append('\n').toString();
    }

    /** The true betas of a sector's companies (every company for {@code null}). */
    private static double[] trueBetas(Map<String, String[]> truth, String sector) {
        return truth.values().stream().filter(t -> sector == null || t[0].equals(sector))
                .mapToDouble(t -> Double.parseDouble(t[1])).toArray();
    }

    private static String row(String name, double[] trueBetas, Map<Integer, double[]> byWindow) {
        List<String> cells = new ArrayList<>();
        cells.add(name);
        cells.add(Integer.toString(trueBetas.length));
        cells.add(String.format(Locale.ROOT, "%.2f", java.util.Arrays.stream(trueBetas).average().orElseThrow()));
        for (int w : WINDOWS) {
            double[] a = byWindow.get(w);
            cells.add(String.format(Locale.ROOT, "%.2f", a[1] / a[3]));
            cells.add(String.format(Locale.ROOT, "%.3f", a[2] / a[3]));
        }
        return "| " + String.join(" | ", cells) + " |\n";
    }
}
