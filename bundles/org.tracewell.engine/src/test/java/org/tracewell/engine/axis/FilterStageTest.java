package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.tf.TransferFunction;

class FilterStageTest {

    private static Complex at(FilterStage f, double w) {
        return f.transferFunction().evaluate(new Complex(0, w));
    }

    @Test
    void notchHasUnityDcGainItsDepthAtTheCentreAndItsWidthAtMinus3Db() {
        double w0 = 900;
        double width = 200;
        FilterStage full = new FilterStage.Notch(w0, width, 0);
        assertEquals(1.0, full.transferFunction().dcGain(), 0);
        assertEquals(0.0, at(full, w0).abs(), 1e-12);
        assertEquals(0.25, at(new FilterStage.Notch(w0, width, 0.25), w0).abs(), 1e-12);
        // (s² + ω0²)/(s² + B·s + ω0²) is at −3 dB where |ω0² − ω²| = B·ω, i.e. at (√(B² + 4ω0²) ∓ B)/2, B apart
        // (standard second-order notch, common practice)
        double lo = (Math.sqrt(width * width + 4 * w0 * w0) - width) / 2;
        double hi = lo + width;
        assertEquals(1 / Math.sqrt(2), at(full, lo).abs(), 1e-12);
        assertEquals(1 / Math.sqrt(2), at(full, hi).abs(), 1e-12);
    }

    @Test
    void leadGivesItsMaximumPhaseAtTheGeometricMean() {
        double z = 100;
        double p = 1000;
        FilterStage lead = new FilterStage.LeadLag(z, p);
        double alpha = p / z;
        // φmax = asin((α − 1)/(α + 1)) at √(z·p) (Franklin, Powell & Emami-Naeini §6.7, from memory)
        double wm = Math.sqrt(z * p);
        assertEquals(Math.asin((alpha - 1) / (alpha + 1)), at(lead, wm).getArgument(), 1e-12);
        assertEquals(at(lead, wm).getArgument(), Math.max(at(lead, wm * 1.01).getArgument(),
                at(lead, wm).getArgument()), 0);
        assertEquals(1.0, lead.transferFunction().dcGain(), 0);
    }

    @Test
    void lowPassesAreMinus3DbAndMinus90DegAtTheCorner() {
        // first order ω/(s + ω): |·| = 1/√2 at ω; second order with ζ: phase −90° and |·| = 1/(2ζ) at ω (Nise ch. 10, from memory)
        assertEquals(1 / Math.sqrt(2), at(new FilterStage.LowPass1(500), 500).abs(), 1e-12);
        Complex g = at(new FilterStage.LowPass2(500, 0.4), 500);
        assertEquals(-Math.PI / 2, g.getArgument(), 1e-12);
        assertEquals(1 / 0.8, g.abs(), 1e-12);
        TransferFunction chain = new CascadeController(30, 1, 0.01, java.util.List.of(new FilterStage.LowPass1(500),
                new FilterStage.LeadLag(100, 1000)), 0, 0, 0, 0).filterChain();
        assertEquals(1.0, chain.dcGain(), 0);
    }
}
