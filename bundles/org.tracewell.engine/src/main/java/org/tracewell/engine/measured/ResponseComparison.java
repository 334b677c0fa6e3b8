package org.tracewell.engine.measured;

import org.tracewell.engine.tf.TransferFunction;

/**
 * How far a predicted response lies from a measured one: the complex log error ln(G_predicted/G_measured) at the
 * measured frequencies inside a band, summarised as root mean squares (unweighted).
 *
 * @param points         measured points compared
 * @param logErrorRms    rms of |ln(G_predicted/G_measured)| (0.01 ≈ 1 % magnitude or 0.57° phase)
 * @param magnitudeRmsDb rms magnitude error, dB
 * @param phaseRmsDeg    rms phase error, degrees (each point's difference taken in (−180°, 180°])
 */
public record ResponseComparison(int points, double logErrorRms, double magnitudeRmsDb, double phaseRmsDeg) {

    /** Compares at every measured point with {@code minOmega ≤ ω ≤ maxOmega} (rad/s); dead time exact. */
    public static ResponseComparison of(MeasuredFrequencyResponse measured, TransferFunction predicted,
            double minOmega, double maxOmega) {
        double sumMag = 0;
        double sumPhase = 0;
        int n = 0;
        double[] g = new double[2];
        for (int i = 0; i < measured.size(); i++) {
            double w = measured.omega(i);
            if (w < minOmega || w > maxOmega) {
                continue;
            }
            predicted.evaluateAtFrequency(w, g);
            double logMag = Math.log(Math.hypot(g[0], g[1]) / measured.magnitude(i));
            double phase = Math.IEEEremainder(Math.atan2(g[1], g[0]) - measured.phase(i), 2 * Math.PI);
            sumMag += logMag * logMag;
            sumPhase += phase * phase;
            n++;
        }
        if (n == 0) {
            throw new IllegalArgumentException(measured.source().fileName() + ": no measured point inside " + minOmega
                    + " .. " + maxOmega + " rad/s to compare");
        }
        return new ResponseComparison(n, Math.sqrt((sumMag + sumPhase) / n), 20 / Math.log(10) * Math.sqrt(sumMag / n),
                Math.toDegrees(Math.sqrt(sumPhase / n)));
    }

    /** Over the whole measured band. */
    public static ResponseComparison of(MeasuredFrequencyResponse measured, TransferFunction predicted) {
        return of(measured, predicted, 0, Double.POSITIVE_INFINITY);
    }
}
