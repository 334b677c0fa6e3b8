package org.tracewell.model.paths;

import java.util.List;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.tracewell.model.units.UnitAnnotations;

/**
 * The numeric attribute a path leads to in one machine (or one copy of it): read and written in SI.
 *
 * @param path      the path, in its canonical spelling
 * @param owner     the element holding the attribute
 * @param attribute the attribute, numeric
 * @param index     position in a many-valued attribute (transfer-function coefficients), −1 for a single value
 */
public record AttributeTarget(String path, EObject owner, EAttribute attribute, int index) {

    /** The stored value, SI. */
    public double get() {
        Object value = attribute.isMany() ? ((List<?>) owner.eGet(attribute)).get(index) : owner.eGet(attribute);
        return ((Number) value).doubleValue();
    }

    /**
     * Stores {@code si}. Integer attributes (encoder counts, say) take the nearest integer; a value outside their
     * range is refused.
     *
     * @throws IllegalArgumentException naming the path when the value does not fit the attribute
     */
    @SuppressWarnings("unchecked")
    public void set(double si) {
        Object value = convert(si);
        if (attribute.isMany()) {
            ((List<Object>) owner.eGet(attribute)).set(index, value);
        } else {
            owner.eSet(attribute, value);
        }
    }

    private Object convert(double si) {
        Class<?> type = attribute.getEAttributeType().getInstanceClass();
        if (type == double.class || type == Double.class) {
            return si;
        }
        if (type == float.class || type == Float.class) {
            return (float) si;
        }
        long rounded = Math.round(si);
        if (!Double.isFinite(si) || (type == int.class || type == Integer.class)
                && (rounded < Integer.MIN_VALUE || rounded > Integer.MAX_VALUE)) {
            throw new IllegalArgumentException("path '" + path + "': " + si + " does not fit the integer attribute "
                    + attribute.getName());
        }
        return type == long.class || type == Long.class ? (Object) rounded : (Object) (int) rounded;
    }

    /** SI unit declared for the attribute (angles on rotary axes); "1" when the metamodel declares none. */
    public String siUnit() {
        String unit = UnitAnnotations.siUnit(owner, attribute);
        return unit.isEmpty() ? "1" : unit;
    }

    /** Trade unit the attribute is shown in; the SI unit when none is declared. */
    public String displayUnit() {
        String unit = UnitAnnotations.displayUnit(owner, attribute);
        return unit.isEmpty() ? siUnit() : unit;
    }
}
