package org.tracewell.engine.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/** Identities that hold for any loop, checked by independent routes. */
class InvariantsTest {

    private static TransferFunction tf(double[] num, double[] den) {
        return TransferFunction.ofDescending(num, den);
    }

    private static Polynomial p(double... d) {
        return Polynomial.ofDescending(d);
    }

    /** A type-1 axis loop: Kv 30 1/s around a 150 rad/s velocity lag and a 400 rad/s filter. */
    private static TransferFunction axisLoop() {
        return TransferFunction.of(p(30 * 150 * 400), Polynomial.S.multiply(p(1, 150)).multiply(p(1, 400)));
    }

    @Test
    void truxalRelationForTypeOneClosedLoop() {
        // Truxal 1955; Franklin, Powell & Emami-Naeini §4.2 (from memory): for a type-1 unity loop with
        // closed-loop poles −p_i and zeros −z_j, 1/Kv = Σ 1/p_i − Σ 1/z_j. Checked on Nise Ex. 7.3 (Kv = 100)
        // and on a third-order axis loop.
        List<TransferFunction> loops = List.of(
                TransferFunction.of(p(1, 2).multiply(p(1, 6)).scale(100), Polynomial.S.multiply(p(1, 3)).multiply(p(1, 4))),
                axisLoop());
        for (TransferFunction l : loops) {
            LoopAnalysis a = LoopAnalyzer.analyze(l, null);
            assertTrue(a.stable());
            double sum = 0;
            for (Complex pole : a.closedLoopPoles()) {
                sum += new Complex(1, 0).divide(pole.negate()).getReal();
            }
            for (Complex zero : a.closedLoopZeros()) {
                sum -= new Complex(1, 0).divide(zero.negate()).getReal();
            }
            assertEquals(1.0 / a.steadyState().kv(), sum, 1e-12 * Math.abs(sum) + 1e-15);
        }
    }

    @Test
    void marginsAreInvariantUnderFrequencyScaling() {
        // L(s) -> L(s/a): crossovers scale by a, margins unchanged [der]. Dead time included.
        TransferFunction l = axisLoop().withDelay(0.002);
        Margins m = LoopFrequencyAnalysis.margins(l);
        for (double a : new double[] {1e-3, 0.1, 7.5, 1e4}) {
            Margins ms = LoopFrequencyAnalysis.margins(l.scaleFrequency(a));
            assertEquals(m.phaseMarginDeg(), ms.phaseMarginDeg(), 1e-9);
            assertEquals(m.gainMarginDb(), ms.gainMarginDb(), 1e-9);
            assertEquals(m.gainCrossoverRadPerSec().orElseThrow() * a, ms.gainCrossoverRadPerSec().orElseThrow(),
                    1e-10 * a * m.gainCrossoverRadPerSec().orElseThrow());
            assertEquals(m.phaseCrossoverRadPerSec().orElseThrow() * a, ms.phaseCrossoverRadPerSec().orElseThrow(),
                    1e-10 * a * m.phaseCrossoverRadPerSec().orElseThrow());
            assertEquals(m.delayMarginSeconds() / a, ms.delayMarginSeconds(), 1e-9 * m.delayMarginSeconds() / a);
        }
    }

    @Test
    void everyGainCrossoverMatchesPolynomialRoots() {
        // Independent route: |L(jω)| = 1  <=>  N(s)N(−s) − D(s)D(−s) = 0 at s = jω, a polynomial in ω².
        // A loop with a lightly damped mode has three gain crossovers.
        double wm = 80;
        TransferFunction l = TransferFunction.of(p(20 * wm * wm), Polynomial.S.multiply(p(1 / 200.0, 1))
                .multiply(p(1, 2 * 0.01 * wm, wm * wm)));
        Margins m = LoopFrequencyAnalysis.margins(l);
        List<Double> expected = unitMagnitudeFrequencies(l.numerator(), l.denominator());
        assertTrue(expected.size() >= 3, "test loop should cross 0 dB several times: " + expected);
        assertEquals(expected.size(), m.gainCrossovers().size());
        for (int i = 0; i < expected.size(); i++) {
            assertEquals(expected.get(i), m.gainCrossovers().get(i).frequencyRadPerSec(), 1e-9 * expected.get(i));
        }
        // The summary is the smallest phase margin over all crossings.
        double minPm = m.gainCrossovers().stream().mapToDouble(GainCrossover::phaseMarginDeg).min().orElseThrow();
        assertEquals(minPm, m.phaseMarginDeg(), 0.0);
    }

    private static List<Double> unitMagnitudeFrequencies(Polynomial n, Polynomial d) {
        Polynomial q = n.multiply(n.reflect()).subtract(d.multiply(d.reflect()));
        double[] x = new double[q.degree() / 2 + 1];
        for (int m = 0; m < x.length; m++) {
            x[m] = q.coefficient(2 * m) * (m % 2 == 0 ? 1 : -1);
        }
        List<Double> w = new ArrayList<>();
        for (Complex r : Polynomial.ofAscending(x).roots()) {
            if (r.getReal() > 0 && Math.abs(r.getImaginary()) < 1e-9 * r.abs()) {
                w.add(Math.sqrt(r.getReal()));
            }
        }
        w.sort(Double::compare);
        return w;
    }

