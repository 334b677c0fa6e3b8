/**
 * Planar contours in the space of two or three linear axes: lines, arcs, full circles, polylines with
 * exact-stop or blended corners; arc-length parametrisation and exact point-to-path distance.
 */
package org.tracewell.engine.path;
