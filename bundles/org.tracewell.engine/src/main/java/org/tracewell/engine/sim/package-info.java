/**
 * Linear axis loops in state-space form, exact zero-order-hold discretisation, and the simulation of
 * axes tracking a sampled reference trajectory.
 */
package org.tracewell.engine.sim;
