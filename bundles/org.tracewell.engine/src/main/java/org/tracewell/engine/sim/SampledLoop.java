package org.tracewell.engine.sim;

/**
 * The sample-by-sample kernel of a discretised axis loop, in an upper-Hessenberg realisation:
 * x̃ = Qᵀx with Q orthogonal (Householder reflections), so Φ̃ = QᵀΦQ has zeros below its first
 * subdiagonal (the step below uses it densely, eight rows at a time, which is faster than exploiting the
 * zeros with one dependent sum per row). An orthogonal change of
 * state coordinates leaves the input–output behaviour unchanged and is numerically stable (Golub &amp;
 * Van Loan, Matrix Computations, 4th ed., §7.4.2 — from memory). The states seen here are therefore
 * not the model's physical states; only the output is used.
 */
final class SampledLoop {

    /** Rows advanced together: eight independent sums keep the CPU's multiply-add units busy. */
    private static final int BLOCK = 8;

    private final int n;
    /** Rows padded up to whole blocks; the padding rows are zero, so their states stay zero. */
    private final int padded;
    /** Φ̃ by blocks of eight rows, column by column: block[(b·n + j)·8 + r] = Φ̃(8b + r, j). */
    private final double[] block;
    /** Γ̃ padded to the block rows, three inputs per row. */
    private final double[] gamma;
    private final double[] c;
    private final double d0;
    private final double d1;
    private final double d2;
    private final double[][] q;

    private SampledLoop(int n, double[] phi, double[] gamma, double[] c, double[] d, double[][] q) {
        this.n = n;
        this.padded = (n + BLOCK - 1) / BLOCK * BLOCK;
        this.block = new double[padded * n];
        for (int i = 0; i < n; i++) {
            int b = i / BLOCK;
            int r = i % BLOCK;
            for (int j = 0; j < n; j++) {
                block[(b * n + j) * BLOCK + r] = phi[i * n + j];
            }
        }
        this.gamma = java.util.Arrays.copyOf(gamma, padded * 3);
        this.c = c;
        this.d0 = d[0];
        this.d1 = d[1];
        this.d2 = d[2];
        this.q = q;
    }

