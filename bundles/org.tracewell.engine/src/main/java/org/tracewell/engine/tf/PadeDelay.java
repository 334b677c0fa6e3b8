package org.tracewell.engine.tf;

import org.tracewell.engine.poly.Polynomial;

/**
 * Diagonal Padé approximant of a dead time, e^(−sT) ≈ Q(−sT)/Q(sT) with
 * Q(x) = Σ c_k x^k, c_k = (2n−k)!·n! / ((2n)!·k!·(n−k)!) (G. A. Baker, Essentials of Padé
 * Approximants, 1975). All-pass, matches the Taylor series of e^(−sT) to order 2n, so
 * limits as s → 0 up to s^(2n) (steady-state errors) are exact.
 */
public final class PadeDelay {

    /** Largest supported order; higher orders only add conditioning trouble. */
    public static final int MAX_ORDER = 10;

    private PadeDelay() {
    }

    /**
     * @param delaySeconds T &gt; 0
     * @param order n in 1..{@value #MAX_ORDER}
     */
    public static TransferFunction of(double delaySeconds, int order) {
        if (!(delaySeconds > 0) || !Double.isFinite(delaySeconds)) {
            throw new IllegalArgumentException("Padé approximant needs a dead time > 0 s, got " + delaySeconds);
        }
        if (order < 1 || order > MAX_ORDER) {
            throw new IllegalArgumentException("Padé order must be 1.." + MAX_ORDER + ", got " + order);
        }
        double[] num = new double[order + 1];
        double[] den = new double[order + 1];
        double c = 1.0;
        double tk = 1.0;
        for (int k = 0; k <= order; k++) {
            den[k] = c * tk;
            num[k] = (k % 2 == 0 ? 1 : -1) * c * tk;
            // c_{k+1} / c_k = (n − k) / ((2n − k)(k + 1))
            c *= (double) (order - k) / ((2.0 * order - k) * (k + 1));
            tk *= delaySeconds;
        }
        return TransferFunction.of(Polynomial.ofAscending(num), Polynomial.ofAscending(den));
    }
}
