package org.tracewell.engine.contour;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class CircleFitTest {

    @Test
    void exactPointsGiveTheCircleExactly() {
        int n = 50;
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            double a = 0.3 + 2.0 * k / n; // a partial arc of 2 rad
            u[k] = -0.02 + 0.1 * Math.cos(a);
            v[k] = 0.07 + 0.1 * Math.sin(a);
        }
        for (FittedCircle c : new FittedCircle[] {CircleFit.algebraic(u, v, 0, n), CircleFit.geometric(u, v, 0, n)}) {
            assertEquals(-0.02, c.centreU(), 1e-13);
            assertEquals(0.07, c.centreV(), 1e-13);
            assertEquals(0.1, c.radius(), 1e-13);
            assertEquals(0.0, c.rmsResidual(), 1e-13);
        }
    }

    @Test
    void noisyPointsRecoverTheKnownCircle() {
        // synthetic ISO 230-4-like data: R = 100 mm, 3600 points, Gaussian radial noise σ = 1 µm
        Random random = new Random(42);
        int n = 3600;
        double sigma = 1e-6;
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n;
            double rho = 0.1 + sigma * random.nextGaussian();
            u[k] = 0.3 + rho * Math.cos(a);
            v[k] = -0.15 + rho * Math.sin(a);
        }
        FittedCircle c = CircleFit.geometric(u, v, 0, n);
        // standard errors of a full-circle fit: centre σ·√(2/n) ≈ 0.024 µm, radius σ/√n ≈ 0.017 µm
        // (least-squares theory [der]); assert within 5 standard errors
        assertEquals(0.3, c.centreU(), 5 * sigma * Math.sqrt(2.0 / n));
        assertEquals(-0.15, c.centreV(), 5 * sigma * Math.sqrt(2.0 / n));
        assertEquals(0.1, c.radius(), 5 * sigma / Math.sqrt(n));
        assertEquals(sigma, c.rmsResidual(), 0.05 * sigma); // residual spread ≈ σ
    }

    @Test
    void geometricFitImprovesOnKasaForAShortNoisyArc() {
        // the algebraic fit is biased toward smaller radii on short arcs (Chernov, Circular and linear
        // regression, CRC 2010, ch. 5 — from memory); the geometric fit minimises the radial residuals
        Random random = new Random(3);
        int n = 400;
        double[] u = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            double a = 1.0 * k / n;
            double rho = 0.05 + 5e-6 * random.nextGaussian();
            u[k] = rho * Math.cos(a);
            v[k] = rho * Math.sin(a);
        }
        FittedCircle kasa = CircleFit.algebraic(u, v, 0, n);
        FittedCircle geo = CircleFit.geometric(u, v, 0, n);
        assertTrue(geo.rmsResidual() <= kasa.rmsResidual(),
                "geometric rms " + geo.rmsResidual() + " vs algebraic " + kasa.rmsResidual());
    }

    @Test
    void tooFewPointsAreRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CircleFit.geometric(new double[] {0, 1}, new double[] {0, 1}, 0, 2));
        assertEquals("a circle fit needs at least 3 points in range 0..2 of 2", e.getMessage());
    }
}