    /** Hessenberg realisation of a discretised loop with the three inputs (r, ṙ, r̈). */
    static SampledLoop of(DiscreteStateSpace dss) {
        int n = dss.stateCount();
        if (dss.inputCount() != 3) {
            throw new IllegalArgumentException("an axis loop kernel needs the inputs (r, ṙ, r̈), got " + dss.inputCount());
        }
        double[][] h = new double[n][n];
        double[][] q = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                h[i][j] = dss.phi(i, j);
            }
            q[i][i] = 1;
        }
        double[] v = new double[n];
        for (int k = 0; k + 2 < n; k++) {
            int m = n - k - 1; // length of the column part below the diagonal
            double norm = 0;
            for (int i = 0; i < m; i++) {
                norm += h[k + 1 + i][k] * h[k + 1 + i][k];
            }
            norm = Math.sqrt(norm);
            if (norm == 0) {
                continue;
            }
            double x0 = h[k + 1][k];
            double alpha = x0 > 0 ? -norm : norm; // sign chosen against cancellation
            for (int i = 0; i < m; i++) {
                v[i] = h[k + 1 + i][k];
            }
            v[0] -= alpha;
            double vv = 0;
            for (int i = 0; i < m; i++) {
                vv += v[i] * v[i];
            }
            if (vv == 0) {
                continue;
            }
            // H ← P·H with P = I − 2vvᵀ/(vᵀv) acting on rows k+1..n−1
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int i = 0; i < m; i++) {
                    s += v[i] * h[k + 1 + i][j];
                }
                double f = 2 * s / vv;
                for (int i = 0; i < m; i++) {
                    h[k + 1 + i][j] -= f * v[i];
                }
            }
            // H ← H·P and Q ← Q·P, on columns k+1..n−1
            for (int i = 0; i < n; i++) {
                double s = 0;
                double t = 0;
                for (int j = 0; j < m; j++) {
                    s += h[i][k + 1 + j] * v[j];
                    t += q[i][k + 1 + j] * v[j];
                }
                double f = 2 * s / vv;
                double g = 2 * t / vv;
                for (int j = 0; j < m; j++) {
                    h[i][k + 1 + j] -= f * v[j];
                    q[i][k + 1 + j] -= g * v[j];
                }
            }
            h[k + 1][k] = alpha;
            for (int i = k + 2; i < n; i++) {
                h[i][k] = 0; // exactly zero by construction; drop the rounding residue
            }
        }
        double[] phi = new double[n * n];
        double[] gamma = new double[n * 3];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(h[i], 0, phi, i * n, n);
            for (int u = 0; u < 3; u++) {
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += q[j][i] * dss.gamma(j, u); // Γ̃ = QᵀΓ
                }
                gamma[i * 3 + u] = s;
            }
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += dss.cRow()[j] * q[j][i]; // C̃ = C·Q
            }
            c[i] = s;
        }
        return new SampledLoop(n, phi, gamma, c, dss.dRow(), q);
    }

    /** Length of the state arrays this kernel works on (the state count padded to whole blocks of rows). */
    int stateCount() {
        return padded;
    }

    /** The internal state Qᵀx of a model state x. */
    double[] toInternal(double[] x) {
        double[] out = new double[padded];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += q[j][i] * x[j];
            }
            out[i] = s;
        }
        return out;
    }

    /**
     * One sample: returns the output y = C̃x + D·u at this instant and writes next = Φ̃x + Γ̃u, eight rows at a
     * time over every column. This ignores the Hessenberg zeros, but eight independent running sums (instead of
     * one dependent chain per row) let a core overlap the multiply-adds; with the output sum in the same pass
     * over x it is about twice as fast for eight states (benchmarks/contour-benchmark.txt).
     */
    double step(double[] x, double[] next, double u0, double u1, double u2) {
        double[] p = block;
        double[] g = gamma;
        double y = d0 * u0 + d1 * u1 + d2 * u2;
        double[] cx = c;
        for (int b = 0, base = 0; b < padded; b += BLOCK, base += n * BLOCK) {
            boolean first = b == 0;
            double s0 = 0;
            double s1 = 0;
            double s2 = 0;
            double s3 = 0;
            double s4 = 0;
            double s5 = 0;
            double s6 = 0;
            double s7 = 0;
            double sy = 0;
            for (int j = 0, o = base; j < n; j++, o += BLOCK) {
                double xj = x[j];
                sy += cx[j] * xj;
                s0 += p[o] * xj;
                s1 += p[o + 1] * xj;
                s2 += p[o + 2] * xj;
                s3 += p[o + 3] * xj;
                s4 += p[o + 4] * xj;
                s5 += p[o + 5] * xj;
                s6 += p[o + 6] * xj;
                s7 += p[o + 7] * xj;
            }
            int q = b * 3;
            next[b] = s0 + g[q] * u0 + g[q + 1] * u1 + g[q + 2] * u2;
            next[b + 1] = s1 + g[q + 3] * u0 + g[q + 4] * u1 + g[q + 5] * u2;
            next[b + 2] = s2 + g[q + 6] * u0 + g[q + 7] * u1 + g[q + 8] * u2;
            next[b + 3] = s3 + g[q + 9] * u0 + g[q + 10] * u1 + g[q + 11] * u2;
            next[b + 4] = s4 + g[q + 12] * u0 + g[q + 13] * u1 + g[q + 14] * u2;
            next[b + 5] = s5 + g[q + 15] * u0 + g[q + 16] * u1 + g[q + 17] * u2;
            next[b + 6] = s6 + g[q + 18] * u0 + g[q + 19] * u1 + g[q + 20] * u2;
            next[b + 7] = s7 + g[q + 21] * u0 + g[q + 22] * u1 + g[q + 23] * u2;
            if (first) {
                y += sy;
            }
        }
        return y;
    }
}
