/**
 * Error-budget arithmetic: budget lines with GUM conversions, combination methods, evaluation against a
 * target with a reserve, top-down apportionment of a machine target, and closed-form inverse design of axis
 * parameters from an allowed error.
 *
 * <p>Coverage convention used throughout the package. Every line enters a combination as one non-negative
 * <em>contribution</em> in metres:
 * <ul>
 *   <li>a {@linkplain ErrorClass#SYSTEMATIC systematic} line contributes {@code |sensitivity · value|}, a bound
 *       that is never rescaled by a coverage factor;</li>
 *   <li>a {@linkplain ErrorClass#RANDOM random} line contributes {@code k · u}, where
 *       {@code u = |sensitivity| · u(value)} is its standard uncertainty from the line's distribution (GUM) and
 *       {@code k} is the budget's coverage factor (2 unless the budget states otherwise).</li>
 * </ul>
 * Hence the root sum of squares of the random contributions is exactly the expanded uncertainty
 * {@code U = k · u_c} with {@code u_c = √(Σ u_i²)}, and a normal line stated at the same k as the budget
 * contributes its stated value unchanged. All values are SI (metres, seconds, metres per second).
 */
package org.tracewell.engine.budget;
