package org.tracewell.engine.axis;

/**
 * Ball-screw shaft dimensions and material.
 *
 * @param length length between the bearings, m
 * @param diameter nominal diameter for the inertia, m
 * @param rootDiameter root (core) diameter for the axial stiffness, m; ≤ diameter
 * @param density kg/m³
 * @param youngsModulus Pa
 */
public record ScrewShaft(double length, double diameter, double rootDiameter, double density,
        double youngsModulus) {

    /** Density of steel, kg/m³ (common practice value). */
    public static final double STEEL_DENSITY = 7850;
    /** Young's modulus of steel, Pa (common practice value). */
    public static final double STEEL_YOUNGS_MODULUS = 2.1e11;

    public ScrewShaft {
        Checks.positive("screw length", length, "m");
        Checks.positive("screw diameter", diameter, "m");
        Checks.positive("screw root diameter", rootDiameter, "m");
        if (rootDiameter > diameter) {
            throw new IllegalArgumentException("screw root diameter must be <= the nominal diameter " + diameter
                    + " m, got " + rootDiameter + " m");
        }
        Checks.positive("screw density", density, "kg/m³");
        Checks.positive("screw Young's modulus", youngsModulus, "Pa");
    }

    /** A steel screw. */
    public static ScrewShaft steel(double length, double diameter, double rootDiameter) {
        return new ScrewShaft(length, diameter, rootDiameter, STEEL_DENSITY, STEEL_YOUNGS_MODULUS);
    }

    /** Rotary inertia of a solid cylinder about its axis: π·ρ·L·d⁴/32, kg·m². */
    public double inertia() {
        return Math.PI * density * length * Math.pow(diameter, 4) / 32;
    }

    /** Cross-section at the root diameter, m². */
    public double rootArea() {
        return Math.PI * rootDiameter * rootDiameter / 4;
    }

    /**
     * Axial stiffness of the shaft between the fixed bearing(s) and the nut, N/m.
     *
     * @param nutPosition distance a of the nut from the (first) fixed bearing, m:
     *        0 &lt; a ≤ L for fixed–free, 0 &lt; a &lt; L for fixed–fixed
     */
    public double axialStiffness(ScrewMounting mounting, double nutPosition) {
        double ea = youngsModulus * rootArea();
        return switch (mounting) {
            case FIXED_FREE -> {
                if (!(nutPosition > 0 && nutPosition <= length)) {
                    throw new IllegalArgumentException("nut position on a fixed–free screw must lie in (0, " + length
                            + "] m from the fixed bearing, got " + nutPosition + " m");
                }
                yield ea / nutPosition;
            }
            case FIXED_FIXED -> {
                if (!(nutPosition > 0 && nutPosition < length)) {
                    throw new IllegalArgumentException("nut position on a fixed–fixed screw must lie in (0, " + length
                            + ") m from the first bearing, got " + nutPosition + " m");
                }
                yield ea * length / (nutPosition * (length - nutPosition));
            }
        };
    }
}
