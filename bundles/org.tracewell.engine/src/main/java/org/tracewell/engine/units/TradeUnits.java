package org.tracewell.engine.units;

import java.util.Locale;

/**
 * The one place where SI values become the units machine builders read and type, and back.
 * Everything inside Tracewell is SI; only the edges (views, command line, report) call this.
 */
public final class TradeUnits {

    /** 1 (m/min)/mm expressed in 1/s: (1/60 m/s) / (1e-3 m) = 16.667 1/s [trade]. */
    public static final double PER_SECOND_PER_M_PER_MIN_PER_MM = 1000.0 / 60.0;

    private TradeUnits() {
    }

    /** Position gain from 1/s to (m/min)/mm. */
    public static double kvToMPerMinPerMm(double kvPerSecond) {
        return kvPerSecond / PER_SECOND_PER_M_PER_MIN_PER_MM;
    }

    /** Position gain from (m/min)/mm to 1/s. */
    public static double kvFromMPerMinPerMm(double kvTrade) {
        return kvTrade * PER_SECOND_PER_M_PER_MIN_PER_MM;
    }

    public static double mPerMinFromMPerS(double metresPerSecond) {
        return metresPerSecond * 60.0;
    }

    public static double mPerSFromMPerMin(double metresPerMinute) {
        return metresPerMinute / 60.0;
    }

    public static double micrometres(double metres) {
        return metres * 1e6;
    }

    public static double hertz(double radPerSecond) {
        return radPerSecond / (2 * Math.PI);
    }

    public static double decibels(double ratio) {
        return 20 * Math.log10(ratio);
    }

    /**
     * A number with {@code significant} significant figures, plain notation for everyday
     * magnitudes and scientific notation outside 1e-4…1e7; "∞"/"−∞" and "—" for NaN.
     */
    public static String format(double value, int significant) {
        if (Double.isNaN(value)) {
            return "—";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "∞" : "−∞";
        }
        if (value == 0) {
            return "0";
        }
        double magnitude = Math.abs(value);
        if (magnitude < 1e-4 || magnitude >= 1e7) {
            return String.format(Locale.ROOT, "%." + Math.max(0, significant - 1) + "e", value);
        }
        int decimals = Math.max(0, significant - 1 - (int) Math.floor(Math.log10(magnitude)));
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
