package org.tracewell.engine.axis;

import java.util.List;

import org.apache.commons.math3.complex.Complex;

/** Generic, plausible axes (DOMAIN.md §8 ranges) and a small complex linear solver for independent checks. */
final class AxisFixtures {

    static final double LEAD = 0.010;
    static final double LOAD_MASS = 250;
    static final double SCREW_INERTIA = 9.7e-4;
    static final double MOTOR_INERTIA = 1.2e-3;
    static final double AXIAL_STIFFNESS = 1.5e8;

    private AxisFixtures() {
    }

    /** Two-mass screw drive with the axial chain tuned to {@link #AXIAL_STIFFNESS} at the nut position. */
    static TwoMassScrewDrive twoMass(double currentBandwidth, double dampingRatio, double loadViscous) {
        // Fixed–free screw, rigid nut and bearing, a chosen so that E·A/a = AXIAL_STIFFNESS.
        ScrewShaft screw = ScrewShaft.steel(1.5, 0.032, 0.027);
        double a = screw.youngsModulus() * screw.rootArea() / AXIAL_STIFFNESS;
        StiffnessChain chain = new StiffnessChain(screw, ScrewMounting.FIXED_FREE, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY);
        double c = TwoMassScrewDrive.dampingForRatio(dampingRatio, AXIAL_STIFFNESS, LOAD_MASS);
        return new TwoMassScrewDrive(new DriveMotor(MOTOR_INERTIA, 1.1, currentBandwidth), SCREW_INERTIA, LOAD_MASS,
                LEAD, 1.0, chain, a, c, loadViscous, 0);
    }

    /** Cascade tuned for about 60 Hz velocity crossover on a 2.8e-3 kg·m² axis, with notch and low-pass. */
    static CascadeController tunedCascade(double resonanceRadPerSec) {
        List<FilterStage> filters = List.of(new FilterStage.Notch(resonanceRadPerSec, 2 * Math.PI * 40, 0.1),
                new FilterStage.LowPass2(2 * Math.PI * 800, 0.7));
        return new CascadeController(40, 1.0, 0.012, filters, 0.8, 0.6, 1e-3, 125e-6);
    }

    /** Solves a·x = b in complex arithmetic (Gaussian elimination with partial pivoting). */
    static Complex[] solve(Complex[][] a, Complex[] b) {
        int n = b.length;
        Complex[][] m = new Complex[n][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a[i], 0, m[i], 0, n);
            m[i][n] = b[i];
        }
        for (int col = 0; col < n; col++) {
            int piv = col;
            for (int r = col + 1; r < n; r++) {
                if (m[r][col].abs() > m[piv][col].abs()) {
                    piv = r;
                }
            }
            Complex[] t = m[col];
            m[col] = m[piv];
            m[piv] = t;
            for (int r = col + 1; r < n; r++) {
                Complex f = m[r][col].divide(m[col][col]);
                for (int k = col; k <= n; k++) {
                    m[r][k] = m[r][k].subtract(f.multiply(m[col][k]));
                }
            }
        }
        Complex[] x = new Complex[n];
        for (int i = n - 1; i >= 0; i--) {
            Complex s = m[i][n];
            for (int k = i + 1; k < n; k++) {
                s = s.subtract(m[i][k].multiply(x[k]));
            }
            x[i] = s.divide(m[i][i]);
        }
        return x;
    }

    /** Relative distance |a − b|/|b|. */
    static double relativeError(Complex a, Complex b) {
        return a.subtract(b).abs() / b.abs();
    }
}
