package org.tracewell.charts;

import java.awt.Color;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Unit-step response of a closed loop with its figures marked: the final value, the settling band around it, the
 * peak (with the overshoot) and the settling instant.
 */
public final class StepResponseChart {

    private StepResponseChart() {
    }

    /** @param timeScale how time is shown (s or ms) */
    public static JFreeChart create(String title, TimeSeries response, StepFigures figures, DisplayScale timeScale) {
        if (response.timeSeconds().length == 0) {
            throw new IllegalArgumentException("step response '" + response.name() + "' has no samples");
        }
        double[] t = TimeChart.scaled(response.timeSeconds(), timeScale.factorFromSi());
        XYSeriesCollection data = new XYSeriesCollection(
                BodeChart.xySeries(response.name(), Decimation.minMax(t, response.value(), BodeChart.COLUMNS, false)));
        NumberAxis time = new NumberAxis(timeScale.label());
        NumberAxis value = new NumberAxis("Output for a unit step");
        value.setAutoRangeIncludesZero(true);
        XYPlot plot = new XYPlot(data, time, value, BodeChart.lines());

        double yEnd = figures.finalValue();
        double half = figures.settlingBand() * Math.abs(yEnd);
        IntervalMarker band = new IntervalMarker(yEnd - half, yEnd + half, new Color(0x4A, 0x55, 0x68, 28));
        plot.addRangeMarker(band, Layer.BACKGROUND);
        ValueMarker finalLine = BodeChart.noteMarker(yEnd, "final value " + Units.format3(yEnd) + ", band ±"
                + Units.format3(100 * figures.settlingBand()) + " %");
        belowAtRight(finalLine);
        plot.addRangeMarker(finalLine);
        if (Double.isFinite(figures.settlingTimeSeconds())) {
            double shown = figures.settlingTimeSeconds() * timeScale.factorFromSi();
            ValueMarker settled = BodeChart.noteMarker(shown, "settled at " + Units.format3(shown) + " " + timeScale.unit());
            settled.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            settled.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            plot.addDomainMarker(settled);
        }
        if (Double.isFinite(figures.peakTimeSeconds()) && figures.overshootPercent() > 0) {
            double shown = figures.peakTimeSeconds() * timeScale.factorFromSi();
            XYPointerAnnotation peak = Notes.pointer(String.format(Locale.ROOT, "overshoot %s %% at %s %s",
                    Units.format3(figures.overshootPercent()), Units.format3(shown), timeScale.unit()), shown,
                    figures.peakValue(), Math.PI / 4, 30, ChartStyle.NOTE); // down and right: clear of the top edge
            peak.setTextAnchor(TextAnchor.TOP_LEFT);
            plot.addAnnotation(peak);
        }
        return ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, false));
    }

    /** The label of a horizontal line under it at the right end, inside the plot and off a curve that settles on it. */
    static void belowAtRight(ValueMarker marker) {
        marker.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
        marker.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
    }
}
