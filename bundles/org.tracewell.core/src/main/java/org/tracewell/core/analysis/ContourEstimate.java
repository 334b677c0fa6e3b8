package org.tracewell.core.analysis;

import java.util.OptionalDouble;

/**
 * Closed-form estimates shown beside the simulated figures of a contour (first-order position loops Kv/(s + Kv) in
 * steady state, DOMAIN.md §4). They ignore the velocity loop, filters, sample delays and the feed ramps, so they are
 * cross-checks, not results. SI.
 *
 * @param firstAxisKv              Kv of the first axis, 1/s
 * @param secondAxisKv             Kv of the second axis, 1/s
 * @param followingErrorFirst      v/Kv of the first axis at its largest steady velocity component, m
 * @param followingErrorSecond     v/Kv of the second axis, m
 * @param radiusLossExact          circles: R·(1 − 1/√(1 + (ω/Kv)²)) with the mean Kv, m; empty otherwise
 * @param radiusLossApprox         circles: F²/(2·R·Kv²), m; empty otherwise
 * @param circularDeviationMismatch circles: G ≈ F·|1/Kx − 1/Ky| (Kv mismatch ellipse), m; empty otherwise
 * @param lineMismatchError        straight lines: (V/2)·sin2θ·|1/Kx − 1/Ky| of the longest line, m; empty otherwise
 * @param cornerError              paths with a sharp corner passed at speed: V/(e·Kv), m; empty otherwise
 * @param basis                    one sentence naming the formulas and their sources
 */
public record ContourEstimate(double firstAxisKv, double secondAxisKv, double followingErrorFirst,
        double followingErrorSecond, OptionalDouble radiusLossExact, OptionalDouble radiusLossApprox,
        OptionalDouble circularDeviationMismatch, OptionalDouble lineMismatchError, OptionalDouble cornerError,
        String basis) {
}
