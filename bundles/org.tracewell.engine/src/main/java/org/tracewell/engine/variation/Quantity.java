package org.tracewell.engine.variation;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A named quantity of a variant model, a parameter or a metric, with its SI unit declared once.
 *
 * @param name identifier used to look the quantity up (e.g. {@code "Kv_x"}, {@code "G"}), not blank
 * @param unit SI unit as text ({@code "m"}, {@code "1/s"}, {@code "s"}, {@code "1"} for a plain number)
 * @param description one line saying what the quantity is
 */
public record Quantity(String name, String unit, String description) {

    public Quantity {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a quantity needs a non-blank name, got '" + name + "'");
        }
        if (unit == null) {
            throw new IllegalArgumentException("quantity '" + name + "' needs a unit (\"1\" for a plain number)");
        }
        description = description == null ? "" : description;
    }

    public static Quantity of(String name, String unit) {
        return new Quantity(name, unit, "");
    }

    /** An immutable copy of {@code quantities}, checked for duplicate names. */
    static List<Quantity> checkedList(String what, List<Quantity> quantities) {
        if (quantities == null || quantities.isEmpty()) {
            throw new IllegalArgumentException("a variant model needs at least one " + what);
        }
        Set<String> names = new HashSet<>();
        for (Quantity q : quantities) {
            if (!names.add(q.name())) {
                throw new IllegalArgumentException("duplicate " + what + " name '" + q.name() + "' in " + quantities);
            }
        }
        return List.copyOf(quantities);
    }

    /** Index of the quantity called {@code name} in {@code quantities}. */
    static int indexOf(String what, List<Quantity> quantities, String name) {
        for (int i = 0; i < quantities.size(); i++) {
            if (quantities.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no " + what + " called '" + name + "'; known: "
                + quantities.stream().map(Quantity::name).toList());
    }
}
