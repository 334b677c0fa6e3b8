package org.tracewell.requirements;

import java.util.OptionalDouble;

import org.tracewell.engine.budget.DesignLimit;

/**
 * A derived axis requirement suggested by inverse design from a machine requirement (not written to the model).
 *
 * @param id               suggested id, e.g. {@code lm3020-r1:derived:y-kv-min}
 * @param parentId         the machine requirement it derives from
 * @param axisId           model id of the axis it would be allocated to, or "" for a pair of axes
 * @param axisName         its name (or "X1/Y" for a pair)
 * @param statement        suggested requirement text, in trade units
 * @param limit            the inverse-design limit (quantity, bound, SI value, formula, source)
 * @param currentValue     the design's present value of the quantity, SI; empty when unknown
 * @param currentlySatisfied whether the present design satisfies the limit
 */
public record DerivedRequirement(String id, String parentId, String axisId, String axisName, String statement,
        DesignLimit limit, OptionalDouble currentValue, boolean currentlySatisfied) {
}
