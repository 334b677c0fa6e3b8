package org.tracewell.core.variation;

import org.tracewell.engine.variation.YieldEstimate;

/**
 * The yield of a Monte-Carlo study against one requirement: the fraction of variants whose requirement value meets
 * the limit, with its binomial standard error.
 *
 * @param requirement the requirement metric
 * @param metricIndex its index among the study's metrics
 * @param nominalValue the requirement value of the nominal machine, SI
 * @param estimate    pass count, sample count, fraction and standard error
 */
public record RequirementYield(RequirementValue requirement, int metricIndex, double nominalValue,
        YieldEstimate estimate) {

    /** True when the nominal machine meets the requirement. */
    public boolean nominalMet() {
        return requirement.met(nominalValue);
    }
}
