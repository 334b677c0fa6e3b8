package org.tracewell.engine.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Worked examples from textbooks (DOMAIN.md §7 and §2), values recomputed. "from memory"
 * marks values recalled from the book but not re-checked against its text.
 */
class PublishedExamplesTest {

    static TransferFunction tf(double[] num, double[] den) {
        return TransferFunction.ofDescending(num, den);
    }

    static Polynomial p(double... descending) {
        return Polynomial.ofDescending(descending);
    }

    @Test
    void nise72TypeZeroPositionConstant() {
        // Nise, Control Systems Engineering, Ex. 7.2 (from memory): G = 120(s+2)/((s+3)(s+4)), Kp = 20.
        TransferFunction g = TransferFunction.of(p(120, 240), p(1, 3).multiply(p(1, 4)));
        LoopAnalysis a = LoopAnalyzer.analyze(g, null);
        assertTrue(a.stable());
        assertEquals(0, a.steadyState().systemType());
        assertEquals(20.0, a.steadyState().kp(), 1e-12); // Nise Ex. 7.2: Kp = 20
        SteadyStateErrors e = a.steadyStateErrors().orElseThrow();
        assertEquals(5.0 / 21.0, e.step(5), 1e-12); // Nise Ex. 7.2: 5u(t) -> 5/21
        assertEquals(Double.POSITIVE_INFINITY, e.ramp(5)); // Nise Ex. 7.2: 5t -> infinite
        // Nise Ex. 7.2: 5t^2 -> infinite; with the a·t²/2 convention 5t² is a = 10.
        assertEquals(Double.POSITIVE_INFINITY, e.parabola(10));
    }

    @Test
    void nise73TypeOneVelocityConstant() {
        // Nise Ex. 7.3 (from memory): G = 100(s+2)(s+6)/(s(s+3)(s+4)), Kv = 100, ramp 5t -> 0.05.
        TransferFunction g = TransferFunction.of(p(1, 2).multiply(p(1, 6)).scale(100),
                Polynomial.S.multiply(p(1, 3)).multiply(p(1, 4)));
        LoopAnalysis a = LoopAnalyzer.analyze(g, null);
        assertTrue(a.stable());
        assertEquals(1, a.steadyState().systemType());
        assertEquals(100.0, a.steadyState().kv(), 1e-12); // Nise Ex. 7.3: Kv = 100
        SteadyStateErrors e = a.steadyStateErrors().orElseThrow();
        assertEquals(0.0, e.step(5), 0.0); // Nise Ex. 7.3: step error 0
        assertEquals(0.05, e.ramp(5), 1e-14); // Nise Ex. 7.3: 5t -> 5/100 = 0.05
        assertEquals(Double.POSITIVE_INFINITY, e.parabola(10)); // Nise Ex. 7.3: 5t² -> infinite
    }

    @Test
    void nise69StableGainRange() {
        // Nise Ex. 6.9 (from memory): s³ + 18s² + 77s + K stable for 0 < K < 1386, poles ±j√77 at the limit.
        StableGainRange r = StableGainRange.of(p(1), p(1, 18, 77, 0));
        assertEquals(1, r.intervals().size());
        assertEquals(0.0, r.intervals().get(0).lower(), 0.0);
        assertEquals(1386.0, r.intervals().get(0).upper(), 1386 * 1e-10); // Nise Ex. 6.9: K < 1386
        StableGainRange.Boundary limit = r.boundaries().stream()
                .filter(b -> Math.abs(b.gain() - 1386) < 1e-6).findFirst().orElseThrow();
        assertEquals(Math.sqrt(77), limit.frequencyRadPerSec(), 1e-10); // Nise Ex. 6.9: ±j√77
        // The closed-loop poles at K = 1386 include ±j√77 (independent check by root finding).
        List<Complex> poles = p(1, 18, 77, 1386).roots();
        assertTrue(poles.stream().anyMatch(z -> Math.abs(z.getReal()) < 1e-9
                && Math.abs(Math.abs(z.getImaginary()) - Math.sqrt(77)) < 1e-9));
        // Routh agrees on both sides of the limit.
        assertTrue(RouthArray.of(p(1, 18, 77, 1385)).stable());
        assertEquals(2, RouthArray.of(p(1, 18, 77, 1387)).rightHalfPlaneRoots());
    }

