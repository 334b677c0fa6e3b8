package org.tracewell.engine.loop;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Values of a loop-gain multiplier k &gt; 0 for which the characteristic polynomial
 * D(s) + k·N(s) of 1 + k·L(s), L = N/D, has all roots in the open left half plane.
 * <p>
 * Method, exact up to polynomial root finding (no gain sweep): roots can only change half
 * plane where they cross the jω axis or pass through infinity. Crossing at s = 0 needs
 * k = −D(0)/N(0); crossing at s = jω, ω &gt; 0, needs D(jω)·N(−jω) real, i.e. the odd part
 * of D(s)·N(−s) to vanish, and then k = −Re(D(jω)·N(−jω))/|N(jω)|²; roots pass through
 * infinity where the leading coefficient vanishes. Between consecutive candidate gains the
 * stability is constant and tested once by root finding.
 *
 * @param intervals stable open intervals of k, ascending; empty when no k &gt; 0 is stable
 * @param boundaries candidate gains where a root crosses the jω axis (or infinity), ascending
 */
public record StableGainRange(List<Interval> intervals, List<Boundary> boundaries) {

    /** Open interval (lower, upper) of k; upper may be +∞. */
    public record Interval(double lower, double upper) {
        public boolean contains(double k) {
            return k > lower && k < upper;
        }
    }

    /**
     * A gain where closed-loop roots sit on the jω axis at ±j·frequency (0: a real root at
     * the origin; +∞: roots at infinity).
     */
    public record Boundary(double gain, double frequencyRadPerSec) {
    }

    public StableGainRange {
        intervals = List.copyOf(intervals);
        boundaries = List.copyOf(boundaries);
    }

    /** True if the multiplier k lies in a stable interval. */
    public boolean contains(double k) {
        return intervals.stream().anyMatch(i -> i.contains(k));
    }

    /** Stable range of k for 1 + k·L(s); L must be rational (use a Padé form for dead time). */
    public static StableGainRange of(TransferFunction loop) {
        if (loop.hasDelay()) {
            throw new IllegalArgumentException("gain range needs a rational loop; replace the dead time of "
                    + loop.delaySeconds() + " s with withPadeDelay(order) first");
        }
        return of(loop.numerator(), loop.denominator());
    }

    /** Stable range of k for D(s) + k·N(s). */
    public static StableGainRange of(Polynomial n, Polynomial d) {
        List<Boundary> candidates = new ArrayList<>();
        double n0 = n.coefficient(0);
        double d0 = d.coefficient(0);
        if (n0 == 0 && d0 == 0) {
            // A root at the origin for every k: never asymptotically stable.
            return new StableGainRange(List.of(), List.of());
        }
        if (n0 != 0) {
            candidates.add(new Boundary(-d0 / n0, 0.0));
        }
        if (n.degree() == d.degree()) {
            candidates.add(new Boundary(-d.leadingCoefficient() / n.leadingCoefficient(), Double.POSITIVE_INFINITY));
        }
        // D(s)·N(−s) at s = jω: Re from even powers, Im from odd powers (signs of j^k).
        Polynomial q = d.multiply(n.reflect());
        int deg = q.degree();
        if (deg >= 1) {
            // Im Q(jω) = ω·R(ω²) with R(x) = Σ q_(2m+1)·(−1)^m·x^m.
            double[] r = new double[(deg - 1) / 2 + 1];
            for (int m = 0; m < r.length; m++) {
                r[m] = q.coefficient(2 * m + 1) * (m % 2 == 0 ? 1 : -1);
            }
            Polynomial rp = Polynomial.ofAscending(r);
            if (!rp.isZero() && rp.degree() >= 1) {
                for (Complex x : rp.roots()) {
                    if (x.getReal() > 0 && Math.abs(x.getImaginary()) <= 1e-7 * x.abs()) {
                        double w = Math.sqrt(x.getReal());
                        Complex dv = d.evaluate(new Complex(0, w));
                        Complex nv = n.evaluate(new Complex(0, w));
                        double nn = nv.abs() * nv.abs();
                        if (nn > 0) {
                            double k = -dv.multiply(nv.conjugate()).getReal() / nn;
                            candidates.add(new Boundary(k, w));
                        }
                    }
                }
            }
        }
        List<Boundary> positive = new ArrayList<>();
        for (Boundary b : candidates) {
            if (b.gain() > 0 && Double.isFinite(b.gain())) {
                positive.add(b);
            }
        }
        positive.sort((x, y) -> Double.compare(x.gain(), y.gain()));
        List<Double> cuts = new ArrayList<>();
        for (Boundary b : positive) {
            if (cuts.isEmpty() || b.gain() > cuts.get(cuts.size() - 1) * (1 + 1e-9)) {
                cuts.add(b.gain());
            }
        }
        List<Interval> stable = new ArrayList<>();
        double lower = 0.0;
        for (int i = 0; i <= cuts.size(); i++) {
            double upper = i < cuts.size() ? cuts.get(i) : Double.POSITIVE_INFINITY;
            double probe = Double.isInfinite(upper) ? (lower == 0 ? 1.0 : 2.0 * lower) : 0.5 * (lower + upper);
            if (isStable(d.add(n.scale(probe)))) {
                Interval previous = stable.isEmpty() ? null : stable.get(stable.size() - 1);
                if (previous != null && previous.upper() == lower && isStable(d.add(n.scale(lower)))) {
                    // The cut was no crossing after all (root-finding noise): join the intervals.
                    stable.set(stable.size() - 1, new Interval(previous.lower(), upper));
                } else {
                    stable.add(new Interval(lower, upper));
                }
            }
            lower = upper;
        }
        return new StableGainRange(stable, positive);
    }

    static boolean isStable(Polynomial characteristic) {
        if (characteristic.isZero()) {
            return false;
        }
        for (Complex p : characteristic.roots()) {
            if (!(p.getReal() < -1e-9 * p.abs()) || p.abs() == 0) {
                return false;
            }
        }
        return true;
    }
}
