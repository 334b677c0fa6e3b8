package org.tracewell.engine.variation;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Local sensitivities of every metric to every parameter by central differences,
 * ∂m/∂p ≈ (m(p + h) − m(p − h))/(2h) with h = relativeStep·|p| (exact for metrics quadratic in p; error
 * O(h²) otherwise), normalised to (∂m/m)/(∂p/p) = (∂m/∂p)·p/m and ranked by magnitude. Takes 2P + 1
 * evaluations. A parameter at 0 takes the absolute step {@code relativeStep} instead and has no normalised
 * value; neither has a metric that is 0 at the point (a circular deviation of matched axes, say).
 */
public final class SensitivityAnalysis {

    private final List<Quantity> parameters;
    private final List<Quantity> metrics;
    private final double[] point;
    private final double[] nominalMetrics;
    private final double[][] derivative;
    private final double[][] normalised;

    private SensitivityAnalysis(List<Quantity> parameters, List<Quantity> metrics, double[] point, double[] nominalMetrics,
                                double[][] derivative, double[][] normalised) {
        this.parameters = parameters;
        this.metrics = metrics;
        this.point = point;
        this.nominalMetrics = nominalMetrics;
        this.derivative = derivative;
        this.normalised = normalised;
    }

    /**
     * @param point        parameter vector where the derivatives are taken
     * @param relativeStep h/|p|, in (0, 0.5]; 1e-3 suits smooth simulated metrics, 1e-4 analytic ones
     */
    public static SensitivityAnalysis at(VariantModel model, double[] point, double relativeStep) {
        int p = model.parameterCount();
        if (point == null || point.length != p) {
            throw new IllegalArgumentException("the point needs " + p + " values, got " + (point == null ? "none" : point.length));
        }
        if (!(relativeStep > 0 && relativeStep <= 0.5)) {
            throw new IllegalArgumentException("relative step must lie in (0, 0.5], got " + relativeStep);
        }
        int m = model.metricCount();
        VariantEvaluator evaluator = model.newEvaluator();
        double[] x = point.clone();
        double[] nominal = new double[m];
        evaluator.evaluate(x, nominal);
        double[] up = new double[m];
        double[] down = new double[m];
        double[][] derivative = new double[m][p];
        double[][] normalised = new double[m][p];
        for (int j = 0; j < p; j++) {
            double h = point[j] == 0 ? relativeStep : relativeStep * Math.abs(point[j]);
            x[j] = point[j] + h;
            evaluator.evaluate(x, up);
            x[j] = point[j] - h;
            evaluator.evaluate(x, down);
            double step = (point[j] + h) - (point[j] - h); // the step actually represented
            x[j] = point[j];
            for (int i = 0; i < m; i++) {
                double d = (up[i] - down[i]) / step;
                derivative[i][j] = d;
                normalised[i][j] = point[j] == 0 || nominal[i] == 0 ? Double.NaN : d * point[j] / nominal[i];
            }
        }
        return new SensitivityAnalysis(model.parameters(), model.metrics(), point.clone(), nominal, derivative, normalised);
    }

    public double[] point() {
        return point.clone();
    }

    /** Metrics at the point itself. */
    public double[] nominalMetrics() {
        return nominalMetrics.clone();
    }

    public double derivative(int metric, int parameter) {
        return derivative[metric][parameter];
    }

    public double normalised(int metric, int parameter) {
        return normalised[metric][parameter];
    }

    /**
     * The sensitivities of one metric, largest |normalised| first (NaN normalised last, ordered by |derivative|).
     */
    public List<Sensitivity> ranked(int metric) {
        List<Sensitivity> out = new ArrayList<>();
        for (int j = 0; j < parameters.size(); j++) {
            out.add(new Sensitivity(j, parameters.get(j).name(), derivative[metric][j], normalised[metric][j]));
        }
        out.sort(Comparator.comparingInt((Sensitivity s) -> Double.isNaN(s.normalised()) ? 1 : 0)
                .thenComparing(Comparator.comparingDouble((Sensitivity s) -> Double.isNaN(s.normalised())
                        ? Math.abs(s.derivative()) : Math.abs(s.normalised())).reversed())
                .thenComparingInt(Sensitivity::parameter));
        return List.copyOf(out);
    }

    public List<Quantity> metrics() {
        return metrics;
    }

    public List<Quantity> parameters() {
        return parameters;
    }
}
