package org.tracewell.charts;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Ramp response of a closed loop: reference v·t and response (mm) above, the error r − y (µm) below, with the
 * steady-state ramp error v/Kv marked (and 1/Kv, the time the response lags the reference by).
 */
public final class RampResponseChart {

    /** Index of the position subplot and of the error subplot. */
    static final int POSITIONS = 0;
    static final int ERROR = 1;

    private RampResponseChart() {
    }

    public static JFreeChart create(String title, RampResponse ramp, DisplayScale timeScale) {
        double[] t = TimeChart.scaled(ramp.timeSeconds(), timeScale.factorFromSi());
        XYSeriesCollection positions = new XYSeriesCollection();
        positions.addSeries(BodeChart.xySeries("reference r = v·t", Decimation.minMax(t,
                TimeChart.scaled(ramp.reference(), 1e3), BodeChart.COLUMNS, false)));
        positions.addSeries(BodeChart.xySeries(ramp.name(), Decimation.minMax(t,
                TimeChart.scaled(ramp.response(), 1e3), BodeChart.COLUMNS, false)));
        XYSeriesCollection error = new XYSeriesCollection(BodeChart.xySeries("error r − y", Decimation.minMax(t,
                TimeChart.scaled(ramp.error(), 1e6), BodeChart.COLUMNS, false)));

        XYLineAndShapeRenderer positionLines = BodeChart.lines();
        positionLines.setSeriesPaint(0, ChartStyle.NOTE);
        positionLines.setSeriesStroke(0, ChartStyle.LIMIT_STROKE);
        positionLines.setSeriesPaint(1, ChartStyle.seriesPaint(0));
        XYPlot positionPlot = new XYPlot(positions, null, new NumberAxis("Position (mm)"), positionLines);
        XYLineAndShapeRenderer errorLines = BodeChart.lines();
        errorLines.setSeriesPaint(0, ChartStyle.seriesPaint(1));
        NumberAxis errorAxis = new NumberAxis("Error (µm)");
        XYPlot errorPlot = new XYPlot(error, null, errorAxis, errorLines);

        double ess = ramp.steadyStateError();
        if (Double.isFinite(ess)) {
            double um = ess * 1e6;
            ValueMarker steady = BodeChart.limitMarker(um, steadyStateLabel(ramp));
            StepResponseChart.belowAtRight(steady);
            errorPlot.addRangeMarker(steady);
            errorAxis.setAutoRangeIncludesZero(true);
        }
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(new NumberAxis(timeScale.label()));
        plot.setGap(8);
        plot.add(positionPlot, 1);
        plot.add(errorPlot, 1);
        String fullTitle = title + " — ramp at " + Units.format3(ramp.velocity() * 60) + " m/min"
                + (Double.isFinite(ess) ? "" : ": the error grows without bound (type 0)");
        return ChartStyle.apply(new JFreeChart(fullTitle, ChartStyle.TITLE_FONT, plot, true));
    }

    /** E.g. "steady error v/Kv = 333 µm (1/Kv = 20.0 ms)". */
    static String steadyStateLabel(RampResponse ramp) {
        if (ramp.unitRampError() == 0) {
            return "steady error 0 (type 2 or higher)";
        }
        return "steady error v/Kv = " + Units.format3(ramp.steadyStateError() * 1e6) + " µm (1/Kv = "
                + Units.format3(ramp.unitRampError() * 1e3) + " ms)";
    }
}
