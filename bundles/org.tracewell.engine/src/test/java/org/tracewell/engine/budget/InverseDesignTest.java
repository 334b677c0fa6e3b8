package org.tracewell.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

class InverseDesignTest {

    private static final double UM = 1e-6;
    private static final double MM = 1e-3;
    /** mm/min → m/s, at the test edge only. */
    private static final double MM_PER_MIN = 1e-3 / 60.0;

    @Test
    void domainRadiusLossCheckForwardAndInverse() {
        // DOMAIN.md §4 [der]: R = 50 mm, F = 2000 mm/min, Kv = 33.33 1/s → ΔR ≈ 10.0 µm (exact 9.997 µm).
        double lossAt3333 = ServoErrorFormulas.radiusLoss(50 * MM, 2000 * MM_PER_MIN, 33.33);
        assertEquals(10.0 * UM, lossAt3333, 0.01 * UM);
        // ... so the smallest Kv for ΔR = 10 µm is ≈ 33.3 1/s (tolerance 0.01 1/s: 33.328 exact).
        DesignLimit kv = InverseDesign.minPositionGainForRadiusLoss(50 * MM, 2000 * MM_PER_MIN, 10 * UM);
        assertEquals(33.33, kv.value(), 0.01);
        assertEquals("Kv", kv.quantity());
        assertEquals("1/s", kv.siUnit());
        assertEquals(LimitBound.AT_LEAST, kv.bound());
        assertTrue(kv.isSatisfiedBy(40.0));
        assertFalse(kv.isSatisfiedBy(30.0));
        assertTrue(kv.formula().contains("ΔR = R·(1 − 1/√(1 + (ω/Kv)²))"));
        // The small-loss approximation ΔR ≈ F²/(2·R·Kv²) (DOMAIN.md §4 [der]) agrees to about (ω/Kv)² = 4e-4.
        double feed = 2000 * MM_PER_MIN;
        assertEquals(feed * feed / (2 * 50 * MM * 33.33 * 33.33), lossAt3333, 1e-3 * lossAt3333);
    }

    @Test
    void radiusLossInversesSubstituteBack() {
        double radius = 100 * MM;
        double feed = 3000 * MM_PER_MIN;
        for (double allowed : new double[] {1e-9, 0.5 * UM, 10 * UM, 1 * MM, 60 * MM}) {
            DesignLimit kv = InverseDesign.minPositionGainForRadiusLoss(radius, feed, allowed);
            // Substitution into the exact forward relation; relative 1e-12 (a few roundings).
            assertEquals(allowed, ServoErrorFormulas.radiusLoss(radius, feed, kv.value()), 1e-12 * allowed);
            DesignLimit maxFeed = InverseDesign.maxFeedForRadiusLoss(radius, kv.value(), allowed);
            assertEquals(feed, maxFeed.value(), 1e-12 * feed);
            assertEquals(LimitBound.AT_MOST, maxFeed.bound());
            assertEquals("m/s", maxFeed.siUnit());
        }
    }

