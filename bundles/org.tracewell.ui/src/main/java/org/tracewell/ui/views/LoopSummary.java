package org.tracewell.ui.views;

import static org.tracewell.engine.units.TradeUnits.format;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.SteadyState;
import org.tracewell.engine.loop.SteadyStateErrors;
import org.tracewell.engine.loop.StepMetrics;
import org.tracewell.engine.units.TradeUnits;
import org.tracewell.model.units.UnitSystem;

/** The results table of the Loop Analysis view, in the units a machine builder reads. */
final class LoopSummary {

    private LoopSummary() {
    }

    static List<String[]> rows(LoopAnalysis a) {
        List<String[]> rows = new ArrayList<>();
        SteadyState ss = a.steadyState();
        rows.add(row("System type", Integer.toString(ss.systemType())));
        rows.add(row("Kp", format(ss.kp(), 4)));
        UnitSystem units = UnitSystem.active();
        rows.add(row("Kv", format(ss.kv(), 4) + " 1/s" + (Double.isFinite(ss.kv()) && ss.kv() > 0
                ? " = " + format(TradeUnits.kvToMPerMinPerMm(ss.kv()) * units.perMetricUnit("(m/min)/mm"), 3) + " "
                        + units.shown("(m/min)/mm") : "")));
        rows.add(row("Ka", withUnit(ss.ka(), "1/s²")));
        rows.add(row("Closed loop", a.stable() ? "stable" : "UNSTABLE"));
        if (a.steadyStateErrors().isPresent()) {
            SteadyStateErrors e = a.steadyStateErrors().get();
            rows.add(row("Error, unit step", format(e.unitStep(), 4)));
            rows.add(row("Error, unit ramp", withUnit(e.unitRamp(), "s")));
            rows.add(row("Error, unit parabola", withUnit(e.unitParabola(), "s²")));
            rows.add(row("Parabola convention", SteadyStateErrors.PARABOLA_CONVENTION));
            double followingAt1 = e.ramp(TradeUnits.mPerSFromMPerMin(1.0));
            // Inch display: at 1 m/min still (a round feed of the trade in either system), the error in µin.
            rows.add(row("Following error at 1 m/min", format(TradeUnits.micrometres(followingAt1)
                    * units.perMetricUnit("µm"), 4) + " " + units.shown("µm")));
        } else {
            rows.add(row("Steady-state errors", "none: closed loop not stable"));
        }
        Margins m = a.margins();
        rows.add(row("Gain margin", withUnit(m.gainMarginDb(), "dB") + at(m.phaseCrossoverRadPerSec())));
        rows.add(row("Phase margin", withUnit(m.phaseMarginDeg(), "°") + at(m.gainCrossoverRadPerSec())));
        a.delayMarginSeconds().ifPresent(d -> rows.add(row("Delay margin", format(d * 1e3, 4) + " ms")));
        a.sensitivityPeak().ifPresent(p -> rows.add(row("Sensitivity peak Ms", format(p.peak(), 4)
                + " at " + format(TradeUnits.hertz(p.frequencyRadPerSec()), 4) + " Hz")));
        a.bandwidthRadPerSec().ifPresent(b -> rows.add(row("Bandwidth (−3 dB)", format(TradeUnits.hertz(b), 4) + " Hz")));
        a.step().ifPresent(s -> {
            StepMetrics metrics = s.metrics();
            rows.add(row("Step final value", format(metrics.finalValue(), 4)));
            rows.add(row("Overshoot", optional(metrics.overshootPercent(), 1, " %")));
            rows.add(row("Peak time", optional(metrics.peakTimeSeconds(), 1e3, " ms")));
            rows.add(row("Rise time 10–90 %", optional(metrics.riseTimeSeconds(), 1e3, " ms")));
            rows.add(row("Settling time (2 % band)", optional(metrics.settlingTimeSeconds(), 1e3, " ms")));
        });
        for (Complex p : a.closedLoopPoles()) {
            rows.add(row("Closed-loop pole", format(p.getReal(), 4) + (p.getImaginary() >= 0 ? " + " : " − ")
                    + format(Math.abs(p.getImaginary()), 4) + "j 1/s"));
        }
        return rows;
    }

    /** A unit only on finite values: "∞", not "∞ s²". */
    private static String withUnit(double value, String unit) {
        if (!Double.isFinite(value)) {
            return format(value, 4);
        }
        return format(value, 4) + (unit.equals("°") ? unit : " " + unit);
    }

    private static String at(OptionalDouble omega) {
        return omega.isPresent() ? " at " + format(TradeUnits.hertz(omega.getAsDouble()), 4) + " Hz" : "";
    }

    private static String optional(OptionalDouble value, double factor, String unit) {
        return value.isPresent() ? format(value.getAsDouble() * factor, 4) + unit : "—";
    }

    private static String[] row(String quantity, String value) {
        return new String[] {quantity, value};
    }
}
