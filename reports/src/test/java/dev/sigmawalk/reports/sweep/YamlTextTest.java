package dev.sigmawalk.reports.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sigmawalk.engine.study.YamlNode;
import dev.sigmawalk.engine.study.YamlTree;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** YAML written by the sweep reads back as the same nodes (YAML 1.2 double-quoted and flow styles). */
class YamlTextTest {
    private static final Path FILE = Path.of("/virtual/study.yaml");

    @Test
    void document_readsBackAsTheSameTree() {
        String source = String.join("\n",
                "title: 'Quotes \" and \\\\ and: colons'",
                "data:",
                "  assets: a b/assets.csv",
                "walkforward:",
                "  windows: [36, 60]",
                "  start: 2006-01-31",
                "  cost_bps: 1.5e1",
                "strategies:",
                "  - name: x",
                "    bounds: [0, 0.10]",
                "    flags: {on: true, off: null}",
                "  - name: \"yes\"",
                "nested: [[1, 2], [3]]",
                "");
        YamlNode.Mapping tree = (YamlNode.Mapping) YamlTree.parse(FILE, source);
        String written = YamlText.document(tree);
        YamlNode again = YamlTree.parse(FILE, written);
        assertEquals(YamlText.flow(tree), YamlText.flow(again), written);
        assertEquals("[0, 0.10]", YamlText.flow(((YamlNode.Mapping) ((YamlNode.Sequence) tree.entries().get("strategies")
                .value()).items().get(0)).entries().get("bounds").value()), "numbers keep their spelling");
    }

    @Test
    void flow_quotesTextSoThatDatesAndWordsStayText() {
        assertEquals("\"2006-01-31\"", YamlText.flow(new YamlNode.Scalar("2006-01-31", YamlNode.Scalar.Kind.STRING, 1, 1)));
        assertEquals("\"a\\nb\\t\\\"c\\\"\"", YamlText.flow(new YamlNode.Scalar("a\nb\t\"c\"", YamlNode.Scalar.Kind.STRING, 1, 1)));
        assertEquals("null", YamlText.flow(new YamlNode.Scalar(null, YamlNode.Scalar.Kind.NULL, 1, 1)));
    }
}
