package org.tracewell.core.variation;

import java.util.List;
import java.util.Optional;

import org.tracewell.engine.budget.LimitBound;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.RequirementKind;

/**
 * The value of one requirement as the design review evaluates it, per variant: the worst of its verifying results
 * (each run of its contours — both directions of a circle —, its error budget total, or the loop figure of its
 * allocated axis). A variant meets the requirement when this value lies on the good side of the limit.
 *
 * @param name          canonical name, {@code requirement[ID]}
 * @param requirementId model id
 * @param statement     the requirement in words
 * @param kind          requirement kind
 * @param contourMetric the metric of a contour-deviation requirement
 * @param bound         which side of the limit is met
 * @param limit         the limit, SI
 * @param siUnit        SI unit of the value
 * @param displayUnit   the requirement's display unit
 * @param axisId        allocated axis, if any
 * @param contourIds    the contours verifying it (its own, or for a following error its nearest ancestor's)
 * @param velocityLoop  true when a margin or bandwidth requirement names the velocity loop
 * @param budgeted      true when an error budget verifies it too
 */
public record RequirementValue(String name, String requirementId, String statement, RequirementKind kind,
        ContourMetric contourMetric, LimitBound bound, double limit, String siUnit, String displayUnit,
        Optional<String> axisId, List<String> contourIds, boolean velocityLoop, boolean budgeted)
        implements StudyMetric {

    public RequirementValue {
        contourIds = List.copyOf(contourIds);
    }

    @Override
    public String description() {
        return "value of requirement " + requirementId + (statement.isBlank() ? "" : ": " + statement);
    }

    @Override
    public LimitBound goodSide() {
        return bound;
    }

    /** True when {@code value} meets the limit; NaN (not computable) never does. */
    public boolean met(double value) {
        return bound.isSatisfiedBy(value, limit);
    }
}
