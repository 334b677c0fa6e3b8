package org.tracewell.engine.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.poly.Polynomial;

class RouthArrayTest {

    @Test
    void zeroFirstElementUsesEpsilon() {
        // Nise, Control Systems Engineering, Ex. 6.2 (from memory): s⁵+2s⁴+3s³+6s²+5s+3 has a zero
        // first element in the s³ row; ε method gives two sign changes, two right-half-plane roots.
        Polynomial p = Polynomial.ofDescending(1, 2, 3, 6, 5, 3);
        RouthArray r = RouthArray.of(p);
        assertEquals(2, r.rightHalfPlaneRoots());
        assertEquals(java.util.List.of(2), r.epsilonRows());
        assertTrue(r.zeroRows().isEmpty());
        assertFalse(r.stable());
        // Independent check: numpy.roots gives 0.343 ± 1.508j in the right half plane.
        assertEquals(2, countRightHalfPlane(p));
    }

    @Test
    void rowOfZerosUsesAuxiliaryPolynomial() {
        // Nise Ex. 6.4 (from memory): s⁵+7s⁴+6s³+42s²+8s+56: row of zeros at s³, auxiliary
        // 7s⁴+42s²+56. Factorisation (s+7)(s²+2)(s²+4) [der]: four roots on the jω axis, none right.
        Polynomial p = Polynomial.ofDescending(1, 7, 6, 42, 8, 56);
        RouthArray r = RouthArray.of(p);
        assertEquals(java.util.List.of(2), r.zeroRows());
        assertEquals(Polynomial.ofDescending(7, 0, 42, 0, 56), r.auxiliaryPolynomial().orElseThrow());
        // Derivative 28s³ + 84s replaces the zero row.
        assertEquals(28.0, r.row(2)[0], 0.0);
        assertEquals(84.0, r.row(2)[1], 0.0);
        assertEquals(0, r.rightHalfPlaneRoots());
        assertEquals(4, r.imaginaryAxisRoots());
        assertFalse(r.stable());
    }

    @Test
    void rootsAtOriginCountOnTheAxis() {
        RouthArray r = RouthArray.of(Polynomial.ofDescending(1, 3, 2, 0, 0)); // s²(s+1)(s+2)
        assertEquals(2, r.imaginaryAxisRoots());
        assertEquals(0, r.rightHalfPlaneRoots());
        assertFalse(r.stable());
    }

    @Test
    void signChangesMatchRootCountsOfRandomPolynomials() {
        // Independent numerics: Routh counts against companion-matrix roots for 300 random polynomials.
        Random rnd = new Random(7);
        for (int trial = 0; trial < 300; trial++) {
            int n = 1 + rnd.nextInt(8);
            double[] c = new double[n + 1];
            c[0] = 1;
            for (int i = 1; i <= n; i++) {
                c[i] = rnd.nextGaussian() * 3 + 1;
            }
            Polynomial p = Polynomial.ofDescending(c);
            RouthArray r = RouthArray.of(p);
            if (r.epsilonRows().isEmpty() && r.zeroRows().isEmpty()) {
                assertEquals(countRightHalfPlane(p), r.rightHalfPlaneRoots(), p.toString());
                assertEquals(countRightHalfPlane(p) == 0, r.stable(), p.toString());
            }
        }
    }

    private static int countRightHalfPlane(Polynomial p) {
        int k = 0;
        for (Complex z : p.roots()) {
            if (z.getReal() > 0) {
                k++;
            }
        }
        return k;
    }
}
