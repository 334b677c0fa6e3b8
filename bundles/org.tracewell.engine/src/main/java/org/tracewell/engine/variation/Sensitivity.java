package org.tracewell.engine.variation;

/**
 * The sensitivity of one metric to one parameter at a point.
 *
 * @param parameter  index in the model's parameter order
 * @param name       parameter name
 * @param derivative ∂m/∂p by central differences, metric unit per parameter unit
 * @param normalised (∂m/m)/(∂p/p): percent change of the metric per percent change of the parameter; NaN where
 *                   the metric or the parameter is 0 at the point
 */
public record Sensitivity(int parameter, String name, double derivative, double normalised) {
}
