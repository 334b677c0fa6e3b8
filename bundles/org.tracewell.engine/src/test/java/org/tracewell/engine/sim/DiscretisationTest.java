package org.tracewell.engine.sim;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.linalg.MatrixExponential;

/**
 * The matrix exponential and the zero-order-hold discretisation the simulation relies on, against
 * closed forms and against an independent ODE integration (Commons Math Dormand–Prince 8(5,3)).
 */
class DiscretisationTest {

    private static void assertMatrix(double[][] expected, RealMatrix actual, double tol) {
        for (int i = 0; i < expected.length; i++) {
            for (int j = 0; j < expected[i].length; j++) {
                assertEquals(expected[i][j], actual.getEntry(i, j), tol, "entry (" + i + "," + j + ")");
            }
        }
    }

    @Test
    void rotationGeneratorGivesCosineSine() {
        // exp([[0, −θ], [θ, 0]]) = [[cos θ, −sin θ], [sin θ, cos θ]] (standard closed form);
        // θ = 40 exercises the scaling and squaring (‖A‖₁ = 40 > θ₁₃ = 5.37)
        for (double theta : new double[] {0.01, 1.3, 40}) {
            RealMatrix e = MatrixExponential.exp(MatrixUtils.createRealMatrix(new double[][] {{0, -theta}, {theta, 0}}));
            double c = Math.cos(theta);
            double s = Math.sin(theta);
            assertMatrix(new double[][] {{c, -s}, {s, c}}, e, 1e-13 * Math.max(1, theta));
        }
    }

    @Test
    void nilpotentSeriesTerminates() {
        // N³ = 0, so exp(N) = I + N + N²/2 exactly
        double a = 2.5;
        double b = -1.5;
        double c = 0.75;
        RealMatrix e = MatrixExponential.exp(MatrixUtils.createRealMatrix(new double[][] {{0, a, b}, {0, 0, c}, {0, 0, 0}}));
        assertMatrix(new double[][] {{1, a, b + a * c / 2}, {0, 1, c}, {0, 0, 1}}, e, 1e-14);
    }

    @Test
    void diagonalisableMatrixMatchesEigenDecomposition() {
        // A = V·diag(λ)·V⁻¹ ⇒ exp(A) = V·diag(e^λ)·V⁻¹, with stiff eigenvalues typical of a fast current loop
        RealMatrix v = MatrixUtils.createRealMatrix(new double[][] {{1, 2, 0}, {0, 1, 1}, {1, 0, 3}});
        RealMatrix vInv = MatrixUtils.inverse(v);
        double[] lambda = {-0.5, -30, -2000};
        RealMatrix a = v.multiply(MatrixUtils.createRealDiagonalMatrix(lambda)).multiply(vInv);
        double[] expLambda = new double[3];
        for (int i = 0; i < 3; i++) {
            expLambda[i] = Math.exp(lambda[i] * 0.01);
        }
        RealMatrix expected = v.multiply(MatrixUtils.createRealDiagonalMatrix(expLambda)).multiply(vInv);
        assertMatrix(expected.getData(), MatrixExponential.exp(a.scalarMultiply(0.01)), 1e-13);
    }

    @Test
    void firstOrderZeroOrderHoldMatchesTheTextbookForm() {
        // x' = −a x + b u held over T: Φ = e^{−aT}, Γ = b(1 − e^{−aT})/a (Franklin, Powell & Workman,
        // Digital Control of Dynamic Systems, ch. 4 — from memory)
        double a = 33.33;
        double b = 7;
        double t = 1e-3;
        ContinuousStateSpace sys = new ContinuousStateSpace(new double[][] {{-a}}, new double[][] {{b}},
                new double[] {1}, new double[] {0});
        DiscreteStateSpace d = DiscreteStateSpace.zeroOrderHold(sys, t);
        assertEquals(Math.exp(-a * t), d.phi(0, 0), 1e-15);
        assertEquals(b * (1 - Math.exp(-a * t)) / a, d.gamma(0, 0), 1e-17);
    }

    /** Plant from velocity command to position: 1st-order filter, 2nd-order velocity loop (50 Hz, D = 0.7), integrator. */
    static ContinuousStateSpace fourStatePlant() {
        double w0 = 2 * Math.PI * 50;
        double damping = 0.7;
        double tau = 1e-3;
        // states: position y, velocity v, dv/dt, filtered command f
        return new ContinuousStateSpace(new double[][] {
            {0, 1, 0, 0},
            {0, 0, 1, 0},
            {0, -w0 * w0, -2 * damping * w0, w0 * w0},
            {0, 0, 0, -1 / tau}},
                new double[][] {{0}, {0}, {0}, {1 / tau}}, new double[] {1, 0, 0, 0}, new double[] {0});
    }

    @Test
    void zeroOrderHoldStepMatchesDormandPrinceIntegration() {
        AxisLoop loop = AxisLoop.closePositionLoop("X", fourStatePlant(), 30, 0.8, 0.5, 1e-3);
        ContinuousStateSpace sys = loop.system();
        double t = 2e-3;
        DiscreteStateSpace d = DiscreteStateSpace.zeroOrderHold(sys, t);
        double[] u = {0.01, 0.05, 0.7};
        double[] x0 = {0.002, 0.03, -5, 0.01};
        double[] expected = integrate(sys, x0, u, t);
        for (int i = 0; i < 4; i++) {
            double sum = 0;
            for (int j = 0; j < 4; j++) {
                sum += d.phi(i, j) * x0[j];
            }
            for (int j = 0; j < 3; j++) {
                sum += d.gamma(i, j) * u[j];
            }
            // ODE tolerances 1e-13 relative / 1e-15 absolute; states span 1e-3..1e1
            assertEquals(expected[i], sum, 1e-10 * Math.max(1, Math.abs(expected[i])), "state " + i);
        }
    }

    @Test
    void simulatedStepResponseMatchesDormandPrinceOverManySamples() {
        AxisLoop loop = AxisLoop.closePositionLoop("Y", fourStatePlant(), 30, 0, 0, 0);
        ContinuousStateSpace sys = loop.system();
        double t = 1e-3;
        DiscreteStateSpace d = DiscreteStateSpace.zeroOrderHold(sys, t);
        double[] u = {1e-3, 0, 0}; // 1 mm step, held
        double[] x = new double[4];
        double[] next = new double[4];
        for (int k = 0; k < 300; k++) {
            for (int i = 0; i < 4; i++) {
                double sum = d.gamma(i, 0) * u[0];
                for (int j = 0; j < 4; j++) {
                    sum += d.phi(i, j) * x[j];
                }
                next[i] = sum;
            }
            System.arraycopy(next, 0, x, 0, 4);
        }
        double[] expected = integrate(sys, new double[4], u, 300 * t);
        assertEquals(expected[0], x[0], 1e-13);
        assertEquals(expected[1], x[1], 1e-11);
    }

    private static double[] integrate(ContinuousStateSpace sys, double[] x0, double[] u, double duration) {
        int n = sys.stateCount();
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return n;
            }

            @Override
            public void computeDerivatives(double time, double[] x, double[] dx) {
                for (int i = 0; i < n; i++) {
                    double sum = 0;
                    for (int j = 0; j < n; j++) {
                        sum += sys.a(i, j) * x[j];
                    }
                    for (int j = 0; j < u.length; j++) {
                        sum += sys.b(i, j) * u[j];
                    }
                    dx[i] = sum;
                }
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, duration, 1e-15, 1e-13);
        double[] y = x0.clone();
        integrator.integrate(ode, 0, x0.clone(), duration, y);
        return y;
    }
}
