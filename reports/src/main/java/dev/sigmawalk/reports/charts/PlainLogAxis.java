package dev.sigmawalk.reports.charts;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.text.AttributedCharacterIterator;
import java.text.AttributedString;
import java.text.CharacterIterator;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.LogTick;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A logarithmic axis whose tick labels are plain strings. The library's log axis labels its ticks
 * with attributed strings (for exponents set as superscripts) and draws them through a text
 * layout, which an SVG or PDF canvas receives as glyph outlines: text a reader cannot select,
 * search or have read aloud. With a number format override the labels carry no attributes worth
 * keeping, so each tick is handed on as a plain {@link NumberTick}, which is drawn as text.
 */
final class PlainLogAxis extends LogAxis {
    private static final long serialVersionUID = 1L;

    PlainLogAxis(String label) {
        super(label);
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        List ticks = super.refreshTicks(g2, state, dataArea, edge);
        List out = new ArrayList<>(ticks.size());
        for (Object t : ticks) {
            out.add(t instanceof LogTick log ? plain(log) : t);
        }
        return out;
    }

    private static ValueTick plain(LogTick tick) {
        return new NumberTick(tick.getTickType(), tick.getValue(), text(tick.getAttributedLabel()), tick.getTextAnchor(),
                tick.getRotationAnchor(), tick.getAngle());
    }

    /** The characters of a label; a minor tick has none. */
    static String text(AttributedString label) {
        if (label == null) {
            return "";
        }
        AttributedCharacterIterator it = label.getIterator();
        StringBuilder sb = new StringBuilder();
        for (char c = it.first(); c != CharacterIterator.DONE; c = it.next()) {
            sb.append(c);
        }
        return sb.toString();
    }
}
