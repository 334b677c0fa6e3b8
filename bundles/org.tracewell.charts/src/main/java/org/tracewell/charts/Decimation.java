package org.tracewell.charts;

import java.util.Arrays;

/**
 * Min/max decimation for display: keeps, for each pixel column, the first, lowest, highest and
 * last sample, so peaks survive and a 10⁷-sample path draws as fast as a 10³ one. The data
 * itself is never changed; only what is handed to the chart shrinks.
 */
public final class Decimation {

    private Decimation() {
    }

    /** x values ascending; buckets equal in x (or in log x when {@code logX}). */
    public static XY minMax(double[] x, double[] y, int columns, boolean logX) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("x has " + x.length + " samples but y has " + y.length);
        }
        if (columns < 1) {
            throw new IllegalArgumentException("columns must be ≥ 1, got " + columns);
        }
        int n = x.length;
        if (n <= 4L * columns) {
            return new XY(x.clone(), y.clone());
        }
        double lo = scale(x[0], logX);
        double hi = scale(x[n - 1], logX);
        double width = (hi - lo) / columns;
        double[] outX = new double[4 * columns + 4];
        double[] outY = new double[outX.length];
        int count = 0;
        int i = 0;
        while (i < n) {
            int bucket = width > 0 ? (int) Math.min(columns - 1, Math.floor((scale(x[i], logX) - lo) / width)) : 0;
            int first = i;
            int min = i;
            int max = i;
            while (i < n && (width <= 0 ? bucket == 0
                    : (int) Math.min(columns - 1, Math.floor((scale(x[i], logX) - lo) / width)) == bucket)) {
                if (y[i] < y[min]) {
                    min = i;
                }
                if (y[i] > y[max]) {
                    max = i;
                }
                i++;
            }
            int last = i - 1;
            int[] keep = {first, Math.min(min, max), Math.max(min, max), last};
            int previous = -1;
            for (int k : keep) {
                if (k != previous) {
                    outX[count] = x[k];
                    outY[count] = y[k];
                    count++;
                    previous = k;
                }
            }
        }
        return new XY(Arrays.copyOf(outX, count), Arrays.copyOf(outY, count));
    }

    private static double scale(double v, boolean log) {
        return log ? Math.log10(v) : v;
    }

    /** A pair of equal-length arrays. */
    public record XY(double[] x, double[] y) {
    }
}
