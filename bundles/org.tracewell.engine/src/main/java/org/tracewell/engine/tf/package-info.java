/**
 * Rational transfer functions with optional dead time: connections, pole–zero cancellation,
 * Padé approximation of the delay, exact frequency response, state-space realisation.
 */
package org.tracewell.engine.tf;
