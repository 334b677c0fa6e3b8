package org.tracewell.engine.variation;

import java.util.Arrays;

/**
 * One of the worst variants of a run, kept for inspection: its index (replayable through
 * {@link MonteCarloPlan#sampleVariant}), its parameter values, the ranked metric and all metrics.
 *
 * @param index      variant index in the run
 * @param parameters parameter values, model order, SI
 * @param value      the metric it was ranked by (NaN when not computable, ranked worst of all)
 * @param metrics    all metric values, model order
 */
public record WorstVariant(int index, double[] parameters, double value, double[] metrics) {

    public WorstVariant {
        parameters = parameters.clone();
        metrics = metrics.clone();
    }

    @Override
    public double[] parameters() {
        return parameters.clone();
    }

    @Override
    public double[] metrics() {
        return metrics.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WorstVariant w && w.index == index && Double.compare(w.value, value) == 0
                && Arrays.equals(w.parameters, parameters) && Arrays.equals(w.metrics, metrics);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Integer.hashCode(index) + Arrays.hashCode(parameters)) + Arrays.hashCode(metrics);
    }

    @Override
    public String toString() {
        return "WorstVariant[" + index + ", parameters " + Arrays.toString(parameters) + ", value " + value + "]";
    }
}
