package org.tracewell.charts;

/**
 * One curve of a sweep chart, in the units the chart's axes show: a metric over the swept values (NaN points, not
 * computable, leave a gap).
 *
 * @param name legend entry, e.g. "X1 Kv 2.40 (m/min)/mm"; the only curve of a 1-D sweep may be named after the metric
 * @param x    swept values, increasing
 * @param y    metric values, one per swept value
 */
public record SweepCurve(String name, double[] x, double[] y) {

    public SweepCurve {
        if (x.length == 0 || x.length != y.length) {
            throw new IllegalArgumentException("sweep curve '" + name + "' needs as many metric values as swept values,"
                    + " got " + x.length + " and " + y.length);
        }
        x = x.clone();
        y = y.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }
}
