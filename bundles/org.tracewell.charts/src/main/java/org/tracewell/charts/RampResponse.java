package org.tracewell.charts;

/**
 * Response of a closed loop to a ramp reference r(t) = v·t, SI (seconds, metres), and its steady-state error.
 *
 * @param name               series name of the response
 * @param timeSeconds        sample instants, ascending from 0
 * @param velocity           ramp slope v, m/s (&gt; 0)
 * @param reference          v·t
 * @param response           y(t)
 * @param error              r − y
 * @param unitRampError      steady-state error for a unit ramp, s (1/Kv for a type-1 loop; +∞ for type 0, 0 above)
 */
public record RampResponse(String name, double[] timeSeconds, double velocity, double[] reference, double[] response,
        double[] error, double unitRampError) {

    public RampResponse {
        int n = timeSeconds.length;
        if (reference.length != n || response.length != n || error.length != n) {
            throw new IllegalArgumentException("ramp response '" + name + "': " + n + " times, " + reference.length
                    + " references, " + response.length + " responses and " + error.length + " errors; all must match");
        }
        if (!(velocity > 0) || !Double.isFinite(velocity)) {
            throw new IllegalArgumentException("ramp velocity must be finite and > 0 m/s, got " + velocity);
        }
        if (!(unitRampError >= 0)) {
            throw new IllegalArgumentException("unit-ramp error must be ≥ 0 s (or +∞), got " + unitRampError);
        }
    }

    /**
     * The ramp response from the unit-step response of the same loop: the ramp is the integral of the step, so
     * y_ramp(t) = v·∫₀ᵗ y_step(τ) dτ, integrated by the trapezoidal rule over the step's own samples (its error is
     * second order in the sample spacing; step samples are dense).
     *
     * @param stepTimes     instants of the step response, ascending from 0, s
     * @param stepValues    the unit-step response there
     * @param velocity      ramp slope, m/s
     * @param unitRampError the loop's steady-state error for a unit ramp, s (from the loop analysis)
     */
    public static RampResponse fromStep(String name, double[] stepTimes, double[] stepValues, double velocity,
            double unitRampError) {
        int n = stepTimes.length;
        if (stepValues.length != n || n == 0) {
            throw new IllegalArgumentException("step response for '" + name + "': " + n + " times and "
                    + stepValues.length + " values; need the same number, at least one");
        }
        double[] reference = new double[n];
        double[] response = new double[n];
        double[] error = new double[n];
        double integral = 0;
        for (int k = 0; k < n; k++) {
            if (k > 0) {
                integral += 0.5 * (stepValues[k] + stepValues[k - 1]) * (stepTimes[k] - stepTimes[k - 1]);
            }
            reference[k] = velocity * stepTimes[k];
            response[k] = velocity * integral;
            error[k] = reference[k] - response[k];
        }
        return new RampResponse(name, stepTimes.clone(), velocity, reference, response, error, unitRampError);
    }

    /** Steady-state error at this ramp's velocity, m (v times the unit-ramp error). */
    public double steadyStateError() {
        return unitRampError == 0 ? 0 : velocity * unitRampError;
    }
}
