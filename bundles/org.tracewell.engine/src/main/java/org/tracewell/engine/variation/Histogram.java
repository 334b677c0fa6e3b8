package org.tracewell.engine.variation;

/**
 * Counts of one metric in equal-width bins over [lower, upper]; the last bin includes its upper edge.
 *
 * @param metric the metric
 * @param lower  lower edge of the first bin, metric unit
 * @param upper  upper edge of the last bin
 * @param counts variants per bin
 */
public record Histogram(Quantity metric, double lower, double upper, int[] counts) {

    public Histogram {
        counts = counts.clone();
    }

    @Override
    public int[] counts() {
        return counts.clone();
    }

    public int binCount() {
        return counts.length;
    }

    public int count(int bin) {
        return counts[bin];
    }

    public double binWidth() {
        return (upper - lower) / counts.length;
    }

    /** Lower edge of bin {@code bin}. */
    public double binStart(int bin) {
        return lower + bin * binWidth();
    }
}
