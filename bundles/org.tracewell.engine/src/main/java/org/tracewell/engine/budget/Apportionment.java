package org.tracewell.engine.budget;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Top-down apportionment of a machine target: allocations a_i = λ·w_i proportional to the items' weights,
 * with λ chosen so that combining the allocations by the budget's method gives exactly the allowed total
 * T' = (1 − reserve)·target.
 *
 * <p>Every {@link CombinationMethod} is positively homogeneous of degree one, M(λ·w) = λ·M(w), so
 * λ = T' / M(w) in closed form for all of them: linear a_i = w_i·T'/Σw; RSS a_i = w_i·T'/√(Σw²);
 * systematic + RSS a_i = w_i·T'/(Σ_sys w + √(Σ_rand w²)); mean a_i = 2·w_i·T'/(Σw + √(Σw²)).
 *
 * @param target      the machine target and its reserve
 * @param method      the combination method the allocations are meant for
 * @param scale       λ, metres per unit weight
 * @param allocations one per item, in item order
 */
public record Apportionment(BudgetTarget target, CombinationMethod method, double scale,
                            List<Allocation> allocations) {

    public Apportionment {
        allocations = List.copyOf(allocations);
    }

    /**
     * Apportions {@code target} among {@code items}.
     *
     * @throws IllegalArgumentException for an empty item list, duplicate names, or weights that are all zero
     */
    public static Apportionment apportion(BudgetTarget target, CombinationMethod method, List<AllocationItem> items) {
        BudgetChecks.requireNonNull("budget target", target);
        BudgetChecks.requireNonNull("combination method", method);
        BudgetChecks.requireNonNull("allocation items", items);
        if (items.isEmpty()) {
            throw new IllegalArgumentException("allocation items = [] is not valid: at least one axis or category "
                    + "is needed to receive the target");
        }
        Set<String> names = new HashSet<>();
        List<CombinationTerm> weights = new ArrayList<>(items.size());
        for (AllocationItem item : items) {
            BudgetChecks.requireNonNull("an allocation item", item);
            if (!names.add(item.name())) {
                throw new IllegalArgumentException("allocation item name \"" + item.name()
                        + "\" appears twice; item names must be unique");
            }
            weights.add(new CombinationTerm(item.weight(), item.errorClass()));
        }
        double combinedWeight = method.combine(weights);
        if (!(combinedWeight > 0.0)) {
            throw new IllegalArgumentException("allocation weights = "
                    + items.stream().map(AllocationItem::weight).toList()
                    + " are all zero; at least one weight must be > 0");
        }
        double scale = target.allowedTotal() / combinedWeight;
        List<Allocation> allocations = items.stream().map(item -> new Allocation(item, scale * item.weight()))
                .toList();
        return new Apportionment(target, method, scale, allocations);
    }

    /** Equal apportionment: every name gets weight 1 and the same class. */
    public static Apportionment apportionEqually(BudgetTarget target, CombinationMethod method,
                                                 List<String> itemNames, ErrorClass errorClass) {
        BudgetChecks.requireNonNull("allocation item names", itemNames);
        return apportion(target, method, itemNames.stream().map(n -> AllocationItem.equal(n, errorClass)).toList());
    }

    /** (1 − reserve)·target, metres: what the allocations combine to. */
    public double allowedTotal() {
        return target.allowedTotal();
    }

    /** The allocations combined by {@link #method()}, metres; equals {@link #allowedTotal()} up to rounding. */
    public double combinedTotal() {
        return method.combine(allocations.stream().map(Allocation::asTerm).toList());
    }

    /** The allocation of the item called {@code name}. */
    public Allocation allocationFor(String name) {
        return allocations.stream().filter(a -> a.item().name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no allocation item is called \"" + name
                        + "\"; known items: " + allocations.stream().map(a -> a.item().name()).toList()));
    }

    /** The closed form used, as text. */
    public String formula() {
        String base = "T' = (1 − reserve)·target; ";
        return base + switch (method) {
            case LINEAR_SUM -> "a_i = w_i·T' / Σw";
            case RSS -> "a_i = w_i·T' / √(Σw²)";
            case SYSTEMATIC_PLUS_RSS -> "a_i = w_i·T' / (Σ_systematic w + √(Σ_random w²))";
            case MEAN_OF_LINEAR_AND_RSS -> "a_i = 2·w_i·T' / (Σw + √(Σw²))";
        };
    }
}
