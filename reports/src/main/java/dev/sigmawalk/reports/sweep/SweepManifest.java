package dev.sigmawalk.reports.sweep;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sigmawalk.engine.data.FileFingerprint;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

/**
 * The sweep's {@code manifest.json}: the sweep file and base study with their SHA-256, the grid,
 * the engine, every point's outcome (with the reason of a failure), the grid's evidence, and the
 * start and end times. Each point's own manifest records its inputs.
 */
final class SweepManifest {
    private SweepManifest() {
    }

    /** What the manifest records. */
    record Content(String version, SweepPlan plan, List<PointOutcome> outcomes, GridEvidence evidence, String engine,
                   Instant started, Instant finished) {
    }

    static void write(Path file, Content c) {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("tool", "sigmawalk");
        root.put("version", c.version());
        SweepPlan plan = c.plan();
        root.set("sweep_file", fingerprint(mapper, plan.sweep().file()));
        root.set("base_study", fingerprint(mapper, plan.base().file()));
        root.put("title", plan.sweep().title());
        ArrayNode axes = root.putArray("vary");
        for (Axis a : plan.sweep().axes()) {
            ObjectNode n = axes.addObject().put("key", a.key());
            ArrayNode values = n.putArray("values");
            for (int i = 0; i < a.values().size(); i++) {
                values.add(a.label(i));
            }
        }
        root.put("engine", c.engine());
        ArrayNode points = root.putArray("points");
        for (PointOutcome o : c.outcomes()) {
            GridPoint p = plan.points().get(o.number() - 1);
            ObjectNode n = points.addObject().put("point", p.label())
                    .put("folder", SweepPlan.POINTS + "/" + p.label());
            ObjectNode values = n.putObject("values");
            for (int a = 0; a < plan.keys().size(); a++) {
                values.put(plan.keys().get(a), p.values().get(a));
            }
            n.put("status", o.status().spelling()).put("reason", o.reason()).put("seconds", o.seconds());
        }
        ObjectNode ev = root.putObject("best_point");
        GridEvidence e = c.evidence();
        e.best().ifPresent(b -> ev.put("point", b.point().label()).put("strategy", b.strategy()).put("window", b.window())
                .put("volatility", b.volatility()));
        e.baseline().ifPresent(b -> ev.put("baseline", b.strategy()).put("baseline_volatility", b.volatility()));
        if (e.best().isPresent()) {
            ev.put("bootstrap_pvalue", e.rawPValue()).put("holm_pvalue", e.holmPValue());
            if (Double.isFinite(e.familyPValue())) {
                ev.put("family_pvalue", e.familyPValue());
            }
        }
        GridFamily f = e.family();
        ev.put("comparisons", e.comparisonCount()).put("family_size", f.members().size())
                .put("family_method", "Romano-Wolf studentised stepdown over every variance comparison of every point,"
                        + " on the dates they share (Method \u00a79)")
                .put("common_dates", f.periods());
        f.first().ifPresent(d -> ev.put("common_first", d.toString()));
        f.last().ifPresent(d -> ev.put("common_last", d.toString()));
        f.notFormed().ifPresent(r -> ev.put("family_not_formed", r));
        if (!f.members().isEmpty()) {
            ev.put("block_length", f.blockLength()).put("resamples", c.plan().base().evidence().resamples())
                    .put("seed", c.plan().base().evidence().seed());
        }
        ArrayNode left = ev.putArray("left_out");
        for (GridFamily.LeftOut l : f.leftOut()) {
            left.addObject().put("point", l.comparison().point().label()).put("strategy", l.comparison().strategy())
                    .put("baseline", l.comparison().baseline()).put("window", l.comparison().window())
                    .put("reason", l.reason());
        }
        root.put("started", c.started().toString());
        root.put("finished", c.finished().toString());
        try {
            Files.writeString(file, mapper.writeValueAsString(root) + "\n", StandardCharsets.UTF_8);
        } catch (IOException ex) {
            throw new UncheckedIOException("cannot write " + file, ex);
        }
    }

    private static ObjectNode fingerprint(ObjectMapper mapper, Path file) {
        FileFingerprint f = FileFingerprint.of(file);
        return mapper.createObjectNode().put("path", f.path().toString()).put("bytes", f.bytes()).put("sha256", f.sha256());
    }
}
