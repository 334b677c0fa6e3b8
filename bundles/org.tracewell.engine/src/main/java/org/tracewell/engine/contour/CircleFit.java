package org.tracewell.engine.contour;

import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * Least-squares circle through measured points: the algebraic fit of Kåsa (IEEE Trans. Instrum. Meas.
 * IM-25(1), 1976), which minimises Σ(ρ² − R²)², refined by Gauss–Newton on the geometric residuals
 * Σ(ρ − R)², the least-squares circle the circular tests of ISO 230-4 centre on. Sums are accumulated
 * in one pass per iteration, so the fit needs no per-point storage.
 */
public final class CircleFit {

    private static final int MAX_ITERATIONS = 100;

    private CircleFit() {
    }

    /** Algebraic (Kåsa) fit to points {@code from..to-1}. */
    public static FittedCircle algebraic(double[] u, double[] v, int from, int to) {
        checkRange(u, v, from, to);
        // shift to the centroid for conditioning
        double mu = 0;
        double mv = 0;
        int n = to - from;
        for (int k = from; k < to; k++) {
            mu += u[k];
            mv += v[k];
        }
        mu /= n;
        mv /= n;
        // minimise Σ (x² + y² + D x + E y + F)²: normal equations in (D, E, F)
        double sxx = 0, sxy = 0, syy = 0, sx = 0, sy = 0, sxz = 0, syz = 0, sz = 0;
        for (int k = from; k < to; k++) {
            double x = u[k] - mu;
            double y = v[k] - mv;
            double z = x * x + y * y;
            sxx += x * x;
            sxy += x * y;
            syy += y * y;
            sx += x;
            sy += y;
            sxz += x * z;
            syz += y * z;
            sz += z;
        }
        RealMatrix m = MatrixUtils.createRealMatrix(new double[][] {{sxx, sxy, sx}, {sxy, syy, sy}, {sx, sy, n}});
        RealVector rhs = MatrixUtils.createRealVector(new double[] {-sxz, -syz, -sz});
        RealVector sol = new LUDecomposition(m).getSolver().solve(rhs);
        double cu = -sol.getEntry(0) / 2;
        double cv = -sol.getEntry(1) / 2;
        double r = Math.sqrt(cu * cu + cv * cv - sol.getEntry(2));
        return new FittedCircle(cu + mu, cv + mv, r, rms(u, v, from, to, cu + mu, cv + mv, r), 0);
    }

    /** Geometric least-squares fit to points {@code from..to-1}, started from the algebraic fit. */
    public static FittedCircle geometric(double[] u, double[] v, int from, int to) {
        FittedCircle start = algebraic(u, v, from, to);
        double a = start.centreU();
        double b = start.centreV();
        double r = start.radius();
        int iterations = 0;
        for (; iterations < MAX_ITERATIONS; iterations++) {
            // residual e = ρ − r, Jacobian row (−(x−a)/ρ, −(y−b)/ρ, −1); normal equations JᵀJ δ = −Jᵀe
            double j11 = 0, j12 = 0, j13 = 0, j22 = 0, j23 = 0, j33 = 0, g1 = 0, g2 = 0, g3 = 0;
            for (int k = from; k < to; k++) {
                double dx = u[k] - a;
                double dy = v[k] - b;
                double rho = Math.sqrt(dx * dx + dy * dy);
                if (rho == 0) {
                    continue;
                }
                double ju = -dx / rho;
                double jv = -dy / rho;
                double e = rho - r;
                j11 += ju * ju;
                j12 += ju * jv;
                j13 -= ju;
                j22 += jv * jv;
                j23 -= jv;
                j33 += 1;
                g1 += ju * e;
                g2 += jv * e;
                g3 -= e;
            }
            RealMatrix normal = MatrixUtils.createRealMatrix(new double[][] {{j11, j12, j13}, {j12, j22, j23}, {j13, j23, j33}});
            RealVector step = new LUDecomposition(normal).getSolver()
                    .solve(MatrixUtils.createRealVector(new double[] {-g1, -g2, -g3}));
            a += step.getEntry(0);
            b += step.getEntry(1);
            r += step.getEntry(2);
            if (step.getNorm() <= 1e-15 * Math.max(r, 1e-300) + 1e-18) {
                iterations++;
                break;
            }
        }
        return new FittedCircle(a, b, r, rms(u, v, from, to, a, b, r), iterations);
    }

    private static double rms(double[] u, double[] v, int from, int to, double a, double b, double r) {
        double sum = 0;
        for (int k = from; k < to; k++) {
            double du = u[k] - a;
            double dv = v[k] - b;
            double e = Math.sqrt(du * du + dv * dv) - r;
            sum += e * e;
        }
        return Math.sqrt(sum / (to - from));
    }

    private static void checkRange(double[] u, double[] v, int from, int to) {
        if (u.length != v.length) {
            throw new IllegalArgumentException("u and v need the same length, got " + u.length + " and " + v.length);
        }
        if (from < 0 || to > u.length || to - from < 3) {
            throw new IllegalArgumentException("a circle fit needs at least 3 points in range " + from + ".." + to
                    + " of " + u.length);
        }
    }
}
