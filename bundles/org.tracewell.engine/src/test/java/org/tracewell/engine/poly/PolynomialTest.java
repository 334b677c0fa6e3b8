package org.tracewell.engine.poly;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

class PolynomialTest {

    @Test
    void descendingInputTrimsLeadingZeros() {
        Polynomial p = Polynomial.ofDescending(0, 0, 1, 15, 100);
        assertEquals(2, p.degree());
        assertEquals(100, p.coefficient(0), 0);
        assertEquals(1, p.leadingCoefficient(), 0);
        assertEquals("1 s^2 + 15 s + 100", p.toString());
    }

    @Test
    void hornerMatchesDirectSum() {
        Polynomial p = Polynomial.ofDescending(2, -3, 0.5, 7);
        Complex z = new Complex(0.3, -1.7);
        Complex direct = z.pow(3).multiply(2).subtract(z.pow(2).multiply(3)).add(z.multiply(0.5)).add(7);
        Complex horner = p.evaluate(z);
        assertEquals(direct.getReal(), horner.getReal(), 1e-12);
        assertEquals(direct.getImaginary(), horner.getImaginary(), 1e-12);
    }

    @Test
    void rootsOfKnownFactorisations() {
        // (s+1)(s+2)(s²+2s+5): roots −1, −2, −1 ± 2j [der].
        Polynomial p = Polynomial.ofDescending(1, 3, 2).multiply(Polynomial.ofDescending(1, 2, 5));
        List<Complex> r = p.roots();
        assertEquals(4, r.size());
        assertClose(new Complex(-1, 2), r.get(0), 1e-13);
        assertClose(new Complex(-1, -2), r.get(1), 1e-13);
        assertClose(new Complex(-1, 0), r.get(2), 1e-13);
        assertClose(new Complex(-2, 0), r.get(3), 1e-13);
        // Conjugates exact.
        assertEquals(r.get(0).getReal(), r.get(1).getReal(), 0.0);
        assertEquals(r.get(0).getImaginary(), -r.get(1).getImaginary(), 0.0);
    }

    @Test
    void integratorsStayExactlyAtZero() {
        List<Complex> r = Polynomial.ofDescending(1, 6, 5, 0, 0).roots();
        assertEquals(Complex.ZERO, r.get(0));
        assertEquals(Complex.ZERO, r.get(1));
    }

    @Test
    void badlyScaledCoefficientsStillGiveAccurateRoots() {
        // Poles at 1e-2, 1, 1e2, 1e4 rad/s: coefficients span 16 decades; balancing keeps roots to 1e-10.
        double[] poles = {-1e-2, -1, -1e2, -1e4};
        List<Complex> roots = new ArrayList<>();
        for (double p : poles) {
            roots.add(new Complex(p, 0));
        }
        List<Complex> r = Polynomial.fromRoots(1.0, roots).roots();
        for (int i = 0; i < poles.length; i++) {
            assertEquals(poles[i], r.get(i).getReal(), 1e-10 * Math.abs(poles[i]));
        }
    }

    @Test
    void randomPolynomialsRoundTrip() {
        Random rnd = new Random(3);
        for (int trial = 0; trial < 100; trial++) {
            List<Complex> roots = new ArrayList<>();
            int pairs = rnd.nextInt(4);
            for (int i = 0; i < pairs; i++) {
                Complex z = new Complex(-rnd.nextDouble() * 10, rnd.nextDouble() * 10 + 0.1);
                roots.add(z);
                roots.add(z.conjugate());
            }
            for (int i = 0, n = 1 + rnd.nextInt(4); i < n; i++) {
                roots.add(new Complex(rnd.nextGaussian() * 5, 0));
            }
            Polynomial p = Polynomial.fromRoots(2.5, roots);
            for (Complex z : p.roots()) {
                double nearest = roots.stream().mapToDouble(x -> x.subtract(z).abs()).min().orElseThrow();
                assertTrue(nearest < 1e-6 * Math.max(1, z.abs()), "root " + z + " of " + p);
                assertTrue(p.evaluate(z).abs() < 1e-8 * p.coefficientNorm() * Math.pow(Math.max(1, z.abs()), p.degree()));
            }
        }
    }

    @Test
    void realRootsSurviveTheEigenSolverPitfall() {
        // s² + 90807.82 s − 4.525e8 has real roots 4736.05 and −95543.87 (quadratic formula [der]). The balanced
        // companion matrix makes Commons Math's non-symmetric eigen solver return a wrong complex pair
        // (same code path as Hipparchus issue #30); the backward-error check must catch it.
        double b = 90807.82086258881;
        double c = -4.525001025463247E8;
        Polynomial p = Polynomial.ofDescending(1, b, c);
        double disc = Math.sqrt(b * b - 4 * c);
        List<Complex> r = p.roots();
        assertEquals((-b + disc) / 2, r.get(0).getReal(), 1e-9 * disc);
        assertEquals(0.0, r.get(0).getImaginary(), 0.0);
        assertEquals((-b - disc) / 2, r.get(1).getReal(), 1e-9 * disc);
        assertTrue(PolynomialRoots.backwardError(p, r) < 1e-12);
    }

    @Test
    void badInputIsRejectedWithAClearMessage() {
        IllegalArgumentException empty = assertThrows(IllegalArgumentException.class, () -> Polynomial.ofDescending());
        assertTrue(empty.getMessage().contains("at least one coefficient"), empty.getMessage());
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
                () -> Polynomial.ofDescending(1, Double.NaN, 2));
        assertTrue(nan.getMessage().contains("NaN") && nan.getMessage().contains("s^1"), nan.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Polynomial.ofDescending(1, Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> Polynomial.ofDescending(0, 0).roots());
        assertThrows(IllegalArgumentException.class,
                () -> Polynomial.fromRoots(1, List.of(new Complex(-1, 1))));
    }

    private static void assertClose(Complex expected, Complex actual, double tol) {
        assertTrue(expected.subtract(actual).abs() <= tol, "expected " + expected + " got " + actual);
    }
}
