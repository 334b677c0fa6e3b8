/**
 * The analysis pipeline of a whole machine: every axis loop, every contour tracked by the axes of its plane (both
 * directions for full circles), the computed and entered error-budget lines, and the budget per machine requirement.
 * Results are immutable and carry the model ids of their inputs; SI units throughout.
 */
package org.tracewell.core.analysis;
