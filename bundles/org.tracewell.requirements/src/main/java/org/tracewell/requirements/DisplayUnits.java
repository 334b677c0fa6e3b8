package org.tracewell.requirements;

import java.util.Locale;

import org.tracewell.engine.units.TradeUnits;

/**
 * Converts a requirement's SI value to the display unit its model entry names (the edge conversion for requirement
 * values; the factors themselves come from {@link TradeUnits} where it has them).
 */
public final class DisplayUnits {

    private DisplayUnits() {
    }

    /**
     * @param si          value in {@code siUnit}
     * @param siUnit      "m", "rad", "1", "Hz", "s", "1/s"
     * @param displayUnit µm, mm, m, nm, deg, rad, dB, Hz, ms, s, 1/s, (m/min)/mm, or empty for the SI unit itself
     */
    public static double fromSi(double si, String siUnit, String displayUnit) {
        String unit = displayUnit == null ? "" : displayUnit.trim();
        if (unit.isEmpty() || unit.equals(siUnit)) {
            return si;
        }
        return switch (unit.toLowerCase(Locale.ROOT)) {
            case "µm", "um", "μm" -> TradeUnits.micrometres(si);
            case "mm" -> si * 1e3;
            case "nm" -> si * 1e9;
            case "deg", "°" -> Math.toDegrees(si);
            case "db" -> TradeUnits.decibels(si);
            case "ms" -> si * 1e3;
            case "(m/min)/mm" -> TradeUnits.kvToMPerMinPerMm(si);
            case "khz" -> si / 1e3;
            default -> throw new IllegalArgumentException("display unit '" + displayUnit + "' is not known for SI unit "
                    + siUnit + "; use µm, mm, m, deg, dB, Hz, ms, s, 1/s or (m/min)/mm");
        };
    }

    /** True when {@link #fromSi} knows {@code displayUnit}. */
    public static boolean isKnown(String displayUnit, String siUnit) {
        try {
            fromSi(1.0, siUnit, displayUnit);
            return true;
        } catch (IllegalArgumentException unknown) {
            return false;
        }
    }

    /** The unit shown: the display unit, or the SI unit when none is given. */
    public static String shown(String siUnit, String displayUnit) {
        return displayUnit == null || displayUnit.isBlank() ? siUnit : displayUnit.trim();
    }
}
