package org.tracewell.engine.contour;

/**
 * A circle fitted to measured points.
 *
 * @param centreU    centre, first plane coordinate, metres
 * @param centreV    centre, second plane coordinate, metres
 * @param radius     metres
 * @param rmsResidual root mean square of the radial residuals, metres
 * @param iterations Gauss–Newton iterations used (0 for the algebraic fit)
 */
public record FittedCircle(double centreU, double centreV, double radius, double rmsResidual, int iterations) {
}
