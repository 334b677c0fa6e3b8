package org.tracewell.engine.variation;

/**
 * Runs a Monte-Carlo tolerance analysis: samples every variant of a plan from its own block stream (see
 * {@link VariantStreams}) and evaluates it, in parallel when the control names a pool, cancellable, with
 * progress. The values of variant i depend only on (seed, i), so serial and parallel runs give the same
 * result bit for bit.
 */
public final class MonteCarloRunner {

    private MonteCarloRunner() {
    }

    /**
     * @throws VariantEvaluationException when the model fails on a variant
     */
    public static MonteCarloResult run(VariantModel model, MonteCarloPlan plan, RunControl control) {
        plan.checkFits(model);
        int n = plan.variantCount();
        if ((long) n * Math.max(model.parameterCount(), model.metricCount()) > Integer.MAX_VALUE - 16) {
            throw new IllegalArgumentException(n + " variants of " + model.parameterCount() + " parameters and "
                    + model.metricCount() + " metrics exceed one primitive array; run fewer variants");
        }
        double[] parameters = new double[n * model.parameterCount()];
        double[][] metrics = new double[model.metricCount()][n];
        VariantBatch.Outcome outcome = VariantBatch.run(model, n, plan::sampleBlock, parameters, metrics, control);
        return new MonteCarloResult(model.parameters(), model.metrics(), plan, parameters, metrics, outcome.evaluated(),
                outcome.completed(), outcome.cancelled());
    }
}
