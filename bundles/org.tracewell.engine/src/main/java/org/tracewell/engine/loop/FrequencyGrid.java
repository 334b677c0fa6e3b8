package org.tracewell.engine.loop;

import java.util.Arrays;
import java.util.Collection;
import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Frequency grids that bracket every crossing of a loop: logarithmic over the span of the
 * poles, zeros and asymptotic crossovers (two decades margin each side), refined around
 * each lightly damped pole or zero (where phase and magnitude change over a width of about
 * |Re p|), and linear where a dead time turns the phase quickly (up to twenty turns of the
 * delay phase, 40π/T; phase crossovers beyond that are not searched). The grid only
 * brackets; crossings are refined by a root finder.
 */
public final class FrequencyGrid {

    /** Default density of the logarithmic part. */
    public static final int DEFAULT_POINTS_PER_DECADE = 50;

    private FrequencyGrid() {
    }

    /** Grid for the loop {@code l} (its own poles and zeros), rad/s, ascending. */
    public static double[] forLoop(TransferFunction l) {
        return forLoop(l, List.of(), DEFAULT_POINTS_PER_DECADE);
    }

    /**
     * Grid for the loop {@code l} with additional singularities (e.g. closed-loop poles)
     * refined as well.
     */
    public static double[] forLoop(TransferFunction l, Collection<Complex> extra, int pointsPerDecade) {
        if (pointsPerDecade < 4) {
            throw new IllegalArgumentException("need at least 4 points per decade, got " + pointsPerDecade);
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (Complex p : l.poles()) {
            double m = p.abs();
            if (m > 0) {
                lo = Math.min(lo, m);
                hi = Math.max(hi, m);
            }
        }
        for (Complex z : l.zeros()) {
            double m = z.abs();
            if (m > 0) {
                lo = Math.min(lo, m);
                hi = Math.max(hi, m);
            }
        }
        for (Complex z : extra) {
            double m = z.abs();
            if (m > 0) {
                lo = Math.min(lo, m);
                hi = Math.max(hi, m);
            }
        }
        // Where the low- and high-frequency asymptotes cross 0 dB.
        int nz = l.numerator().zeroRootMultiplicity();
        int dz = l.denominator().zeroRootMultiplicity();
        int net = dz - nz;
        if (net != 0) {
            double k = Math.abs(l.numerator().coefficient(nz) / l.denominator().coefficient(dz));
            double w = Math.pow(k, 1.0 / net);
            if (w > 0 && Double.isFinite(w)) {
                lo = Math.min(lo, w);
                hi = Math.max(hi, w);
            }
        }
        int r = l.relativeDegree();
        if (r != 0) {
            double k = Math.abs(l.numerator().leadingCoefficient() / l.denominator().leadingCoefficient());
            double w = Math.pow(k, 1.0 / r);
            if (w > 0 && Double.isFinite(w)) {
                lo = Math.min(lo, w);
                hi = Math.max(hi, w);
            }
        }
        if (!(lo <= hi)) {
            lo = 1;
            hi = 1;
        }
        lo /= 100;
        hi *= 100;
        double t = l.delaySeconds();
        if (t > 0) {
            // Cover twenty turns of the delay's phase.
            hi = Math.max(hi, 40 * Math.PI / t);
        }
        int nLog = (int) Math.ceil(Math.log10(hi / lo) * pointsPerDecade) + 1;
        double[] buf = new double[nLog + 64];
        int count = 0;
        double ratio = Math.log(hi / lo) / (nLog - 1);
        for (int i = 0; i < nLog; i++) {
            buf = ensure(buf, count + 1);
            buf[count++] = lo * Math.exp(ratio * i);
        }
        count = addResonances(buf = ensure(buf, count + 32 * (l.poles().size() + l.zeros().size() + extra.size())),
                count, l.poles(), lo, hi);
        count = addResonances(buf, count, l.zeros(), lo, hi);
        count = addResonances(buf, count, extra, lo, hi);
        if (t > 0) {
            // Linear spacing where the log grid would step over half a turn of the delay phase;
            // bounded to twenty turns (at most ~300 points).
            double step = Math.PI / (8 * t);
            double end = Math.min(hi, 40 * Math.PI / t);
            for (double w = 10 / t; w < end; w += step) {
                buf = ensure(buf, count + 1);
                buf[count++] = w;
            }
        }
        double[] out = Arrays.copyOf(buf, count);
        Arrays.sort(out);
        int u = 0;
        for (int i = 0; i < out.length; i++) {
            if (out[i] > 0 && (u == 0 || out[i] > out[u - 1])) {
                out[u++] = out[i];
            }
        }
        return Arrays.copyOf(out, u);
    }

    private static int addResonances(double[] buf, int count, Collection<Complex> roots, double lo, double hi) {
        for (Complex p : roots) {
            double w0 = Math.abs(p.getImaginary());
            if (p.getImaginary() <= 0 || w0 < lo || w0 > hi) {
                continue;
            }
            double width = Math.abs(p.getReal());
            if (width > 0) {
                for (int k = -12; k <= 12; k++) {
                    double w = w0 + k * width / 3;
                    if (w > 0) {
                        buf[count++] = w;
                    }
                }
            } else {
                buf[count++] = w0;
                for (int j = 2; j <= 7; j++) {
                    double f = Math.pow(10, -j);
                    buf[count++] = w0 * (1 - f);
                    buf[count++] = w0 * (1 + f);
                }
            }
        }
        return count;
    }

    private static double[] ensure(double[] buf, int size) {
        return size <= buf.length ? buf : Arrays.copyOf(buf, Math.max(size, buf.length * 2));
    }
}
