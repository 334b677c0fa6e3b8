package org.tracewell.engine.tf;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.poly.Polynomial;

/**
 * Immutable rational transfer function N(s)/D(s)·e^(−sT) with real coefficients and an
 * optional dead time T ≥ 0 seconds.
 * <p>
 * The dead time is kept exact: {@link #evaluate(Complex)} and {@link #frequencyResponse(double[])}
 * use e^(−jωT) itself. Connections that would make the result non-rational (a feedback or
 * parallel connection around a delay) refuse and point to {@link #withPadeDelay(int)}.
 * Neither polynomial may be the zero polynomial. Common factors are not cancelled
 * automatically — hidden modes matter for stability; use {@link #minimalRealization(double)}.
 */
public final class TransferFunction {

    /** The constant 1 (unity feedback, identity in series). */
    public static final TransferFunction ONE = new TransferFunction(Polynomial.ONE, Polynomial.ONE, 0.0);

    private final Polynomial numerator;
    private final Polynomial denominator;
    private final double delaySeconds;

    // Lazily computed, immutable once set (List.copyOf); a benign race only repeats work.
    private List<Complex> poles;
    private List<Complex> zeros;

    private TransferFunction(Polynomial numerator, Polynomial denominator, double delaySeconds) {
        this.numerator = numerator;
        this.denominator = denominator;
        this.delaySeconds = delaySeconds;
    }

    /**
     * N(s)/D(s).
     *
     * @throws IllegalArgumentException if either polynomial is the zero polynomial
     */
    public static TransferFunction of(Polynomial numerator, Polynomial denominator) {
        return of(numerator, denominator, 0.0);
    }

    /**
     * N(s)/D(s)·e^(−sT).
     *
     * @throws IllegalArgumentException if either polynomial is all zero or T is negative/NaN/infinite
     */
    public static TransferFunction of(Polynomial numerator, Polynomial denominator, double delaySeconds) {
        if (numerator == null || numerator.isZero()) {
            throw new IllegalArgumentException("numerator is the zero polynomial (all coefficients 0);"
                    + " a transfer function needs at least one non-zero numerator coefficient");
        }
        if (denominator == null || denominator.isZero()) {
            throw new IllegalArgumentException("denominator is the zero polynomial (all coefficients 0);"
                    + " a transfer function needs at least one non-zero denominator coefficient");
        }
        if (!(delaySeconds >= 0) || !Double.isFinite(delaySeconds)) {
            throw new IllegalArgumentException("dead time must be a finite number of seconds >= 0, got "
                    + delaySeconds);
        }
        return new TransferFunction(numerator, denominator, delaySeconds);
    }

    /** From coefficients in descending powers of s. */
    public static TransferFunction ofDescending(double[] numerator, double[] denominator) {
        return of(Polynomial.ofDescending(numerator), Polynomial.ofDescending(denominator));
    }

    /** Constant gain k ≠ 0. */
    public static TransferFunction gain(double k) {
        return of(Polynomial.constant(k), Polynomial.ONE);
    }

    /** k·Π(s − z)/Π(s − p). */
    public static TransferFunction zeroPoleGain(List<Complex> zeros, List<Complex> poles, double k) {
        return of(Polynomial.fromRoots(k, zeros), Polynomial.fromRoots(1.0, poles));
    }

    public Polynomial numerator() {
        return numerator;
    }

    public Polynomial denominator() {
        return denominator;
    }

    public double delaySeconds() {
        return delaySeconds;
    }

    public boolean hasDelay() {
        return delaySeconds > 0;
    }

    /** Same rational part with dead time T. */
    public TransferFunction withDelay(double seconds) {
        return of(numerator, denominator, seconds);
    }

    /** deg D − deg N. */
    public int relativeDegree() {
        return denominator.degree() - numerator.degree();
    }

    public boolean isProper() {
        return relativeDegree() >= 0;
    }

    public boolean isStrictlyProper() {
        return relativeDegree() > 0;
    }

    /** Poles (roots of D), ordered least stable first. */
    public List<Complex> poles() {
        List<Complex> p = poles;
        if (p == null) {
            p = denominator.roots();
            poles = p;
        }
        return p;
    }

    /** Finite zeros (roots of N), ordered least stable first. */
    public List<Complex> zeros() {
        List<Complex> z = zeros;
        if (z == null) {
            z = numerator.roots();
            zeros = z;
        }
        return z;
    }

