package org.tracewell.requirements;

import java.util.OptionalDouble;

/**
 * A computed result that verifies a requirement.
 *
 * @param elementKind  "contour", "axis" or "budget"
 * @param elementId    model id of the contour, axis or requirement (budget)
 * @param elementName  its name
 * @param direction    "CW", "CCW", "programmed" for contour runs; empty string otherwise
 * @param resultName   the figure, e.g. "circular deviation G", "position-loop phase margin"
 * @param value        the figure, SI; empty when it could not be computed
 */
public record Verification(String elementKind, String elementId, String elementName, String direction,
        String resultName, OptionalDouble value) {

    /** E.g. {@code contour 'circle R100 CW' CCW · circular deviation G}. */
    public String describe() {
        String run = direction.isEmpty() || "programmed".equals(direction) ? "" : " " + direction;
        return elementKind + " '" + elementName + "'" + run + " · " + resultName;
    }
}
