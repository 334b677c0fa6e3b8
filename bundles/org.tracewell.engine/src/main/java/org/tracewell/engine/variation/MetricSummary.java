package org.tracewell.engine.variation;

/**
 * The distribution of one metric over the evaluated variants of a run. Percentiles are exact order
 * statistics of the sorted values with linear interpolation between neighbours: position h = (n − 1)·p,
 * Hyndman &amp; Fan's definition 7 (Amer. Statistician 50(4), 1996 — from memory), the default of R and NumPy.
 *
 * @param metric            the metric
 * @param count             variants with a finite value
 * @param invalidCount      evaluated variants whose value was NaN (not computable)
 * @param mean              arithmetic mean, metric unit
 * @param standardDeviation sample standard deviation (n − 1 in the denominator); 0 for one value
 * @param min               smallest value
 * @param max               largest value
 * @param p01               1st percentile
 * @param p05               5th percentile
 * @param p50               median
 * @param p95               95th percentile
 * @param p99               99th percentile
 */
public record MetricSummary(Quantity metric, int count, int invalidCount, double mean, double standardDeviation,
                            double min, double max, double p01, double p05, double p50, double p95, double p99) {

    /** Summary of the first {@code n} entries of {@code sorted} (ascending, finite). */
    static MetricSummary ofSorted(Quantity metric, double[] sorted, int n, int invalid) {
        if (n == 0) {
            double nan = Double.NaN;
            return new MetricSummary(metric, 0, invalid, nan, nan, nan, nan, nan, nan, nan, nan, nan);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += sorted[i];
        }
        double mean = sum / n;
        double squares = 0;
        double residual = 0;
        for (int i = 0; i < n; i++) {
            double d = sorted[i] - mean;
            squares += d * d;
            residual += d;
        }
        // corrected two-pass variance (Chan, Golub & LeVeque, Amer. Statistician 37(3), 1983 — from memory)
        double variance = n > 1 ? (squares - residual * residual / n) / (n - 1) : 0;
        return new MetricSummary(metric, n, invalid, mean, Math.sqrt(Math.max(variance, 0)), sorted[0], sorted[n - 1],
                percentile(sorted, n, 0.01), percentile(sorted, n, 0.05), percentile(sorted, n, 0.50),
                percentile(sorted, n, 0.95), percentile(sorted, n, 0.99));
    }

    /** Percentile p (0..1) of the first n sorted values, definition 7. */
    static double percentile(double[] sorted, int n, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("percentile needs p in 0..1, got " + p);
        }
        if (n == 0) {
            return Double.NaN;
        }
        double h = (n - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, n - 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }
}
