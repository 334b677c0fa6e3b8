package org.tracewell.engine.variation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class SweepAndSensitivityTest {

    /** m1 = p1²·p2, m2 = p3/p1, m3 = sin p2. */
    private static VariantModel polynomial() {
        return VariantModel.of(List.of(Quantity.of("p1", "1"), Quantity.of("p2", "1"), Quantity.of("p3", "1")),
                List.of(Quantity.of("m1", "1"), Quantity.of("m2", "1"), Quantity.of("m3", "1")),
                (p, m) -> {
                    m[0] = p[0] * p[0] * p[1];
                    m[1] = p[2] / p[0];
                    m[2] = Math.sin(p[1]);
                });
    }

    @Test
    void normalisedSensitivitiesOfAPowerLawAreItsExponents() {
        SensitivityAnalysis s = SensitivityAnalysis.at(polynomial(), new double[] {3, 0.7, 5}, 1e-4);
        // m = p1²·p2: (∂m/m)/(∂p/p) = 2 for p1 and 1 for p2, 0 for p3 (power-law exponents, analytic);
        // central differences are exact for a quadratic, so only rounding remains
        assertEquals(2, s.normalised(0, 0), 1e-9);
        assertEquals(1, s.normalised(0, 1), 1e-9);
        assertEquals(0, s.normalised(0, 2), 0);
        assertEquals(2 * 3 * 0.7, s.derivative(0, 0), 1e-9);
        // m2 = p3/p1: exponents −1 and 1; O(h²) = 1e-8 truncation error
        assertEquals(-1, s.normalised(1, 0), 1e-7);
        assertEquals(1, s.normalised(1, 2), 1e-9);
        // m3 = sin p2: normalised p2·cos p2/sin p2 (analytic)
        assertEquals(0.7 * Math.cos(0.7) / Math.sin(0.7), s.normalised(2, 1), 1e-7);
        // ranked by magnitude: p1 (2), p2 (1), p3 (0)
        List<Sensitivity> ranked = s.ranked(0);
        assertEquals(List.of("p1", "p2", "p3"), ranked.stream().map(Sensitivity::name).toList());
        assertEquals(List.of("p1", "p3", "p2"), s.ranked(1).stream().map(Sensitivity::name).toList());
    }

    @Test
    void zeroParameterOrMetricHasNoNormalisedValue() {
        SensitivityAnalysis s = SensitivityAnalysis.at(polynomial(), new double[] {3, 0, 5}, 1e-3);
        assertTrue(Double.isNaN(s.normalised(0, 0))); // metric is 0
        assertEquals(9, s.derivative(0, 1), 1e-9); // ∂(p1²p2)/∂p2 = p1², absolute step used at p2 = 0
        assertThrows(IllegalArgumentException.class, () -> SensitivityAnalysis.at(polynomial(), new double[] {1, 2}, 1e-3));
        assertThrows(IllegalArgumentException.class, () -> SensitivityAnalysis.at(polynomial(), new double[] {1, 2, 3}, 0));
    }

    @Test
    void linearAndLogarithmicGrids() {
        SweepAxis lin = SweepAxis.linear(0, 1, 2, 5);
        assertArrayEquals(new double[] {1, 1.25, 1.5, 1.75, 2}, lin.values(), 1e-15);
        SweepAxis log = SweepAxis.logarithmic(0, 1, 1000, 4);
        assertArrayEquals(new double[] {1, 10, 100, 1000}, log.values(), 1e-12);
        SweepAxis negative = SweepAxis.logarithmic(0, -1, -100, 3);
        assertArrayEquals(new double[] {-1, -10, -100}, negative.values(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> SweepAxis.logarithmic(0, 0, 10, 3));
        assertThrows(IllegalArgumentException.class, () -> SweepAxis.linear(0, 0, 10, 0));
    }

    @Test
    void oneAndTwoDimensionalSweepsEvaluateTheGrid() {
        VariantModel model = polynomial();
        double[] base = {3, 0.7, 5};
        SweepResult one = SweepRunner.sweep(model, base, SweepAxis.linear(1, 0, 2, 11), RunControl.serial());
        assertEquals(11, one.pointCount());
        for (int i = 0; i < 11; i++) {
            assertEquals(9 * 0.2 * i, one.metric(0, i), 1e-12);
        }
        ForkJoinPool pool = new ForkJoinPool(2);
        try {
            SweepAxis a = SweepAxis.logarithmic(0, 0.1, 10, 30);
            SweepAxis b = SweepAxis.linear(2, -1, 1, 7);
            SweepResult two = SweepRunner.sweep(model, base, a, b, RunControl.on(pool));
            assertEquals(210, two.pointCount());
            for (int i = 0; i < 30; i++) {
                for (int j = 0; j < 7; j++) {
                    double p1 = a.value(i);
                    double p3 = b.value(j);
                    assertEquals(p1 * p1 * 0.7, two.metric(0, i, j), 1e-12 * p1 * p1);
                    assertEquals(p3 / p1, two.metric(1, i, j), 1e-12);
                }
            }
            SweepResult serial = SweepRunner.sweep(model, base, a, b, RunControl.serial());
            assertArrayEquals(serial.metricValues(1), two.metricValues(1));
        } finally {
            pool.shutdown();
        }
        assertThrows(IllegalArgumentException.class,
                () -> SweepRunner.sweep(model, base, SweepAxis.linear(1, 0, 1, 2), SweepAxis.linear(1, 0, 1, 2),
                        RunControl.serial()));
    }

    @Test
    void sweepsCancelToo() {
        AtomicInteger calls = new AtomicInteger();
        VariantModel slow = VariantModel.of(List.of(Quantity.of("p", "1")), List.of(Quantity.of("m", "1")),
                (p, m) -> m[0] = calls.incrementAndGet());
        SweepResult r = SweepRunner.sweep(slow, new double[] {0}, SweepAxis.linear(0, 0, 1, 10_000),
                RunControl.serial().withCancellation(() -> calls.get() >= 300));
        assertTrue(r.cancelled());
        assertEquals(300, r.completedCount());
        assertTrue(Double.isNaN(r.metric(0, 300)));
        assertEquals(300, r.metric(0, 299), 0);
    }
}
