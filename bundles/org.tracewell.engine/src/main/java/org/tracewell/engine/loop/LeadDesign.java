package org.tracewell.engine.loop;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Lead compensator C(s) = (T·s + 1)/(α·T·s + 1), 0 &lt; α &lt; 1, designed for a phase margin by
 * the frequency-response method (Ogata, Modern Control Engineering, ch. 7; Franklin, Powell
 * &amp; Emami-Naeini, §6.7). C(0) = 1, so the static error constants are unchanged.
 * <p>
 * Rule used: maximum phase lead φ_m = required PM − present PM + allowance (the allowance
 * covers the phase lost because the crossover moves up); α = (1 − sin φ_m)/(1 + sin φ_m);
 * φ_m is delivered at ω_m = 1/(T·√α), where the lead raises the gain by 1/√α, so ω_m is put
 * where |L(jω)| = √α and becomes the new gain crossover.
 *
 * @param requiredPhaseMarginDeg the requirement
 * @param maximumLeadDeg φ_m
 * @param alpha α
 * @param zeroRadPerSec 1/T
 * @param poleRadPerSec 1/(α·T)
 * @param compensator C(s)
 * @param compensatedLoop C(s)·L(s)
 * @param marginsBefore margins of L
 * @param marginsAfter margins of C·L
 */
public record LeadDesign(double requiredPhaseMarginDeg, double maximumLeadDeg, double alpha, double zeroRadPerSec,
        double poleRadPerSec, TransferFunction compensator, TransferFunction compensatedLoop, Margins marginsBefore,
        Margins marginsAfter) {

    /** Largest lead one stage delivers sensibly; beyond it α becomes tiny and noise gain large. */
    public static final double MAXIMUM_SINGLE_STAGE_LEAD_DEG = 65.0;

    /** ω_m = √(zero·pole), where the lead is largest. */
    public double maximumLeadFrequencyRadPerSec() {
        return Math.sqrt(zeroRadPerSec * poleRadPerSec);
    }

    /**
     * Lead for a required phase margin of loop L.
     *
     * @param allowanceDeg extra lead for the crossover shift, commonly 5–12° (common practice)
     * @throws IllegalArgumentException if L has no gain crossover, already meets the
     *         requirement, or would need more than {@value #MAXIMUM_SINGLE_STAGE_LEAD_DEG}° from one stage
     */
    public static LeadDesign forPhaseMargin(TransferFunction loop, double requiredPhaseMarginDeg, double allowanceDeg) {
        if (!(requiredPhaseMarginDeg > 0 && requiredPhaseMarginDeg < 90)) {
            throw new IllegalArgumentException("required phase margin must be between 0 and 90 degrees, got "
                    + requiredPhaseMarginDeg);
        }
        if (!(allowanceDeg >= 0 && allowanceDeg < 30)) {
            throw new IllegalArgumentException("allowance must be between 0 and 30 degrees, got " + allowanceDeg);
        }
        Margins before = LoopFrequencyAnalysis.margins(loop);
        if (before.gainCrossovers().isEmpty()) {
            throw new IllegalArgumentException("the loop has no gain crossover (|L| never crosses 1); a lead has no"
                    + " crossover to act at");
        }
        if (before.phaseMarginDeg() >= requiredPhaseMarginDeg) {
            throw new IllegalArgumentException("the loop already has a phase margin of " + before.phaseMarginDeg()
                    + " deg >= required " + requiredPhaseMarginDeg + " deg; no lead is needed");
        }
        double lead = requiredPhaseMarginDeg - before.phaseMarginDeg() + allowanceDeg;
        if (lead > MAXIMUM_SINGLE_STAGE_LEAD_DEG) {
            throw new IllegalArgumentException("the loop would need " + lead + " deg of lead, more than one stage"
                    + " gives (" + MAXIMUM_SINGLE_STAGE_LEAD_DEG + " deg); use two stages or lower the gain");
        }
        double sin = Math.sin(Math.toRadians(lead));
        double alpha = (1 - sin) / (1 + sin);
        // New crossover: the highest frequency where |L| = √α (above the present crossover).
        double level = Math.log(Math.sqrt(alpha));
        double[] grid = FrequencyGrid.forLoop(loop);
        double[] v = new double[2];
        double wm = Double.NaN;
        double previous = Double.NaN;
        double fPrevious = Double.NaN;
        for (double w : grid) {
            loop.evaluateAtFrequency(w, v);
            double f = Math.log(Math.hypot(v[0], v[1])) - level;
            if (!Double.isNaN(fPrevious) && (fPrevious > 0) != (f > 0)) {
                final double[] scratch = new double[2];
                wm = new BrentSolver(1e-13, 1e-300).solve(200, x -> {
                    loop.evaluateAtFrequency(x, scratch);
                    return Math.log(Math.hypot(scratch[0], scratch[1])) - level;
                }, previous, w);
            }
            previous = w;
            fPrevious = f;
        }
        if (Double.isNaN(wm)) {
            throw new IllegalArgumentException("|L| never falls to " + Math.sqrt(alpha) + "; cannot place the lead");
        }
        double t = 1.0 / (wm * Math.sqrt(alpha));
        TransferFunction c = TransferFunction.of(Polynomial.ofDescending(t, 1.0), Polynomial.ofDescending(alpha * t, 1.0));
        TransferFunction compensated = c.series(loop);
        return new LeadDesign(requiredPhaseMarginDeg, lead, alpha, 1.0 / t, 1.0 / (alpha * t), c, compensated, before,
                LoopFrequencyAnalysis.margins(compensated));
    }
}
