package org.tracewell.ui.views;

import org.tracewell.engine.units.TradeUnits;

/** The few trade-unit texts the contour views print, through the one conversion table ({@link TradeUnits}). */
final class Units {

    private Units() {
    }

    /** Metres as micrometres, three significant figures, e.g. "12.3". */
    static String um(double metres) {
        return TradeUnits.format(TradeUnits.micrometres(metres), 3);
    }

    /** A value to {@code significant} figures. */
    static String plain(double value, int significant) {
        return TradeUnits.format(value, significant);
    }

    /** A feed in m/s as m/min, three significant figures. */
    static String mPerMin(double metresPerSecond) {
        return TradeUnits.format(TradeUnits.mPerMinFromMPerS(metresPerSecond), 3);
    }
}
