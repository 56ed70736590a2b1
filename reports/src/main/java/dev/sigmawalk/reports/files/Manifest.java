package dev.sigmawalk.reports.files;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
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
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("tool", "sigmawalk");
        root.put("version", c.version());
        root.set("study", study(mapper, c.study()));
        ArrayNode inputs = root.putArray("inputs");
        for (FileFingerprint f : c.inputs()) {
            inputs.addObject().put("path", f.path().toString()).put("bytes", f.bytes()).put("sha256", f.sha256());
        }
        ObjectNode data = root.putObject("data");
        ReturnPanel p = c.panel();
        data.put("rows", p.rows()).put("assets", p.assetCount()).put("first_date", p.date(0).toString())
                .put("last_date", p.date(p.rows() - 1).toString()).put("periods_per_year", p.periodsPerYear())
                .put("periods_per_year_inferred", c.periodsInferred()).put("market", p.marketName());
        ObjectNode oos = root.putObject("out_of_sample");
        RunResult<?> run = c.run();
        oos.put("first_rebalance", p.date(run.schedule().firstRebalance()).toString())
                .put("rebalances", run.schedule().count()).put("periods", run.dates().length)
                .put("first_date", run.dates()[0].toString())
                .put("last_date", run.dates()[run.dates().length - 1].toString());
        ArrayNode warnings = root.putArray("warnings");
        c.warnings().forEach(warnings::add);
        ArrayNode failed = root.putArray("failed_rebalances");
        for (PathResult path : run.paths()) {
            for (RebalanceRecord r : path.rebalances()) {
                if (r.failure().isPresent()) {
                    failed.addObject().put("strategy", path.strategy()).put("window", path.window())
                            .put("date", r.date().toString()).put("reason", r.failure().get());
                }
            }
        }
        root.put("started", c.started().toString());
        root.put("finished", c.finished().toString());
        root.put("threads", c.threads());
        ObjectNode timing = root.putObject("seconds");
        c.seconds().forEach(timing::put);
        try {
            Files.writeString(file, mapper.writeValueAsString(root) + "\n", StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
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

    private static ObjectNode study(ObjectMapper mapper, Study s) {
        ObjectNode n = mapper.createObjectNode();
        n.put("file", s.file().toString());
        n.put("title", s.title());
        ObjectNode data = n.putObject("data");
        data.put("assets", s.data().assets().toString());
        data.put("layout", s.data().layout().spelling());
        data.put("values", s.data().values().spelling());
        data.put("market", describe(s.data().market()));
        data.put("riskfree", describe(s.data().riskFree()));
        s.data().sectors().ifPresent(p -> data.put("sectors", p.toString()));
        s.data().periodsPerYear().ifPresent(v -> data.put("periods_per_year", v));
        ObjectNode wf = n.putObject("walkforward");
        ArrayNode windows = wf.putArray("windows");
        s.walkForward().windows().forEach(windows::add);
        if (s.walkForward().rebalance() instanceof RebalanceRule.EveryRows e) {
            wf.put("rebalance_every", e.rows());
        } else {
            wf.put("rebalance", ((RebalanceRule.CalendarEnd) s.walkForward().rebalance()).calendar().spelling());
        }
        s.walkForward().start().ifPresent(d -> wf.put("start", d.toString()));
        s.walkForward().end().ifPresent(d -> wf.put("end", d.toString()));
        wf.put("cost_bps", s.walkForward().costBps());
        ArrayNode strategies = n.putArray("strategies");
        for (StrategySpec st : s.strategies()) {
            ObjectNode o = strategies.addObject();
            o.put("name", st.name()).put("risk", st.risk().spelling()).put("objective", st.objective().spelling());
            o.put("shrinkage_target", st.shrinkageTarget().spelling());
            st.bounds().ifPresent(b -> o.putArray("bounds").add(b.lower()).add(b.upper()));
            o.put("risk_aversion", st.riskAversion());
            o.put("expected_returns", st.expectedReturns().spelling());
            st.alphas().ifPresent(a -> o.put("alphas", a.toString()));
            st.marketPremium().ifPresent(v -> o.put("market_premium", v));
            st.baseline().ifPresent(v -> o.put("baseline", v));
        }
        ObjectNode ev = n.putObject("evidence");
        ev.put("resamples", s.evidence().resamples()).put("seed", s.evidence().seed())
                .put("block_length", s.evidence().blockLength());
        n.putObject("report").put("paper", s.report().paper().spelling());
        n.put("output", s.output().toString());
        return n;
    }
}
