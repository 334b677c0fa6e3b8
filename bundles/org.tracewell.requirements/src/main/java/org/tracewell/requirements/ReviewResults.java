package org.tracewell.requirements;

import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineBudget;

/**
 * Everything a design review shows: the analysis, the budget, the evaluated requirements, and their provenance.
 * What {@code tracewell analyze} writes as results.json and CSV, and what the report is drawn from.
 */
public record ReviewResults(MachineAnalysis analysis, MachineBudget budget, RequirementReport requirements,
        ReviewProvenance provenance) {
}
