package org.tracewell.engine.path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class PathGeometryTest {

    private static final double EPS = 1e-12;

    @Test
    void lineHasLengthPointTangentAndLeftNormal() {
        Path path = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 3, 4)));
        // 3-4-5 triangle (elementary geometry)
        assertEquals(5.0, path.length(), EPS);
        assertEquals(1.5, path.pointAt(2.5).u(), EPS);
        assertEquals(2.0, path.pointAt(2.5).v(), EPS);
        assertEquals(0.6, path.tangentAt(1).u(), EPS);
        assertEquals(0.8, path.tangentAt(1).v(), EPS);
        // left normal = tangent turned +90°
        assertEquals(-0.8, path.normalAt(1).u(), EPS);
        assertEquals(0.6, path.normalAt(1).v(), EPS);
        assertEquals(0.0, path.curvatureAt(1), 0.0);
        // the end point is returned exactly, not re-interpolated
        assertEquals(3.0, path.pointAt(5).u(), 0.0);
        assertEquals(4.0, path.pointAt(5).v(), 0.0);
    }

    @Test
    void arcsRunInTheirDirectionWithNormalTowardCentreOnCcw() {
        Point2 c = new Point2(1, 1);
        ArcSegment ccw = ArcSegment.of(c, 2, 0, Math.PI / 2, ArcDirection.CCW);
        assertEquals(Math.PI, ccw.length(), EPS); // quarter of 2π·2
        assertEquals(1.0, ccw.uAt(ccw.length()), EPS);
        assertEquals(3.0, ccw.vAt(ccw.length()), EPS);
        assertEquals(0.0, ccw.tangentUAt(0), EPS);
        assertEquals(1.0, ccw.tangentVAt(0), EPS);
        assertEquals(0.5, ccw.curvature(), EPS);
        Path p = Path.of(ContourPlane.xy(), List.of(ccw));
        assertEquals(-1.0, p.normalAt(0).u(), EPS); // left normal points at the centre on a CCW arc

        ArcSegment cw = ArcSegment.of(c, 2, 0, Math.PI / 2, ArcDirection.CW);
        assertEquals(3 * Math.PI, cw.length(), EPS); // the long way round: three quarters
        assertEquals(0.0, cw.tangentUAt(0), EPS);
        assertEquals(-1.0, cw.tangentVAt(0), EPS);
        assertEquals(-0.5, cw.curvature(), EPS);

        ArcSegment full = ArcSegment.fullCircle(c, 2, Math.PI / 3, ArcDirection.CW);
        assertEquals(4 * Math.PI, full.length(), EPS);
        assertEquals(full.uAt(0), full.uAt(full.length()), 1e-12);
        assertEquals(full.vAt(0), full.vAt(full.length()), 1e-12);
    }

    @Test
    void pointToSegmentAndArcDistancesAreExact() {
        // independent check: brute-force minimum over 20 001 points on each segment;
        // the exact distance can only be smaller, and by at most the sampling step
        List<Segment> segments = List.of(LineSegment.of(-0.1, 0.05, 0.2, -0.03),
                ArcSegment.of(new Point2(0.02, -0.01), 0.07, 0.3, 2.2, ArcDirection.CCW),
                ArcSegment.of(new Point2(-0.05, 0.04), 0.11, 1.0, -2.5, ArcDirection.CW));
        Random random = new Random(7);
        int samples = 20_000;
        for (Segment seg : segments) {
            double step = seg.length() / samples;
            for (int trial = 0; trial < 20; trial++) {
                double pu = -0.25 + 0.5 * random.nextDouble();
                double pv = -0.25 + 0.5 * random.nextDouble();
                double brute = Double.POSITIVE_INFINITY;
                for (int i = 0; i <= samples; i++) {
                    double s = i * step;
                    brute = Math.min(brute, Math.hypot(pu - seg.uAt(s), pv - seg.vAt(s)));
                }
                double exact = seg.distance(pu, pv);
                assertTrue(exact <= brute + 1e-15, "exact " + exact + " must not exceed sampled " + brute);
                assertTrue(brute - exact <= step, "exact " + exact + " too far below sampled " + brute);
            }
        }
    }

    @Test
    void fastNearestPointAgreesWithTheParametricForm() {
        // nearest() uses the radial projection on arcs; it must give the same point and tangent as
        // closestParameter() followed by the trigonometric point and tangent
        List<Segment> segments = List.of(LineSegment.of(0.01, 0.02, -0.03, 0.05),
                ArcSegment.of(new Point2(0.01, 0.01), 0.04, 2.0, -1.0, ArcDirection.CW),
                ArcSegment.fullCircle(new Point2(0, 0), 0.05, 1.0, ArcDirection.CCW),
                new ArcSegment(new Point2(0.02, 0), 0.03, -0.5, 4.0),      // more than a half turn
                new ArcSegment(new Point2(0, 0.01), 0.06, 0.7, -Math.PI));  // exactly a half turn
        Random random = new Random(11);
        double[] out = new double[4];
        for (Segment seg : segments) {
            for (int trial = 0; trial < 200; trial++) {
                double pu = -0.1 + 0.2 * random.nextDouble();
                double pv = -0.1 + 0.2 * random.nextDouble();
                double s = seg.nearest(pu, pv, 0, out);
                assertEquals(seg.closestParameter(pu, pv, 0), s, 0.0);
                assertEquals(seg.uAt(s), out[0], 1e-15);
                assertEquals(seg.vAt(s), out[1], 1e-15);
                assertEquals(seg.tangentUAt(s), out[2], 1e-14);
                assertEquals(seg.tangentVAt(s), out[3], 1e-14);
                // the trigonometry-free squared distance used by the contour search
                double d = Math.hypot(pu - seg.uAt(s), pv - seg.vAt(s));
                assertEquals(d * d, seg.distanceSquared(pu, pv), 1e-16);
            }
        }
    }

    @Test
    void arcDistanceKnownCases() {
        ArcSegment arc = ArcSegment.of(new Point2(0, 0), 1, 0, Math.PI / 2, ArcDirection.CCW);
        assertEquals(1.0, arc.distance(0, 0), EPS);                 // centre: every point at R
        assertEquals(0.5, arc.distance(Math.sqrt(0.5) * 1.5, Math.sqrt(0.5) * 1.5), EPS); // radial, inside sweep
        assertEquals(Math.hypot(2, 1), arc.distance(-1, -1), EPS);  // outside sweep: nearer end (1, 0)
        assertEquals(0.0, arc.closestParameter(2, -0.001, 0), EPS);
    }

    @Test
    void tangentProjectionBoundsMatchDenseSampling() {
        // used to map axis limits onto a segment; check against a dense sweep of the tangent
        ArcSegment arc = ArcSegment.of(new Point2(0, 0), 0.05, 0.2, 1.1, ArcDirection.CCW);
        double[][] dirs = {{1, 0}, {0, 1}, {Math.sqrt(0.5), Math.sqrt(0.5)}, {0.6, -0.8}};
        for (double[] w : dirs) {
            double brute = 0;
            double bruteN = 0;
            for (int i = 0; i <= 100_000; i++) {
                double s = arc.length() * i / 100_000;
                brute = Math.max(brute, Math.abs(arc.tangentUAt(s) * w[0] + arc.tangentVAt(s) * w[1]));
                bruteN = Math.max(bruteN, Math.abs(-arc.tangentVAt(s) * w[0] + arc.tangentUAt(s) * w[1]));
            }
            assertEquals(brute, arc.maxAbsTangentProjection(w[0], w[1]), 1e-9);
            assertEquals(bruteN, arc.maxAbsNormalProjection(w[0], w[1]), 1e-9);
        }
    }

    @Test
    void blendedCornerDeviatesByTheToleranceAndStaysTangent() {
        List<Point2> pts = List.of(new Point2(0, 0), new Point2(0.1, 0), new Point2(0.1, 0.1), new Point2(0.03, 0.13));
        double tol = 20e-6;
        Path path = Polyline.blended(ContourPlane.xy(), pts, tol);
        assertEquals(5, path.segmentCount()); // 3 lines + 2 blend arcs
        for (int j = 0; j + 1 < path.segmentCount(); j++) {
            assertFalse(path.isStopJunction(j), "blended junction " + j + " must be tangent");
        }
        // the arc midpoint deviates from the corner by exactly the tolerance (r·(1/cos(φ/2) − 1))
        assertEquals(tol, path.distance(0.1, 0), 1e-12);
        assertEquals(tol, path.distance(0.1, 0.1), 1e-12);
        // the blend shortens the path: two tangent lengths replaced by a shorter arc
        double polylineLength = 0.1 + 0.1 + Math.hypot(0.07, 0.03);
        assertTrue(path.length() < polylineLength);
    }

    @Test
    void shortLegsShrinkTheBlendBelowTolerance() {
        List<Point2> pts = List.of(new Point2(0, 0), new Point2(1e-3, 0), new Point2(1e-3, 1e-3));
        Path path = Polyline.blended(ContourPlane.xy(), pts, 1e-3);
        assertTrue(path.distance(1e-3, 0) <= 1e-3);
        // the arc uses half of each 1 mm leg: r = 0.5 mm, deviation r(√2 − 1) (geometry)
        assertEquals(0.5e-3 * (Math.sqrt(2) - 1), path.distance(1e-3, 0), 1e-15);
    }

    @Test
    void exactStopAndSharpCornersAreStops() {
        List<Point2> pts = List.of(new Point2(0, 0), new Point2(1, 0), new Point2(2, 0), new Point2(2, 1));
        Path exact = Polyline.exactStop(ContourPlane.xy(), pts);
        assertTrue(exact.isStopJunction(0)); // requested, although straight
        assertTrue(exact.isExactStopRequested(0));
        assertTrue(exact.isStopJunction(1));
        Path sharp = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 1, 0), LineSegment.of(1, 0, 2, 0),
                LineSegment.of(2, 0, 2, 1)));
        assertFalse(sharp.isStopJunction(0)); // straight continuation
        assertTrue(sharp.isStopJunction(1));  // 90° turn cannot be passed at speed
    }

    @Test
    void disconnectedSegmentsAreRejectedWithTheGap() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 1, 0), LineSegment.of(1, 0.001, 2, 0))));
        assertTrue(e.getMessage().contains("segment 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new ArcSegment(new Point2(0, 0), -1, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> ContourPlane.of(new double[3], new double[] {1, 0, 0},
                new double[] {1, 0, 0}));
    }

    @Test
    void globalProjectionFindsTheNearestSegmentAndSide() {
        Path path = Path.of(ContourPlane.xy(), List.of(LineSegment.of(0, 0, 1, 0),
                ArcSegment.of(new Point2(1, 1), 1, -Math.PI / 2, 0, ArcDirection.CCW)));
        PathProjection p = path.project(0.5, 0.2);
        assertEquals(0, p.segmentIndex());
        assertEquals(0.5, p.pathParameter(), EPS);
        assertEquals(0.2, p.signedDistance(), EPS); // left of travel along +u
        PathProjection q = path.project(2.5, 1);
        assertEquals(1, q.segmentIndex());
        assertEquals(1 + Math.PI / 2, q.pathParameter(), 1e-12);
        assertEquals(-0.5, q.signedDistance(), EPS); // outside a CCW arc is to the right
    }

    @Test
    void threeAxisPlaneMapsPlanePointsOntoAxes() {
        double s = Math.sqrt(0.5);
        ContourPlane tilted = ContourPlane.of(new double[] {0.1, 0.2, 0.3}, new double[] {s, 0, s}, new double[] {0, 1, 0});
        assertEquals(0.1 + 2 * s, tilted.axisPosition(0, 2, 5), EPS);
        assertEquals(0.2 + 5, tilted.axisPosition(1, 2, 5), EPS);
        assertEquals(0.3 + 2 * s, tilted.axisPosition(2, 2, 5), EPS);
        ContourPlane xz = ContourPlane.ofAxes(3, 0, 2);
        assertEquals(0.0, xz.axisPosition(1, 0.4, 0.7), 0.0);
        assertEquals(0.7, xz.axisPosition(2, 0.4, 0.7), 0.0);
    }
}