    /** Number of poles at s = 0 minus zeros at s = 0 (the system type when positive). */
    public int integratorCount() {
        return denominator.zeroRootMultiplicity() - numerator.zeroRootMultiplicity();
    }

    /** G(s) at a complex point, dead time included exactly. */
    public Complex evaluate(Complex s) {
        Complex v = numerator.evaluate(s).divide(denominator.evaluate(s));
        if (hasDelay()) {
            v = v.multiply(s.multiply(-delaySeconds).exp());
        }
        return v;
    }

    /**
     * G(jω) into {@code out = [re, im]} without allocation (dead time exact). Uses a scaled
     * complex division so large and small magnitudes do not overflow.
     */
    public void evaluateAtFrequency(double omega, double[] out) {
        double[] n = new double[2];
        double[] d = new double[2];
        evaluateAtFrequency(omega, out, n, d);
    }

    /** As {@link #evaluateAtFrequency(double, double[])} with caller-supplied scratch arrays of length 2. */
    public void evaluateAtFrequency(double omega, double[] out, double[] scratchN, double[] scratchD) {
        numerator.evaluate(0.0, omega, scratchN);
        denominator.evaluate(0.0, omega, scratchD);
        divide(scratchN[0], scratchN[1], scratchD[0], scratchD[1], out);
        if (delaySeconds > 0) {
            double c = Math.cos(omega * delaySeconds);
            double s = -Math.sin(omega * delaySeconds);
            double re = out[0] * c - out[1] * s;
            out[1] = out[0] * s + out[1] * c;
            out[0] = re;
        }
    }

    /** Smith's complex division (a + jb)/(c + jd). */
    static void divide(double a, double b, double c, double d, double[] out) {
        if (Math.abs(c) >= Math.abs(d)) {
            if (c == 0.0) {
                out[0] = a == 0 && b == 0 ? Double.NaN : Double.POSITIVE_INFINITY;
                out[1] = out[0];
                return;
            }
            double r = d / c;
            double den = c + d * r;
            out[0] = (a + b * r) / den;
            out[1] = (b - a * r) / den;
        } else {
            double r = c / d;
            double den = c * r + d;
            out[0] = (a * r + b) / den;
            out[1] = (b * r - a) / den;
        }
    }

    /** Frequency response at the given angular frequencies (rad/s), dead time exact. */
    public FrequencyResponse frequencyResponse(double[] omegaRadPerSec) {
        int n = omegaRadPerSec.length;
        double[] re = new double[n];
        double[] im = new double[n];
        double[] out = new double[2];
        double[] sn = new double[2];
        double[] sd = new double[2];
        for (int i = 0; i < n; i++) {
            evaluateAtFrequency(omegaRadPerSec[i], out, sn, sd);
            re[i] = out[0];
            im[i] = out[1];
        }
        return new FrequencyResponse(omegaRadPerSec.clone(), re, im);
    }

    /**
     * DC gain G(0): finite for no net integrator, ±∞ for a net integrator (sign of the
     * low-frequency coefficient ratio), 0 for a net differentiator.
     */
    public double dcGain() {
        int nz = numerator.zeroRootMultiplicity();
        int dz = denominator.zeroRootMultiplicity();
        if (nz > dz) {
            return 0.0;
        }
        double ratio = numerator.coefficient(nz) / denominator.coefficient(dz);
        if (nz < dz) {
            return Math.copySign(Double.POSITIVE_INFINITY, ratio);
        }
        return ratio;
    }

    /** G·other; dead times add. */
    public TransferFunction series(TransferFunction other) {
        return of(numerator.multiply(other.numerator), denominator.multiply(other.denominator),
                delaySeconds + other.delaySeconds);
    }

    /**
     * G + other. Equal dead times factor out; different ones are not rational.
     *
     * @throws IllegalArgumentException for different dead times
     */
    public TransferFunction parallel(TransferFunction other) {
        if (delaySeconds != other.delaySeconds) {
            throw new IllegalArgumentException("parallel connection of dead times " + delaySeconds + " s and "
                    + other.delaySeconds + " s is not rational; replace the delays with withPadeDelay(order) first");
        }
        Polynomial n = numerator.multiply(other.denominator).add(other.numerator.multiply(denominator));
        return of(n, denominator.multiply(other.denominator), delaySeconds);
    }

