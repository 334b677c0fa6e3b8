package org.tracewell.core.analysis;

import java.util.List;

import org.tracewell.engine.budget.BudgetEvaluation;
import org.tracewell.engine.budget.ErrorBudget;

/**
 * The error budget of one machine-level contour requirement, evaluated against the requirement's limit.
 *
 * @param requirementId model id of the requirement
 * @param metric        "maxNormalDeviation", "circularDeviation" or "radialDeviation"
 * @param contourIds    the contours the requirement is evaluated on
 * @param budget        the lines that apply, and the combination method (with its coverage factor)
 * @param evaluation    totals, ranked contributions and the comparison with the requirement's limit
 *                      (reserve {@link MachineBudget#RESERVE_FRACTION})
 */
public record RequirementBudget(String requirementId, String metric, List<String> contourIds, ErrorBudget budget,
        BudgetEvaluation evaluation) {

    public RequirementBudget {
        contourIds = List.copyOf(contourIds);
    }
}
