package org.tracewell.charts;

import java.awt.Graphics2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.axis.AxisSpace;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.PlotState;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.data.xy.XYDataset;

/**
 * An XY plot whose data area is square wherever the chart puts it: with {@link EqualAspect}'s equal data spans, a
 * circle is drawn round however much room the title, the legend and the subtitles take (a circle test read as an
 * ellipse would show a distortion the machine does not have). The plot shrinks its area, centred, before drawing.
 */
final class SquarePlot extends XYPlot {

    private static final long serialVersionUID = 1L;

    SquarePlot(XYDataset dataset, ValueAxis domainAxis, ValueAxis rangeAxis, XYItemRenderer renderer) {
        super(dataset, domainAxis, rangeAxis, renderer);
    }

    @Override
    public void draw(Graphics2D g2, Rectangle2D area, Point2D anchor, PlotState parentState, PlotRenderingInfo info) {
        super.draw(g2, squareDataArea(g2, area), anchor, parentState, info);
    }

    /** The part of {@code area} whose data area (inside the insets and the axes' room) is a centred square. */
    private Rectangle2D squareDataArea(Graphics2D g2, Rectangle2D area) {
        Rectangle2D inner = area.getBounds2D();
        getInsets().trim(inner);
        AxisSpace space = calculateAxisSpace(g2, inner);
        Rectangle2D data = space.shrink(inner, null);
        double extraWidth = data.getWidth() - data.getHeight();
        if (Math.abs(extraWidth) < 0.5 || data.getWidth() <= 0 || data.getHeight() <= 0) {
            return area;
        }
        double dx = Math.max(0, extraWidth);
        double dy = Math.max(0, -extraWidth);
        return new Rectangle2D.Double(area.getX() + dx / 2, area.getY() + dy / 2, area.getWidth() - dx,
                area.getHeight() - dy);
    }
}
