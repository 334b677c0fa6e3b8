/**
 * Single-loop analysis: system type and error constants, steady-state errors, Routh array,
 * stable gain range, margins with every crossing, sensitivity peak, bandwidth, step response
 * and lag design. Entry point {@link org.tracewell.engine.loop.LoopAnalyzer}, result
 * {@link org.tracewell.engine.loop.LoopAnalysis}. SI units throughout (rad/s, s).
 */
package org.tracewell.engine.loop;
