package org.tracewell.report;

import java.util.OptionalDouble;

import org.tracewell.engine.units.TradeUnits;
import org.tracewell.requirements.DisplayUnits;

/**
 * Number text for the report. SI → trade conversions go through {@link TradeUnits} (µm, m/min,
 * (m/min)/mm, Hz, dB) and, for plain decimal prefixes and degrees, {@link DisplayUnits}; the figures are
 * formatted by {@link TradeUnits#format}.
 */
final class Fmt {

    /** Significant figures of every figure in the report. */
    static final int DIGITS = 3;

    private Fmt() {
    }

    static String num(double value) {
        return TradeUnits.format(value, DIGITS);
    }

    static String num(OptionalDouble value) {
        return value.isPresent() ? num(value.getAsDouble()) : "—";
    }

    static String um(double metres) {
        return num(TradeUnits.micrometres(metres));
    }

    static String um(OptionalDouble metres) {
        return metres.isPresent() ? um(metres.getAsDouble()) : "—";
    }

    /** A length in µm below 1 mm and in mm from there, with its unit (following errors span both). */
    static String length(double metres) {
        return Math.abs(metres) < 1e-3 ? um(metres) + " µm" : mm(metres) + " mm";
    }

    static String mm(double metres) {
        return num(DisplayUnits.fromSi(metres, "m", "mm"));
    }

    static String ms(double seconds) {
        return num(DisplayUnits.fromSi(seconds, "s", "ms"));
    }

    static String deg(double radians) {
        return num(DisplayUnits.fromSi(radians, "rad", "deg"));
    }

    static String mPerMin(double metresPerSecond) {
        return num(TradeUnits.mPerMinFromMPerS(metresPerSecond));
    }

    static String kvTrade(double perSecond) {
        return num(TradeUnits.kvToMPerMinPerMm(perSecond));
    }

    static String hz(double radPerSecond) {
        return num(TradeUnits.hertz(radPerSecond));
    }

    static String hz(OptionalDouble radPerSecond) {
        return radPerSecond.isPresent() ? hz(radPerSecond.getAsDouble()) : "—";
    }

    static String db(double ratio) {
        return num(TradeUnits.decibels(ratio));
    }

    static String percent(double fraction) {
        return num(100 * fraction) + " %";
    }
}