    @Test
    void radiusLossAgreesWithAnIntegratedCircleTest() {
        // Independent numerics: integrate x' = Kv(xr − x), y' = Kv(yr − y) on the circle with Commons Math's
        // Dormand–Prince 8(5,3) until the start transient has died out (e^(−Kv·t) < 1e-20), then compare radii.
        double radius = 50 * MM;
        double omega = 2000 * MM_PER_MIN / radius;
        double kv = 33.33;
        FirstOrderDifferentialEquations loops = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double t, double[] q, double[] dq) {
                dq[0] = kv * (radius * Math.cos(omega * t) - q[0]);
                dq[1] = kv * (radius * Math.sin(omega * t) - q[1]);
            }
        };
        double[] state = {radius, 0.0};
        double end = 2.0;
        new DormandPrince853Integrator(1e-8, 0.01, 1e-15, 1e-13).integrate(loops, 0.0, state, end, state);
        double simulatedLoss = radius - Math.hypot(state[0], state[1]);
        // Tolerance 1e-4 µm: integrator tolerance 1e-13 relative on 5e-2 m states.
        assertEquals(ServoErrorFormulas.radiusLoss(radius, omega * radius, kv), simulatedLoss, 1e-4 * UM);
    }

    @Test
    void circularDeviationMismatchInverseAndEllipseCheck() {
        // LM-3020 demo target: G ≤ 25 µm at F = 3 m/min, R = 100 mm.
        double feed = 3000 * MM_PER_MIN;
        double radius = 100 * MM;
        DesignLimit mismatch = InverseDesign.maxGainMismatchForCircularDeviation(25 * UM, feed);
        assertEquals(5e-4, mismatch.value(), 1e-16);
        assertEquals("s", mismatch.siUnit());
        assertTrue(mismatch.source().contains("from memory"));
        assertEquals(25 * UM, ServoErrorFormulas.circularDeviationFromMismatch(feed, mismatch.value()), 1e-18);

        // Independent check of G ≈ F·|1/Kx − 1/Ky| (Kakino et al. 1993, from memory): steady-state circle through
        // first-order loops H = K/(jω + K); the ellipse is centred, so G = max ρ − min ρ about the origin.
        double kx = 50.0;
        double ky = 1.0 / (1.0 / kx + mismatch.value());
        double omega = feed / radius;
        Complex hx = new Complex(kx).divide(new Complex(kx, omega));
        Complex hy = new Complex(ky).divide(new Complex(ky, omega));
        double largest = Double.NEGATIVE_INFINITY;
        double smallest = Double.POSITIVE_INFINITY;
        int samples = 200_000;
        for (int i = 0; i < samples; i++) {
            double phase = 2 * Math.PI * i / samples;
            double rho = Math.hypot(radius * hx.abs() * Math.cos(phase + hx.getArgument()),
                    radius * hy.abs() * Math.sin(phase + hy.getArgument()));
            largest = Math.max(largest, rho);
            smallest = Math.min(smallest, rho);
        }
        // The relation is first order in ω/Kv = 0.01; tolerance 2 % of G.
        assertEquals(25 * UM, largest - smallest, 0.02 * 25 * UM);
    }

    @Test
    void lineMismatchInverseAgreesWithTheGeometryOfTheLaggedPoint() {
        // LM-3020 demo target: contour error ≤ 40 µm on a 45° line at 10 m/min.
        double speed = 10_000 * MM_PER_MIN;
        double angle = Math.toRadians(45);
        DesignLimit limit = InverseDesign.maxGainMismatchForLine(40 * UM, speed, angle);
        // 2ε/(V·sin 90°) = 2·40 µm / (1/6 m/s) = 4.8e-4 s [der].
        assertEquals(4.8e-4, limit.value(), 1e-15);
        assertEquals(40 * UM, ServoErrorFormulas.lineContourErrorFromMismatch(speed, angle, limit.value()), 1e-18);

        // Steady state: each axis lags its command by v_axis/K (DOMAIN.md §4 [trade]); the distance of the lagged
        // point from the line is ε = (V/2)·sin 2θ·(1/Kx − 1/Ky) (Koren 1980, from memory).
        GainWindow window = GainWindow.around(50.0, limit.value());
        for (double ky : new double[] {window.lowest(), window.highest()}) {
            double kx = 50.0;
            double t = 0.3;
            double px = speed * Math.cos(angle) * (t - 1 / kx);
            double py = speed * Math.sin(angle) * (t - 1 / ky);
            double distance = Math.abs(-px * Math.sin(angle) + py * Math.cos(angle));
            assertEquals(40 * UM, distance, 1e-12 * 40 * UM + 1e-18);
        }
        // Window [1/(0.02 + 4.8e-4), 1/(0.02 − 4.8e-4)] = [48.828, 51.230] 1/s [der].
        assertEquals(48.828125, window.lowest(), 1e-9);
        assertEquals(51.229508, window.highest(), 1e-6);
        assertTrue(window.contains(50.0));
        assertFalse(window.contains(52.0));

        // At 30°: sin 60° = √3/2 → Δ = 2ε/(V·√3/2).
        assertEquals(4 * 40 * UM / (speed * Math.sqrt(3)),
                InverseDesign.maxGainMismatchForLine(40 * UM, speed, Math.toRadians(30)).value(), 1e-15);
    }

    @Test
    void axisParallelLinePutsNoLimitOnTheMismatch() {
        DesignLimit along = InverseDesign.maxGainMismatchForLine(10 * UM, 0.1, Math.PI / 2);
        assertTrue(along.isUnlimited());
        assertTrue(along.isSatisfiedBy(1.0));
        assertTrue(GainWindow.around(50, Double.POSITIVE_INFINITY).contains(1e9));
    }

    @Test
    void cornerInverseSubstitutesBackAndMatchesTheSampledResponse() {
        double speed = 3000 * MM_PER_MIN;
        double allowed = 0.5 * MM;
        DesignLimit kv = InverseDesign.minPositionGainForCornerError(speed, allowed);
        // V/(e·ε) = 0.05/(e·5e-4) = 36.788 1/s [der].
        assertEquals(0.05 / (Math.E * 5e-4), kv.value(), 1e-12);
        assertEquals(allowed, ServoErrorFormulas.cornerError(speed, kv.value()), 1e-12 * allowed);

        // Independent check of the forward relation: closed-form responses of first-order loops through a 90°
        // corner at the origin (x stops, y starts at t = 0): x = −(V/K)·e^(−Kt), y = V·(t − (1 − e^(−Kt))/K).
        // The path is the −x ray and the +y ray, so the contour error is min(|x|, |y|); its largest value
        // should be V/(e·K) ≈ 0.368·V/K (DOMAIN.md §4 [der]).
        double k = kv.value();
        double worst = 0;
        for (int i = 0; i <= 100_000; i++) {
            double t = 5.0 / k * i / 100_000;
            double x = -(speed / k) * Math.exp(-k * t);
            double y = speed * (t - (1 - Math.exp(-k * t)) / k);
            worst = Math.max(worst, Math.min(Math.abs(x), Math.abs(y)));
        }
        // Grid step 5e-5/K: the sampled maximum is within 1e-4 relative of the peak.
        assertEquals(allowed, worst, 1e-4 * allowed);
        assertEquals(0.368, Math.exp(-1), 5e-4);
    }

    @Test
    void encoderResolutionInversesSubstituteIntoBudgetLines() {
        double allowed = 1.0 * UM;
        DesignLimit random = InverseDesign.maxEncoderResolution(allowed, 1.0, ErrorClass.RANDOM, 2.0);
        // √12·1 µm / 2 = 1.732 µm [der, GUM q/√12 from memory].
        assertEquals(Math.sqrt(3.0) * UM, random.value(), 1e-15 * UM);
        BudgetLine quantisation = new BudgetLine("quant-x", "X encoder", "X", SourceKind.QUANTISATION,
                random.value(), ValueOrigin.COMPUTED, ErrorClass.RANDOM, Distribution.QUANTISATION, 2.0, 1.0, "");
        assertEquals(allowed, quantisation.contribution(2.0), 1e-12 * allowed);
        assertEquals(allowed, ServoErrorFormulas.quantisationContribution(random.value(), 1.0, ErrorClass.RANDOM,
                2.0), 1e-12 * allowed);

        DesignLimit projected = InverseDesign.maxEncoderResolution(allowed, -0.5, ErrorClass.SYSTEMATIC, 2.0);
        // Rounding bound |s|·q/2 = c → q = 2c/|s| = 4 µm.
        assertEquals(4.0 * UM, projected.value(), 1e-15 * UM);
        BudgetLine bound = BudgetLine.systematic("quant-y", "Y encoder", "Y", SourceKind.QUANTISATION,
                projected.value() / 2, "").withSensitivity(-0.5);
        assertEquals(allowed, bound.contribution(2.0), 1e-12 * allowed);
    }

    @Test
    void invalidInputsAreRejectedNamingTheValueAndTheRange() {
        IllegalArgumentException tooLarge = assertThrows(IllegalArgumentException.class,
                () -> InverseDesign.minPositionGainForRadiusLoss(0.05, 0.03, 0.05));
        assertTrue(tooLarge.getMessage().contains("ΔR = 0.05 m"), tooLarge.getMessage());
        assertTrue(tooLarge.getMessage().contains("(0, R) = (0, 0.05) m"), tooLarge.getMessage());

        IllegalArgumentException zeroLoss = assertThrows(IllegalArgumentException.class,
                () -> InverseDesign.maxFeedForRadiusLoss(0.05, 30, 0.0));
        assertTrue(zeroLoss.getMessage().contains("ΔR = 0.0 m"), zeroLoss.getMessage());

        IllegalArgumentException feed = assertThrows(IllegalArgumentException.class,
                () -> InverseDesign.maxGainMismatchForCircularDeviation(25 * UM, -1.0));
        assertTrue(feed.getMessage().contains("feed F = -1.0 m/s"), feed.getMessage());
        assertTrue(feed.getMessage().contains("> 0"), feed.getMessage());

        IllegalArgumentException corner = assertThrows(IllegalArgumentException.class,
                () -> InverseDesign.minPositionGainForCornerError(0.05, 0.0));
        assertTrue(corner.getMessage().contains("allowed corner error ε = 0.0 m"), corner.getMessage());

        IllegalArgumentException sensitivity = assertThrows(IllegalArgumentException.class,
                () -> InverseDesign.maxEncoderResolution(UM, 0.0, ErrorClass.RANDOM, 2.0));
        assertTrue(sensitivity.getMessage().contains("sensitivity = 0"), sensitivity.getMessage());

        IllegalArgumentException gain = assertThrows(IllegalArgumentException.class,
                () -> ServoErrorFormulas.gainMismatch(50, 0));
        assertTrue(gain.getMessage().contains("Ky = 0.0 1/s"), gain.getMessage());
    }

    @Test
    void statementsReadAsDerivedRequirements() {
        DesignLimit kv = InverseDesign.minPositionGainForCornerError(0.05, 5e-4);
        assertTrue(kv.statement().startsWith("Kv ≥ 36.78"), kv.statement());
        assertEquals(0.02, ServoErrorFormulas.gainMismatch(25, 50), 1e-15);
    }

    @Test
    void budgetHeadroomMatchesTheClosedFormOfEachMethod() {
        // Lines: systematic mismatch m (sought), systematic 6 µm, random uniform ±5 µm (contribution at k = 2:
        // 2·5/√3 = 5.7735 µm, JCGM 100:2008 rectangular u = a/√3, from memory). Allowed total 20 µm.
        BudgetLine mismatch = BudgetLine.systematic("m", "Kv mismatch", null, SourceKind.GAIN_MISMATCH, 1 * UM, "x");
        BudgetLine squareness = BudgetLine.systematic("s", "squareness", "Y", SourceKind.GEOMETRIC, 6 * UM, "x");
        BudgetLine thermal = new BudgetLine("t", "thermal", "X", SourceKind.THERMAL, 5 * UM, ValueOrigin.ENTERED,
                ErrorClass.RANDOM, Distribution.UNIFORM, 1.0, 1.0, "x");
        double r = 2 * 5 / Math.sqrt(3) * UM;
        double allowed = 20 * UM;
        java.util.Map<CombinationMethod, Double> byHand = java.util.Map.of(
                // linear: m + 6 + r = 20
                CombinationMethod.LINEAR_SUM, allowed - 6 * UM - r,
                // RSS: m² + 36 + r² = 400
                CombinationMethod.RSS, Math.sqrt(allowed * allowed - 36 * UM * UM - r * r),
                // systematic sum plus random RSS: m + 6 + r = 20 (one random line)
                CombinationMethod.SYSTEMATIC_PLUS_RSS, allowed - 6 * UM - r);
        for (var e : byHand.entrySet()) {
            ErrorBudget budget = ErrorBudget.of("G", e.getKey(), java.util.List.of(mismatch, squareness, thermal));
            double headroom = InverseDesign.headroomForLine(budget, "m", allowed);
            assertEquals(e.getValue(), headroom, 1e-9 * UM, e.getKey().name());
            // forward: at the headroom the total is the allowed total
            assertEquals(allowed, budget.withReplacedLine(mismatch.withValue(headroom)).evaluate().total(),
                    1e-9 * UM, e.getKey().name());
        }
        // mean of linear and RSS: no closed form used here; forward substitution only.
        ErrorBudget mean = ErrorBudget.of("G", CombinationMethod.MEAN_OF_LINEAR_AND_RSS,
                java.util.List.of(mismatch, squareness, thermal));
        double h = InverseDesign.headroomForLine(mean, "m", allowed);
        assertEquals(allowed, mean.withReplacedLine(mismatch.withValue(h)).evaluate().total(), 1e-9 * UM);
        // other lines alone over the allowed total: no headroom
        assertEquals(0, InverseDesign.headroomForLine(mean, "m", 5 * UM));
        assertThrows(IllegalArgumentException.class, () -> InverseDesign.headroomForLine(mean, "nope", allowed));
    }
}
