package org.tracewell.engine.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.tf.StateSpace;
import org.tracewell.engine.tf.TransferFunction;

/** Step responses against an independent Dormand–Prince 8(5,3) integration of the closed loop. */
class StepResponseTest {

    private static TransferFunction tf(double[] num, double[] den) {
        return TransferFunction.ofDescending(num, den);
    }

    /** Output of x' = Ax + B·1, y = Cx + D, from x(0) = 0, at the given times, by Commons Math ODE. */
    private static double[] integrate(TransferFunction g, double[] times) {
        StateSpace ss = StateSpace.controllableCanonical(g);
        RealMatrix a = ss.a();
        RealMatrix b = ss.b();
        RealMatrix c = ss.c();
        int n = ss.order();
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return n;
            }

            @Override
            public void computeDerivatives(double t, double[] x, double[] dx) {
                double[] ax = a.operate(x);
                for (int i = 0; i < n; i++) {
                    dx[i] = ax[i] + b.getEntry(i, 0);
                }
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 10.0, 1e-13, 1e-12);
        double[] x = new double[n];
        double t = 0;
        double[] y = new double[times.length];
        for (int k = 0; k < times.length; k++) {
            if (times[k] > t) {
                integrator.integrate(ode, t, x, times[k], x);
                t = times[k];
            }
            double v = ss.d();
            for (int i = 0; i < n; i++) {
                v += c.getEntry(0, i) * x[i];
            }
            y[k] = v;
        }
        return y;
    }

    /** y at k·h, k = 0..n−1, from one Dormand–Prince run with its dense (interpolated) output. */
    private static double[] denseOde(TransferFunction g, double h, int n) {
        StateSpace ss = StateSpace.controllableCanonical(g);
        RealMatrix a = ss.a();
        RealMatrix b = ss.b();
        RealMatrix c = ss.c();
        int dim = ss.order();
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return dim;
            }

            @Override
            public void computeDerivatives(double t, double[] x, double[] dx) {
                double[] ax = a.operate(x);
                for (int i = 0; i < dim; i++) {
                    dx[i] = ax[i] + b.getEntry(i, 0);
                }
            }
        };
        double[] y = new double[n];
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 1.0, 1e-13, 1e-12);
        FixedStepHandler sampler = new FixedStepHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public void handleStep(double t, double[] x, double[] dx, boolean isLast) {
                int k = (int) Math.round(t / h);
                if (k < n) {
                    double v = ss.d();
                    for (int i = 0; i < dim; i++) {
                        v += c.getEntry(0, i) * x[i];
                    }
                    y[k] = v;
                }
            }
        };
        integrator.addStepHandler(new StepNormalizer(h, sampler, StepNormalizerBounds.BOTH));
        integrator.integrate(ode, 0.0, new double[dim], (n - 1) * h, new double[dim]);
        return y;
    }

    private static void assertMatchesOde(TransferFunction closedLoop, double tolerance) {
        StepResponse r = StepResponse.of(closedLoop);
        double[] t = r.times();
        double[] y = r.values();
        int stride = Math.max(1, t.length / 200);
        double[] ts = new double[(t.length + stride - 1) / stride];
        double[] ys = new double[ts.length];
        for (int i = 0, k = 0; i < t.length; i += stride, k++) {
            ts[k] = t[i];
            ys[k] = y[i];
        }
        double[] ref = integrate(closedLoop, ts);
        for (int k = 0; k < ts.length; k++) {
            assertEquals(ref[k], ys[k], tolerance, "t = " + ts[k]);
        }
    }

    @Test
    void thirdOrderClosedLoopMatchesOdeIntegration() {
        // Nise Ex. 7.3 loop closed: T = 100(s+2)(s+6)/(s³+107s²+812s+1200); tolerance 1e-8 (ODE tolerance 1e-12).
        TransferFunction l = tf(new double[] {100, 800, 1200}, new double[] {1, 7, 12, 0});
        assertMatchesOde(l.unityFeedback(), 1e-8);
    }

    @Test
    void lightlyDampedFourthOrderMatchesOdeIntegration() {
        // Velocity loop with a 60 Hz mode inside a 12 1/s position loop (invented, plausible numbers).
        double wm = 2 * Math.PI * 60;
        TransferFunction mode = tf(new double[] {wm * wm}, new double[] {1, 2 * 0.05 * wm, wm * wm});
        TransferFunction l = tf(new double[] {12}, new double[] {1 / 300.0, 1, 0}).series(mode);
        LoopAnalysis a = LoopAnalyzer.analyze(l, null);
        assertTrue(a.stable());
        assertMatchesOde(a.closedLoop(), 1e-8);
    }

    @Test
    void metricsAgreeWithDenseOdeSamplingForNonMinimumPhaseLoop() {
        // Right-half-plane zero: undershoot first. Overshoot, rise and settling times against a dense
        // ODE-sampled response (1e-4 s grid): agreement to the grid resolution.
        TransferFunction t = tf(new double[] {-0.5, 1}, new double[] {0.25, 0.8, 1});
        StepMetrics m = StepResponse.of(t).metrics();
        int n = 200001;
        double[] y = denseOde(t, 1e-4, n);
        double max = Double.NEGATIVE_INFINITY;
        int lastOut = 0;
        int t10 = -1;
        int t90 = -1;
        for (int i = 0; i < n; i++) {
            max = Math.max(max, y[i]);
            if (Math.abs(y[i] - 1) > 0.02) {
                lastOut = i;
            }
            if (t10 < 0 && y[i] >= 0.1) {
                t10 = i;
            }
            if (t90 < 0 && y[i] >= 0.9) {
                t90 = i;
            }
        }
        assertEquals((max - 1) * 100, m.overshootPercent().orElseThrow(), 1e-6);
        assertEquals(lastOut * 1e-4, m.settlingTimeSeconds().orElseThrow(), 1.5e-4);
        assertEquals((t90 - t10) * 1e-4, m.riseTimeSeconds().orElseThrow(), 2.5e-4);
        assertEquals(1.0, m.finalValue(), 1e-15);
    }

    @Test
    void overdampedResponseHasNoPeakTime() {
        // Critically damped: Kv·T = 0.25 gives ζ = 1 (DOMAIN.md §2 [der]); no overshoot, no peak time.
        TransferFunction l = tf(new double[] {25}, new double[] {0.01, 1, 0});
        StepMetrics m = StepResponse.of(l.unityFeedback()).metrics();
        assertEquals(0.0, m.overshootPercent().orElseThrow(), 0.0);
        assertTrue(m.peakTimeSeconds().isEmpty());
        // Double pole at −50: y = 1 − (1 + 50t)e^(−50t); 10–90 % rise time = (3.8897 − 0.5318)/50 [der].
        assertEquals((3.889720169867429 - 0.531811608389612) / 50, m.riseTimeSeconds().orElseThrow(), 1e-9);
    }

    @Test
    void unstableClosedLoopIsRejected() {
        TransferFunction t = tf(new double[] {1}, new double[] {1, -1, 1});
        assertThrows(IllegalArgumentException.class, () -> StepResponse.of(t));
    }
}
