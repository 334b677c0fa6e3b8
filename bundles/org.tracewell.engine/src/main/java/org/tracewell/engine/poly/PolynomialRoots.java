package org.tracewell.engine.poly;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * Roots of a real polynomial: eigenvalues of the balanced companion matrix (Commons Math
 * {@link EigenDecomposition}, Hessenberg–Schur), each polished by Newton steps on the original
 * polynomial and accepted only if the roots reproduce the coefficients (componentwise backward
 * error); otherwise the unbalanced companion matrix and Commons Math's {@link LaguerreSolver}
 * are tried.
 * <p>
 * Exact zero roots (zero low-order coefficients) are split off first so integrators stay at
 * exactly 0. Complex roots are returned as exact conjugate pairs; a pair whose imaginary part
 * is below 1e-7 of its magnitude is reported as two real roots (a split double root).
 * Order: descending real part (least stable first); at equal real part, conjugate pairs (upper
 * root first) before real roots.
 */
public final class PolynomialRoots {

    /** Relative size under which an imaginary part is noise from a split multiple real root. */
    static final double REAL_ROOT_TOLERANCE = 1e-7;

    private PolynomialRoots() {
    }

    /** All roots, with multiplicity. */
    public static List<Complex> of(Polynomial p) {
        if (p.isZero()) {
            throw new IllegalArgumentException("the zero polynomial has no well-defined roots");
        }
        int zeros = p.zeroRootMultiplicity();
        Polynomial q = p.divideByPowerOfS(zeros);
        List<Complex> roots = new ArrayList<>(p.degree());
        for (int i = 0; i < zeros; i++) {
            roots.add(Complex.ZERO);
        }
        int n = q.degree();
        if (n == 1) {
            roots.add(new Complex(-q.coefficient(0) / q.coefficient(1), 0.0));
        } else if (n >= 2) {
            roots.addAll(bestOf(q));
        }
        roots.sort(ORDER);
        return List.copyOf(roots);
    }

    /** Descending real part, then complex pairs (larger |Im| first, upper before lower) before real roots. */
    public static final Comparator<Complex> ORDER = Comparator
            .comparingDouble((Complex c) -> -c.getReal())
            .thenComparingDouble(c -> -Math.abs(c.getImaginary()))
            .thenComparingDouble(c -> -c.getImaginary());

    /**
     * Tries the balanced companion matrix, the unbalanced one and Laguerre's method in turn,
     * each polished, and keeps the first whose backward error is below
     * {@value #ACCEPTED_BACKWARD_ERROR} (else the smallest). The check is needed: Commons Math's
     * non-symmetric eigen solver can return a wrong complex pair for a real 2×2 block (the
     * same code in its Hipparchus fork: Hipparchus issue #30).
     */
    private static List<Complex> bestOf(Polynomial q) {
        List<Complex> best = null;
        double bestError = Double.POSITIVE_INFINITY;
        for (int method = 0; method < 3; method++) {
            List<Complex> candidate;
            double error;
            try {
                List<Complex> raw = switch (method) {
                    case 0 -> companionEigenvalues(q, true);
                    case 1 -> companionEigenvalues(q, false);
                    default -> laguerre(q);
                };
                candidate = cleanPairs(polish(q, raw));
                error = backwardError(q, candidate);
            } catch (MathIllegalStateException | ArithmeticException | IllegalArgumentException e) {
                // this method failed; try the next
                continue;
            }
            if (error < bestError) {
                best = candidate;
                bestError = error;
            }
            if (error <= ACCEPTED_BACKWARD_ERROR) {
                break;
            }
        }
        if (best == null) {
            throw new ArithmeticException("no root finder converged for " + q);
        }
        return best;
    }

    /** Backward error accepted without trying another method. */
    static final double ACCEPTED_BACKWARD_ERROR = 1e-7;

    /**
     * Componentwise backward error: max_k |c_k(lead·Π(s − z_i)) − c_k(q)| / c_k(|lead|·Π(s + |z_i|)).
     * Small when the roots are the exact roots of a polynomial whose coefficients differ from q's by
     * that relative amount; a wrong or duplicated root makes it of order one.
     */
    static double backwardError(Polynomial q, List<Complex> roots) {
        if (roots.size() != q.degree()) {
            return Double.POSITIVE_INFINITY;
        }
        double lead = q.leadingCoefficient();
        Polynomial rebuilt = Polynomial.fromRoots(lead, roots);
        List<Complex> magnitudes = new ArrayList<>(roots.size());
        for (Complex z : roots) {
            magnitudes.add(new Complex(-z.abs(), 0));
        }
        Polynomial bound = Polynomial.fromRoots(Math.abs(lead), magnitudes);
        double worst = 0;
        for (int k = 0; k <= q.degree(); k++) {
            double b = bound.coefficient(k);
            double diff = Math.abs(rebuilt.coefficient(k) - q.coefficient(k));
            if (b > 0) {
                worst = Math.max(worst, diff / b);
            } else if (diff > 0) {
                return Double.POSITIVE_INFINITY;
            }
        }
        return worst;
    }

