package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Min/max decimation keeps every extreme and the end points; it never loses a peak. */
class DecimationTest {

    @Test
    void keepsPeaksOfALargeSeries() {
        int n = 1_000_000;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 1e-3;
            y[i] = Math.sin(i * 1e-3);
        }
        y[123_457] = 42; // a single-sample spike, e.g. a reversal glitch
        y[654_321] = -17;
        Decimation.XY d = Decimation.minMax(x, y, 500, false);
        assertTrue(d.x().length <= 4 * 500, "at most four samples per column, got " + d.x().length);
        assertEquals(x[0], d.x()[0]);
        assertEquals(x[n - 1], d.x()[d.x().length - 1]);
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < d.y().length; i++) {
            max = Math.max(max, d.y()[i]);
            min = Math.min(min, d.y()[i]);
            if (i > 0) {
                assertTrue(d.x()[i] > d.x()[i - 1], "x stays ascending");
            }
        }
        assertEquals(42, max);
        assertEquals(-17, min);
    }

    @Test
    void smallSeriesPassUnchanged() {
        double[] x = {1, 2, 3};
        double[] y = {4, 5, 6};
        Decimation.XY d = Decimation.minMax(x, y, 10, true);
        assertEquals(3, d.x().length);
        assertEquals(5, d.y()[1]);
    }
}
