package org.tracewell.model.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The one table of units Tracewell knows, and the one way numbers are printed with them. The model stores SI; this
 * class is used at the edges (labels, command line, report, diffs, validation messages) to show trade units.
 */
public final class UnitTable {

    /** Significant digits used when printing a value: enough for engineering review, few enough to read. */
    public static final int SIGNIFICANT_DIGITS = 4;

    /** The international inch in metres (exact by definition). */
    private static final double INCH_M = 0.0254;

    private static final Map<String, TradeUnit> UNITS = new LinkedHashMap<>();

    static {
        si("1"); add("%", "1", 0.01); add("dB", "1", 1.0, true, 0);
        si("m"); add("mm", "m", 1e-3); add("µm", "m", 1e-6);
        si("rad"); add("deg", "rad", Math.PI / 180.0); add("arcmin", "rad", Math.PI / 10800.0);
        add("arcsec", "rad", Math.PI / 648000.0);
        si("m/s"); add("m/min", "m/s", 1.0 / 60.0); add("mm/min", "m/s", 1.0 / 60000.0);
        si("rad/s"); add("rev/min", "rad/s", 2.0 * Math.PI / 60.0); add("deg/s", "rad/s", Math.PI / 180.0);
        si("m/s²"); si("m/s³"); si("rad/s²"); si("rad/s³");
        // Position gain: 1 (m/min)/mm = (1/60 m/s) / (1e-3 m) = 16.667 1/s (DOMAIN.md §4, common practice).
        si("1/s"); add("(m/min)/mm", "1/s", 1000.0 / 60.0, false, 1);
        si("s"); add("ms", "s", 1e-3); add("µs", "s", 1e-6);
        si("Hz"); add("kHz", "Hz", 1e3);
        si("kg"); si("kg·m²"); add("kg·cm²", "kg·m²", 1e-4);
        si("N/m"); add("N/µm", "N/m", 1e6);
        si("N·m/rad"); add("N·m/arcmin", "N·m/rad", 10800.0 / Math.PI);
        si("N"); si("N·m"); si("N/A"); si("N·m/A"); si("N·s/m"); si("N·m·s/rad"); si("N/(m·s)"); si("N·m/(rad·s)");
        si("1/rev");
        // Transmission ratio: load travel per motor radian; the trade quotes travel per motor revolution.
        si("m/rad"); add("mm/rev", "m/rad", 1e-3 / (2.0 * Math.PI));
        // Inch units (UnitSystem.INCH): the international inch is exactly 25.4 mm; a mil is a thousandth of an inch.
        add("in", "m", INCH_M); add("µin", "m", INCH_M * 1e-6); add("mil", "m", INCH_M * 1e-3);
        add("in/min", "m/s", INCH_M / 60.0); add("in/s²", "m/s²", INCH_M); add("in/s³", "m/s³", INCH_M);
        add("(in/min)/mil", "1/s", 1000.0 / 60.0, false, 1);
        add("in/rev", "m/rad", INCH_M / (2.0 * Math.PI));
    }

    private UnitTable() {
    }

    private static void si(String symbol) {
        add(symbol, symbol, 1.0);
    }

    private static void add(String symbol, String siSymbol, double siPerUnit) {
        add(symbol, siSymbol, siPerUnit, false, 0);
    }

    private static void add(String symbol, String siSymbol, double siPerUnit, boolean decibel, int minFractionDigits) {
        UNITS.put(symbol, new TradeUnit(symbol, siSymbol, siPerUnit, decibel, minFractionDigits));
    }

    /** The unit printed as {@code symbol}, if Tracewell knows it. */
    public static Optional<TradeUnit> find(String symbol) {
        return symbol == null ? Optional.empty() : Optional.ofNullable(UNITS.get(symbol.strip()));
    }

    /** The unit printed as {@code symbol}; fails naming the known symbols. */
    public static TradeUnit get(String symbol) {
        return find(symbol).orElseThrow(() -> new IllegalArgumentException(
                "unknown unit '" + symbol + "'; known units: " + String.join(", ", UNITS.keySet())));
    }

    /** All known unit symbols, in table order. */
    public static Set<String> symbols() {
        return java.util.Collections.unmodifiableSet(UNITS.keySet());
    }

    /** Formats a number with {@link #SIGNIFICANT_DIGITS}, without exponent for everyday magnitudes. */
    public static String formatNumber(double value, int minFractionDigits) {
        if (Double.isNaN(value)) {
            return "NaN";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "∞" : "-∞";
        }
        if (value == 0.0) {
            return minFractionDigits == 0 ? "0" : "0." + "0".repeat(minFractionDigits);
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(SIGNIFICANT_DIGITS, RoundingMode.HALF_EVEN))
                .stripTrailingZeros();
        double magnitude = Math.abs(value);
        if (magnitude >= 1e7 || magnitude < 1e-4) {
            // Engineering-style exponent: mantissa with up to SIGNIFICANT_DIGITS digits, e.g. 1.235e-5.
            int exponent = rounded.precision() - rounded.scale() - 1;
            String mantissa = rounded.movePointLeft(exponent).stripTrailingZeros().toPlainString();
            return mantissa + "e" + exponent;
        }
        if (rounded.scale() < minFractionDigits) {
            rounded = rounded.setScale(minFractionDigits, RoundingMode.UNNECESSARY);
        }
        return rounded.toPlainString();
    }

    /** Formats an SI value in the given display unit, e.g. {@code 0.05 → "3.0 (m/min)/mm"} for 50 1/s. */
    public static String format(double siValue, String displayUnit) {
        Optional<TradeUnit> unit = find(displayUnit);
        if (unit.isEmpty()) {
            return formatNumber(siValue, 0) + (displayUnit == null || displayUnit.isBlank() ? "" : " " + displayUnit);
        }
        TradeUnit u = unit.get();
        String number = formatNumber(u.fromSi(siValue), u.minFractionDigits());
        return "1".equals(u.symbol()) ? number : number + " " + u.symbol();
    }
}
