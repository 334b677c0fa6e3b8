package org.tracewell.engine.budget;

/**
 * The part of a machine target given to one item.
 *
 * @param item      the item
 * @param allocated allowed contribution of the item, metres (a systematic bound or k·u for a random item, at
 *                  the same coverage as the budget it will be checked in)
 */
public record Allocation(AllocationItem item, double allocated) {

    /** The allocation as a combination term. */
    public CombinationTerm asTerm() {
        return new CombinationTerm(allocated, item.errorClass());
    }
}