    @Test
    void nise45SecondOrderStepResponse() {
        // Nise Ex. 4.5 (from memory): T = 100/(s²+15s+100): ζ = 0.75, Tp = 0.475 s, %OS = 2.838 %.
        // Realised as the unity-feedback loop L = 100/(s(s+15)).
        LoopAnalysis a = LoopAnalyzer.analyze(tf(new double[] {100}, new double[] {1, 15, 0}), null);
        StepMetrics m = a.step().orElseThrow().metrics();
        double zeta = 0.75;
        double wn = 10;
        double tp = Math.PI / (wn * Math.sqrt(1 - zeta * zeta));
        double os = 100 * Math.exp(-zeta * Math.PI / Math.sqrt(1 - zeta * zeta));
        assertEquals(1.0, m.finalValue(), 1e-15);
        assertEquals(0.475, m.peakTimeSeconds().orElseThrow(), 5e-4); // Nise Ex. 4.5: Tp = 0.475 s (3 digits)
        assertEquals(tp, m.peakTimeSeconds().orElseThrow(), 1e-9); // Nise ch. 4 formula Tp = π/(ωn√(1−ζ²))
        assertEquals(2.838, m.overshootPercent().orElseThrow(), 5e-4); // Nise Ex. 4.5: %OS = 2.838
        assertEquals(os, m.overshootPercent().orElseThrow(), 1e-8); // Nise ch. 4 %OS formula
        // Settling time measured from the response (2 % band); the 4/(ζωn) = 0.533 s estimate differs.
        // Reference 0.57426 s: scipy.signal.step on a 10 µs grid (independent numerics), ±20 µs.
        assertEquals(0.57426, m.settlingTimeSeconds().orElseThrow(), 2e-5);
    }

    @Test
    void ogataMarginsOfThirdOrderLoop() {
        // Ogata, Modern Control Engineering (from memory): K/(s(s+1)(s+5)), K = 10:
        // GM = 9.542 dB at √5 rad/s, PM = 25.39° (exact values).
        TransferFunction l = tf(new double[] {10}, new double[] {1, 6, 5, 0});
        Margins m = LoopFrequencyAnalysis.margins(l);
        assertEquals(20 * Math.log10(3), m.gainMarginDb(), 1e-9); // GM = 3 exactly: L(j√5) = −1/3 [der]
        assertEquals(9.542, m.gainMarginDb(), 5e-4); // Ogata: 9.542 dB
        assertEquals(Math.sqrt(5), m.phaseCrossoverRadPerSec().orElseThrow(), 1e-10); // Ogata: √5 rad/s
        assertEquals(25.39, m.phaseMarginDeg(), 5e-3); // Ogata: 25.39°
        assertEquals(1, m.gainCrossovers().size());
        assertEquals(1, m.phaseCrossovers().size());
    }

    @Test
    void nise91LagRaisesPositionConstantTenfold() {
        // Nise Ex. 9.1/9.2 (from memory): K/((s+1)(s+2)(s+10)) at ζ = 0.174: K ≈ 164.6, Kp ≈ 8.23,
        // e_step ≈ 0.108; tenfold improvement with p_c = 0.01, z_c ≈ 0.111 (1 % tolerance).
        TransferFunction l = TransferFunction.of(p(164.6), p(1, 1).multiply(p(1, 2)).multiply(p(1, 10)));
        LoopAnalysis a = LoopAnalyzer.analyze(l, null);
        assertEquals(8.23, a.steadyState().kp(), 8.23 * 1e-3); // Nise Ex. 9.1: Kp ≈ 8.23
        assertEquals(0.108, a.steadyStateErrors().orElseThrow().unitStep(), 0.108 * 0.01); // Nise: 0.108
        // Tenfold improvement: e = 0.0108.
        LagDesign lag = LagDesign.forMaximumError(l, ErrorConstant.KP, 1.0, 0.0108);
        // Nise Ex. 9.2: with p_c = 0.01 the zero is z_c ≈ 0.111, i.e. z/p ≈ 11.1 (1 % tolerance).
        assertEquals(0.111, lag.ratio() * 0.01, 0.111 * 0.01);
        assertEquals(1 / 0.0108 - 1, lag.after(), 1e-9 * lag.after());
        assertTrue(LoopAnalyzer.analyze(lag.compensatedLoop(), null).stable());
    }

    @Test
    void fpeLagExample() {
        // Franklin, Powell & Emami-Naeini, Feedback Control of Dynamic Systems, §6.7 (from memory):
        // plant 1/(s(s+1)) with lag 10(10s+1)/(100s+1): Kv = 10, PM ≈ 45.2° at 0.79 rad/s.
        TransferFunction lag = tf(new double[] {100, 10}, new double[] {100, 1});
        TransferFunction l = lag.series(tf(new double[] {1}, new double[] {1, 1, 0}));
        LoopAnalysis a = LoopAnalyzer.analyze(l, null);
        assertEquals(10.0, a.steadyState().kv(), 1e-12); // FPE: Kv = 10
        assertEquals(45.2, a.margins().phaseMarginDeg(), 0.05); // FPE: PM ≈ 45.2°
        assertEquals(0.79, a.margins().gainCrossoverRadPerSec().orElseThrow(), 0.005); // FPE: 0.79 rad/s
    }

