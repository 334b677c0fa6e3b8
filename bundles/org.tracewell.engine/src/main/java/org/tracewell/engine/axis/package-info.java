/**
 * Axis dynamics from physics: drive plants (rigid and two-mass screw drives, rack and pinion,
 * direct linear drive, rotary table, explicit transfer function), cascade controllers with
 * filter stages, feedforward and sampled-loop delays, and the loops derived from them for the
 * loop analysis and the tracking simulation. Entry point {@link org.tracewell.engine.axis.AxisModel},
 * result {@link org.tracewell.engine.axis.AxisDynamics}.
 * <p>
 * Frames and units (SI): rotary drives are written in the motor-side rotary frame (torque N·m,
 * motor velocity rad/s, inertia kg·m²); a direct linear drive in its own linear frame (force N,
 * velocity m/s, mass kg). Load position is metres for linear axes and radians for a rotary table.
 * The transmission ratio ρ is load displacement per motor radian (m/rad, or rad/rad).
 */
package org.tracewell.engine.axis;
