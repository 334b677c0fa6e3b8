/**
 * Feed planning along a path (trapezoidal and jerk-limited S-curve, with per-axis limits mapped onto
 * each segment) and the sampled reference motion of each axis.
 */
package org.tracewell.engine.trajectory;
