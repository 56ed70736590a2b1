package dev.sigmawalk.reports.files;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import dev.sigmawalk.engine.data.FileFingerprint;
import dev.sigmawalk.engine.data.ReturnPanel;
import dev.sigmawalk.engine.run.PathResult;
import dev.sigmawalk.engine.run.RebalanceRecord;
import dev.sigmawalk.engine.run.RunResult;
import dev.sigmawalk.engine.study.RebalanceRule;
import dev.sigmawalk.engine.study.SeriesSource;
import dev.sigmawalk.engine.study.StrategySpec;
import dev.sigmawalk.engine.study.Study;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

/**
 * {@code manifest.json}: what was run, on what, by which version, and what went wrong along the
 * way, so that a result can be traced and reproduced.
 */
public final class Manifest {
    private Manifest() {
    }

    /** Everything the manifest records. */
    public record Content(String version, Study study, ReturnPanel panel, boolean periodsInferred,
                          List<FileFingerprint> inputs, RunResult<?> run, List<String> warnings, Instant started,
                          Instant finished, int threads, Map<String, Double> seconds) {
    }

    public static void write(Path file, Content c) {
        StringWriter text = new StringWriter();
        try (JsonGenerator g = new JsonFactory().createGenerator(text)) {
            g.setPrettyPrinter(new DefaultPrettyPrinter());
            content(g, c);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
        try {
            Files.writeString(file, text + "\n", StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    /**
     * The manifest's fields, written as they are known: a run reads a streaming JSON writer's
     * classes only, not those of a whole object-mapping layer.
     */
    private static void content(JsonGenerator g, Content c) throws IOException {
        g.writeStartObject();
        g.writeStringField("tool", "sigmawalk");
        g.writeStringField("version", c.version());
        g.writeFieldName("study");
        study(g, c.study());
        g.writeArrayFieldStart("inputs");
        for (FileFingerprint f : c.inputs()) {
            g.writeStartObject();
            g.writeStringField("path", f.path().toString());
            g.writeNumberField("bytes", f.bytes());
            g.writeStringField("sha256", f.sha256());
            g.writeEndObject();
        }
        g.writeEndArray();
        ReturnPanel p = c.panel();
        g.writeObjectFieldStart("data");
        g.writeNumberField("rows", p.rows());
        g.writeNumberField("assets", p.assetCount());
        g.writeStringField("first_date", p.date(0).toString());
        g.writeStringField("last_date", p.date(p.rows() - 1).toString());
        g.writeNumberField("periods_per_year", p.periodsPerYear());
        g.writeBooleanField("periods_per_year_inferred", c.periodsInferred());
        g.writeStringField("market", p.marketName());
        g.writeEndObject();
        RunResult<?> run = c.run();
        g.writeObjectFieldStart("out_of_sample");
        g.writeStringField("first_rebalance", p.date(run.schedule().firstRebalance()).toString());
        g.writeNumberField("rebalances", run.schedule().count());
        g.writeNumberField("periods", run.dates().length);
        g.writeStringField("first_date", run.dates()[0].toString());
        g.writeStringField("last_date", run.dates()[run.dates().length - 1].toString());
        g.writeEndObject();
        g.writeArrayFieldStart("warnings");
        for (String w : c.warnings()) {
            g.writeString(w);
        }
        g.writeEndArray();
        g.writeArrayFieldStart("failed_rebalances");
        for (PathResult path : run.paths()) {
            for (RebalanceRecord r : path.rebalances()) {
                if (r.failure().isPresent()) {
                    g.writeStartObject();
                    g.writeStringField("strategy", path.strategy());
                    g.writeNumberField("window", path.window());
                    g.writeStringField("date", r.date().toString());
                    g.writeStringField("reason", r.failure().get());
                    g.writeEndObject();
                }
            }
        }
        g.writeEndArray();
        g.writeStringField("started", c.started().toString());
        g.writeStringField("finished", c.finished().toString());
        g.writeNumberField("threads", c.threads());
        g.writeObjectFieldStart("seconds");
        for (Map.Entry<String, Double> e : c.seconds().entrySet()) {
            g.writeNumberField(e.getKey(), e.getValue());
        }
        g.writeEndObject();
        g.writeEndObject();
    }

    private static String describe(SeriesSource source) {
        if (source instanceof SeriesSource.File f) {
            return f.path().toString();
        }
        if (source instanceof SeriesSource.Column c) {
            return "column " + c.name();
        }
        return "annual rate " + ((SeriesSource.AnnualRate) source).rate();
    }

    private static void study(JsonGenerator g, Study s) throws IOException {
        g.writeStartObject();
        g.writeStringField("file", s.file().toString());
        g.writeStringField("title", s.title());
        g.writeObjectFieldStart("data");
        g.writeStringField("assets", s.data().assets().toString());
        g.writeStringField("layout", s.data().layout().spelling());
        g.writeStringField("values", s.data().values().spelling());
        g.writeStringField("market", describe(s.data().market()));
        g.writeStringField("riskfree", describe(s.data().riskFree()));
        if (s.data().sectors().isPresent()) {
            g.writeStringField("sectors", s.data().sectors().get().toString());
        }
        if (s.data().periodsPerYear().isPresent()) {
            g.writeNumberField("periods_per_year", s.data().periodsPerYear().getAsInt());
        }
        g.writeEndObject();
        g.writeObjectFieldStart("walkforward");
        g.writeArrayFieldStart("windows");
        for (int w : s.walkForward().windows()) {
            g.writeNumber(w);
        }
        g.writeEndArray();
        if (s.walkForward().rebalance() instanceof RebalanceRule.EveryRows e) {
            g.writeNumberField("rebalance_every", e.rows());
        } else {
            g.writeStringField("rebalance", ((RebalanceRule.CalendarEnd) s.walkForward().rebalance()).calendar().spelling());
        }
        if (s.walkForward().start().isPresent()) {
            g.writeStringField("start", s.walkForward().start().get().toString());
        }
        if (s.walkForward().end().isPresent()) {
            g.writeStringField("end", s.walkForward().end().get().toString());
        }
        g.writeNumberField("cost_bps", s.walkForward().costBps());
        g.writeEndObject();
        g.writeArrayFieldStart("strategies");
        for (StrategySpec st : s.strategies()) {
            strategy(g, st);
        }
        g.writeEndArray();
        g.writeObjectFieldStart("evidence");
        g.writeNumberField("resamples", s.evidence().resamples());
        g.writeNumberField("seed", s.evidence().seed());
        g.writeNumberField("block_length", s.evidence().blockLength());
        g.writeEndObject();
        g.writeObjectFieldStart("report");
        g.writeStringField("paper", s.report().paper().spelling());
        g.writeEndObject();
        g.writeStringField("output", s.output().toString());
        g.writeEndObject();
    }

    private static void strategy(JsonGenerator g, StrategySpec st) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", st.name());
        g.writeStringField("risk", st.risk().spelling());
        g.writeStringField("objective", st.objective().spelling());
        g.writeStringField("shrinkage_target", st.shrinkageTarget().spelling());
        if (st.bounds().isPresent()) {
            g.writeArrayFieldStart("bounds");
            g.writeNumber(st.bounds().get().lower());
            g.writeNumber(st.bounds().get().upper());
            g.writeEndArray();
        }
        g.writeNumberField("risk_aversion", st.riskAversion());
        g.writeStringField("expected_returns", st.expectedReturns().spelling());
        if (st.alphas().isPresent()) {
            g.writeStringField("alphas", st.alphas().get().toString());
        }
        if (st.marketPremium().isPresent()) {
            g.writeNumberField("market_premium", st.marketPremium().getAsDouble());
        }
        if (st.baseline().isPresent()) {
            g.writeStringField("baseline", st.baseline().get());
        }
        g.writeEndObject();
    }
}
