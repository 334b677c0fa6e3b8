package org.tracewell.engine.loop;

/**
 * Steady-state error e(∞) = lim s→0 s·E(s) of a stable closed loop for unit references
 * (final-value theorem; Nise, Control Systems Engineering, ch. 7). Values are in the unit of
 * the reference; {@code Double.POSITIVE_INFINITY} means the error grows without bound.
 * <p>
 * Parabola convention: see {@link #PARABOLA_CONVENTION}. A reference 5·t² is the parabola
 * with a = 10 (Laplace 10/s³), so its error is 10/Ka.
 *
 * @param unitStep error for r(t) = 1 (Laplace 1/s)
 * @param unitRamp error for r(t) = t (Laplace 1/s²)
 * @param unitParabola error for r(t) = t²/2 (Laplace 1/s³)
 */
public record SteadyStateErrors(double unitStep, double unitRamp, double unitParabola) {

    /** The parabola convention, to be printed wherever a parabola error is shown. */
    public static final String PARABOLA_CONVENTION =
            "parabola reference r(t) = a·t²/2 (Laplace a/s³); unit parabola t²/2, so 5·t² means a = 10";

    /** Error for a step of height r0. */
    public double step(double r0) {
        return scale(unitStep, r0);
    }

    /** Error for a ramp of slope v (unit of the reference per second), e.g. v/Kv for type 1. */
    public double ramp(double v) {
        return scale(unitRamp, v);
    }

    /** Error for the parabola a·t²/2 (a in unit per second²), e.g. a/Ka for type 2. */
    public double parabola(double a) {
        return scale(unitParabola, a);
    }

    private static double scale(double unit, double amplitude) {
        if (!Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("reference amplitude must be finite, got " + amplitude);
        }
        if (amplitude == 0) {
            return 0.0;
        }
        return unit * amplitude;
    }
}
