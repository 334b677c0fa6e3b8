package org.tracewell.engine.variation;

import java.util.List;
import java.util.function.Supplier;

/**
 * The generic evaluation contract of sweeps, sensitivities and Monte-Carlo runs: a vector of named parameter
 * values in, a vector of named metric values out (circular deviation G, maximum contour error, phase margin,
 * bandwidth, ...). Names and SI units are declared once, here; the arrays passed around carry values only.
 * Implementations are immutable and thread-safe; per-thread scratch state lives in the evaluators.
 */
public interface VariantModel {

    /** The parameters, in the order of the parameter arrays. */
    List<Quantity> parameters();

    /** The metrics, in the order of the metric arrays. */
    List<Quantity> metrics();

    /** A fresh evaluator for one thread. */
    VariantEvaluator newEvaluator();

    default int parameterCount() {
        return parameters().size();
    }

    default int metricCount() {
        return metrics().size();
    }

    default int parameterIndex(String name) {
        return Quantity.indexOf("parameter", parameters(), name);
    }

    default int metricIndex(String name) {
        return Quantity.indexOf("metric", metrics(), name);
    }

    /** Evaluates one point with a fresh evaluator: for single checks, not for loops. */
    default double[] evaluate(double... parameterValues) {
        if (parameterValues.length != parameterCount()) {
            throw new IllegalArgumentException("model takes " + parameterCount() + " parameters " + parameters()
                    + ", got " + parameterValues.length);
        }
        double[] out = new double[metricCount()];
        newEvaluator().evaluate(parameterValues.clone(), out);
        return out;
    }

    /**
     * A model of a pure function without scratch state: the same {@code function} serves every thread.
     */
    static VariantModel of(List<Quantity> parameters, List<Quantity> metrics, VariantEvaluator function) {
        if (function == null) {
            throw new IllegalArgumentException("a variant model needs an evaluation function");
        }
        return of(parameters, metrics, () -> function);
    }

    /** A model whose evaluators come from {@code evaluators} (one call per worker thread). */
    static VariantModel of(List<Quantity> parameters, List<Quantity> metrics, Supplier<VariantEvaluator> evaluators) {
        List<Quantity> p = Quantity.checkedList("parameter", parameters);
        List<Quantity> m = Quantity.checkedList("metric", metrics);
        if (evaluators == null) {
            throw new IllegalArgumentException("a variant model needs a source of evaluators");
        }
        return new VariantModel() {
            @Override
            public List<Quantity> parameters() {
                return p;
            }

            @Override
            public List<Quantity> metrics() {
                return m;
            }

            @Override
            public VariantEvaluator newEvaluator() {
                return evaluators.get();
            }

            @Override
            public String toString() {
                return "VariantModel" + p.stream().map(Quantity::name).toList() + " -> "
                        + m.stream().map(Quantity::name).toList();
            }
        };
    }
}