    @Test
    void secondOrderPhaseMarginAndBandwidthFormulas() {
        // Nise ch. 10 (from memory): PM of ωn²/(s(s+2ζωn)) = atan(2ζ/√(−2ζ²+√(1+4ζ⁴))),
        // ωBW = ωn·√((1−2ζ²)+√(4ζ⁴−4ζ²+2)).
        for (double zeta : new double[] {0.2, 0.5, 0.75}) {
            double wn = 10;
            LoopAnalysis a = LoopAnalyzer.analyze(tf(new double[] {wn * wn}, new double[] {1, 2 * zeta * wn, 0}),
                    null);
            double pm = Math.toDegrees(Math.atan(2 * zeta / Math.sqrt(-2 * zeta * zeta
                    + Math.sqrt(1 + 4 * Math.pow(zeta, 4)))));
            double bw = wn * Math.sqrt((1 - 2 * zeta * zeta) + Math.sqrt(4 * Math.pow(zeta, 4) - 4 * zeta * zeta + 2));
            assertEquals(pm, a.margins().phaseMarginDeg(), 1e-9, "PM at zeta " + zeta); // exact formula
            assertEquals(bw, a.bandwidthRadPerSec().orElseThrow(), 1e-9, "BW at zeta " + zeta); // exact formula
            assertEquals(Double.POSITIVE_INFINITY, a.margins().gainMarginDb()); // phase never reaches −180°
        }
    }

    @Test
    void positionLoopAroundFirstOrderVelocityLag() {
        // DOMAIN.md §2 [der]: L = Kv/(s(Ts+1)): ωn = √(Kv/T), ζ = 1/(2√(Kv·T)); Kv·T = 0.5 -> ζ = 0.707.
        double t = 0.005;
        double kv = 0.5 / t;
        LoopAnalysis a = LoopAnalyzer.analyze(tf(new double[] {kv}, new double[] {t, 1, 0}), null);
        double zeta = 1 / (2 * Math.sqrt(kv * t));
        double wn = Math.sqrt(kv / t);
        for (Complex pole : a.closedLoopPoles()) {
            assertEquals(wn, pole.abs(), 1e-9 * wn);
            assertEquals(zeta, -pole.getReal() / pole.abs(), 1e-12);
        }
        assertEquals(Math.sqrt(0.5), zeta, 1e-15);
        // ζ = 1/√2 -> %OS = 100·exp(−π) = 4.32 % (Nise ch. 4 formula).
        assertEquals(100 * Math.exp(-Math.PI), a.step().orElseThrow().metrics().overshootPercent().orElseThrow(),
                1e-7);
    }

    @Test
    void positionLoopAroundSecondOrderVelocityLoopStableBelowTwoDOmega() {
        // DOMAIN.md §2 [der]: s³ + 2Dω0 s² + ω0² s + Kv ω0² = 0 stable for Kv < 2·D·ω0.
        double w0 = 2 * Math.PI * 80;
        double d = 0.6;
        TransferFunction l = tf(new double[] {w0 * w0}, new double[] {1, 2 * d * w0, w0 * w0, 0});
        StableGainRange r = StableGainRange.of(l);
        assertEquals(1, r.intervals().size());
        assertEquals(2 * d * w0, r.intervals().get(0).upper(), 1e-9 * 2 * d * w0);
        assertTrue(LoopAnalyzer.analyze(l.series(TransferFunction.gain(0.99 * 2 * d * w0)), null).stable());
        assertFalse(LoopAnalyzer.analyze(l.series(TransferFunction.gain(1.01 * 2 * d * w0)), null).stable());
    }

    @Test
    void nise76NonUnityFeedbackEquivalentSystem() {
        // Nise Ex. 7.6 (from memory): G = 100/(s(s+10)), H = 1/(s+5): equivalent unity system type 0,
        // Kp = −1.25, unit-step error −4. Recomputed: T(0) = 500/100 = 5, so e = 1 − 5 = −4 [der].
        TransferFunction g = tf(new double[] {100}, new double[] {1, 10, 0});
        TransferFunction h = tf(new double[] {1}, new double[] {1, 5});
        LoopAnalysis a = LoopAnalyzer.analyze(g, h);
        assertTrue(a.stable());
        assertEquals(0, a.steadyState().systemType());
        assertEquals(-1.25, a.steadyState().kp(), 1e-12);
        assertEquals(-4.0, a.steadyStateErrors().orElseThrow().unitStep(), 1e-12);
        assertEquals(1, a.loopType());
    }
}
