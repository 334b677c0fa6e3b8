package org.tracewell.engine.path;

/**
 * The point of a path nearest to a query point.
 *
 * @param segmentIndex   index of the segment holding the nearest point
 * @param pathParameter  arc length of the nearest point from the path start, metres
 * @param u              nearest point, first plane coordinate
 * @param v              nearest point, second plane coordinate
 * @param signedDistance distance from the query point, positive when the query point lies to the
 *                       left of the direction of travel (side of the left normal), metres
 */
public record PathProjection(int segmentIndex, double pathParameter, double u, double v, double signedDistance) {
}
