package org.tracewell.engine.variation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tracewell.engine.budget.LimitBound;

/**
 * The outcome of a Monte-Carlo run, held as primitive arrays: the sampled parameters (one flat row-major
 * array) and one array per metric. Summaries, yields, histograms and the worst variants are computed from
 * them on request, over the evaluated variants only (a cancelled run keeps the variants it finished).
 * The arrays are never handed out; accessors copy.
 */
public final class MonteCarloResult {

    private final List<Quantity> parameters;
    private final List<Quantity> metrics;
    private final MonteCarloPlan plan;
    private final double[] parameterValues;
    private final double[][] metricValues;
    private final boolean[] evaluated;
    private final int completed;
    private final boolean cancelled;

    MonteCarloResult(List<Quantity> parameters, List<Quantity> metrics, MonteCarloPlan plan, double[] parameterValues,
                     double[][] metricValues, boolean[] evaluated, int completed, boolean cancelled) {
        this.parameters = parameters;
        this.metrics = metrics;
        this.plan = plan;
        this.parameterValues = parameterValues;
        this.metricValues = metricValues;
        this.evaluated = evaluated;
        this.completed = completed;
        this.cancelled = cancelled;
    }

    public MonteCarloPlan plan() {
        return plan;
    }

    public List<Quantity> parameters() {
        return parameters;
    }

    public List<Quantity> metrics() {
        return metrics;
    }

    public int metricIndex(String name) {
        return Quantity.indexOf("metric", metrics, name);
    }

    public int parameterIndex(String name) {
        return Quantity.indexOf("parameter", parameters, name);
    }

    /** Variants in the plan. */
    public int variantCount() {
        return plan.variantCount();
    }

    /** Variants evaluated (all of them unless the run was cancelled). */
    public int completedCount() {
        return completed;
    }

    public boolean cancelled() {
        return cancelled;
    }

    public boolean isEvaluated(int variant) {
        return evaluated[variant];
    }

    /** Metric {@code metric} of variant {@code variant}; NaN when not evaluated or not computable. */
    public double metric(int metric, int variant) {
        return metricValues[metric][variant];
    }

    public double parameter(int variant, int parameter) {
        return parameterValues[variant * parameters.size() + parameter];
    }

    /** A copy of one metric over all variants (NaN where not evaluated). */
    public double[] metricValues(int metric) {
        return metricValues[metric].clone();
    }

    /** A copy of one parameter over all variants. */
    public double[] parameterValues(int parameter) {
        int p = parameters.size();
        double[] out = new double[plan.variantCount()];
        for (int v = 0; v < out.length; v++) {
            out[v] = parameterValues[v * p + parameter];
        }
        return out;
    }

    /** The finite values of evaluated variants, sorted; returns the count, the NaN count in {@code invalid[0]}. */
    private int sortedFinite(int metric, double[] into, int[] invalid) {
        double[] values = metricValues[metric];
        int n = 0;
        int bad = 0;
        for (int v = 0; v < values.length; v++) {
            if (!evaluated[v]) {
                continue;
            }
            if (Double.isNaN(values[v])) {
                bad++;
            } else {
                into[n++] = values[v];
            }
        }
        Arrays.sort(into, 0, n);
        invalid[0] = bad;
        return n;
    }

    /** Mean, σ, extremes and percentiles 1/5/50/95/99 of one metric. */
    public MetricSummary summary(int metric) {
        double[] sorted = new double[metricValues[metric].length];
        int[] invalid = new int[1];
        int n = sortedFinite(metric, sorted, invalid);
        return MetricSummary.ofSorted(metrics.get(metric), sorted, n, invalid[0]);
    }

    /** Summaries of all metrics, model order. */
    public List<MetricSummary> summaries() {
        List<MetricSummary> out = new ArrayList<>();
        for (int m = 0; m < metrics.size(); m++) {
            out.add(summary(m));
        }
        return List.copyOf(out);
    }

