package org.tracewell.engine.sim;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.tracewell.engine.linalg.ZeroOrderHold;

/**
 * x[k+1] = Φ x[k] + Γ u[k], y[k] = C x[k] + D u[k]: the exact sampled form of a continuous system
 * whose input is held constant over each sample period (zero-order hold). Φ and Γ come from Van
 * Loan's block exponential exp([[A, B], [0, 0]]·T) = [[Φ, Γ], [0, I]], the exponential by scaling and
 * squaring with Padé approximants (Higham 2005), both in {@code org.tracewell.engine.linalg}.
 * Matrices are kept flat and row-major for the simulation loop.
 */
public final class DiscreteStateSpace {

    private final int n;
    private final int m;
    private final double[] phi;
    private final double[] gamma;
    private final double[] c;
    private final double[] d;
    private final double samplePeriod;

    private DiscreteStateSpace(int n, int m, double[] phi, double[] gamma, double[] c, double[] d, double samplePeriod) {
        this.n = n;
        this.m = m;
        this.phi = phi;
        this.gamma = gamma;
        this.c = c;
        this.d = d;
        this.samplePeriod = samplePeriod;
    }

    /** Zero-order-hold discretisation of {@code system} at {@code samplePeriod} seconds. */
    public static DiscreteStateSpace zeroOrderHold(ContinuousStateSpace system, double samplePeriod) {
        RealMatrix a = MatrixUtils.createRealMatrix(system.a());
        RealMatrix b = MatrixUtils.createRealMatrix(system.b());
        ZeroOrderHold.Discretized z = ZeroOrderHold.discretize(a, b, samplePeriod);
        int n = system.stateCount();
        int m = system.inputCount();
        double[] phi = new double[n * n];
        double[] gamma = new double[n * m];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                phi[i * n + j] = z.phi().getEntry(i, j);
            }
            for (int j = 0; j < m; j++) {
                gamma[i * m + j] = z.gamma().getEntry(i, j);
            }
        }
        return new DiscreteStateSpace(n, m, phi, gamma, system.c(), system.d(), samplePeriod);
    }

    public int stateCount() {
        return n;
    }

    public int inputCount() {
        return m;
    }

    public double samplePeriod() {
        return samplePeriod;
    }

    public double phi(int row, int col) {
        return phi[row * n + col];
    }

    public double gamma(int row, int col) {
        return gamma[row * m + col];
    }

    // package access for the simulation kernel, which must not copy per call
    double[] cRow() {
        return c;
    }

    double[] dRow() {
        return d;
    }
}
