package org.tracewell.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYAnnotation;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The charts of the live views: Nyquist with the Ms circle, step and ramp responses, tracking per axis. Reference
 * values come from closed forms evaluated here, independently of the engine.
 */
class LiveChartsTest {

    // ------------------------------------------------------------------------------------------------ Nyquist

    /** L(jω) = 10/(jω(jω + 1)(jω + 5)) as a complex product, {re, im}: independent of the magnitude/phase form. */
    private static double[] ogata(double w) {
        // (jω)(jω + 1)(jω + 5) = −6ω² + j(5ω − ω³)
        double re = -6 * w * w;
        double im = 5 * w - w * w * w;
        double d = re * re + im * im;
        return new double[] {10 * re / d, -10 * im / d};
    }

    /** Ms = max 1/|1 + L(jω)| by a dense search (10⁶ points over 0.01–100 rad/s), with where it peaks. */
    private static double[] densePeak() {
        double best = 0;
        double at = 0;
        for (int i = 0; i <= 1_000_000; i++) {
            double w = Math.pow(10, -2 + 4.0 * i / 1_000_000);
            double[] l = ogata(w);
            double s = 1 / Math.hypot(1 + l[0], l[1]);
            if (s > best) {
                best = s;
                at = w;
            }
        }
        return new double[] {best, at};
    }

    @Test
    void nyquistCurveIsLOfJOmegaWithItsMirrorAndTheMsCircleAboutMinusOne() throws IOException {
        FrequencySeries loop = ChartRenderingTest.ogataLoop(2000);
        double[] peak = densePeak();
        double ms = peak[0];
        JFreeChart chart = NyquistChart.create("Nyquist", loop, ms, peak[1]);
        XYPlot plot = chart.getXYPlot();
        XYDataset data = plot.getDataset();
        for (int i : new int[] {0, 500, 1234, 1999}) {
            double[] l = ogata(loop.omegaRadPerSec()[i]);
            // the curve is L(jω) itself and the mirror its conjugate (L(−jω) = conj L(jω) for a real loop)
            assertEquals(l[0], data.getXValue(NyquistChart.CURVE, i), 1e-9 * Math.max(1, Math.abs(l[0])));
            assertEquals(l[1], data.getYValue(NyquistChart.CURVE, i), 1e-9 * Math.max(1, Math.abs(l[1])));
            assertEquals(-l[1], data.getYValue(NyquistChart.MIRROR, i), 1e-9 * Math.max(1, Math.abs(l[1])));
        }
        assertEquals(2000, data.getItemCount(NyquistChart.CURVE), "every frequency kept in the data");
        for (int k = 0; k < data.getItemCount(NyquistChart.MS_CIRCLE); k++) {
            double distance = Math.hypot(data.getXValue(NyquistChart.MS_CIRCLE, k) + 1,
                    data.getYValue(NyquistChart.MS_CIRCLE, k));
            assertEquals(1 / ms, distance, 1e-12, "Ms circle: radius 1/Ms about −1 (by construction)");
        }
        // 1/Ms is the shortest distance from the curve to −1 (Åström & Murray, Feedback Systems, 2008 — from
        // memory): the circle touches the drawn curve; 0.5 % covers the 2000-point grid against the dense search.
        double closest = Double.POSITIVE_INFINITY;
        for (int i = 0; i < data.getItemCount(NyquistChart.CURVE); i++) {
            closest = Math.min(closest, Math.hypot(data.getXValue(NyquistChart.CURVE, i) + 1,
                    data.getYValue(NyquistChart.CURVE, i)));
        }
        assertEquals(1 / ms, closest, 0.005 / ms);
        // GM = 3 for K = 10 (Ogata, from memory; DOMAIN.md §7): the curve crosses the real axis at −1/3, so
        // Ms ≥ 1/(1 − 1/3) = 1.5.
        assertTrue(ms > 1.5, "Ms " + ms);
        assertTrue(data.getSeriesKey(NyquistChart.MS_CIRCLE).toString().contains("1/Ms = " + Units.format3(1 / ms)),
                data.getSeriesKey(NyquistChart.MS_CIRCLE).toString());
        assertTrue(ReviewChartsTest.texts(plot).contains("−1"), ReviewChartsTest.texts(plot));
        assertTrue(pointerTexts(plot).contains("Ms " + Units.format3(ms) + " at "), pointerTexts(plot));

        // The frame holds −1 with its circle, and spans are equal so circles stay round.
        double lo = plot.getDomainAxis().getLowerBound();
        double hi = plot.getDomainAxis().getUpperBound();
        assertTrue(lo < -1 - 1 / ms && hi > 0, lo + " … " + hi);
        assertEquals(plot.getDomainAxis().getRange().getLength(), plot.getRangeAxis().getRange().getLength(), 1e-9);
        assertTrue(hi - lo < 2 * (2 * NyquistChart.FRAME_MAGNITUDE) * 1.2, "low-frequency branch does not set the frame");

        BufferedImage image = ReviewChartsTest.render(chart, 720, 640);
        assertEquals(720, image.getWidth());
        assertEquals(640, image.getHeight());
    }

