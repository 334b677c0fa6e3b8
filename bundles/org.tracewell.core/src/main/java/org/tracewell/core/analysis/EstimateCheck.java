package org.tracewell.core.analysis;

/**
 * One simulated figure beside the closed-form estimate of the same quantity, so a reader sees at once whether
 * the simulation and the first-order picture agree, and by how much. SI (metres).
 *
 * @param figure    what is compared, e.g. "peak following error X"
 * @param simulated the figure from the simulation
 * @param estimate  the closed-form estimate
 * @param formula   the estimate's formula, short ("v/Kv")
 */
public record EstimateCheck(String figure, double simulated, double estimate, String formula) {

    /** Estimates below this (1 nm) are treated as zero: a relative difference would mean nothing. */
    public static final double NEGLIGIBLE = 1e-9;

    /** simulated − estimate, m. */
    public double difference() {
        return simulated - estimate;
    }

    /** (simulated − estimate) / estimate; NaN when the estimate is negligible. */
    public double relativeDifference() {
        return Math.abs(estimate) < NEGLIGIBLE ? Double.NaN : difference() / estimate;
    }
}
