package org.tracewell.engine.tf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.poly.Polynomial;

class TransferFunctionTest {

    private static TransferFunction tf(double[] num, double[] den) {
        return TransferFunction.ofDescending(num, den);
    }

    private static void assertComplex(Complex expected, Complex actual, double tol) {
        assertTrue(expected.subtract(actual).abs() <= tol * Math.max(1, expected.abs()),
                "expected " + expected + " got " + actual);
    }

    @Test
    void connectionsMatchPointwiseArithmetic() {
        TransferFunction g = tf(new double[] {2, 1}, new double[] {1, 3, 2});
        TransferFunction h = tf(new double[] {5}, new double[] {1, 4});
        Complex s = new Complex(0.2, 1.3);
        Complex gv = g.evaluate(s);
        Complex hv = h.evaluate(s);
        assertComplex(gv.multiply(hv), g.series(h).evaluate(s), 1e-14);
        assertComplex(gv.add(hv), g.parallel(h).evaluate(s), 1e-14);
        assertComplex(gv.divide(gv.multiply(hv).add(1)), g.feedback(h).evaluate(s), 1e-14);
        assertComplex(gv.divide(gv.add(1)), g.unityFeedback().evaluate(s), 1e-14);
    }

    @Test
    void deadTimeIsExactInTheFrequencyResponse() {
        TransferFunction g = tf(new double[] {10}, new double[] {1, 1}).withDelay(0.05);
        FrequencyResponse fr = g.frequencyResponse(new double[] {0.5, 5, 50});
        for (int i = 0; i < fr.size(); i++) {
            double w = fr.omega(i);
            Complex ref = new Complex(10, 0).divide(new Complex(1, w)).multiply(new Complex(0, -w * 0.05).exp());
            assertEquals(ref.getReal(), fr.real(i), 1e-13);
            assertEquals(ref.getImaginary(), fr.imaginary(i), 1e-13);
            assertEquals(ref.abs(), fr.magnitude(i), 1e-13);
        }
        // Unwrapped phase keeps going below −180° (delay adds −ωT).
        double[] phase = g.frequencyResponse(new double[] {1, 10, 20, 40, 60, 80, 100, 120}).unwrappedPhaseDeg();
        assertEquals(-Math.toDegrees(Math.atan(120) + 120 * 0.05), phase[7], 1e-9);
    }

    @Test
    void padeApproximantMatchesTheDelay() {
        // Order 1: (1 − sT/2)/(1 + sT/2) (Baker, Essentials of Padé Approximants, from memory).
        TransferFunction p1 = PadeDelay.of(0.2, 1);
        assertEquals(Polynomial.ofDescending(-0.1, 1), p1.numerator());
        assertEquals(Polynomial.ofDescending(0.1, 1), p1.denominator());
        // Order 6 is all-pass and tracks e^(−jωT) closely up to ωT = 3 (error below 1e-6) [der].
        double t = 0.01;
        TransferFunction p6 = PadeDelay.of(t, 6);
        for (double wt : new double[] {0.1, 1, 2, 3}) {
            Complex v = p6.evaluate(new Complex(0, wt / t));
            assertEquals(1.0, v.abs(), 1e-13);
            assertComplex(new Complex(0, -wt).exp(), v, 1e-6);
        }
    }

    @Test
    void minimalRealizationCancelsCommonFactors() {
        // (s+1)(s+3)/((s+1)(s+2)(s²+2s+5)) with a complex pair cancelling as well.
        Polynomial common = Polynomial.ofDescending(1, 2, 5);
        TransferFunction g = TransferFunction.of(Polynomial.ofDescending(1, 4, 3).multiply(common).scale(7),
                Polynomial.ofDescending(1, 3, 2).multiply(common).multiply(Polynomial.ofDescending(1, 10)));
        TransferFunction m = g.minimalRealization(1e-8);
        assertEquals(1, m.numerator().degree());
        assertEquals(2, m.denominator().degree());
        Complex s = new Complex(0.4, 2.2);
        assertComplex(g.evaluate(s), m.evaluate(s), 1e-12);
    }

    @Test
    void scalingMovesPolesByTheFactor() {
        TransferFunction g = tf(new double[] {3}, new double[] {1, 2, 5});
        TransferFunction gs = g.scaleFrequency(10);
        assertComplex(new Complex(-10, 20), gs.poles().get(0), 1e-12);
        assertComplex(g.evaluate(new Complex(0, 1)), gs.evaluate(new Complex(0, 10)), 1e-14);
    }

    @Test
    void badInputIsRejectedWithAClearMessage() {
        IllegalArgumentException zeroDen = assertThrows(IllegalArgumentException.class,
                () -> tf(new double[] {1}, new double[] {0, 0, 0}));
        assertTrue(zeroDen.getMessage().contains("denominator is the zero polynomial"), zeroDen.getMessage());
        IllegalArgumentException zeroNum = assertThrows(IllegalArgumentException.class,
                () -> tf(new double[] {0}, new double[] {1, 1}));
        assertTrue(zeroNum.getMessage().contains("numerator"), zeroNum.getMessage());
        assertThrows(IllegalArgumentException.class, () -> tf(new double[] {1}, new double[] {1, 1}).withDelay(-1));
        assertThrows(IllegalArgumentException.class,
                () -> tf(new double[] {1}, new double[] {1, 1}).withDelay(0.1).unityFeedback());
        assertThrows(IllegalArgumentException.class, () -> PadeDelay.of(0.1, 0));
        assertThrows(IllegalArgumentException.class, () -> StateSpace.controllableCanonical(
                tf(new double[] {1, 0, 0}, new double[] {1, 1})));
    }
}
