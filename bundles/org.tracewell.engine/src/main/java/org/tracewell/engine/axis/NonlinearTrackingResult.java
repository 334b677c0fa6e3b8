package org.tracewell.engine.axis;

/**
 * Output of {@link NonlinearAxisSimulator}: per position-loop sample the reference, the load position
 * and the torque command, with peak and RMS following error (reference − load position).
 */
public final class NonlinearTrackingResult {

    private final String axisName;
    private final double samplePeriod;
    private final double[] reference;
    private final double[] load;
    private final double[] torque;
    private final double peak;
    private final int peakIndex;
    private final double rms;

    NonlinearTrackingResult(String axisName, double samplePeriod, double[] reference, double[] load, double[] torque) {
        this.axisName = axisName;
        this.samplePeriod = samplePeriod;
        this.reference = reference;
        this.load = load;
        this.torque = torque;
        double p = 0;
        int at = 0;
        double sq = 0;
        for (int i = 0; i < load.length; i++) {
            double e = reference[i] - load[i];
            sq += e * e;
            if (Math.abs(e) > p) {
                p = Math.abs(e);
                at = i;
            }
        }
        this.peak = p;
        this.peakIndex = at;
        this.rms = load.length == 0 ? 0 : Math.sqrt(sq / load.length);
    }

    public String axisName() {
        return axisName;
    }

    /** Position-loop sample period, s. */
    public double samplePeriod() {
        return samplePeriod;
    }

    public int sampleCount() {
        return load.length;
    }

    public double reference(int k) {
        return reference[k];
    }

    /** Load position, m. */
    public double actual(int k) {
        return load[k];
    }

    /** Reference − load position, m. */
    public double followingError(int k) {
        return reference[k] - load[k];
    }

    /** Torque command applied during sample k, N·m. */
    public double torqueCommand(int k) {
        return torque[k];
    }

    public double peakFollowingError() {
        return peak;
    }

    public int peakFollowingErrorIndex() {
        return peakIndex;
    }

    public double rmsFollowingError() {
        return rms;
    }
}
