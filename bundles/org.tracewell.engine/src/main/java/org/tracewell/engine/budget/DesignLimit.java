package org.tracewell.engine.budget;

/**
 * A limit on an axis design quantity derived from an allowed error; the requirements layer turns it into a
 * derived axis requirement.
 *
 * @param quantity symbol of the limited quantity, e.g. {@code "Kv"} or {@code "|1/Kx − 1/Ky|"}
 * @param bound    whether the quantity must stay at most or at least {@code value}
 * @param value    the limit in SI units; {@code +∞} when the allowed error puts no limit on the quantity
 * @param siUnit   SI unit of {@code value}: {@code "s"}, {@code "1/s"}, {@code "m/s"} or {@code "m"}
 * @param formula  the closed-form inverse used and the forward relation it inverts
 * @param source   where the forward relation comes from (with "from memory" where it was recalled)
 */
public record DesignLimit(String quantity, LimitBound bound, double value, String siUnit, String formula,
                          String source) {

    /** Whether a design value of the quantity respects this limit. */
    public boolean isSatisfiedBy(double designValue) {
        return bound.isSatisfiedBy(designValue, value);
    }

    /** Whether the allowed error leaves the quantity unconstrained. */
    public boolean isUnlimited() {
        return Double.isInfinite(value);
    }

    /** For example {@code "Kv ≥ 33.33 1/s"}. */
    public String statement() {
        return quantity + " " + bound.symbol() + " " + value + " " + siUnit;
    }
}
