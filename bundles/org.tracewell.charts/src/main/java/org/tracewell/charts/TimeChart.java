package org.tracewell.charts;

import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeriesCollection;

/** Signals against time: step and ramp responses, following error per axis. */
public final class TimeChart {

    private TimeChart() {
    }

    /**
     * @param valueScale how the SI values are shown (e.g. µm for following error)
     * @param limitSi an optional horizontal limit in SI (NaN for none), drawn at ± when {@code symmetric}
     */
    public static JFreeChart create(String title, List<TimeSeries> series, DisplayScale timeScale,
            DisplayScale valueScale, double limitSi, boolean symmetric) {
        if (series.isEmpty()) {
            throw new IllegalArgumentException("a time chart needs at least one series");
        }
        XYSeriesCollection data = new XYSeriesCollection();
        for (TimeSeries s : series) {
            double[] t = scaled(s.timeSeconds(), timeScale.factorFromSi());
            double[] v = scaled(s.value(), valueScale.factorFromSi());
            data.addSeries(BodeChart.xySeries(s.name(), Decimation.minMax(t, v, BodeChart.COLUMNS, false)));
        }
        NumberAxis time = new NumberAxis(timeScale.label());
        NumberAxis value = new NumberAxis(valueScale.label());
        value.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, time, value, BodeChart.lines());
        if (Double.isFinite(limitSi)) {
            double shown = limitSi * valueScale.factorFromSi();
            plot.addRangeMarker(BodeChart.limitMarker(shown, "limit " + Units.format3(shown) + " " + valueScale.unit()));
            if (symmetric) {
                plot.addRangeMarker(BodeChart.limitMarker(-shown, null));
            }
        }
        return ChartStyle.apply(new JFreeChart(title, ChartStyle.TITLE_FONT, plot, series.size() > 1));
    }

    static double[] scaled(double[] values, double factor) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i] * factor;
        }
        return out;
    }
}
