package org.tracewell.core.variation;

import org.tracewell.engine.budget.LimitBound;

/**
 * One result a study collects per variant, named as the user writes it: {@code requirement[lm3020-r1]},
 * {@code contour[circle R100 F3 CCW].G}, {@code axis[Y].phaseMargin}. Values are SI; the display unit is the one
 * the trade reads it in. Parsed and checked against a machine by {@link StudyMetrics#parse}.
 */
public sealed interface StudyMetric permits RequirementValue, ContourValue, AxisValue {

    /** The metric name, canonical spelling. */
    String name();

    String siUnit();

    String displayUnit();

    /** One line saying what the metric is. */
    String description();

    /** Which side of a limit is good: decides which variants are the worst ones. */
    LimitBound goodSide();
}
