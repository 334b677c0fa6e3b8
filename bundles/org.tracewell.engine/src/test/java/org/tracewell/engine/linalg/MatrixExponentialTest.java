package org.tracewell.engine.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;

import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

class MatrixExponentialTest {

    private static void assertMatrix(RealMatrix expected, RealMatrix actual, double relTol) {
        double scale = Math.max(1e-300, expected.getFrobeniusNorm());
        assertEquals(0.0, expected.subtract(actual).getFrobeniusNorm() / scale, relTol);
    }

    @Test
    void rotationGivesCosineAndSine() {
        // exp([[0, w], [−w, 0]]·t) = [[cos, sin], [−sin, cos]] (analytic), for small and large norms.
        for (double w : new double[] {1e-3, 0.3, 2.0, 40.0, 1000.0}) {
            RealMatrix a = MatrixUtils.createRealMatrix(new double[][] {{0, w}, {-w, 0}});
            RealMatrix e = MatrixExponential.exp(a);
            RealMatrix ref = MatrixUtils.createRealMatrix(new double[][] {{Math.cos(w), Math.sin(w)},
                {-Math.sin(w), Math.cos(w)}});
            // Squaring amplifies rounding with the norm: tolerance 1e-13·max(1, w).
            assertMatrix(ref, e, 1e-13 * Math.max(1, w));
        }
    }

    @Test
    void nilpotentSeriesIsExact() {
        // exp of a strictly upper triangular N = I + N + N²/2 (N³ = 0) [analytic].
        RealMatrix n = MatrixUtils.createRealMatrix(new double[][] {{0, 2, 3}, {0, 0, 4}, {0, 0, 0}});
        RealMatrix ref = MatrixUtils.createRealIdentityMatrix(3).add(n).add(n.multiply(n).scalarMultiply(0.5));
        assertMatrix(ref, MatrixExponential.exp(n), 1e-15);
    }

    @Test
    void symmetricMatricesAgreeWithEigenDecomposition() {
        // Independent route: V·exp(Λ)·Vᵀ from Commons Math's symmetric eigen-solver.
        Random rnd = new Random(11);
        for (int trial = 0; trial < 20; trial++) {
            int n = 2 + rnd.nextInt(8);
            double[][] m = new double[n][n];
            double scale = Math.pow(10, rnd.nextInt(3) - 1); // eigenvalues up to ~±60: no overflow
            for (int i = 0; i < n; i++) {
                for (int j = 0; j <= i; j++) {
                    m[i][j] = m[j][i] = rnd.nextGaussian() * scale;
                }
            }
            RealMatrix a = MatrixUtils.createRealMatrix(m);
            EigenDecomposition ed = new EigenDecomposition(a);
            double[] ev = ed.getRealEigenvalues();
            double[] ex = new double[n];
            for (int i = 0; i < n; i++) {
                ex[i] = Math.exp(ev[i]);
            }
            RealMatrix ref = ed.getV().multiply(MatrixUtils.createRealDiagonalMatrix(ex)).multiply(ed.getVT());
            assertMatrix(ref, MatrixExponential.exp(a), 1e-11);
        }
    }

    @Test
    void zeroOrderHoldOfFirstOrderLag() {
        // x' = −a x + u: Φ = e^(−ah), Γ = (1 − e^(−ah))/a (analytic).
        double a = 3.0;
        double h = 0.01;
        ZeroOrderHold.Discretized d = ZeroOrderHold.discretize(MatrixUtils.createRealMatrix(new double[][] {{-a}}),
                MatrixUtils.createRealMatrix(new double[][] {{1}}), h);
        assertEquals(Math.exp(-a * h), d.phi().getEntry(0, 0), 1e-16);
        assertEquals((1 - Math.exp(-a * h)) / a, d.gamma().getEntry(0, 0), 1e-17);
    }

    @Test
    void badInputIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> MatrixExponential.exp(MatrixUtils.createRealMatrix(2, 3)));
        RealMatrix nan = MatrixUtils.createRealMatrix(new double[][] {{Double.NaN}});
        assertThrows(IllegalArgumentException.class, () -> MatrixExponential.exp(nan));
    }
}
