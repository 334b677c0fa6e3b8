package org.tracewell.engine.tf;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.tracewell.engine.poly.Polynomial;

/**
 * Single-input single-output state-space model x' = A x + B u, y = C x + D u.
 *
 * @param a n×n state matrix
 * @param b n×1 input matrix
 * @param c 1×n output matrix
 * @param d direct feedthrough
 */
public record StateSpace(RealMatrix a, RealMatrix b, RealMatrix c, double d) {

    public StateSpace {
        a = a.copy();
        b = b.copy();
        c = c.copy();
    }

    @Override
    public RealMatrix a() {
        return a.copy();
    }

    @Override
    public RealMatrix b() {
        return b.copy();
    }

    @Override
    public RealMatrix c() {
        return c.copy();
    }

    public int order() {
        return a.getRowDimension();
    }

    /**
     * Controllable canonical realisation of a proper, delay-free transfer function.
     *
     * @throws IllegalArgumentException if the transfer function is improper or has dead time
     */
    public static StateSpace controllableCanonical(TransferFunction g) {
        if (!g.isProper()) {
            throw new IllegalArgumentException("state-space realisation needs a proper transfer function; "
                    + g + " has numerator degree " + g.numerator().degree() + " > denominator degree "
                    + g.denominator().degree());
        }
        if (g.hasDelay()) {
            throw new IllegalArgumentException("state-space realisation needs a rational transfer function;"
                    + " replace the dead time of " + g.delaySeconds() + " s with withPadeDelay(order) first");
        }
        Polynomial den = g.denominator();
        int n = den.degree();
        double lead = den.leadingCoefficient();
        double[] a = new double[n];
        double[] b = new double[n + 1];
        for (int k = 0; k < n; k++) {
            a[k] = den.coefficient(k) / lead;
        }
        for (int k = 0; k <= n; k++) {
            b[k] = g.numerator().coefficient(k) / lead;
        }
        double d = b[n];
        RealMatrix am = MatrixUtils.createRealMatrix(Math.max(n, 1), Math.max(n, 1));
        RealMatrix bm = MatrixUtils.createRealMatrix(Math.max(n, 1), 1);
        RealMatrix cm = MatrixUtils.createRealMatrix(1, Math.max(n, 1));
        if (n == 0) {
            // Pure gain: a dummy stable state that never reaches the output.
            am.setEntry(0, 0, -1.0);
            return new StateSpace(am, bm, cm, d);
        }
        for (int i = 0; i + 1 < n; i++) {
            am.setEntry(i, i + 1, 1.0);
        }
        for (int k = 0; k < n; k++) {
            am.setEntry(n - 1, k, -a[k]);
            cm.setEntry(0, k, b[k] - d * a[k]);
        }
        bm.setEntry(n - 1, 0, 1.0);
        return new StateSpace(am, bm, cm, d);
    }

    /**
     * Cascade realisation: the transfer function factored by its poles and zeros into first-
     * and second-order sections, each realised in controllable canonical form, connected in
     * series. Far better conditioned than {@link #controllableCanonical} when poles spread over
     * decades (the companion form's coefficients grow like products of pole magnitudes).
     *
     * @throws IllegalArgumentException if the transfer function is improper or has dead time
     */
    public static StateSpace cascade(TransferFunction g) {
        if (!g.isProper() || g.hasDelay()) {
            throw new IllegalArgumentException("cascade realisation needs a proper rational transfer function, got " + g);
        }
        double gain = g.numerator().leadingCoefficient() / g.denominator().leadingCoefficient();
        List<List<Complex>> poleGroups = groups(g.poles());
        List<List<Complex>> zeroGroups = groups(g.zeros());
        // Two-zero groups go to two-pole groups; a single zero to any group left.
        List<Polynomial> numerators = new ArrayList<>();
        for (int i = 0; i < poleGroups.size(); i++) {
            numerators.add(Polynomial.ONE);
        }
        boolean[] used = new boolean[poleGroups.size()];
        for (List<Complex> zg : zeroGroups) {
            int target = -1;
            for (int i = 0; i < poleGroups.size() && target < 0; i++) {
                if (!used[i] && poleGroups.get(i).size() >= zg.size()) {
                    target = i;
                }
            }
            if (target < 0) {
                throw new IllegalStateException("cannot place zeros " + zg + " in sections of " + g);
            }
            used[target] = true;
            numerators.set(target, Polynomial.fromRoots(1.0, zg));
        }
        StateSpace result = null;
        for (int i = 0; i < poleGroups.size(); i++) {
            StateSpace section = controllableCanonical(
                    TransferFunction.of(numerators.get(i), Polynomial.fromRoots(1.0, poleGroups.get(i))));
            result = result == null ? section : result.then(section);
        }
        if (result == null) {
            return controllableCanonical(g);
        }
        return new StateSpace(result.a, result.b, result.c.scalarMultiply(gain), result.d * gain);
    }

    /** Series connection: this system's output drives {@code next}. */
    public StateSpace then(StateSpace next) {
        int n1 = order();
        int n2 = next.order();
        RealMatrix a2 = MatrixUtils.createRealMatrix(n1 + n2, n1 + n2);
        a2.setSubMatrix(a.getData(), 0, 0);
        a2.setSubMatrix(next.b.multiply(c).getData(), n1, 0);
        a2.setSubMatrix(next.a.getData(), n1, n1);
        RealMatrix b2 = MatrixUtils.createRealMatrix(n1 + n2, 1);
        b2.setSubMatrix(b.getData(), 0, 0);
        b2.setSubMatrix(next.b.scalarMultiply(d).getData(), n1, 0);
        RealMatrix c2 = MatrixUtils.createRealMatrix(1, n1 + n2);
        c2.setSubMatrix(c.scalarMultiply(next.d).getData(), 0, 0);
        c2.setSubMatrix(next.c.getData(), 0, n1);
        return new StateSpace(a2, b2, c2, d * next.d);
    }

    /** Roots grouped into conjugate pairs and pairs of real roots, at most one single real root. */
    private static List<List<Complex>> groups(List<Complex> roots) {
        List<List<Complex>> out = new ArrayList<>();
        List<Complex> real = new ArrayList<>();
        for (int i = 0; i < roots.size(); i++) {
            Complex z = roots.get(i);
            if (z.getImaginary() > 0) {
                out.add(List.of(z, z.conjugate()));
            } else if (z.getImaginary() == 0) {
                real.add(z);
            }
        }
        for (int i = 0; i + 1 < real.size(); i += 2) {
            out.add(List.of(real.get(i), real.get(i + 1)));
        }
        if (real.size() % 2 == 1) {
            out.add(List.of(real.get(real.size() - 1)));
        }
        return out;
    }
}
