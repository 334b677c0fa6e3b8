package org.tracewell.engine.sim;

import java.util.Arrays;

/**
 * A continuous-time linear system with one output: x' = A x + B u, y = C x + D u, with n states and
 * m inputs. Immutable: the matrices are copied in and out.
 */
public final class ContinuousStateSpace {

    private final double[][] a;
    private final double[][] b;
    private final double[] c;
    private final double[] d;

    /**
     * @param a n×n state matrix
     * @param b n×m input matrix
     * @param c output row, length n
     * @param d feedthrough row, length m
     */
    public ContinuousStateSpace(double[][] a, double[][] b, double[] c, double[] d) {
        int n = a.length;
        if (n == 0) {
            throw new IllegalArgumentException("a state-space model needs at least one state, got A with 0 rows");
        }
        for (int i = 0; i < n; i++) {
            if (a[i].length != n) {
                throw new IllegalArgumentException("A must be square " + n + "×" + n + ", row " + i + " has "
                        + a[i].length + " entries");
            }
        }
        if (b.length != n) {
            throw new IllegalArgumentException("B needs " + n + " rows (one per state), got " + b.length);
        }
        int m = b[0].length;
        if (m == 0) {
            throw new IllegalArgumentException("B needs at least one input column, got 0");
        }
        for (int i = 0; i < n; i++) {
            if (b[i].length != m) {
                throw new IllegalArgumentException("B rows must all have " + m + " columns, row " + i + " has " + b[i].length);
            }
        }
        if (c.length != n) {
            throw new IllegalArgumentException("C needs " + n + " entries (one per state), got " + c.length);
        }
        if (d.length != m) {
            throw new IllegalArgumentException("D needs " + m + " entries (one per input), got " + d.length);
        }
        this.a = deepCopy(a);
        this.b = deepCopy(b);
        this.c = c.clone();
        this.d = d.clone();
        checkFinite("A", this.a);
        checkFinite("B", this.b);
        checkFinite("C", new double[][] {this.c});
        checkFinite("D", new double[][] {this.d});
    }

    public int stateCount() {
        return a.length;
    }

    public int inputCount() {
        return d.length;
    }

    public double[][] a() {
        return deepCopy(a);
    }

    public double[][] b() {
        return deepCopy(b);
    }

    public double[] c() {
        return c.clone();
    }

    public double[] d() {
        return d.clone();
    }

    public double a(int row, int col) {
        return a[row][col];
    }

    public double b(int row, int col) {
        return b[row][col];
    }

    public double c(int col) {
        return c[col];
    }

    public double d(int col) {
        return d[col];
    }

    static double[][] deepCopy(double[][] m) {
        double[][] out = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            out[i] = m[i].clone();
        }
        return out;
    }

    private static void checkFinite(String name, double[][] m) {
        for (int i = 0; i < m.length; i++) {
            for (int j = 0; j < m[i].length; j++) {
                if (!Double.isFinite(m[i][j])) {
                    throw new IllegalArgumentException(name + "(" + i + "," + j + ") is " + m[i][j]
                            + "; state-space entries must be finite");
                }
            }
        }
    }

    @Override
    public String toString() {
        return "ContinuousStateSpace[n=" + stateCount() + ", m=" + inputCount() + ", A=" + Arrays.deepToString(a)
                + ", B=" + Arrays.deepToString(b) + ", C=" + Arrays.toString(c) + ", D=" + Arrays.toString(d) + "]";
    }
}
