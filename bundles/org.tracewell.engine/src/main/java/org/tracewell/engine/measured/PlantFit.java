package org.tracewell.engine.measured;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.tracewell.engine.axis.Resonance;

/**
 * Fits a rigid or a two-mass plant to a measured torque-command → motor-velocity response with Commons Math's
 * {@link LevenbergMarquardtOptimizer}.
 * <p>
 * Residuals are the complex log error ln(G_fit/G_measured) = ln|ratio| + j·∠ratio, real and imaginary part per
 * point: a relative error, so a −60 dB point weighs as much as a 0 dB one, and magnitude (in nepers) and phase (in
 * radians) share one scale. Each point is weighted by √(coherence) and by √ of its share of the logarithmic
 * frequency axis, so a densely sampled decade does not outvote a sparse one. Parameters are searched as
 * logarithms (inertia, frequencies, damping ratio) or scaled to the band (viscous damping, dead time, kept ≥ 0),
 * which keeps every step physical. Start values come from the data: the inertia from the −20 dB/decade
 * asymptote, the resonance from the peak of ω·|G|, the anti-resonance from its dip below the peak, the damping
 * ratio from a short scan, the dead time from the phase slope. The Jacobian is by central differences.
 */
public final class PlantFit {

    private static final double ZETA_MIN = 1e-4;
    private static final double ZETA_MAX = 2;
    private static final double[] ZETA_SCAN = {0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5};

    private PlantFit() {
    }

    /** Physical values of one trial, from the parameter vector. */
    private record Trial(double inertia, double viscous, double antiResonance, double dampingRatio, double resonance,
            double deadTime) {

        double motorInertia() {
            double ratio = antiResonance / resonance;
            return inertia * ratio * ratio;
        }

        double loadInertia() {
            return inertia - motorInertia();
        }

        double stiffness() {
            return loadInertia() * antiResonance * antiResonance;
        }

        double damping() {
            return 2 * dampingRatio * loadInertia() * antiResonance;
        }
    }

    /** The data, the band and how parameters map to physics. */
    private static final class Problem {
        final PlantFitModel model;
        final PlantFitOptions options;
        final double[] omega;
        final double[] measuredRe;
        final double[] measuredIm;
        final double[] weight;
        final double omegaLow;
        final double omegaHigh;

        Problem(PlantFitModel model, PlantFitOptions options, double[] omega, double[] re, double[] im, double[] w) {
            this.model = model;
            this.options = options;
            this.omega = omega;
            this.measuredRe = re;
            this.measuredIm = im;
            this.weight = w;
            this.omegaLow = omega[0];
            this.omegaHigh = omega[omega.length - 1];
        }

        boolean twoMass() {
            return model == PlantFitModel.TWO_MASS;
        }

        int parameterCount() {
            return PlantFit.parameterCount(model, options.fitDeadTime());
        }

        /** p = [ln J, b/(J·ω_low), (ln ω_a, ln(ω_r/ω_a − 1), ln ζ), (T_d·ω_high)]. */
        Trial decode(double[] p) {
            double j = Math.exp(p[0]);
            double b = Math.max(0, p[1]) * j * omegaLow;
            double wa = Double.NaN;
            double zeta = Double.NaN;
            double wr = Double.NaN;
            int next = 2;
            if (twoMass()) {
                wa = Math.exp(p[2]);
                wr = wa * (1 + Math.exp(p[3]));
                zeta = Math.exp(p[4]);
                next = 5;
            }
            double td = options.fitDeadTime() ? Math.max(0, p[next]) / omegaHigh : 0;
            return new Trial(j, b, wa, zeta, wr, td);
        }

        double[] encode(Trial t) {
            double[] p = new double[parameterCount()];
            p[0] = Math.log(t.inertia());
            p[1] = t.viscous() / (t.inertia() * omegaLow);
            int next = 2;
            if (twoMass()) {
                p[2] = Math.log(t.antiResonance());
                p[3] = Math.log(t.resonance() / t.antiResonance() - 1);
                p[4] = Math.log(t.dampingRatio());
                next = 5;
            }
            if (options.fitDeadTime()) {
                p[next] = t.deadTime() * omegaHigh;
            }
            return p;
        }

