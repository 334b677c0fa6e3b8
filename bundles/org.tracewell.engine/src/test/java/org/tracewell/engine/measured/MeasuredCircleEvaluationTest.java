package org.tracewell.engine.measured;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.tracewell.engine.budget.BudgetLine;
import org.tracewell.engine.budget.ErrorClass;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.path.ArcDirection;

/** Measured circular tests: import, ISO 230-4 figures by the prediction's own code, budget lines. */
class MeasuredCircleEvaluationTest {

    private static final double R_MM = 100;
    private static final String HEAD = "# LM-3020 XY circle, ball bar\n# radius_mm: 100\n# feed_m_min: 3\n# axes: X1 Y\n"
            + "# date: 2026-03-16\n";

    /** x/y samples of a circle of radius R + δ about (e, 0) µm, CCW from 0°, n samples over one turn. */
    private static String offsetCircle(double deltaUm, double eUm, int n) {
        StringBuilder b = new StringBuilder(HEAD).append("# direction: CCW\nx_mm,y_mm\n");
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n;
            double r = R_MM + deltaUm * 1e-3;
            b.append(String.format(Locale.ROOT, "%.10f,%.10f%n", eUm * 1e-3 + r * Math.cos(a), r * Math.sin(a)));
        }
        return b.toString();
    }

    /** Polar samples ρ − R = offset + half·cos 2(θ − tilt), µm, for one direction. */
    private static void ellipse(StringBuilder b, String direction, double offsetUm, double halfUm, double tiltDeg,
            int n) {
        int sign = direction.equals("CCW") ? 1 : -1;
        for (int k = 0; k < n; k++) {
            double deg = sign * 360.0 * k / n;
            double d = offsetUm + halfUm * Math.cos(2 * Math.toRadians(deg - tiltDeg));
            b.append(String.format(Locale.ROOT, "%s,%.6f,%.9f%n", direction, deg, d));
        }
    }

    @Test
    void offsetCircleHasNoCircularDeviationAndTheRadialDeviationOfItsCentreShift() throws MeasuredDataException {
        MeasuredCircleTest test = MeasuredCircleTest.parse("circle.csv", offsetCircle(3, 2, 720));
        assertEquals(0.1, test.radius(), 1e-15);
        assertEquals(0.05, test.feed(), 1e-15); // 3 m/min = 0.05 m/s
        assertEquals("X1", test.firstAxisName());
        MeasuredCircleEvaluation e = MeasuredCircleEvaluation.of(test);
        CircleTestResult r = e.runs().get(0);
        // By construction (geometry, exact): the least-squares circle is the sampled circle, so G = 0; about the
        // nominal centre ρ(θ) = e·cos θ + √((R + δ)² − e² sin² θ) spans R + δ − e .. R + δ + e, so F runs from
        // δ − e = 1 µm to δ + e = 5 µm. Tolerance 1e-11 m: the file's 1e-10 mm rounding.
        assertEquals(0.0, r.circularDeviation(), 1e-11);
        assertEquals(2e-6, r.leastSquaresCircle().centreU(), 1e-11);
        assertEquals(0.1 + 3e-6, r.leastSquaresCircle().radius(), 1e-11);
        assertEquals(5e-6, r.radialDeviationMax(), 1e-11);
        assertEquals(1e-6, r.radialDeviationMin(), 1e-11);
        assertEquals(720, r.evaluatedSamples());
    }

    @Test
    void bothDirectionsGiveGPerRunAndGbFromTheSameCodeAsThePredictions() throws MeasuredDataException {
        StringBuilder b = new StringBuilder(HEAD).append("direction,angle_deg,radial_deviation_um\n");
        ellipse(b, "CW", -3, 2, 45, 1440);
        ellipse(b, "CCW", -2, 2, 135, 1440);
        MeasuredCircleTest test = MeasuredCircleTest.parse("xy-circle.csv", b.toString());
        MeasuredCircleEvaluation e = MeasuredCircleEvaluation.of(test);
        // Same code: CircleTest.evaluate on the run's own points gives bit-identical figures.
        for (MeasuredCircleRun run : test.runs()) {
            CircleTestResult direct = CircleTest.evaluate(MeasuredCircleEvaluation.setup(test, run), run.us(), run.vs());
            assertEquals(direct, e.run(run.direction()).orElseThrow());
        }
        // By construction: an ellipse offset ± 2 µm about the nominal centre keeps the least-squares centre there
        // (symmetry), so G = peak-to-peak = 4 µm per run, with the major axis at the stated tilt; F is the larger of
        // |−3 − 2| and |−2 − 2| µm. Tolerance 1e-9 m covers the fit's second-order terms (half²/R ≈ 4e-14 m) and the
        // file's 1e-9 µm rounding with margin.
        CircleTestResult cw = e.run(ArcDirection.CW).orElseThrow();
        CircleTestResult ccw = e.run(ArcDirection.CCW).orElseThrow();
        assertEquals(4e-6, cw.circularDeviation(), 1e-9);
        assertEquals(4e-6, ccw.circularDeviation(), 1e-9);
        assertEquals(Math.toRadians(45), cw.ellipseOrientation(), 1e-6);
        assertEquals(Math.toRadians(135), ccw.ellipseOrientation(), 1e-6);
        assertEquals(5e-6, e.radialDeviation(), 1e-9);
        // G(b): both runs about the common centre span (−3 − 2) .. (−2 + 2) µm = 5 µm.
        assertEquals(5e-6, e.bidirectional().orElseThrow().bidirectionalDeviation(), 1e-9);

        BudgetLine g = MeasuredBudgetLines.circle("xy-g-measured", null, e, CircleFigure.CIRCULAR_DEVIATION);
        assertEquals(ErrorClass.SYSTEMATIC, g.errorClass());
        assertEquals(4e-6, g.value(), 1e-9);
        assertEquals("xy-circle.csv, 2026-03-16", g.evidence());
        assertTrue(g.name().contains("R 100 mm at 3 m/min"), g.name());
        BudgetLine gb = MeasuredBudgetLines.circle("xy-gb", null, e, CircleFigure.BIDIRECTIONAL_DEVIATION);
        assertEquals(5e-6, gb.value(), 1e-9);
    }

    private static MeasuredDataException bad(String text) {
        return assertThrows(MeasuredDataException.class, () -> MeasuredCircleTest.parse("c.csv", text));
    }

    @Test
    void badCircleFilesSayWhereAndWhy() {
        // stated CW, samples run CCW
        String wrongWay = offsetCircle(0, 0, 72).replace("# direction: CCW", "# direction: CW");
        MeasuredDataException e = bad(wrongWay);
        assertEquals(8, e.line());
        assertTrue(e.getMessage().contains("travel CCW") && e.getMessage().contains("stated CW"), e.getMessage());
        // 300° only
        String partial = offsetCircle(0, 0, 72);
        String[] lines = partial.split("\n");
        StringBuilder cut = new StringBuilder();
        for (int i = 0; i < lines.length - 12; i++) {
            cut.append(lines[i]).append('\n');
        }
        e = bad(cut.toString());
        assertTrue(e.getMessage().contains("covers 295.0° only"), e.getMessage());
        // no radius
        e = bad(offsetCircle(0, 0, 72).replace("# radius_mm: 100\n", ""));
        assertTrue(e.getMessage().contains("'# radius_mm: …'"), e.getMessage());
        // a second CW run
        StringBuilder twice = new StringBuilder(HEAD).append("direction,angle_deg,radial_deviation_um\n");
        ellipse(twice, "CW", 0, 1, 0, 36);
        ellipse(twice, "CCW", 0, 1, 0, 36);
        ellipse(twice, "CW", 0, 1, 0, 36);
        e = bad(twice.toString());
        assertEquals(6 + 72 + 1, e.line());
        assertTrue(e.getMessage().contains("a second CW run (the first starts on line 7)"), e.getMessage());
        // a bad direction value
        e = bad(HEAD + "direction,angle_deg,radial_deviation_um\nCW,0,0\ncw?,1,0\n");
        assertEquals(8, e.line());
        assertEquals(1, e.column());
        assertTrue(e.getMessage().contains("valid: CW or CCW"), e.getMessage());
    }
}
