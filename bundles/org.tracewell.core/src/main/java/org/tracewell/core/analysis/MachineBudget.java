package org.tracewell.core.analysis;

import java.util.List;
import java.util.Optional;

import org.tracewell.engine.budget.BudgetLine;

/**
 * All budget lines of a machine and the budget of every machine-level contour requirement.
 *
 * @param computedLines   lines the pipeline computed from the analysis (ids start with {@code computed:})
 * @param enteredLines    the model's lines (ids = model ids), except superseded ones
 * @param superseded      model lines marked computed that the pipeline recomputed
 * @param requirements    one budget per machine-level contour-deviation requirement, model order
 */
public record MachineBudget(List<BudgetLine> computedLines, List<BudgetLine> enteredLines,
        List<SupersededLine> superseded, List<RequirementBudget> requirements) {

    /** Reserve held back from every requirement limit when the budget is compared with it (10–25 % is usual). */
    public static final double RESERVE_FRACTION = 0.10;

    public MachineBudget {
        computedLines = List.copyOf(computedLines);
        enteredLines = List.copyOf(enteredLines);
        superseded = List.copyOf(superseded);
        requirements = List.copyOf(requirements);
    }

    public Optional<RequirementBudget> forRequirement(String requirementId) {
        return requirements.stream().filter(r -> r.requirementId().equals(requirementId)).findFirst();
    }
}
