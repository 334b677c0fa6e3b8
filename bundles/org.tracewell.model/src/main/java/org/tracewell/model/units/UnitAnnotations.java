package org.tracewell.model.units;

import org.eclipse.emf.ecore.EAnnotation;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;

/**
 * Reads the units each attribute declares in {@code tracewell.ecore} (annotation source {@link #SOURCE}): {@code unit}
 * and {@code displayUnit}, and for quantities that differ on rotary axes {@code rotaryUnit} / {@code rotaryDisplayUnit}.
 */
public final class UnitAnnotations {

    /** Annotation source of unit declarations in the metamodel. */
    public static final String SOURCE = "http://tracewell.org/units";

    private UnitAnnotations() {
    }

    /** The SI unit the attribute is stored in, for this owner (rotary axes use angles); empty when undeclared. */
    public static String siUnit(EObject owner, EStructuralFeature feature) {
        return detail(feature, isRotary(owner) ? "rotaryUnit" : null, "unit");
    }

    /**
     * The trade unit the attribute is shown in, for this owner, in the active {@link UnitSystem} (the declared metric
     * unit, or its inch counterpart); empty when undeclared.
     */
    public static String displayUnit(EObject owner, EStructuralFeature feature) {
        return UnitSystem.active().shown(detail(feature, isRotary(owner) ? "rotaryDisplayUnit" : null, "displayUnit"));
    }

    /** Formats the owner's value of a numeric attribute in its display unit. */
    public static String formatValue(EObject owner, EStructuralFeature feature, double siValue) {
        return UnitTable.format(siValue, displayUnit(owner, feature));
    }

    /** True when the element belongs to a rotary axis (its quantities are angles rather than lengths). */
    public static boolean isRotary(EObject element) {
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof Axis axis) {
                return axis.getKind() == AxisKind.ROTARY;
            }
        }
        return false;
    }

    private static String detail(EStructuralFeature feature, String preferredKey, String key) {
        EAnnotation annotation = feature.getEAnnotation(SOURCE);
        if (annotation == null) {
            return "";
        }
        if (preferredKey != null) {
            String preferred = annotation.getDetails().get(preferredKey);
            if (preferred != null) {
                return preferred;
            }
        }
        String value = annotation.getDetails().get(key);
        return value == null ? "" : value;
    }
}
