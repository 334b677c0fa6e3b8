package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Quadrant reversals sit where each axis's velocity on the circle is zero. */
class ReversalPointTest {

    @Test
    void eachAxisReversesWhereItsCoordinateIsExtreme() {
        // u = R·cos θ, v = R·sin θ: u̇ = −R·ω·sin θ vanishes at 0 and π, v̇ = R·ω·cos θ at π/2 and 3π/2 (kinematics).
        List<ReversalPoint> points = ReversalPoint.quadrants("X", "Y");
        assertEquals("X reverses", points.get(0).label());
        assertEquals(0.0, points.get(0).angleRad(), 0.0);
        assertEquals("Y reverses", points.get(1).label());
        assertEquals(Math.PI / 2, points.get(1).angleRad(), 0.0);
        assertEquals("X reverses", points.get(2).label());
        assertEquals("Y reverses", points.get(3).label());
    }
}