    /**
     * Closed loop G/(1 + G·H) with negative feedback through H.
     *
     * @throws IllegalArgumentException if G or H carries dead time (not rational), or the loop
     *         is algebraic so that 1 + G·H vanishes identically
     */
    public TransferFunction feedback(TransferFunction h) {
        if (hasDelay() || h.hasDelay()) {
            throw new IllegalArgumentException("feedback around a dead time is not a rational transfer function;"
                    + " replace the delay with withPadeDelay(order) first (dead time "
                    + Math.max(delaySeconds, h.delaySeconds) + " s)");
        }
        Polynomial num = numerator.multiply(h.denominator);
        Polynomial den = denominator.multiply(h.denominator).add(numerator.multiply(h.numerator));
        if (den.isZero()) {
            throw new IllegalArgumentException("1 + G·H is identically zero; the closed loop is not defined");
        }
        return of(num, den);
    }

    /** Unity negative feedback G/(1 + G). */
    public TransferFunction unityFeedback() {
        return feedback(ONE);
    }

    /** −G. */
    public TransferFunction negate() {
        return of(numerator.scale(-1.0), denominator, delaySeconds);
    }

    /**
     * Dead time replaced by its diagonal Padé approximant of the given order (exact
     * transfer function returned unchanged when there is no dead time).
     */
    public TransferFunction withPadeDelay(int order) {
        if (!hasDelay()) {
            return this;
        }
        TransferFunction pade = PadeDelay.of(delaySeconds, order);
        return of(numerator.multiply(pade.numerator), denominator.multiply(pade.denominator));
    }

    /**
     * G(s/a): every pole and zero multiplied by a, dead time divided by a. Crossover
     * frequencies scale by a, margins stay unchanged.
     */
    public TransferFunction scaleFrequency(double a) {
        return of(numerator.substituteScaledVariable(a), denominator.substituteScaledVariable(a),
                delaySeconds / a);
    }

    /**
     * Cancels pole–zero pairs closer than {@code relativeTolerance·max(1, |p|)} and returns the
     * reduced transfer function with the same high-frequency gain factor. Complex pairs
     * cancel together with their conjugates. Exact roots at the origin stay exact.
     *
     * @param relativeTolerance e.g. 1e-6; must be in [0, 1)
     */
    public TransferFunction minimalRealization(double relativeTolerance) {
        if (!(relativeTolerance >= 0 && relativeTolerance < 1)) {
            throw new IllegalArgumentException("cancellation tolerance must be in [0, 1), got " + relativeTolerance);
        }
        List<Complex> zs = new ArrayList<>(zeros());
        List<Complex> ps = new ArrayList<>(poles());
        List<Complex> keptZeros = new ArrayList<>();
        while (!zs.isEmpty()) {
            Complex z = zs.remove(0);
            if (z.getImaginary() < 0) {
                // handled together with its upper-half-plane partner
                keptZeros.add(z);
                continue;
            }
            int best = nearest(ps, z);
            if (best >= 0 && ps.get(best).subtract(z).abs() <= relativeTolerance * Math.max(1.0, ps.get(best).abs())) {
                ps.remove(best);
                if (z.getImaginary() > 0) {
                    int zc = nearest(zs, z.conjugate());
                    int pc = nearest(ps, z.conjugate());
                    if (zc >= 0 && pc >= 0) {
                        zs.remove(zc);
                        ps.remove(pc);
                    }
                }
            } else {
                keptZeros.add(z);
            }
        }
        double k = numerator.leadingCoefficient() / denominator.leadingCoefficient();
        return of(Polynomial.fromRoots(k, keptZeros), Polynomial.fromRoots(1.0, ps), delaySeconds);
    }

    private static int nearest(List<Complex> list, Complex target) {
        int best = -1;
        double dist = Double.POSITIVE_INFINITY;
        for (int i = 0; i < list.size(); i++) {
            double d = list.get(i).subtract(target).abs();
            if (d < dist) {
                dist = d;
                best = i;
            }
        }
        return best;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TransferFunction t && numerator.equals(t.numerator)
                && denominator.equals(t.denominator) && Double.compare(delaySeconds, t.delaySeconds) == 0;
    }

    @Override
    public int hashCode() {
        return (numerator.hashCode() * 31 + denominator.hashCode()) * 31 + Double.hashCode(delaySeconds);
    }

    @Override
    public String toString() {
        String s = "(" + numerator + ") / (" + denominator + ")";
        return hasDelay() ? s + " · e^(-" + delaySeconds + " s)" : s;
    }
}
