package org.tracewell.engine.variation;

/**
 * Evaluates one variant: reads the parameter values and writes the metric values, both in the order the
 * model declares. An evaluator may keep scratch buffers and so is used by one thread at a time; the runs
 * ask the model for one evaluator per worker thread and reuse it for every variant that thread evaluates.
 * The result must depend on the parameters only (not on earlier calls), which keeps runs reproducible.
 * A metric that cannot be computed for a variant (an unstable loop, say) is written as NaN.
 */
@FunctionalInterface
public interface VariantEvaluator {

    /**
     * @param parameters parameter values, SI, one per declared parameter; read only
     * @param metrics    receives one value per declared metric, SI
     */
    void evaluate(double[] parameters, double[] metrics);
}
