package org.tracewell.charts;

import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Tracking of a contour run per axis against time: reference (dashed) and actual position of each axis in mm above,
 * each axis's following error in µm below, its peak marked with the true value. Colours pair an axis's curves.
 */
public final class TrackingChart {

    /** Index of the position subplot and of the following-error subplot. */
    static final int POSITIONS = 0;
    static final int FOLLOWING_ERROR = 1;

    private TrackingChart() {
    }

    public static JFreeChart create(String title, List<AxisTrack> axes, DisplayScale timeScale) {
        return create(title, axes, timeScale, BodeChart.COLUMNS);
    }

    /**
     * @param columns pixel columns to decimate for (min/max per column), e.g. the width the chart is drawn at: fewer
     *                points draw faster and look the same
     */
    public static JFreeChart create(String title, List<AxisTrack> axes, DisplayScale timeScale, int columns) {
        if (axes.isEmpty()) {
            throw new IllegalArgumentException("a tracking chart needs at least one axis");
        }
        XYSeriesCollection positions = new XYSeriesCollection();
        XYSeriesCollection errors = new XYSeriesCollection();
        XYLineAndShapeRenderer positionLines = BodeChart.lines();
        XYLineAndShapeRenderer errorLines = BodeChart.lines();
        // Each series as one path: several times faster to draw than thousands of dashed segments (measured).
        positionLines.setDrawSeriesLineAsPath(true);
        errorLines.setDrawSeriesLineAsPath(true);
        for (int a = 0; a < axes.size(); a++) {
            AxisTrack axis = axes.get(a);
            double[] t = TimeChart.scaled(axis.timeSeconds(), timeScale.factorFromSi());
            positions.addSeries(BodeChart.xySeries(axis.axisName() + " reference", Decimation.minMax(t,
                    TimeChart.scaled(axis.reference(), 1e3), columns, false)));
            positions.addSeries(BodeChart.xySeries(axis.axisName() + " actual", Decimation.minMax(t,
                    TimeChart.scaled(axis.actual(), 1e3), columns, false)));
            errors.addSeries(BodeChart.xySeries(axis.axisName() + " following error", Decimation.minMax(t,
                    TimeChart.scaled(axis.followingError(), 1e6), columns, false)));
            positionLines.setSeriesPaint(2 * a, ChartStyle.seriesPaint(a));
            positionLines.setSeriesStroke(2 * a, ChartStyle.LIMIT_STROKE);
            positionLines.setSeriesPaint(2 * a + 1, ChartStyle.seriesPaint(a));
            errorLines.setSeriesPaint(a, ChartStyle.seriesPaint(a));
        }
        XYPlot positionPlot = new XYPlot(positions, null, new NumberAxis("Position (mm)"), positionLines);
        NumberAxis errorAxis = new NumberAxis("Following error (µm)");
        XYPlot errorPlot = new XYPlot(errors, null, errorAxis, errorLines);
        for (int a = 0; a < axes.size(); a++) {
            AxisTrack axis = axes.get(a);
            if (axis.timeSeconds().length == 0) {
                continue;
            }
            int at = axis.indexOfPeak();
            double peakUm = axis.followingError()[at] * 1e6;
            XYPointerAnnotation peak = Notes.pointer(axis.axisName() + " peak " + Units.format3(peakUm) + " µm",
                    axis.timeSeconds()[at] * timeScale.factorFromSi(), peakUm,
                    peakUm >= 0 ? Math.PI / 4 : -Math.PI / 4, 26 + 30 * a, ChartStyle.seriesPaint(a)); // stacked
            peak.setTextAnchor(peakUm >= 0 ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT);
            errorPlot.addAnnotation(peak);
        }
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(new NumberAxis(timeScale.label()));
        plot.setGap(8);
        plot.add(positionPlot, 2);
        plot.add(errorPlot, 3); // the error is what the view is for
        return ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, true));
    }
}
