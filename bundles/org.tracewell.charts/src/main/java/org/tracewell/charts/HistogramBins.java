package org.tracewell.charts;

/**
 * Counts of a quantity in bins given by their edges, in the unit the chart's axis shows: bin i spans
 * [edges[i], edges[i + 1]]. Edges need not be evenly spaced (bins equal in SI become unequal in dB).
 *
 * @param edges  bin edges, strictly increasing, one more than the counts
 * @param counts samples per bin, ≥ 0
 */
public record HistogramBins(double[] edges, int[] counts) {

    public HistogramBins {
        if (counts.length == 0 || edges.length != counts.length + 1) {
            throw new IllegalArgumentException("a histogram needs at least one bin and one more edge than bins, got "
                    + edges.length + " edges for " + counts.length + " bins");
        }
        for (int i = 0; i < counts.length; i++) {
            if (!(edges[i + 1] > edges[i]) || !Double.isFinite(edges[i]) || !Double.isFinite(edges[i + 1])) {
                throw new IllegalArgumentException("histogram edges must be finite and increasing, got " + edges[i]
                        + " then " + edges[i + 1] + " at bin " + i);
            }
            if (counts[i] < 0) {
                throw new IllegalArgumentException("histogram count of bin " + i + " is negative: " + counts[i]);
            }
        }
        edges = edges.clone();
        counts = counts.clone();
    }

    @Override
    public double[] edges() {
        return edges.clone();
    }

    @Override
    public int[] counts() {
        return counts.clone();
    }

    public int total() {
        int n = 0;
        for (int c : counts) {
            n += c;
        }
        return n;
    }
}