    private static List<Complex> companionEigenvalues(Polynomial q, boolean balanced) {
        int n = q.degree();
        double lead = q.leadingCoefficient();
        double[][] a = new double[n][n];
        // Frobenius companion: last column holds -c_k / c_n, sub-diagonal ones.
        for (int i = 0; i < n; i++) {
            a[i][n - 1] = -q.coefficient(i) / lead;
            if (i > 0) {
                a[i][i - 1] = 1.0;
            }
        }
        if (balanced) {
            balance(a);
        }
        EigenDecomposition ed = new EigenDecomposition(new Array2DRowRealMatrix(a, false));
        double[] re = ed.getRealEigenvalues();
        double[] im = ed.getImagEigenvalues();
        List<Complex> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(re[i]) || !Double.isFinite(im[i])) {
                throw new ArithmeticException("eigenvalue solver returned a non-finite value");
            }
            out.add(new Complex(re[i], im[i]));
        }
        return out;
    }

    private static List<Complex> laguerre(Polynomial q) {
        // Bounded evaluations: without a limit Commons Math's Laguerre iterates forever when it stalls.
        Complex[] r = new LaguerreSolver(1e-14, 1e-300).solveAllComplex(q.ascendingCoefficients(), 0.0,
                2000 * q.degree());
        return List.of(r);
    }

    /**
     * Parlett–Reinsch balancing (diagonal similarity by powers of 2): leaves the eigenvalues
     * unchanged and makes the companion matrix's rows and columns comparable in norm, which
     * is what makes companion eigenvalues accurate for badly scaled coefficients.
     */
    static void balance(double[][] a) {
        int n = a.length;
        final double radix = 2.0;
        boolean converged = false;
        while (!converged) {
            converged = true;
            for (int i = 0; i < n; i++) {
                double c = 0;
                double r = 0;
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        c += Math.abs(a[j][i]);
                        r += Math.abs(a[i][j]);
                    }
                }
                if (c == 0 || r == 0) {
                    continue;
                }
                double g = r / radix;
                double f = 1.0;
                double s = c + r;
                while (c < g) {
                    f *= radix;
                    c *= radix * radix;
                }
                g = r * radix;
                while (c > g) {
                    f /= radix;
                    c /= radix * radix;
                }
                if ((c + r) / f < 0.95 * s) {
                    converged = false;
                    double inv = 1.0 / f;
                    for (int j = 0; j < n; j++) {
                        a[i][j] *= inv;
                    }
                    for (int j = 0; j < n; j++) {
                        a[j][i] *= f;
                    }
                }
            }
        }
    }

    private static List<Complex> polish(Polynomial q, List<Complex> raw) {
        Polynomial dq = q.derivative();
        double[] pv = new double[2];
        double[] dv = new double[2];
        List<Complex> out = new ArrayList<>(raw.size());
        for (Complex z0 : raw) {
            double x = z0.getReal();
            double y = z0.getImaginary();
            q.evaluate(x, y, pv);
            double best = Math.hypot(pv[0], pv[1]);
            for (int it = 0; it < 4 && best > 0; it++) {
                dq.evaluate(x, y, dv);
                double den = dv[0] * dv[0] + dv[1] * dv[1];
                if (den == 0) {
                    break;
                }
                // Newton step: z - p/p'
                double sx = (pv[0] * dv[0] + pv[1] * dv[1]) / den;
                double sy = (pv[1] * dv[0] - pv[0] * dv[1]) / den;
                double nx = x - sx;
                double ny = y - sy;
                q.evaluate(nx, ny, pv);
                double val = Math.hypot(pv[0], pv[1]);
                if (!(val < best)) {
                    break;
                }
                best = val;
                x = nx;
                y = ny;
            }
            out.add(new Complex(x, y));
        }
        return out;
    }

    /** Real roots made exactly real, complex roots made exact conjugate pairs. */
    private static List<Complex> cleanPairs(List<Complex> roots) {
        List<Complex> real = new ArrayList<>();
        List<Complex> upper = new ArrayList<>();
        List<Complex> lower = new ArrayList<>();
        for (Complex z : roots) {
            double mag = z.abs();
            if (Math.abs(z.getImaginary()) <= REAL_ROOT_TOLERANCE * mag) {
                real.add(new Complex(z.getReal(), 0.0));
            } else if (z.getImaginary() > 0) {
                upper.add(z);
            } else {
                lower.add(z);
            }
        }
        List<Complex> out = new ArrayList<>(real);
        // Match each upper root with the nearest conjugate of a lower root; average the pair.
        List<Complex> remaining = new ArrayList<>(lower);
        for (Complex u : upper) {
            int bestIndex = -1;
            double bestDist = Double.POSITIVE_INFINITY;
            for (int i = 0; i < remaining.size(); i++) {
                double d = u.subtract(remaining.get(i).conjugate()).abs();
                if (d < bestDist) {
                    bestDist = d;
                    bestIndex = i;
                }
            }
            if (bestIndex < 0) {
                // No partner (cannot happen for a real polynomial); keep the root as found.
                out.add(u);
                continue;
            }
            Complex l = remaining.remove(bestIndex);
            double re = 0.5 * (u.getReal() + l.getReal());
            double im = 0.5 * (u.getImaginary() - l.getImaginary());
            out.add(new Complex(re, im));
            out.add(new Complex(re, -im));
        }
        out.addAll(remaining);
        return out;
    }
}