    @Test
    void nyquistOfAnUnstableLoopHasNoMsCircleAndSaysSo() {
        JFreeChart chart = NyquistChart.create("Nyquist", ChartRenderingTest.ogataLoop(300), Double.NaN, Double.NaN);
        XYDataset data = chart.getXYPlot().getDataset();
        assertEquals(0, data.getItemCount(NyquistChart.MS_CIRCLE));
        assertTrue(data.getSeriesKey(NyquistChart.MS_CIRCLE).toString().contains("not stable"));
        FrequencySeries loop = ChartRenderingTest.ogataLoop(10);
        assertThrows(IllegalArgumentException.class, () -> NyquistChart.create("n", loop, -2, 1));
    }

    // ------------------------------------------------------------------------------------------------ step and ramp

    /** Unit step of ωn²/(s² + 2ζωn·s + ωn²), 0 < ζ < 1 (Nise, Control Systems Engineering, ch. 4 — from memory). */
    private static double step(double t, double zeta, double wn) {
        double sigma = zeta * wn;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        return 1 - Math.exp(-sigma * t) * (Math.cos(wd * t) + sigma / wd * Math.sin(wd * t));
    }

    private static double[] step(double[] t, double zeta, double wn) {
        double[] y = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            y[k] = step(t[k], zeta, wn);
        }
        return y;
    }

    /** n instants 0, dt, 2·dt, … */
    private static double[] times(int n, double dt) {
        double[] t = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * dt;
        }
        return t;
    }

    @Test
    void stepChartMarksFinalValueBandPeakAndSettling() throws IOException {
        // Nise Ex. 4.5 (from memory, recomputed in DOMAIN.md §7): T = 100/(s² + 15 s + 100): ζ = 0.75, ωn = 10,
        // Tp = 0.475 s, %OS = 2.838 %.
        double zeta = 0.75;
        double wn = 10;
        double[] t = times(3001, 1e-3);
        double[] y = step(t, zeta, wn);
        double tp = Math.PI / (wn * Math.sqrt(1 - zeta * zeta));
        double os = 100 * Math.exp(-zeta * Math.PI / Math.sqrt(1 - zeta * zeta));
        assertEquals(0.475, tp, 5e-4);
        assertEquals(2.838, os, 5e-4);
        StepFigures figures = new StepFigures(1, 1 + os / 100, tp, os, 0.533, 0.02);
        JFreeChart chart = StepResponseChart.create("Step", new TimeSeries("y(t)", t, y), figures,
                DisplayScale.MILLISECONDS);
        XYPlot plot = chart.getXYPlot();
        assertEquals(475.0, plot.getDataset().getXValue(0, 475), 1e-9, "time in ms");
        assertEquals(step(0.475, zeta, wn), plot.getDataset().getYValue(0, 475), 1e-12);
        String marks = ChartRenderingTest.labels(plot);
        assertTrue(marks.contains("final value 1.00, band ±2.00 %"), marks);
        assertTrue(marks.contains("settled at 533 ms"), marks);
        assertTrue(pointerTexts(plot).contains("overshoot 2.84 % at 475 ms"), pointerTexts(plot));
        IntervalMarker band = (IntervalMarker) plot.getRangeMarkers(Layer.BACKGROUND).iterator().next();
        assertEquals(0.98, band.getStartValue(), 1e-12);
        assertEquals(1.02, band.getEndValue(), 1e-12);
        BufferedImage image = ReviewChartsTest.render(chart, 640, 400);
        assertEquals(640, image.getWidth());
        assertEquals(400, image.getHeight());
    }

    @Test
    void rampResponseIsTheIntegralOfTheStepAndSettlesAtVOverKv() throws IOException {
        // Position loop Kv/(s(Ts + 1)) with Kv·T = 0.5: ζ = 0.707, ωn = √(Kv/T) (DOMAIN.md §2 [der]); Kv = 50 1/s,
        // T = 10 ms → ωn = 70.71 1/s. Its closed loop is the standard second order, whose unit-ramp error tends to
        // 2ζ/ωn = 1/Kv (Nise ch. 7 — from memory).
        double kv = 50;
        double wn = Math.sqrt(kv / 0.01);
        double zeta = 1 / (2 * Math.sqrt(kv * 0.01));
        int n = 4001;
        double[] t = times(n, 1e-4);
        double[] y = step(t, zeta, wn);
        double velocity = 1.0 / 60; // 1 m/min
        RampResponse ramp = RampResponse.fromStep("y(t)", t, y, velocity, 1 / kv);
        // e(t) = ∫₀ᵗ (1 − y_step) in closed form: I_c + (σ/ω_d)·I_s with I_c = ∫e^{−στ}cos ω_dτ, I_s = ∫e^{−στ}sin ω_dτ.
        double sigma = zeta * wn;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        for (int k : new int[] {200, 1000, 4000}) {
            double tk = t[k];
            double decay = Math.exp(-sigma * tk);
            double ic = (sigma - decay * (sigma * Math.cos(wd * tk) - wd * Math.sin(wd * tk))) / (wn * wn);
            double is = (wd - decay * (sigma * Math.sin(wd * tk) + wd * Math.cos(wd * tk))) / (wn * wn);
            double exact = velocity * (ic + sigma / wd * is);
            // Trapezoid over h = 0.1 ms: error ≈ v·h²/12·|y'(t) − y'(0)| ≤ (1/60)·1e-8/12·31 ≈ 0.4 nm; 2 nm allowed.
            assertEquals(exact, ramp.error()[k], 2e-9, "error at " + tk + " s");
            assertEquals(velocity * tk, ramp.reference()[k], 1e-15);
        }
        assertEquals(velocity / kv, ramp.error()[n - 1], 1e-9, "settles at v/Kv = 333.3 µm");
        assertEquals(velocity / kv, ramp.steadyStateError(), 1e-15);

        JFreeChart chart = RampResponseChart.create("Ramp", ramp, DisplayScale.MILLISECONDS);
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        XYPlot positions = plot.getSubplots().get(RampResponseChart.POSITIONS);
        XYPlot error = plot.getSubplots().get(RampResponseChart.ERROR);
        assertEquals(velocity * t[1000] * 1e3, positions.getDataset().getYValue(0, 1000), 1e-12, "reference in mm");
        assertEquals(ramp.response()[1000] * 1e3, positions.getDataset().getYValue(1, 1000), 1e-12);
        assertEquals(ramp.error()[1000] * 1e6, error.getDataset().getYValue(0, 1000), 1e-9, "error in µm");
        String marks = ChartRenderingTest.labels(error);
        assertTrue(marks.contains("steady error v/Kv = 333 µm (1/Kv = 20.0 ms)"), marks);
        assertTrue(chart.getTitle().getText().contains("ramp at 1.00 m/min"), chart.getTitle().getText());
        BufferedImage image = ReviewChartsTest.render(chart, 800, 520);
        assertEquals(800, image.getWidth());
        assertEquals(520, image.getHeight());
    }

    @Test
    void rampOfATypeZeroLoopHasNoSteadyErrorMark() {
        double[] t = {0, 1, 2};
        double[] y = {0, 0.5, 0.5};
        RampResponse ramp = RampResponse.fromStep("y", t, y, 1, Double.POSITIVE_INFINITY);
        assertEquals(0.75, ramp.response()[2], 1e-15, "trapezoid: ½(0 + 0.5)·1 + ½(0.5 + 0.5)·1");
        JFreeChart chart = RampResponseChart.create("Ramp", ramp, DisplayScale.SECONDS);
        XYPlot error = ((CombinedDomainXYPlot) chart.getPlot()).getSubplots().get(RampResponseChart.ERROR);
        assertTrue(ChartRenderingTest.labels(error).isEmpty(), ChartRenderingTest.labels(error));
        assertTrue(chart.getTitle().getText().contains("without bound"), chart.getTitle().getText());
        assertThrows(IllegalArgumentException.class, () -> RampResponse.fromStep("y", t, y, 0, 1));
    }

    // ------------------------------------------------------------------------------------------------ tracking

    @Test
    void trackingChartShowsEachAxisInMillimetresAndItsFollowingErrorInMicrometres() throws IOException {
        int n = 20_000; // above the 4 × 1600 samples the display keeps
        double[] t = new double[n];
        double[][] ref = new double[2][n];
        double[][] act = new double[2][n];
        double[][] fe = new double[2][n];
        for (int k = 0; k < n; k++) {
            t[k] = k * 1e-3;
            // a 100 mm circle at 0.5 rad/s tracked 0.1 ms late: following error up to 0.1·0.5·1e-4 m = 5 µm
            ref[0][k] = 0.1 * Math.cos(0.5 * t[k]);
            act[0][k] = 0.1 * Math.cos(0.5 * (t[k] - 1e-4));
            ref[1][k] = 0.1 * Math.sin(0.5 * t[k]);
            act[1][k] = 0.1 * Math.sin(0.5 * (t[k] - 1e-4));
            for (int a = 0; a < 2; a++) {
                fe[a][k] = ref[a][k] - act[a][k];
            }
        }
        fe[0][13_210] = 42e-6; // a spike the display decimation must keep
        AxisTrack x = new AxisTrack("X1", t, ref[0], act[0], fe[0]);
        AxisTrack y = new AxisTrack("Y", t, ref[1], act[1], fe[1]);
        JFreeChart chart = TrackingChart.create("Tracking", List.of(x, y), DisplayScale.SECONDS);
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        XYDataset positions = plot.getSubplots().get(TrackingChart.POSITIONS).getDataset();
        XYDataset errors = plot.getSubplots().get(TrackingChart.FOLLOWING_ERROR).getDataset();
        assertEquals(List.of("X1 reference", "X1 actual", "Y reference", "Y actual"),
                List.of(positions.getSeriesKey(0), positions.getSeriesKey(1), positions.getSeriesKey(2),
                        positions.getSeriesKey(3)).stream().map(Object::toString).toList());
        assertEquals(100.0, positions.getYValue(0, 0), 1e-12, "mm");
        double maxUm = 0;
        for (int i = 0; i < errors.getItemCount(0); i++) {
            maxUm = Math.max(maxUm, errors.getYValue(0, i));
        }
        assertEquals(42.0, maxUm, 1e-9, "µm; the spike survives decimation");
        assertTrue(errors.getItemCount(0) < n, "decimated for display: " + errors.getItemCount(0));
        assertEquals(13_210, x.indexOfPeak());
        assertTrue(pointerTexts(plot.getSubplots().get(TrackingChart.FOLLOWING_ERROR)).contains("X1 peak 42.0 µm"));
        BufferedImage image = ReviewChartsTest.render(chart, 900, 600);
        assertEquals(900, image.getWidth());
        assertEquals(600, image.getHeight());
        assertThrows(IllegalArgumentException.class, () -> TrackingChart.create("t", List.of(), DisplayScale.SECONDS));

        // Decimated for the width it is drawn at: at most 4 points per pixel column, the spike still there.
        JFreeChart narrow = TrackingChart.create("Tracking", List.of(x, y), DisplayScale.SECONDS, 500);
        XYDataset few = ((CombinedDomainXYPlot) narrow.getPlot()).getSubplots().get(TrackingChart.FOLLOWING_ERROR)
                .getDataset();
        assertTrue(few.getItemCount(0) <= 4 * 500, "points: " + few.getItemCount(0));
        double narrowMax = 0;
        for (int i = 0; i < few.getItemCount(0); i++) {
            narrowMax = Math.max(narrowMax, few.getYValue(0, i));
        }
        assertEquals(42.0, narrowMax, 1e-9);
    }

    // ------------------------------------------------------------------------------------------------ helpers

    /** Texts of pointer annotations (they extend text annotations) only. */
    static String pointerTexts(XYPlot plot) {
        StringBuilder all = new StringBuilder();
        for (XYAnnotation a : plot.getAnnotations()) {
            if (a instanceof org.jfree.chart.annotations.XYPointerAnnotation p) {
                all.append(p.getText()).append(" | ");
            }
        }
        return all.toString();
    }

    @Test
    void nyquistSubtitleStatesTheFrame() {
        JFreeChart chart = NyquistChart.create("Nyquist", ChartRenderingTest.ogataLoop(100), 2, 1);
        boolean found = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            found |= chart.getSubtitle(i) instanceof TextTitle t && t.getText().contains("|L| ≤ 3");
        }
        assertTrue(found, "the frame's extent is stated on the chart");
        assertFalse(chart.getXYPlot().getDomainAxis().isAutoRange(), "fixed frame, not the data's extent");
    }
}
