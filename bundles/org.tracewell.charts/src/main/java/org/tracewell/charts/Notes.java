package org.tracewell.charts;

import java.awt.Paint;

import org.jfree.chart.annotations.XYPointerAnnotation;

/** Annotations in the chart style: a pointer from a note to a point of a curve. */
final class Notes {

    private Notes() {
    }

    /**
     * A pointer at (x, y) with its text {@code baseRadius} pixels away at {@code angle} (Java2D radians: y grows
     * downwards), on a label background so it stays legible over curves.
     */
    static XYPointerAnnotation pointer(String text, double x, double y, double angle, double baseRadius,
            Paint arrow) {
        XYPointerAnnotation a = new XYPointerAnnotation(text, x, y, angle);
        a.setFont(ChartStyle.NOTE_FONT);
        a.setPaint(ChartStyle.INK);
        a.setArrowPaint(arrow);
        a.setBackgroundPaint(ChartStyle.LABEL_BACKGROUND);
        a.setBaseRadius(baseRadius);
        return a;
    }
}
