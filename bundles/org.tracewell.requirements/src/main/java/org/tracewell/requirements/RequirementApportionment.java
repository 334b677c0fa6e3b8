package org.tracewell.requirements;

import java.util.List;

import org.tracewell.engine.budget.Apportionment;

/**
 * Top-down apportionment of one machine contour requirement's limit among its budget contributors.
 *
 * @param requirementId the machine requirement
 * @param basis         how items and weights were chosen (one sentence)
 * @param apportionment the engine's apportionment: target with reserve, method, one allocation per item
 * @param items         per item: its name, the axis it belongs to (or ""), the allocation and the current
 *                      contribution of the budget lines it stands for, and whether that fits
 */
public record RequirementApportionment(String requirementId, String basis, Apportionment apportionment,
        List<ApportionedItem> items) {

    public RequirementApportionment {
        items = List.copyOf(items);
    }

    /**
     * @param name       item name (an axis name, or a category such as "geometric")
     * @param axisId     model id of the axis, or "" for a machine-wide category
     * @param allocated  allowed contribution, m
     * @param current    present contribution of the item's lines (Σ|s·v| or k·√Σu², as the method combines), m
     * @param fits       current ≤ allocated
     */
    public record ApportionedItem(String name, String axisId, double allocated, double current, boolean fits) {
    }
}
