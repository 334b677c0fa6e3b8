package org.tracewell.core.analysis;

import org.tracewell.engine.budget.BudgetLine;

/**
 * A model budget line marked "computed" that the pipeline recomputed from the model (same source and axis); the
 * recomputed line is used, the stored one is kept for comparison.
 *
 * @param stored       the line as the model stores it
 * @param replacedById id of the pipeline's line used instead
 */
public record SupersededLine(BudgetLine stored, String replacedById) {
}
