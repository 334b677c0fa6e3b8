package org.tracewell.charts;

import java.awt.BasicStroke;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** Closed-loop poles (×) and zeros (○) in the s-plane, in 1/s. */
public final class PoleZeroChart {

    private PoleZeroChart() {
    }

    /** @param poles and zeros as {@code [re, im]} pairs in 1/s */
    public static JFreeChart create(String title, double[][] poles, double[][] zeros) {
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(points("poles", poles));
        data.addSeries(points("zeros", zeros));
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        renderer.setSeriesShape(0, cross(5));
        renderer.setSeriesShape(1, new Ellipse2D.Double(-4.5, -4.5, 9, 9));
        renderer.setSeriesShapesFilled(1, false);
        renderer.setUseOutlinePaint(false);
        renderer.setSeriesStroke(0, new BasicStroke(1.8f));
        renderer.setSeriesStroke(1, new BasicStroke(1.4f));
        NumberAxis re = new NumberAxis("Real part (1/s)");
        NumberAxis im = new NumberAxis("Imaginary part (1/s)");
        XYPlot plot = new XYPlot(data, re, im, renderer);
        plot.addDomainMarker(new ValueMarker(0, ChartStyle.NOTE, new BasicStroke(0.8f)));
        plot.addRangeMarker(new ValueMarker(0, ChartStyle.NOTE, new BasicStroke(0.8f)));
        return ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true));
    }

    private static XYSeries points(String name, double[][] roots) {
        XYSeries s = new XYSeries(name, false, true);
        for (double[] root : roots) {
            if (root.length != 2) {
                throw new IllegalArgumentException(name + ": each root is [re, im], got " + root.length + " numbers");
            }
            s.add(root[0], root[1], false);
        }
        return s;
    }

    private static Shape cross(double half) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(-half, -half);
        p.lineTo(half, half);
        p.moveTo(-half, half);
        p.lineTo(half, -half);
        return new BasicStroke(1.8f).createStrokedShape(p);
    }
}
