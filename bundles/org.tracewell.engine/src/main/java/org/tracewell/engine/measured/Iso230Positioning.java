package org.tracewell.engine.measured;

import java.util.ArrayList;
import java.util.List;

/**
 * Positioning accuracy and repeatability of an axis after ISO 230-2 (the definitions of ISO 230-2:2014 as recalled,
 * not checked against the standard's text; DOMAIN.md §5). Expanded figures use the coverage factor 2 (±2s).
 */
public final class Iso230Positioning {

    /** Targets and approaches each way the standard asks for at least (ISO 230-2, from memory). */
    public static final int STANDARD_MINIMUM = 5;

    private Iso230Positioning() {
    }

    public static PositioningEvaluation evaluate(PositioningMeasurement runs) {
        int m = runs.targetCount();
        int n = runs.approachCount();
        List<TargetStatistics> targets = new ArrayList<>(m);
        double[] up = new double[n];
        double[] down = new double[n];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < n; j++) {
                up[j] = runs.up(i, j);
                down[j] = runs.down(i, j);
            }
            targets.add(new TargetStatistics(runs.target(i), mean(up), mean(down), sampleDeviation(up),
                    sampleDeviation(down)));
        }
        double upHi = Double.NEGATIVE_INFINITY, upLo = Double.POSITIVE_INFINITY;
        double downHi = Double.NEGATIVE_INFINITY, downLo = Double.POSITIVE_INFINITY;
        double meanUpHi = Double.NEGATIVE_INFINITY, meanUpLo = Double.POSITIVE_INFINITY;
        double meanDownHi = Double.NEGATIVE_INFINITY, meanDownLo = Double.POSITIVE_INFINITY;
        double biHi = Double.NEGATIVE_INFINITY, biLo = Double.POSITIVE_INFINITY;
        double r = 0, rUp = 0, rDown = 0, b = 0, bSum = 0;
        for (TargetStatistics t : targets) {
            upHi = Math.max(upHi, t.meanUp() + 2 * t.standardUncertaintyUp());
            upLo = Math.min(upLo, t.meanUp() - 2 * t.standardUncertaintyUp());
            downHi = Math.max(downHi, t.meanDown() + 2 * t.standardUncertaintyDown());
            downLo = Math.min(downLo, t.meanDown() - 2 * t.standardUncertaintyDown());
            meanUpHi = Math.max(meanUpHi, t.meanUp());
            meanUpLo = Math.min(meanUpLo, t.meanUp());
            meanDownHi = Math.max(meanDownHi, t.meanDown());
            meanDownLo = Math.min(meanDownLo, t.meanDown());
            biHi = Math.max(biHi, t.meanBidirectional());
            biLo = Math.min(biLo, t.meanBidirectional());
            r = Math.max(r, t.repeatability());
            rUp = Math.max(rUp, t.repeatabilityUp());
            rDown = Math.max(rDown, t.repeatabilityDown());
            b = Math.max(b, Math.abs(t.reversal()));
            bSum += t.reversal();
        }
        double accHi = Math.max(upHi, downHi);
        double accLo = Math.min(upLo, downLo);
        PositioningFigures figures = new PositioningFigures(accHi - accLo, upHi - upLo, downHi - downLo, r, rUp, rDown,
                b, bSum / m, Math.max(meanUpHi, meanDownHi) - Math.min(meanUpLo, meanDownLo), meanUpHi - meanUpLo,
                meanDownHi - meanDownLo, biHi - biLo);
        List<String> notes = new ArrayList<>();
        if (m < STANDARD_MINIMUM) {
            notes.add(m + " target positions; ISO 230-2 asks for at least " + STANDARD_MINIMUM);
        }
        if (n < STANDARD_MINIMUM) {
            notes.add(n + " approaches each way per target; ISO 230-2 asks for " + STANDARD_MINIMUM);
        }
        return new PositioningEvaluation(runs, targets, figures, notes);
    }

    private static double mean(double[] x) {
        double sum = 0;
        for (double value : x) {
            sum += value;
        }
        return sum / x.length;
    }

    /** Sample standard deviation with n − 1 in the denominator (two-pass, so large offsets do not cancel). */
    private static double sampleDeviation(double[] x) {
        double mean = mean(x);
        double sum = 0;
        for (double value : x) {
            sum += (value - mean) * (value - mean);
        }
        return Math.sqrt(sum / (x.length - 1));
    }
}