        /** Keeps a trial inside the physical range (LM may step outside). */
        RealVector validate(RealVector point) {
            double[] p = point.toArray();
            p[1] = Math.max(0, p[1]);
            if (twoMass()) {
                p[2] = clamp(p[2], Math.log(omegaLow / 10), Math.log(omegaHigh * 10));
                p[3] = clamp(p[3], Math.log(1e-3), Math.log(100));
                p[4] = clamp(p[4], Math.log(ZETA_MIN), Math.log(ZETA_MAX));
            }
            if (options.fitDeadTime()) {
                p[p.length - 1] = clamp(p[p.length - 1], 0, 2 * Math.PI);
            }
            return new ArrayRealVector(p, false);
        }

        /** Residuals [w·ln|ratio|, w·∠ratio] per point, ratio = G_fit/G_measured. */
        double[] residuals(Trial t) {
            double[] r = new double[2 * omega.length];
            double[] g = new double[2];
            for (int i = 0; i < omega.length; i++) {
                response(t, omega[i], g);
                // ratio = g / measured
                double mr = measuredRe[i];
                double mi = measuredIm[i];
                double den = mr * mr + mi * mi;
                double zr = (g[0] * mr + g[1] * mi) / den;
                double zi = (g[1] * mr - g[0] * mi) / den;
                r[2 * i] = weight[i] * 0.5 * Math.log(zr * zr + zi * zi);
                r[2 * i + 1] = weight[i] * Math.IEEEremainder(Math.atan2(zi, zr) - omega[i] * t.deadTime(), 2 * Math.PI);
            }
            return r;
        }

        /** Current-loop lag times mechanics at jω (no dead time), written into {@code out}. */
        void response(Trial t, double w, double[] out) {
            double nr;
            double ni;
            double dr;
            double di;
            if (twoMass()) {
                double jm = t.motorInertia();
                double jl = t.loadInertia();
                double k = t.stiffness();
                double c = t.damping();
                double b = t.viscous();
                // A_L(jω) = k − J_L ω² + j(b + c)ω
                nr = k - jl * w * w;
                ni = (b + c) * w;
                // Q(jω) = k·b − (J_M(b + c) + J_L c)ω² + j[(k·J + c·b)ω − J_M J_L ω³]
                dr = k * b - (jm * (b + c) + jl * c) * w * w;
                di = (k * (jm + jl) + c * b) * w - jm * jl * w * w * w;
            } else {
                nr = 1;
                ni = 0;
                dr = t.viscous();
                di = t.inertia() * w;
            }
            double wi = options.currentLoopBandwidth();
            if (Double.isFinite(wi)) {
                // multiply the denominator by (1 + jω/ω_i)
                double lr = 1;
                double li = w / wi;
                double r = dr * lr - di * li;
                di = dr * li + di * lr;
                dr = r;
            }
            double den = dr * dr + di * di;
            out[0] = (nr * dr + ni * di) / den;
            out[1] = (ni * dr - nr * di) / den;
        }

        double cost(Trial t) {
            double sum = 0;
            for (double r : residuals(t)) {
                sum += r * r;
            }
            return sum;
        }
    }

