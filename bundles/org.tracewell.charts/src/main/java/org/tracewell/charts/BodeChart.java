package org.tracewell.charts;

import java.awt.Color;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** Bode diagram: magnitude (dB) over phase (°) on one logarithmic frequency axis in Hz, margins marked. */
public final class BodeChart {

    /** Display resolution of the decimation (pixel columns of a wide chart). */
    static final int COLUMNS = 1600;

    private BodeChart() {
    }

    public static JFreeChart create(String title, List<FrequencySeries> series, Margins margins) {
        return create(title, series, List.of(), margins);
    }

    /**
     * Predicted responses drawn as lines and measured ones as points over them, on the same axes: the chart's
     * convention for "measured against predicted".
     *
     * @param predicted responses computed from the model (lines); may be empty when {@code measured} is not
     * @param measured  measured responses (points), series after the predicted ones in the same datasets
     */
    public static JFreeChart create(String title, List<FrequencySeries> predicted, List<FrequencySeries> measured,
            Margins margins) {
        if (predicted.isEmpty() && measured.isEmpty()) {
            throw new IllegalArgumentException("a Bode chart needs at least one frequency response");
        }
        XYSeriesCollection magnitude = new XYSeriesCollection();
        XYSeriesCollection phase = new XYSeriesCollection();
        addResponses(predicted, magnitude, phase);
        addResponses(measured, magnitude, phase);

        LogAxis frequency = new PlainLabelLogAxis("Frequency (Hz)");
        frequency.setSmallestValue(1e-6);
        frequency.setBase(10);
        frequency.setNumberFormatOverride(new java.text.DecimalFormat("0.####"));
        frequency.setTickUnit(new NumberTickUnit(1)); // one labelled tick per decade
        frequency.setMinorTickCount(9);
        frequency.setMinorTickMarksVisible(true);
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(frequency);
        plot.setGap(8);

        XYPlot magPlot = new XYPlot(magnitude, null, new NumberAxis("Magnitude (dB)"), lines());
        magPlot.addRangeMarker(limitMarker(0, null));
        XYLineAndShapeRenderer phaseLines = lines();
        phaseLines.setDefaultSeriesVisibleInLegend(false); // the magnitude plot's legend items name every series
        XYPlot phasePlot = new XYPlot(phase, null, new NumberAxis("Phase (°)"), phaseLines);
        ((NumberAxis) phasePlot.getRangeAxis()).setAutoRangeIncludesZero(false);
        phasePlot.addRangeMarker(limitMarker(-180, null));
        for (int i = predicted.size(); i < predicted.size() + measured.size(); i++) {
            ChartStyle.showAsMeasured((XYLineAndShapeRenderer) magPlot.getRenderer(), i);
            ChartStyle.showAsMeasured((XYLineAndShapeRenderer) phasePlot.getRenderer(), i);
        }
        plot.add(magPlot, 3);
        plot.add(phasePlot, 2);

        if (Double.isFinite(margins.gainCrossoverRadPerSec())) {
            double hz = Units.hertz(margins.gainCrossoverRadPerSec());
            String text = Double.isFinite(margins.phaseMarginRad())
                    ? String.format(Locale.ROOT, "PM %.1f° at %s Hz", Math.toDegrees(margins.phaseMarginRad()), Units.format3(hz))
                    : String.format(Locale.ROOT, "crossover %s Hz", Units.format3(hz));
            phasePlot.addDomainMarker(noteMarker(hz, text));
            magPlot.addDomainMarker(noteMarker(hz, null));
        }
        if (Double.isFinite(margins.phaseCrossoverRadPerSec())) {
            double hz = Units.hertz(margins.phaseCrossoverRadPerSec());
            String text = Double.isFinite(margins.gainMarginRatio())
                    ? String.format(Locale.ROOT, "GM %.1f dB at %s Hz", Units.decibels(margins.gainMarginRatio()), Units.format3(hz))
                    : null;
            magPlot.addDomainMarker(noteMarker(hz, text));
            phasePlot.addDomainMarker(noteMarker(hz, null));
        }
        JFreeChart chart = new JFreeChart(title, ChartStyle.TITLE_FONT, plot, predicted.size() + measured.size() > 1);
        return ChartStyle.apply(chart);
    }

    /** Hz, dB and degrees of each response into the two collections, decimated to the display resolution. */
    private static void addResponses(List<FrequencySeries> series, XYSeriesCollection magnitude,
            XYSeriesCollection phase) {
        for (FrequencySeries s : series) {
            double[] hz = new double[s.omegaRadPerSec().length];
            double[] db = new double[hz.length];
            double[] deg = new double[hz.length];
            for (int i = 0; i < hz.length; i++) {
                hz[i] = Units.hertz(s.omegaRadPerSec()[i]);
                db[i] = Units.decibels(s.magnitude()[i]);
                deg[i] = Math.toDegrees(s.phaseRad()[i]);
            }
            magnitude.addSeries(xySeries(s.name(), Decimation.minMax(hz, db, COLUMNS, true)));
            phase.addSeries(xySeries(s.name(), Decimation.minMax(hz, deg, COLUMNS, true)));
        }
    }

    static XYSeries xySeries(String name, Decimation.XY xy) {
        XYSeries s = new XYSeries(name, false, true);
        for (int i = 0; i < xy.x().length; i++) {
            s.add(xy.x()[i], xy.y()[i], false);
        }
        return s;
    }

    static XYLineAndShapeRenderer lines() {
        return new XYLineAndShapeRenderer(true, false);
    }

    static ValueMarker limitMarker(double value, String label) {
        ValueMarker marker = new ValueMarker(value, ChartStyle.LIMIT, ChartStyle.LIMIT_STROKE);
        if (label != null) {
            marker.setLabel(label);
            marker.setLabelFont(ChartStyle.NOTE_FONT);
            marker.setLabelPaint(ChartStyle.LIMIT);
            marker.setLabelBackgroundColor(ChartStyle.LABEL_BACKGROUND);
            marker.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            marker.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        }
        return marker;
    }

    static ValueMarker noteMarker(double value, String label) {
        ValueMarker marker = new ValueMarker(value, ChartStyle.NOTE, ChartStyle.LIMIT_STROKE);
        marker.setPaint(new Color(ChartStyle.NOTE.getRed(), ChartStyle.NOTE.getGreen(), ChartStyle.NOTE.getBlue(), 160));
        if (label != null) {
            marker.setLabel(label);
            marker.setLabelFont(ChartStyle.NOTE_FONT);
            marker.setLabelPaint(ChartStyle.INK);
            marker.setLabelBackgroundColor(ChartStyle.LABEL_BACKGROUND);
            marker.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            marker.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        }
        return marker;
    }
}
