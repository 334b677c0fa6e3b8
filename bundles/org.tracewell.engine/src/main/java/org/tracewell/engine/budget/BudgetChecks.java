package org.tracewell.engine.budget;

/** Argument checks shared by the package; every message names the quantity, the bad value and the valid range. */
final class BudgetChecks {

    private BudgetChecks() {
    }

    static double requireFinite(String what, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " = " + value + unitSuffix(unit) + " is not a finite number");
        }
        return value;
    }

    static double requirePositive(String what, double value, String unit) {
        if (!(value > 0.0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " = " + value + unitSuffix(unit)
                    + " is outside the valid range: finite and > 0");
        }
        return value;
    }

    static double requireNonNegative(String what, double value, String unit) {
        if (!(value >= 0.0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " = " + value + unitSuffix(unit)
                    + " is outside the valid range: finite and >= 0");
        }
        return value;
    }

    /** A reserve is a fraction of the target held back; 1 would leave nothing to allocate. */
    static double requireReserveFraction(double reserveFraction) {
        if (!(reserveFraction >= 0.0 && reserveFraction < 1.0)) {
            throw new IllegalArgumentException("reserve fraction = " + reserveFraction
                    + " is outside the valid range [0, 1) (for example 0.10 to 0.25 for a 10-25 % reserve)");
        }
        return reserveFraction;
    }

    static String requireText(String what, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(what + " = " + (value == null ? "null" : "\"" + value + "\"")
                    + " is not valid: a non-blank text is required");
        }
        return value;
    }

    static <T> T requireNonNull(String what, T value) {
        if (value == null) {
            throw new IllegalArgumentException(what + " is null; a value is required");
        }
        return value;
    }

    private static String unitSuffix(String unit) {
        return unit.isEmpty() ? "" : " " + unit;
    }
}