    /**
     * Fits {@code model} to the points of {@code measured} inside the options' band.
     *
     * @throws IllegalArgumentException when the band holds too few points, a two-mass fit finds no resonance peak
     *                                  inside it, or the optimiser does not converge; the message says which
     */
    public static PlantFitResult fit(MeasuredFrequencyResponse measured, PlantFitModel model, PlantFitOptions options) {
        List<Integer> used = new ArrayList<>();
        for (int i = 0; i < measured.size(); i++) {
            if (measured.omega(i) >= options.minOmega() && measured.omega(i) <= options.maxOmega()) {
                used.add(i);
            }
        }
        int n = used.size();
        double[] omega = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            omega[k] = measured.omega(used.get(k));
            re[k] = measured.real(used.get(k));
            im[k] = measured.imaginary(used.get(k));
        }
        int minimumPoints = 2 * parameterCount(model, options.fitDeadTime());
        if (n < minimumPoints) {
            throw new IllegalArgumentException(measured.source().fileName() + ": " + n + " points inside the fit band "
                    + options.minOmega() + " .. " + options.maxOmega() + " rad/s; the " + model.displayName()
                    + " fit needs at least " + minimumPoints);
        }
        Problem problem = new Problem(model, options, omega, re, im, weights(measured, used));
        Trial start = startValues(problem, measured.source().fileName());
        LeastSquaresProblem lsq = new LeastSquaresBuilder()
                .start(problem.encode(start))
                .model(jacobian(problem))
                .target(new double[2 * n])
                .parameterValidator(problem::validate)
                .maxIterations(options.maxIterations())
                .maxEvaluations(100 * options.maxIterations())
                .lazyEvaluation(false)
                .build();
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(lsq);
        } catch (TooManyIterationsException | TooManyEvaluationsException | ConvergenceException e) {
            throw new IllegalArgumentException(measured.source().fileName() + ": the " + model.displayName()
                    + " fit did not converge (" + e.getMessage() + "); narrow the band or try the other model", e);
        }
        Trial best = problem.decode(optimum.getPoint().toArray());
        return result(problem, measured, best, optimum.getIterations(), optimum.getEvaluations());
    }

    private static PlantFitResult result(Problem problem, MeasuredFrequencyResponse measured, Trial t, int iterations,
            int evaluations) {
        Optional<TwoMassParameters> twoMass = Optional.empty();
        if (problem.twoMass()) {
            twoMass = Optional.of(new TwoMassParameters(t.motorInertia(), t.loadInertia(), t.stiffness(), t.damping(),
                    t.dampingRatio(), Resonance.ofTwoMass(t.stiffness(), t.motorInertia(), t.loadInertia())));
        }
        double wi = problem.options.currentLoopBandwidth();
        // The fit's figures of merit: the plain comparison of the fitted response with the points it saw.
        ResponseComparison quality = ResponseComparison.of(measured, PlantFitResult.withDrive(
                PlantFitResult.mechanics(t.inertia(), t.viscous(), twoMass), wi, t.deadTime()),
                problem.options.minOmega(), problem.options.maxOmega());
        return new PlantFitResult(problem.model, measured.source(), t.inertia(), t.viscous(), twoMass, t.deadTime(), wi,
                quality, iterations, evaluations);
    }

    /** √coherence · √(share of the log-frequency axis), normalised to a mean square of 1. */
    private static double[] weights(MeasuredFrequencyResponse measured, List<Integer> used) {
        int n = used.size();
        double[] w = new double[n];
        if (n == 0) {
            return w;
        }
        double sum = 0;
        for (int k = 0; k < n; k++) {
            double lo = Math.log(measured.omega(used.get(Math.max(0, k - 1))));
            double hi = Math.log(measured.omega(used.get(Math.min(n - 1, k + 1))));
            double share = n == 1 ? 1 : (hi - lo) / 2;
            w[k] = share * measured.coherence(used.get(k));
            sum += w[k];
        }
        for (int k = 0; k < n; k++) {
            w[k] = sum > 0 ? Math.sqrt(w[k] * n / sum) : 1;
        }
        return w;
    }

    private static Trial startValues(Problem p, String fileName) {
        int n = p.omega.length;
        // The measurement with the current-loop lag taken out: H = G·(1 + jω/ω_i), and ω·|H|, which is 1/J on the
        // inertia asymptote.
        double[] hr = new double[n];
        double[] hi = new double[n];
        double[] omegaGain = new double[n];
        double wi = p.options.currentLoopBandwidth();
        for (int i = 0; i < n; i++) {
            double li = Double.isFinite(wi) ? p.omega[i] / wi : 0;
            hr[i] = p.measuredRe[i] - p.measuredIm[i] * li;
            hi[i] = p.measuredIm[i] + p.measuredRe[i] * li;
            omegaGain[i] = p.omega[i] * Math.hypot(hr[i], hi[i]);
        }
        Trial start;
        if (!p.twoMass()) {
            // 1/H = b + jωJ: J from the imaginary part over the whole band, b from the lowest fifth (where a dead
            // time disturbs the real part least)
            double sxy = 0;
            double sxx = 0;
            for (int i = 0; i < n; i++) {
                double den = hr[i] * hr[i] + hi[i] * hi[i];
                double invIm = -hi[i] / den;
                sxy += p.omega[i] * invIm;
                sxx += p.omega[i] * p.omega[i];
            }
            double j = sxy > 0 ? sxy / sxx : 1 / median(omegaGain, 0, n);
            double b = 0;
            int low = Math.max(1, n / 5);
            for (int i = 0; i < low; i++) {
                double den = hr[i] * hr[i] + hi[i] * hi[i];
                b += hr[i] / den / low;
            }
            start = new Trial(j, Math.max(0, b), Double.NaN, Double.NaN, Double.NaN, 0);
        } else {
            int peak = 0;
            for (int i = 1; i < n; i++) {
                if (omegaGain[i] > omegaGain[peak]) {
                    peak = i;
                }
            }
            if (peak == 0 || peak == n - 1) {
                throw new IllegalArgumentException(fileName + ": no resonance peak inside the fit band (ω·|G| is"
                        + " largest at its " + (peak == 0 ? "lower" : "upper") + " end, "
                        + String.format(java.util.Locale.ROOT, "%.4g", p.omega[peak] / (2 * Math.PI))
                        + " Hz); widen the band or fit the rigid model");
            }
            double wr = p.omega[peak];
            int dip = -1;
            for (int i = 0; i < peak; i++) {
                if (p.omega[i] >= wr / 4 && (dip < 0 || omegaGain[i] < omegaGain[dip])) {
                    dip = i;
                }
            }
            double wa = dip >= 0 && p.omega[dip] < wr ? p.omega[dip] : wr / 1.2;
            int below = 0;
            while (below < n && p.omega[below] < wa / 2) {
                below++;
            }
            double j = 1 / median(omegaGain, 0, Math.max(below, Math.min(3, n)));
            start = new Trial(j, 0, wa, 0.05, wr, 0);
            double bestCost = Double.POSITIVE_INFINITY;
            for (double zeta : ZETA_SCAN) {
                Trial t = new Trial(j, 0, wa, zeta, wr, 0);
                double c = p.cost(t);
                if (c < bestCost) {
                    bestCost = c;
                    start = t;
                }
            }
        }
        if (p.options.fitDeadTime()) {
            // phase slope: the unexplained phase lag grows as ω·T_d
            double[] r = p.residuals(start);
            double sxy = 0;
            double sxx = 0;
            for (int i = 0; i < n; i++) {
                double w = p.weight[i];
                if (w > 0) {
                    sxy += p.omega[i] * r[2 * i + 1] / w * w * w;
                    sxx += p.omega[i] * p.omega[i] * w * w;
                }
            }
            double td = sxx > 0 ? Math.max(0, sxy / sxx) : 0;
            td = Math.min(td, 2 * Math.PI / p.omegaHigh);
            start = new Trial(start.inertia(), start.viscous(), start.antiResonance(), start.dampingRatio(),
                    start.resonance(), td);
        }
        return start;
    }

    private static MultivariateJacobianFunction jacobian(Problem problem) {
        return point -> {
            double[] p = point.toArray();
            double[] value = problem.residuals(problem.decode(p));
            double[][] jac = new double[value.length][p.length];
            for (int k = 0; k < p.length; k++) {
                double h = 1e-6 * Math.max(1, Math.abs(p[k]));
                double[] plus = p.clone();
                double[] minus = p.clone();
                plus[k] += h;
                minus[k] -= h;
                double[] rp = problem.residuals(problem.decode(plus));
                double[] rm = problem.residuals(problem.decode(minus));
                for (int i = 0; i < value.length; i++) {
                    jac[i][k] = (rp[i] - rm[i]) / (2 * h);
                }
            }
            return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jac, false));
        };
    }

    /** Inertia and viscous damping; two frequencies and a damping ratio for two masses; the dead time. */
    private static int parameterCount(PlantFitModel model, boolean deadTime) {
        return (model == PlantFitModel.TWO_MASS ? 5 : 2) + (deadTime ? 1 : 0);
    }

    private static double median(double[] values, int from, int to) {
        double[] part = Arrays.copyOfRange(values, from, to);
        Arrays.sort(part);
        int n = part.length;
        return n % 2 == 1 ? part[n / 2] : (part[n / 2 - 1] + part[n / 2]) / 2;
    }

    private static double clamp(double x, double lo, double hi) {
        return Math.max(lo, Math.min(hi, x));
    }

}
