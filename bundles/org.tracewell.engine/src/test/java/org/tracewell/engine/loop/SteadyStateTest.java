package org.tracewell.engine.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracewell.engine.tf.TransferFunction;

class SteadyStateTest {

    private static TransferFunction tf(double[] num, double[] den) {
        return TransferFunction.ofDescending(num, den);
    }

    @Test
    void velocityFeedforwardRaisesTheEffectiveType() {
        // DOMAIN.md §1 [der]: velocity feedforward of gain 1 around a first-order velocity loop T:
        // E/R = T·s²/(T·s² + s + Kv): zero ramp error, Ka_eff = Kv/T.
        double kv = 40;
        double t = 0.004;
        TransferFunction plant = tf(new double[] {1}, new double[] {t, 1, 0});
        TransferFunction controller = TransferFunction.gain(kv);
        TransferFunction velocityFeedforward = tf(new double[] {1, 0}, new double[] {1});
        SteadyState without = LoopAnalyzer.analyze(controller.series(plant), null).steadyState();
        assertEquals(1, without.systemType());
        assertEquals(kv, without.kv(), 1e-12);
        SteadyState with = LoopAnalyzer.withFeedforward(controller, plant, velocityFeedforward, null);
        assertEquals(2, with.systemType());
        assertEquals(kv / t, with.ka(), 1e-9 * kv / t);
        SteadyStateErrors e = with.errors().orElseThrow();
        assertEquals(0.0, e.unitRamp(), 0.0);
        assertEquals(t / kv, e.parabola(1.0), 1e-15);
    }

    @Test
    void disturbanceAtPlantInputFollowsTheNiseFormula() {
        // Nise §7.5 (from memory): unit step disturbance at the plant input gives
        // e(∞) = −1/(lim 1/P + lim C). P = 1/(s(Js+b)): lim 1/P = 0, so e = −1/K for C = K [der].
        TransferFunction plant = tf(new double[] {1}, new double[] {0.02, 0.1, 0});
        LoopAnalysis proportional = LoopAnalyzer.analyzeWithPlant(TransferFunction.gain(50), plant, null);
        assertEquals(-1.0 / 50, proportional.disturbance().orElseThrow().unitStep(), 1e-15);
        assertEquals(Double.NEGATIVE_INFINITY, proportional.disturbance().orElseThrow().unitRamp());
        // PI controller: lim C = ∞, so a constant load is rejected completely (infinite static stiffness).
        TransferFunction pi = tf(new double[] {50, 100}, new double[] {1, 0});
        LoopAnalysis integral = LoopAnalyzer.analyzeWithPlant(pi, plant, null);
        assertTrue(integral.stable());
        assertEquals(0.0, integral.disturbance().orElseThrow().unitStep(), 0.0);
        // Ramp disturbance: −1/lim(s·C) = −1/100 [der from the same formula].
        assertEquals(-1.0 / 100, integral.disturbance().orElseThrow().unitRamp(), 1e-15);
    }

    @Test
    void typeTwoLoopHasFiniteParabolaError() {
        // Type 2: Ka = lim s²L; parabola a·t²/2 gives a/Ka (Nise ch. 7 table). L = 50(s+2)/(s²(s+20)): Ka = 5.
        LoopAnalysis a = LoopAnalyzer.analyze(tf(new double[] {50, 100}, new double[] {1, 20, 0, 0}), null);
        assertTrue(a.stable());
        assertEquals(2, a.steadyState().systemType());
        assertEquals(5.0, a.steadyState().ka(), 1e-12);
        assertEquals(Double.POSITIVE_INFINITY, a.steadyState().kv());
        SteadyStateErrors e = a.steadyStateErrors().orElseThrow();
        assertEquals(10.0 / 5.0, e.parabola(10), 1e-12); // 5t² = parabola with a = 10 -> 10/Ka
        assertEquals(0.0, e.ramp(3), 0.0);
    }

    @Test
    void nonUnityFeedbackWithIntegratorsKeepsTypeThroughCancellation() {
        // H = 1 + 0·s written as (s+5)/(s+5): the equivalent unity system keeps type 1, Kv = 8.
        TransferFunction g = tf(new double[] {40}, new double[] {1, 6, 5, 0});
        TransferFunction h = tf(new double[] {1, 5}, new double[] {1, 5});
        LoopAnalysis unity = LoopAnalyzer.analyze(g.series(TransferFunction.gain(0.25)), null);
        LoopAnalysis viaH = LoopAnalyzer.analyze(g.series(TransferFunction.gain(0.25)), h);
        assertEquals(1, viaH.steadyState().systemType());
        assertEquals(unity.steadyState().kv(), viaH.steadyState().kv(), 1e-12);
        assertEquals(unity.steadyStateErrors().orElseThrow().unitRamp(),
                viaH.steadyStateErrors().orElseThrow().unitRamp(), 1e-12);
    }

    @Test
    void parabolaConventionIsStated() {
        assertTrue(SteadyStateErrors.PARABOLA_CONVENTION.contains("a·t²/2"));
        assertThrows(IllegalArgumentException.class, () -> new SteadyStateErrors(0, 0, 1).parabola(Double.NaN));
    }
}
