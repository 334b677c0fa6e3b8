package org.tracewell.charts;

import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A sweep: one result over one swept attribute, one curve for a 1-D sweep, a family of curves (one per value of the
 * second attribute) for a 2-D sweep. Grid points are marked; a limit is a dashed horizontal line, the nominal value
 * of the swept attribute a vertical note line.
 */
public final class SweepChart {

    private SweepChart() {
    }

    /**
     * @param curves   the curves, in the axes' units; at least one
     * @param limit    the metric's limit (NaN for none), y unit
     * @param nominalX the nominal value of the swept attribute (NaN for none), x unit
     */
    public static JFreeChart create(String title, String xLabel, String yLabel, List<SweepCurve> curves, double limit,
            double nominalX) {
        if (curves.isEmpty()) {
            throw new IllegalArgumentException("a sweep chart needs at least one curve");
        }
        XYSeriesCollection data = new XYSeriesCollection();
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (SweepCurve c : curves) {
            XYSeries s = new XYSeries(c.name(), false, true);
            double[] x = c.x();
            double[] y = c.y();
            for (int i = 0; i < x.length; i++) {
                s.add(x[i], Double.isFinite(y[i]) ? y[i] : null); // a missing point breaks the line
                if (Double.isFinite(y[i])) {
                    low = Math.min(low, y[i]);
                    high = Math.max(high, y[i]);
                }
            }
            data.addSeries(s);
        }
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
        NumberAxis x = new NumberAxis(xLabel);
        x.setAutoRangeIncludesZero(false);
        NumberAxis y = new NumberAxis(yLabel);
        y.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        if (Double.isFinite(limit)) {
            plot.addRangeMarker(BodeChart.limitMarker(limit, "limit " + Units.format3(limit)));
            low = Math.min(low, limit);
            high = Math.max(high, limit);
        }
        if (high > low) { // the limit stays in view even when every point is far from it
            double pad = 0.06 * (high - low);
            y.setAutoRange(false);
            y.setRange(low - pad, high + pad);
        }
        if (Double.isFinite(nominalX)) {
            ValueMarker nominal = BodeChart.noteMarker(nominalX, "nominal " + Units.format3(nominalX));
            plot.addDomainMarker(nominal);
        }
        return ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, curves.size() > 1));
    }
}
