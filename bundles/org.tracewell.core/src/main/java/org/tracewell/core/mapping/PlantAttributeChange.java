package org.tracewell.core.mapping;

import java.util.Locale;

/**
 * One plant attribute of the model set from a fit, SI as the model stores it.
 *
 * @param elementId   id of the plant element changed
 * @param attribute   the model attribute, as the ecore names it (e.g. {@code loadMass})
 * @param oldValue    value before, in {@code unit}
 * @param newValue    fitted value, in {@code unit}
 * @param unit        the SI unit the model stores the attribute in (ecore unit annotation), e.g. "kg", "N/m"
 * @param displayUnit the trade unit the model shows it in (ecore display annotation), e.g. "kg·cm²", "N/µm", "%"
 */
public record PlantAttributeChange(String elementId, String attribute, double oldValue, double newValue, String unit,
        String displayUnit) {

    /** The attribute in words, as {@code tracewell diff} names it: {@code loadMass} → "load mass". */
    public String label() {
        return attribute.replaceAll("([a-z0-9])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
    }

    /** Relative change (new − old)/old; NaN when the old value is 0. */
    public double relativeChange() {
        return oldValue == 0 ? Double.NaN : (newValue - oldValue) / oldValue;
    }
}
