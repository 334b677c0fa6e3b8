package org.tracewell.charts;

import java.util.Locale;

/** The few SI-to-display conversions the charts need. */
final class Units {

    private Units() {
    }

    static double hertz(double radPerSec) {
        return radPerSec / (2 * Math.PI);
    }

    static double decibels(double ratio) {
        return 20 * Math.log10(ratio);
    }

    /** Three significant figures without exponent for everyday magnitudes. */
    static String format3(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return String.valueOf(v);
        }
        int digits = Math.max(0, 2 - (int) Math.floor(Math.log10(Math.abs(v))));
        return String.format(Locale.ROOT, "%." + digits + "f", v);
    }
}
