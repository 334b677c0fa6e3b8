package org.tracewell.ui.views;

import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.jfree.chart.JFreeChart;
import org.tracewell.charts.BodeChart;
import org.tracewell.charts.DisplayScale;
import org.tracewell.charts.FrequencySeries;
import org.tracewell.charts.Margins;
import org.tracewell.charts.NyquistChart;
import org.tracewell.charts.PoleZeroChart;
import org.tracewell.charts.RampResponse;
import org.tracewell.charts.RampResponseChart;
import org.tracewell.charts.StepFigures;
import org.tracewell.charts.StepResponseChart;
import org.tracewell.charts.TimeSeries;
import org.tracewell.engine.loop.FrequencyGrid;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.StepMetrics;
import org.tracewell.engine.loop.StepResponse;
import org.tracewell.engine.tf.FrequencyResponse;
import org.tracewell.engine.units.TradeUnits;

/** Turns a loop analysis into the charts of the Loop Analysis view. */
final class LoopCharts {

    /** The ramp the ramp-response chart shows: 1 m/min, the feed the results table quotes following error at. */
    static final double RAMP_VELOCITY = TradeUnits.mPerSFromMPerMin(1.0);

    private LoopCharts() {
    }

    /** The chart of tab {@code index} of {@link LoopAnalysisView#CHART_TABS}; null where it does not apply. */
    static JFreeChart forTab(LoopAnalysis analysis, int index) {
        return switch (index) {
            case 0 -> bode(analysis, openLoop(analysis));
            case 1 -> nyquist(analysis, openLoop(analysis));
            case 2 -> step(analysis);
            case 3 -> ramp(analysis);
            case 4 -> poles(analysis);
            default -> throw new IllegalArgumentException("no chart tab " + index + "; the tabs are "
                    + LoopAnalysisView.CHART_TABS);
        };
    }

    /** L(jω) on the loop's own grid, phase unwrapped: the Bode and the Nyquist chart draw the same points. */
    static FrequencySeries openLoop(LoopAnalysis analysis) {
        FrequencyResponse response = analysis.loop().frequencyResponse(FrequencyGrid.forLoop(analysis.loop()));
        double[] magnitude = new double[response.size()];
        double[] phaseRad = response.unwrappedPhaseDeg();
        for (int i = 0; i < magnitude.length; i++) {
            magnitude[i] = response.magnitude(i);
            phaseRad[i] = Math.toRadians(phaseRad[i]);
        }
        return new FrequencySeries("L(jω)", response.omegas(), magnitude, phaseRad);
    }

    static JFreeChart bode(LoopAnalysis analysis, FrequencySeries open) {
        var m = analysis.margins();
        Margins margins = new Margins(m.gainCrossoverRadPerSec().orElse(Double.NaN), Math.toRadians(m.phaseMarginDeg()),
                m.phaseCrossoverRadPerSec().orElse(Double.NaN), m.gainMarginFactor());
        return BodeChart.create("Open loop L(jω)", List.of(open), margins);
    }

    static JFreeChart nyquist(LoopAnalysis analysis, FrequencySeries open) {
        double ms = analysis.sensitivityPeak().map(p -> p.peak()).orElse(Double.NaN);
        double at = analysis.sensitivityPeak().map(p -> p.frequencyRadPerSec()).orElse(Double.NaN);
        return NyquistChart.create("Nyquist diagram of L(jω)", open, ms, at);
    }

    static JFreeChart step(LoopAnalysis analysis) {
        if (analysis.step().isEmpty()) {
            return null;
        }
        StepResponse response = analysis.step().get();
        StepMetrics m = response.metrics();
        double[] t = response.times();
        StepFigures figures = new StepFigures(m.finalValue(), m.peakValue(), m.peakTimeSeconds().orElse(Double.NaN),
                m.overshootPercent().orElse(Double.NaN), m.settlingTimeSeconds().orElse(Double.NaN), 0.02);
        return StepResponseChart.create("Unit-step response of the closed loop",
                new TimeSeries("y(t)", t, response.values()), figures, timeScale(t));
    }

    static JFreeChart ramp(LoopAnalysis analysis) {
        if (analysis.step().isEmpty() || analysis.steadyStateErrors().isEmpty()) {
            return null;
        }
        StepResponse response = analysis.step().get();
        double[] t = response.times();
        RampResponse ramp = RampResponse.fromStep("y(t)", t, response.values(), RAMP_VELOCITY,
                analysis.steadyStateErrors().get().unitRamp());
        return RampResponseChart.create("Ramp response of the closed loop", ramp, timeScale(t));
    }

    static JFreeChart poles(LoopAnalysis analysis) {
        return PoleZeroChart.create("Closed-loop poles and zeros", pairs(analysis.closedLoopPoles()),
                pairs(analysis.closedLoopZeros()));
    }

    /** Milliseconds for servo loops (settled within a second), seconds for slower ones. */
    private static DisplayScale timeScale(double[] t) {
        return t.length > 0 && t[t.length - 1] < 1 ? DisplayScale.MILLISECONDS : DisplayScale.SECONDS;
    }

    private static double[][] pairs(List<Complex> roots) {
        double[][] out = new double[roots.size()][];
        for (int i = 0; i < out.length; i++) {
            out[i] = new double[] {roots.get(i).getReal(), roots.get(i).getImaginary()};
        }
        return out;
    }
}
