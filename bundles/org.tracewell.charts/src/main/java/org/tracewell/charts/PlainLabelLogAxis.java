package org.tracewell.charts;

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
import org.jfree.chart.axis.Tick;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A logarithmic axis whose tick labels are plain strings. {@link LogAxis} hands out attributed labels (for
 * superscript exponents), which Java 2D lays out through its full text-shaping path; with a number format
 * set the labels are plain digits anyway, and drawing them as strings makes a Bode chart several times
 * cheaper to render (the design-review report draws a dozen of them against a time budget).
 */
final class PlainLabelLogAxis extends LogAxis {

    private static final long serialVersionUID = 1L;

    PlainLabelLogAxis(String label) {
        super(label);
    }

    @Override
    @SuppressWarnings({ "rawtypes", "unchecked" })
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        List<Tick> plain = new ArrayList<>();
        for (Object tick : super.refreshTicks(g2, state, dataArea, edge)) {
            if (tick instanceof LogTick log) {
                plain.add(new NumberTick(log.getTickType(), log.getValue(), text(log.getAttributedLabel()),
                        log.getTextAnchor(), log.getRotationAnchor(), log.getAngle()));
            } else {
                plain.add((ValueTick) tick);
            }
        }
        return plain;
    }

    private static String text(AttributedString label) {
        if (label == null) {
            return "";
        }
        AttributedCharacterIterator it = label.getIterator();
        StringBuilder text = new StringBuilder(it.getEndIndex() - it.getBeginIndex());
        for (char c = it.first(); c != CharacterIterator.DONE; c = it.next()) {
            text.append(c);
        }
        return text.toString();
    }
}
