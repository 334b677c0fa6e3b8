package org.tracewell.charts;

/**
 * Where an axis reverses on a circle, as a polar angle about the centre (radians), e.g. the axis along u
 * reverses at 0° and 180° (where u = R·cos θ is extreme and its velocity −R·ω·sin θ is zero), the axis
 * along v at 90° and 270°.
 */
public record ReversalPoint(String label, double angleRad) {

    /** The four quadrant reversals of a circle in a plane whose coordinates are the axes {@code u} and {@code v}. */
    public static java.util.List<ReversalPoint> quadrants(String u, String v) {
        return java.util.List.of(new ReversalPoint(u + " reverses", 0), new ReversalPoint(v + " reverses", Math.PI / 2),
                new ReversalPoint(u + " reverses", Math.PI), new ReversalPoint(v + " reverses", 1.5 * Math.PI));
    }
}
