package org.tracewell.engine.linalg;

import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Zero-order-hold discretisation of x' = A x + B u by Van Loan's block matrix:
 * exp([[A, B], [0, 0]]·h) = [[Φ, Γ], [0, I]] (C. F. Van Loan, "Computing integrals involving
 * the matrix exponential", IEEE Trans. Autom. Control 23(3), 1978). Exact at the samples for an
 * input held constant between them, so a step response sampled this way has no
 * discretisation error.
 */
public final class ZeroOrderHold {

    /** Discrete system x[k+1] = Φ x[k] + Γ u[k]. */
    public record Discretized(RealMatrix phi, RealMatrix gamma, double samplePeriodSeconds) {
    }

    private ZeroOrderHold() {
    }

    /**
     * @param a state matrix (n×n)
     * @param b input matrix (n×m)
     * @param samplePeriodSeconds h &gt; 0
     */
    public static Discretized discretize(RealMatrix a, RealMatrix b, double samplePeriodSeconds) {
        if (!(samplePeriodSeconds > 0) || !Double.isFinite(samplePeriodSeconds)) {
            throw new IllegalArgumentException("sample period must be a positive finite number of seconds, got "
                    + samplePeriodSeconds);
        }
        int n = a.getRowDimension();
        if (!a.isSquare() || b.getRowDimension() != n) {
            throw new IllegalArgumentException("A must be n×n and B n×m; got A " + a.getRowDimension() + "x"
                    + a.getColumnDimension() + ", B " + b.getRowDimension() + "x" + b.getColumnDimension());
        }
        int m = b.getColumnDimension();
        RealMatrix block = MatrixUtils.createRealMatrix(n + m, n + m);
        block.setSubMatrix(a.scalarMultiply(samplePeriodSeconds).getData(), 0, 0);
        block.setSubMatrix(b.scalarMultiply(samplePeriodSeconds).getData(), 0, n);
        RealMatrix e = MatrixExponential.exp(block);
        return new Discretized(e.getSubMatrix(0, n - 1, 0, n - 1), e.getSubMatrix(0, n - 1, n, n + m - 1),
                samplePeriodSeconds);
    }
}