    /** Any percentile p (0..1) of one metric, same definition as the summary. */
    public double percentile(int metric, double p) {
        double[] sorted = new double[metricValues[metric].length];
        int n = sortedFinite(metric, sorted, new int[1]);
        return MetricSummary.percentile(sorted, n, p);
    }

    /** Fraction of evaluated variants whose metric satisfies {@code bound} at {@code limit}. */
    public YieldEstimate yield(int metric, LimitBound bound, double limit) {
        if (bound == null || Double.isNaN(limit)) {
            throw new IllegalArgumentException("a yield needs a bound (AT_MOST/AT_LEAST) and a limit, got " + bound
                    + " " + limit);
        }
        double[] values = metricValues[metric];
        int pass = 0;
        int n = 0;
        for (int v = 0; v < values.length; v++) {
            if (evaluated[v]) {
                n++;
                if (bound.isSatisfiedBy(values[v], limit)) { // NaN satisfies neither bound
                    pass++;
                }
            }
        }
        return YieldEstimate.of(metrics.get(metric), bound, limit, pass, n);
    }

    /**
     * The {@code k} worst evaluated variants on one metric, worst first: largest values when
     * {@code bound} is AT_MOST (a deviation), smallest when AT_LEAST (a margin). NaN ranks worst of all; ties
     * go to the lower index.
     */
    public List<WorstVariant> worst(int metric, int k, LimitBound bound) {
        if (k < 0) {
            throw new IllegalArgumentException("number of worst variants must be >= 0, got " + k);
        }
        double sign = bound == LimitBound.AT_LEAST ? -1 : 1;
        double[] values = metricValues[metric];
        // bounded selection over primitive arrays: keep the k worst seen, sorted worst first
        int[] index = new int[k];
        double[] badness = new double[k];
        int size = 0;
        for (int v = 0; v < values.length && k > 0; v++) {
            if (!evaluated[v]) {
                continue;
            }
            double b = Double.isNaN(values[v]) ? Double.POSITIVE_INFINITY : sign * values[v];
            if (size == k && !(b > badness[k - 1])) {
                continue;
            }
            int pos = size < k ? size++ : k - 1;
            while (pos > 0 && b > badness[pos - 1]) {
                badness[pos] = badness[pos - 1];
                index[pos] = index[pos - 1];
                pos--;
            }
            badness[pos] = b;
            index[pos] = v;
        }
        List<WorstVariant> out = new ArrayList<>(size);
        int p = parameters.size();
        for (int i = 0; i < size; i++) {
            int v = index[i];
            double[] all = new double[metrics.size()];
            for (int m = 0; m < all.length; m++) {
                all[m] = metricValues[m][v];
            }
            out.add(new WorstVariant(v, Arrays.copyOfRange(parameterValues, v * p, v * p + p), values[v], all));
        }
        return List.copyOf(out);
    }

    /** Histogram of one metric over its finite range in {@code bins} equal bins. */
    public Histogram histogram(int metric, int bins) {
        if (bins < 1) {
            throw new IllegalArgumentException("a histogram needs at least 1 bin, got " + bins);
        }
        MetricSummary s = summary(metric);
        int[] counts = new int[bins];
        if (s.count() == 0) {
            return new Histogram(metrics.get(metric), Double.NaN, Double.NaN, counts);
        }
        double lo = s.min();
        double hi = s.max() > s.min() ? s.max() : s.min() + Math.max(Math.abs(s.min()), 1e-300) * 1e-9;
        double[] values = metricValues[metric];
        for (int v = 0; v < values.length; v++) {
            if (evaluated[v] && !Double.isNaN(values[v])) {
                int bin = (int) ((values[v] - lo) / (hi - lo) * bins);
                counts[Math.min(Math.max(bin, 0), bins - 1)]++;
            }
        }
        return new Histogram(metrics.get(metric), lo, hi, counts);
    }
}
