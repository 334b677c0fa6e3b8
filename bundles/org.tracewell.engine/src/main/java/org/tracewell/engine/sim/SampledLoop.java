package org.tracewell.engine.sim;

/**
 * The sample-by-sample kernel of a discretised axis loop, in an upper-Hessenberg realisation:
 * x̃ = Qᵀx with Q orthogonal (Householder reflections), so Φ̃ = QᵀΦQ has zeros below its first
 * subdiagonal and one step costs about n²/2 + 3n/2 multiply-adds instead of n². An orthogonal change of
 * state coordinates leaves the input–output behaviour unchanged and is numerically stable (Golub &amp;
 * Van Loan, Matrix Computations, 4th ed., §7.4.2 — from memory). The states seen here are therefore
 * not the model's physical states; only the output is used.
 */
final class SampledLoop {

    private final int n;
    private final double[] phi;
    private final double[] gamma;
    private final double[] c;
    private final double d0;
    private final double d1;
    private final double d2;
    private final double[][] q;

    private SampledLoop(int n, double[] phi, double[] gamma, double[] c, double[] d, double[][] q) {
        this.n = n;
        this.phi = phi;
        this.gamma = gamma;
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

    int stateCount() {
        return n;
    }

    /** The internal state Qᵀx of a model state x. */
    double[] toInternal(double[] x) {
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += q[j][i] * x[j];
            }
            out[i] = s;
        }
        return out;
    }

    /** Output y = C̃x̃ + D·u at this sample. */
    double output(double[] x, double u0, double u1, double u2) {
        double y = d0 * u0 + d1 * u1 + d2 * u2;
        for (int i = 0; i < n; i++) {
            y += c[i] * x[i];
        }
        return y;
    }

    /** next = Φ̃x + Γ̃u, two rows at a time, each row from its first nonzero column. */
    void advance(double[] x, double[] next, double u0, double u1, double u2) {
        int i = 0;
        for (; i + 1 < n; i += 2) {
            int row0 = i * n;
            int row1 = row0 + n;
            int g = i * 3;
            double sum0 = gamma[g] * u0 + gamma[g + 1] * u1 + gamma[g + 2] * u2;
            double sum1 = gamma[g + 3] * u0 + gamma[g + 4] * u1 + gamma[g + 5] * u2;
            for (int j = i == 0 ? 0 : i - 1; j < n; j++) {
                double xj = x[j];
                sum0 += phi[row0 + j] * xj;
                sum1 += phi[row1 + j] * xj;
            }
            next[i] = sum0;
            next[i + 1] = sum1;
        }
        if (i < n) {
            int row = i * n;
            double sum = gamma[i * 3] * u0 + gamma[i * 3 + 1] * u1 + gamma[i * 3 + 2] * u2;
            for (int j = i == 0 ? 0 : i - 1; j < n; j++) {
                sum += phi[row + j] * x[j];
            }
            next[i] = sum;
        }
    }
}
