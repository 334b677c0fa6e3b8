package org.tracewell.core.variation;

import org.tracewell.engine.budget.LimitBound;

/**
 * A figure of one contour in its programmed direction.
 *
 * @param name        canonical name, {@code contour[KEY].TOKEN}
 * @param contourId   model id of the contour
 * @param contourName its name
 * @param quantity    which figure
 */
public record ContourValue(String name, String contourId, String contourName, ContourQuantity quantity)
        implements StudyMetric {

    @Override
    public String siUnit() {
        return "m";
    }

    @Override
    public String displayUnit() {
        return "µm";
    }

    @Override
    public String description() {
        return quantity.description() + " of contour '" + contourName + "'";
    }

    @Override
    public LimitBound goodSide() {
        return LimitBound.AT_MOST;
    }
}
