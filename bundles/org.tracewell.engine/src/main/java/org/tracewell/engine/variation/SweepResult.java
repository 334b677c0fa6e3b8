package org.tracewell.engine.variation;

import java.util.List;

/**
 * Metrics over a 1-D or 2-D sweep grid, one primitive array per metric. Grid point (i, j) — i on the first
 * axis, j on the second — sits at flat index i·n₂ + j (row-major; n₂ = 1 for a 1-D sweep).
 */
public final class SweepResult {

    private final List<Quantity> parameters;
    private final List<Quantity> metrics;
    private final double[] base;
    private final List<SweepAxis> axes;
    private final double[][] values;
    private final boolean[] evaluated;
    private final int completed;
    private final boolean cancelled;

    SweepResult(List<Quantity> parameters, List<Quantity> metrics, double[] base, List<SweepAxis> axes,
                double[][] values, boolean[] evaluated, int completed, boolean cancelled) {
        this.parameters = parameters;
        this.metrics = metrics;
        this.base = base.clone();
        this.axes = List.copyOf(axes);
        this.values = values;
        this.evaluated = evaluated;
        this.completed = completed;
        this.cancelled = cancelled;
    }

    public List<Quantity> parameters() {
        return parameters;
    }

    public List<Quantity> metrics() {
        return metrics;
    }

    /** The parameter vector the unswept parameters keep. */
    public double[] base() {
        return base.clone();
    }

    /** One axis for a 1-D sweep, two for a 2-D sweep. */
    public List<SweepAxis> axes() {
        return axes;
    }

    public int pointCount() {
        return values[0].length;
    }

    public int completedCount() {
        return completed;
    }

    public boolean cancelled() {
        return cancelled;
    }

    public boolean isEvaluated(int point) {
        return evaluated[point];
    }

    /** Metric at point i of a 1-D sweep (or flat index i of a 2-D one); NaN when not evaluated. */
    public double metric(int metric, int i) {
        return values[metric][i];
    }

    /** Metric at grid point (i, j) of a 2-D sweep. */
    public double metric(int metric, int i, int j) {
        if (axes.size() != 2) {
            throw new IllegalStateException("(i, j) addressing needs a 2-D sweep; this one has " + axes.size() + " axis");
        }
        int n2 = axes.get(1).size();
        if (j < 0 || j >= n2) {
            throw new IndexOutOfBoundsException("j = " + j + " outside 0.." + (n2 - 1));
        }
        return values[metric][i * n2 + j];
    }

    /** A copy of one metric over the grid, flat row-major. */
    public double[] metricValues(int metric) {
        return values[metric].clone();
    }

    public int metricIndex(String name) {
        return Quantity.indexOf("metric", metrics, name);
    }
}
