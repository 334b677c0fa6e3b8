package org.tracewell.ui.editor;

import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tracewell.model.units.TradeUnit;
import org.tracewell.model.units.UnitTable;

/**
 * Reads a value typed in trade units — a number and an optional unit, e.g. {@code "3 m/min"}, {@code "33.3 1/s"},
 * {@code "2 (m/min)/mm"}, {@code "50"} — and returns it in SI. A missing unit means the unit the field shows. Any unit
 * of the same quantity is accepted ({@code "40 1/s"} for a gain shown in (m/min)/mm); anything else is refused with a
 * message that names the text and what would be valid.
 */
public final class TradeValueParser {

    /** A decimal number with optional exponent; the decimal separator is a point. */
    private static final Pattern NUMBER_AND_UNIT = Pattern
            .compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

    /** What people type for units whose symbol has a character that is not on the keyboard. */
    private static final Map<String, String> KEYBOARD_SPELLINGS = Map.ofEntries(Map.entry("um", "µm"),
            Map.entry("us", "µs"), Map.entry("°", "deg"), Map.entry("N/um", "N/µm"), Map.entry("kg*m^2", "kg·m²"),
            Map.entry("kg*cm^2", "kg·cm²"), Map.entry("m/s^2", "m/s²"), Map.entry("m/s^3", "m/s³"),
            Map.entry("rpm", "rev/min"), Map.entry("uin", "µin"), Map.entry("in/s^2", "in/s²"),
            Map.entry("in/s^3", "in/s³"),
            // The inch trade's shorthand: feed in "ipm", position gain in "ipm/mil".
            Map.entry("ipm", "in/min"), Map.entry("ipm/mil", "(in/min)/mil"));

    private TradeValueParser() {
    }

    /**
     * @param text        what was typed
     * @param siUnit      the SI unit the model stores (empty when the attribute declares none: a plain number)
     * @param displayUnit the unit the field shows, used when the text names none (empty: same as {@code siUnit})
     * @return the value in {@code siUnit}
     * @throws IllegalArgumentException naming the text and the accepted form
     */
    public static double toSi(String text, String siUnit, String displayUnit) {
        String shown = displayUnit == null || displayUnit.isBlank() ? siUnit : displayUnit;
        String example = shown == null || shown.isBlank() || "1".equals(shown) ? "e.g. 0.5" : "e.g. 3.0 " + shown;
        Matcher m = NUMBER_AND_UNIT.matcher(text == null ? "" : text);
        if (!m.matches()) {
            if (text != null && text.matches("\\s*[+-]?\\d+,\\d+.*")) {
                throw new IllegalArgumentException("'" + text.strip() + "': use a point as decimal separator, "
                        + example);
            }
            throw new IllegalArgumentException("'" + (text == null ? "" : text.strip())
                    + "' is not a number with an optional unit; " + example);
        }
        double number = Double.parseDouble(m.group(1));
        if (!Double.isFinite(number)) {
            throw new IllegalArgumentException("'" + text.strip() + "' is too large; " + example);
        }
        String typedUnit = m.group(2);
        if (siUnit == null || siUnit.isBlank()) {
            if (!typedUnit.isEmpty()) {
                throw new IllegalArgumentException("'" + typedUnit + "': this value has no unit; enter a plain number");
            }
            return number;
        }
        String unitSymbol = typedUnit.isEmpty() ? shown : KEYBOARD_SPELLINGS.getOrDefault(typedUnit, typedUnit);
        Optional<TradeUnit> unit = UnitTable.find(unitSymbol);
        TradeUnit si = UnitTable.get(siUnit);
        if (unit.isEmpty() || !unit.get().isCompatibleWith(si)) {
            throw new IllegalArgumentException("'" + typedUnit + "' is not a unit of this quantity; use "
                    + String.join(" or ", compatibleUnits(si)) + " (" + example + ")");
        }
        double value = unit.get().toSi(number);
        return si.fromSi(value);
    }

    private static java.util.List<String> compatibleUnits(TradeUnit si) {
        return UnitTable.symbols().stream().map(UnitTable::get).filter(u -> u.isCompatibleWith(si))
                .map(TradeUnit::symbol).toList();
    }
}
