package org.tracewell.engine.contour;

/**
 * A CW and a CCW run of the same circle test and their bidirectional circular deviation G(b), taken
 * here as the radial band of both runs together about the least-squares centre of both (ISO 230-4 as
 * recalled in DOMAIN.md §5, not checked against the standard's text).
 *
 * @param clockwise                 the CW run
 * @param counterClockwise          the CCW run
 * @param commonCircle              least-squares circle of both runs' evaluated samples together
 * @param bidirectionalDeviation    G(b): radial width of the thinnest ring about the common
 *                                  least-squares centre holding both runs, metres
 */
public record BidirectionalCircleResult(CircleTestResult clockwise, CircleTestResult counterClockwise,
                                        FittedCircle commonCircle, double bidirectionalDeviation) {
}
