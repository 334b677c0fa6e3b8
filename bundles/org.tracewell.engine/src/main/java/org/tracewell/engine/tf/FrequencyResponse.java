package org.tracewell.engine.tf;

/**
 * Sampled frequency response G(jω). Immutable; accessors return copies or single values.
 */
public final class FrequencyResponse {

    private final double[] omega;
    private final double[] re;
    private final double[] im;

    FrequencyResponse(double[] omega, double[] re, double[] im) {
        this.omega = omega;
        this.re = re;
        this.im = im;
    }

    /** A response given point by point (e.g. measured); the arrays are copied and must have equal lengths. */
    public static FrequencyResponse of(double[] omegaRadPerSec, double[] real, double[] imaginary) {
        if (real.length != omegaRadPerSec.length || imaginary.length != omegaRadPerSec.length) {
            throw new IllegalArgumentException("a frequency response needs one real and one imaginary part per"
                    + " frequency: " + omegaRadPerSec.length + " frequencies, " + real.length + " real and "
                    + imaginary.length + " imaginary parts");
        }
        return new FrequencyResponse(omegaRadPerSec.clone(), real.clone(), imaginary.clone());
    }

    public int size() {
        return omega.length;
    }

    /** Angular frequency of point i in rad/s. */
    public double omega(int i) {
        return omega[i];
    }

    public double real(int i) {
        return re[i];
    }

    public double imaginary(int i) {
        return im[i];
    }

    public double magnitude(int i) {
        return Math.hypot(re[i], im[i]);
    }

    public double magnitudeDb(int i) {
        return 20.0 * Math.log10(magnitude(i));
    }

    /** Principal phase in degrees, (−180, 180]. */
    public double phaseDeg(int i) {
        return Math.toDegrees(Math.atan2(im[i], re[i]));
    }

    public double[] omegas() {
        return omega.clone();
    }

    /**
     * Phase in degrees unwrapped along the frequency axis (jumps above 180° between
     * neighbouring points removed), starting from the principal value at the first point.
     * Only as reliable as the sampling is dense; margins do not use it.
     */
    public double[] unwrappedPhaseDeg() {
        double[] p = new double[omega.length];
        double offset = 0;
        for (int i = 0; i < p.length; i++) {
            double raw = phaseDeg(i);
            if (i > 0) {
                double prev = p[i - 1];
                double cand = raw + offset;
                while (cand - prev > 180) {
                    offset -= 360;
                    cand -= 360;
                }
                while (cand - prev < -180) {
                    offset += 360;
                    cand += 360;
                }
            }
            p[i] = raw + offset;
        }
        return p;
    }
}
