package org.tracewell.engine.variation;

import java.util.Arrays;

/**
 * One axis of a sweep grid: a model parameter and the values it takes, in order.
 *
 * @param parameter index of the swept parameter in the model's parameter order
 * @param values    the grid values, SI, at least 1, finite
 */
public record SweepAxis(int parameter, double[] values) {

    public SweepAxis {
        if (parameter < 0) {
            throw new IllegalArgumentException("swept parameter index must be >= 0, got " + parameter);
        }
        if (values == null || values.length == 0) {
            throw new IllegalArgumentException("a sweep axis needs at least one value");
        }
        values = values.clone();
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("sweep values must be finite, got " + v + " in " + Arrays.toString(values));
            }
        }
    }

    /** {@code count} values evenly spaced from {@code from} to {@code to}, both included. */
    public static SweepAxis linear(int parameter, double from, double to, int count) {
        checkCount(count, from, to);
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            v[i] = count == 1 ? from : i == count - 1 ? to : from + (to - from) * i / (count - 1);
        }
        return new SweepAxis(parameter, v);
    }

    /** {@code count} values evenly spaced in log from {@code from} to {@code to} (same sign, non-zero). */
    public static SweepAxis logarithmic(int parameter, double from, double to, int count) {
        checkCount(count, from, to);
        if (!(from * to > 0)) {
            throw new IllegalArgumentException("a logarithmic sweep needs two non-zero ends of the same sign, got " + from
                    + " and " + to);
        }
        double sign = Math.signum(from);
        double a = Math.log(Math.abs(from));
        double b = Math.log(Math.abs(to));
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            v[i] = count == 1 ? from : i == count - 1 ? to : sign * Math.exp(a + (b - a) * i / (count - 1));
        }
        return new SweepAxis(parameter, v);
    }

    private static void checkCount(int count, double from, double to) {
        if (count < 1) {
            throw new IllegalArgumentException("a sweep axis needs at least 1 point, got " + count);
        }
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw new IllegalArgumentException("sweep ends must be finite, got " + from + " and " + to);
        }
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    public int size() {
        return values.length;
    }

    public double value(int i) {
        return values[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SweepAxis a && a.parameter == parameter && Arrays.equals(a.values, values);
    }

    @Override
    public int hashCode() {
        return 31 * parameter + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "SweepAxis[parameter " + parameter + ", " + Arrays.toString(values) + "]";
    }
}
