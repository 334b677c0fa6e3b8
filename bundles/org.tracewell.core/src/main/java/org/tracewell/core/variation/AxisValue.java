package org.tracewell.core.variation;

import org.tracewell.engine.budget.LimitBound;

/**
 * A loop figure of one axis.
 *
 * @param name     canonical name, {@code axis[KEY].TOKEN}
 * @param axisId   model id of the axis
 * @param axisName its name
 * @param rotary   true for a rotary axis (angles)
 * @param quantity which figure
 */
public record AxisValue(String name, String axisId, String axisName, boolean rotary, AxisQuantity quantity)
        implements StudyMetric {

    @Override
    public String siUnit() {
        return quantity.siUnit(rotary);
    }

    @Override
    public String displayUnit() {
        return quantity.displayUnit(rotary);
    }

    @Override
    public String description() {
        return quantity.description() + " of axis " + axisName;
    }

    @Override
    public LimitBound goodSide() {
        return quantity.goodSide();
    }
}
