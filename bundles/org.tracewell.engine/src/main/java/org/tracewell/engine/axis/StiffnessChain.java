package org.tracewell.engine.axis;

/**
 * Axial stiffness chain of a screw drive: screw shaft, nut and support bearing in series,
 * 1/k = 1/k_screw(a) + 1/k_nut + 1/k_bearing; the shaft term depends on the nut position a
 * (Altintas et al., "Machine tool feed drives", CIRP Annals 60(2), 2011).
 *
 * @param screw shaft dimensions
 * @param mounting fixed–free or fixed–fixed
 * @param nutStiffness N/m; +∞ for a rigid nut
 * @param bearingStiffness N/m (all support bearings together); +∞ for rigid bearings
 */
public record StiffnessChain(ScrewShaft screw, ScrewMounting mounting, double nutStiffness,
        double bearingStiffness) {

    public StiffnessChain {
        if (screw == null || mounting == null) {
            throw new IllegalArgumentException("a stiffness chain needs a screw shaft and a mounting, got "
                    + screw + " and " + mounting);
        }
        Checks.positiveOrInfinite("nut stiffness", nutStiffness, "N/m");
        Checks.positiveOrInfinite("bearing stiffness", bearingStiffness, "N/m");
    }

    /** Stiffness of springs in series, 1/k = Σ 1/k_i; +∞ entries are rigid. */
    public static double series(double... stiffnesses) {
        if (stiffnesses.length == 0) {
            throw new IllegalArgumentException("series stiffness needs at least one spring, got none");
        }
        double compliance = 0;
        for (int i = 0; i < stiffnesses.length; i++) {
            Checks.positiveOrInfinite("stiffness #" + i, stiffnesses[i], "N/m");
            compliance += 1.0 / stiffnesses[i];
        }
        return 1.0 / compliance;
    }

    /** Total axial stiffness with the nut at a (m from the fixed bearing), N/m. */
    public double stiffnessAt(double nutPosition) {
        return series(screw.axialStiffness(mounting, nutPosition), nutStiffness, bearingStiffness);
    }

    /** Nut position with the lowest total stiffness over the stroke: the far end or mid-span. */
    public double softestNutPosition() {
        return mounting == ScrewMounting.FIXED_FREE ? screw.length() : screw.length() / 2;
    }
}