    @Test
    void conditionallyStableLoopReportsBothPhaseCrossovers() {
        // L = 300(s+1)²/(s³(s+10)²): phase starts at −270°, rises above −180° and falls back.
        // Reference values from numpy on a 2e6-point grid (independent numerics): crossings at 1.2984 and
        // 7.7015 rad/s with GM −11.17 dB and +12.09 dB.
        TransferFunction l = TransferFunction.of(p(1, 1).multiply(p(1, 1)).scale(300),
                p(1, 0, 0, 0).multiply(p(1, 10)).multiply(p(1, 10)));
        LoopAnalysis a = LoopAnalyzer.analyze(l, null);
        assertTrue(a.stable());
        List<PhaseCrossover> pc = a.margins().phaseCrossovers();
        assertEquals(2, pc.size());
        assertEquals(1.29844, pc.get(0).frequencyRadPerSec(), 1e-4);
        assertEquals(-11.1739, pc.get(0).gainMarginDb(), 1e-3);
        assertEquals(7.70152, pc.get(1).frequencyRadPerSec(), 1e-4);
        assertEquals(12.0889, pc.get(1).gainMarginDb(), 1e-3);
        // Summary: the crossing closest to 0 dB, here the gain-reduction margin.
        assertEquals(pc.get(0).gainMarginDb(), a.margins().gainMarginDb(), 0.0);
        // The stable gain range (polynomial route) agrees with the two margins (frequency route).
        StableGainRange.Interval range = a.gainRange().intervals().get(0);
        assertEquals(1, a.gainRange().intervals().size());
        assertEquals(Math.pow(10, pc.get(0).gainMarginDb() / 20), range.lower(), 1e-9 * range.lower());
        assertEquals(Math.pow(10, pc.get(1).gainMarginDb() / 20), range.upper(), 1e-9 * range.upper());
        assertTrue(range.contains(1.0));
    }

    @Test
    void delayMarginBringsTheLoopToTheStabilityLimit() {
        // Adding exactly the delay margin puts L(jωc) on −1 [der: e^(−jωc·DM) rotates by PM].
        TransferFunction l = axisLoop();
        Margins m = LoopFrequencyAnalysis.margins(l);
        double dm = m.delayMarginSeconds();
        double wc = m.gainCrossoverRadPerSec().orElseThrow();
        Complex v = l.withDelay(dm).evaluate(new Complex(0, wc));
        assertEquals(-1.0, v.getReal(), 1e-9);
        assertEquals(0.0, v.getImaginary(), 1e-9);
        assertEquals(Math.toRadians(m.phaseMarginDeg()) / wc, dm, 1e-15);
        // With slightly less delay the Padé-rational closed loop is stable, with slightly more it is not.
        assertTrue(LoopAnalyzer.analyze(l.withDelay(0.95 * dm), null).stable());
        assertFalse(LoopAnalyzer.analyze(l.withDelay(1.05 * dm), null).stable());
    }

    @Test
    void unstableLoopReportsNoSteadyStateErrorAndNoStepFigures() {
        // Ogata's K/(s(s+1)(s+5)) is unstable beyond K = 30 (Routh: 6·5 = 30 [der]); take K = 40.
        LoopAnalysis a = LoopAnalyzer.analyze(tf(new double[] {40}, new double[] {1, 6, 5, 0}), null);
        assertFalse(a.stable());
        assertTrue(a.steadyStateErrors().isEmpty());
        assertTrue(a.step().isEmpty());
        assertTrue(a.bandwidthRadPerSec().isEmpty());
        assertTrue(a.sensitivityPeak().isEmpty());
        assertTrue(a.delayMarginSeconds().isEmpty());
        assertEquals(2, a.routh().rightHalfPlaneRoots());
        // The constants remain properties of the open loop.
        assertEquals(8.0, a.steadyState().kv(), 1e-12);
        assertTrue(a.margins().phaseMarginDeg() < 0);
        assertTrue(a.margins().gainMarginDb() < 0);
    }

    @Test
    void sensitivityPeakIsAtLeastOneOverStabilityMarginsBound() {
        // Åström & Murray, Feedback Systems (from memory): GM >= Ms/(Ms−1) and PM >= 2·asin(1/(2Ms)).
        LoopAnalysis a = LoopAnalyzer.analyze(tf(new double[] {10}, new double[] {1, 6, 5, 0}), null);
        double ms = a.sensitivityPeak().orElseThrow().peak();
        assertTrue(a.margins().gainMarginFactor() >= ms / (ms - 1) - 1e-12);
        assertTrue(Math.toRadians(a.margins().phaseMarginDeg()) >= 2 * Math.asin(1 / (2 * ms)) - 1e-12);
        // Peak is a maximum of |S| on a fine independent scan (1e5 log points), ±1e-9 relative.
        TransferFunction l = a.loop();
        double best = 0;
        for (int i = 0; i <= 100000; i++) {
            double w = Math.pow(10, -2 + 4.0 * i / 100000);
            best = Math.max(best, 1 / new Complex(1, 0).add(l.evaluate(new Complex(0, w))).abs());
        }
        assertEquals(best, ms, 1e-6 * ms);
        assertTrue(ms >= best);
    }
}
