package org.tracewell.ui.views;

import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.jfree.chart.JFreeChart;
import org.tracewell.charts.BodeChart;
import org.tracewell.charts.DisplayScale;
import org.tracewell.charts.FrequencySeries;
import org.tracewell.charts.Margins;
import org.tracewell.charts.PoleZeroChart;
import org.tracewell.charts.TimeChart;
import org.tracewell.charts.TimeSeries;
import org.tracewell.engine.loop.FrequencyGrid;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.tf.FrequencyResponse;

/** Turns a loop analysis into the three charts of the Loop Analysis view. */
final class LoopCharts {

    private LoopCharts() {
    }

    static JFreeChart bode(LoopAnalysis analysis) {
        FrequencyResponse response = analysis.loop().frequencyResponse(FrequencyGrid.forLoop(analysis.loop()));
        double[] magnitude = new double[response.size()];
        double[] phaseRad = response.unwrappedPhaseDeg();
        for (int i = 0; i < magnitude.length; i++) {
            magnitude[i] = response.magnitude(i);
            phaseRad[i] = Math.toRadians(phaseRad[i]);
        }
        var m = analysis.margins();
        Margins margins = new Margins(m.gainCrossoverRadPerSec().orElse(Double.NaN), Math.toRadians(m.phaseMarginDeg()),
                m.phaseCrossoverRadPerSec().orElse(Double.NaN), m.gainMarginFactor());
        return BodeChart.create("Open loop L(jω)", List.of(new FrequencySeries("L(jω)", response.omegas(), magnitude, phaseRad)),
                margins);
    }

    static JFreeChart step(LoopAnalysis analysis) {
        if (analysis.step().isEmpty()) {
            return null;
        }
        var response = analysis.step().get();
        return TimeChart.create("Unit-step response of the closed loop",
                List.of(new TimeSeries("y(t)", response.times(), response.values())),
                DisplayScale.SECONDS, DisplayScale.RATIO, Double.NaN, false);
    }

    static JFreeChart poles(LoopAnalysis analysis) {
        return PoleZeroChart.create("Closed-loop poles and zeros", pairs(analysis.closedLoopPoles()),
                pairs(analysis.closedLoopZeros()));
    }

    private static double[][] pairs(List<Complex> roots) {
        double[][] out = new double[roots.size()][];
        for (int i = 0; i < out.length; i++) {
            out[i] = new double[] {roots.get(i).getReal(), roots.get(i).getImaginary()};
        }
        return out;
    }
}
