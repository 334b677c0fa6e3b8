package org.tracewell.engine.sim;

/**
 * The sample-by-sample kernel of a discretised axis loop, in an upper-Hessenberg realisation:
 * x̃ = Qᵀx with Q orthogonal (Householder reflections), so Φ̃ = QᵀΦQ has zeros below its first
 * subdiagonal (the kernel below uses it densely, eight rows at a time, which is faster than exploiting the
 * zeros with one dependent sum per row). An orthogonal change of
 * state coordinates leaves the input–output behaviour unchanged and is numerically stable (Golub &amp;
 * Van Loan, Matrix Computations, 4th ed., §7.4.2 — from memory). The states seen here are therefore
 * not the model's physical states; {@link #toModel} maps one back where a caller needs it.
 * <p>
 * Inputs: an axis loop's three (r, ṙ, r̈), or a single input (a step response), which runs as the first of three
 * with the other two unused. Immutable; the state arrays belong to the caller, so one kernel serves many threads.
 */
public final class SampledLoop {

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
    /** Output weights of the later blocks: none (the output is summed with the first block). */
    private final double[] zeros;
    private final double d0;
    private final double d1;
    private final double d2;
    /** True when the velocity and acceleration inputs drive nothing (no feedforward): their terms are skipped. */
    private final boolean positionOnly;
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
        this.zeros = new double[n];
        this.d0 = d[0];
        this.d1 = d[1];
        this.d2 = d[2];
        boolean unused = d1 == 0 && d2 == 0;
        for (int i = 0; i < n && unused; i++) {
            unused = gamma[i * 3 + 1] == 0 && gamma[i * 3 + 2] == 0;
        }
        this.positionOnly = unused;
        this.q = q;
    }

    /** Hessenberg realisation of a discretised loop with the three inputs (r, ṙ, r̈), or with one input. */
    public static SampledLoop of(DiscreteStateSpace dss) {
        int n = dss.stateCount();
        int inputs = dss.inputCount();
        if (inputs != 3 && inputs != 1) {
            throw new IllegalArgumentException("a loop kernel needs the inputs (r, ṙ, r̈) or a single input, got "
                    + inputs + " inputs");
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
                for (int j = 0; j < n && u < inputs; j++) {
                    s += q[j][i] * dss.gamma(j, u); // Γ̃ = QᵀΓ (unused inputs of a single-input system stay zero)
                }
                gamma[i * 3 + u] = s;
            }
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += dss.cRow()[j] * q[j][i]; // C̃ = C·Q
            }
            c[i] = s;
        }
        double[] d = java.util.Arrays.copyOf(dss.dRow(), 3);
        return new SampledLoop(n, phi, gamma, c, d, q);
    }

    /** Length of the state arrays this kernel works on (the state count padded to whole blocks of rows). */
    public int stateCount() {
        return padded;
    }

    /** True when the kernel skips the velocity and acceleration inputs (they drive nothing). */
    public boolean positionOnly() {
        return positionOnly;
    }

    /** The model state x = Qx̃ of an internal state x̃ (as {@link #run} leaves it), as long as the model's. */
    public double[] toModel(double[] internal) {
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += q[i][j] * internal[j];
            }
            out[i] = s;
        }
        return out;
    }

    /** The internal state Qᵀx of a model state x, padded to {@link #stateCount()}. */
    public double[] toInternal(double[] x) {
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
     * One sample: returns the output y = C̃x + D·u at this instant and writes next = Φ̃x + Γ̃u. See
     * {@link #run} for the arithmetic; a streaming run calls this once per sample.
     */
    public double step(double[] x, double[] next, double u0, double u1, double u2) {
        if (positionOnly) {
            double y = rows1(0, c, x, next, u0);
            for (int b = BLOCK; b < padded; b += BLOCK) {
                rows1(b, zeros, x, next, u0);
            }
            return y;
        }
        double y = rows3(0, c, x, next, u0, u1, u2);
        for (int b = BLOCK; b < padded; b += BLOCK) {
            rows3(b, zeros, x, next, u0, u1, u2);
        }
        return y;
    }

    /**
     * Runs {@code length} samples from the reference arrays (position, velocity, acceleration held over each period)
     * into {@code out[offset…]}, starting from state {@code x} with {@code spare} as scratch; returns the array that
     * holds the state after the last sample (one of the two). A kernel without velocity and acceleration terms
     * ({@link #positionOnly()}, e.g. a single-input system) reads only {@code r}; the others may then be null.
     * <p>
     * Φ̃x + Γ̃u is computed eight rows at a time over every column, ignoring the Hessenberg zeros: eight independent
     * fused multiply-add chains (instead of one dependent sum per row) keep a core's multiply-add units busy, and
     * the input terms start each chain, off the path from one state to the next. A loop without feedforward has
     * zero velocity and acceleration columns, which its own kernel skips (a third of the arithmetic of an
     * eight-state loop). The two kernels are kept apart, and each sample loop calls one of them, because one kernel
     * that asks which inputs to use measured almost twice as slow (benchmarks/contour-benchmark.txt).
     */
    public double[] run(double[] x, double[] spare, double[] r, double[] rd, double[] rdd, double[] out, int offset,
            int length) {
        double[] now = x;
        double[] next = spare;
        if (positionOnly) {
            for (int k = 0; k < length; k++) {
                double u0 = r[k];
                out[offset + k] = rows1(0, c, now, next, u0);
                for (int b = BLOCK; b < padded; b += BLOCK) {
                    rows1(b, zeros, now, next, u0);
                }
                double[] swap = now;
                now = next;
                next = swap;
            }
        } else {
            for (int k = 0; k < length; k++) {
                out[offset + k] = step(now, next, r[k], rd[k], rdd[k]);
                double[] swap = now;
                now = next;
                next = swap;
            }
        }
        return now;
    }

    /**
     * Rows b…b+7 of Φ̃x + Γ̃u into next, all three inputs; returns D·u + cx·x summed in the same pass over x (the
     * output for the first block with cx = C̃, nothing for later ones with zeros).
     */
    private double rows3(int b, double[] cx, double[] x, double[] next, double u0, double u1, double u2) {
        double[] p = block;
        double[] g = gamma;
        int q = b * 3;
        double y = b == 0 ? d0 * u0 + d1 * u1 + d2 * u2 : 0;
        double s0 = g[q] * u0 + g[q + 1] * u1 + g[q + 2] * u2;
        double s1 = g[q + 3] * u0 + g[q + 4] * u1 + g[q + 5] * u2;
        double s2 = g[q + 6] * u0 + g[q + 7] * u1 + g[q + 8] * u2;
        double s3 = g[q + 9] * u0 + g[q + 10] * u1 + g[q + 11] * u2;
        double s4 = g[q + 12] * u0 + g[q + 13] * u1 + g[q + 14] * u2;
        double s5 = g[q + 15] * u0 + g[q + 16] * u1 + g[q + 17] * u2;
        double s6 = g[q + 18] * u0 + g[q + 19] * u1 + g[q + 20] * u2;
        double s7 = g[q + 21] * u0 + g[q + 22] * u1 + g[q + 23] * u2;
        for (int j = 0, o = b * n; j < n; j++, o += BLOCK) {
            double xj = x[j];
            y = Math.fma(cx[j], xj, y);
            s0 = Math.fma(p[o], xj, s0);
            s1 = Math.fma(p[o + 1], xj, s1);
            s2 = Math.fma(p[o + 2], xj, s2);
            s3 = Math.fma(p[o + 3], xj, s3);
            s4 = Math.fma(p[o + 4], xj, s4);
            s5 = Math.fma(p[o + 5], xj, s5);
            s6 = Math.fma(p[o + 6], xj, s6);
            s7 = Math.fma(p[o + 7], xj, s7);
        }
        store(next, b, s0, s1, s2, s3, s4, s5, s6, s7);
        return y;
    }

    /** As {@link #rows3} for a loop driven by the position input alone. */
    private double rows1(int b, double[] cx, double[] x, double[] next, double u0) {
        double[] p = block;
        double[] g = gamma;
        int q = b * 3;
        double y = b == 0 ? d0 * u0 : 0;
        double s0 = g[q] * u0;
        double s1 = g[q + 3] * u0;
        double s2 = g[q + 6] * u0;
        double s3 = g[q + 9] * u0;
        double s4 = g[q + 12] * u0;
        double s5 = g[q + 15] * u0;
        double s6 = g[q + 18] * u0;
        double s7 = g[q + 21] * u0;
        for (int j = 0, o = b * n; j < n; j++, o += BLOCK) {
            double xj = x[j];
            y = Math.fma(cx[j], xj, y);
            s0 = Math.fma(p[o], xj, s0);
            s1 = Math.fma(p[o + 1], xj, s1);
            s2 = Math.fma(p[o + 2], xj, s2);
            s3 = Math.fma(p[o + 3], xj, s3);
            s4 = Math.fma(p[o + 4], xj, s4);
            s5 = Math.fma(p[o + 5], xj, s5);
            s6 = Math.fma(p[o + 6], xj, s6);
            s7 = Math.fma(p[o + 7], xj, s7);
        }
        store(next, b, s0, s1, s2, s3, s4, s5, s6, s7);
        return y;
    }

    private static void store(double[] next, int b, double s0, double s1, double s2, double s3, double s4, double s5,
            double s6, double s7) {
        next[b] = s0;
        next[b + 1] = s1;
        next[b + 2] = s2;
        next[b + 3] = s3;
        next[b + 4] = s4;
        next[b + 5] = s5;
        next[b + 6] = s6;
        next[b + 7] = s7;
    }
}
