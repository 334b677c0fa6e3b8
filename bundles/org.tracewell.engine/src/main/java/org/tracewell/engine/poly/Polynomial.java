package org.tracewell.engine.poly;

import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.complex.Complex;

/**
 * Immutable polynomial in s with real coefficients.
 * <p>
 * Coefficients are held in ascending powers internally ({@code c[0] + c[1]·s + …}); the
 * factories for user input take descending powers because that is how loop transfer
 * functions are written. Leading (highest-power) zeros are trimmed, so {@link #degree()} is
 * exact. The zero polynomial exists (it is needed for arithmetic) and has degree −1;
 * {@link org.tracewell.engine.tf.TransferFunction} rejects it as a numerator or denominator.
 */
public final class Polynomial {

    /** The zero polynomial (degree −1). */
    public static final Polynomial ZERO = new Polynomial(new double[0]);
    /** The constant 1. */
    public static final Polynomial ONE = new Polynomial(new double[] {1.0});
    /** The polynomial s. */
    public static final Polynomial S = new Polynomial(new double[] {0.0, 1.0});

    /** Ascending coefficients, trimmed so that the last entry is non-zero (empty for ZERO). */
    private final double[] ascending;

    private Polynomial(double[] trimmedAscending) {
        this.ascending = trimmedAscending;
    }

    /**
     * Polynomial from coefficients in descending powers of s ({@code c_n … c_0}).
     *
     * @throws IllegalArgumentException if no coefficient is given or one is NaN or infinite
     */
    public static Polynomial ofDescending(double... descending) {
        if (descending == null || descending.length == 0) {
            throw new IllegalArgumentException(
                    "polynomial needs at least one coefficient (descending powers of s), got none");
        }
        double[] asc = new double[descending.length];
        for (int i = 0; i < descending.length; i++) {
            asc[descending.length - 1 - i] = descending[i];
        }
        checkFinite(asc);
        return new Polynomial(trim(asc));
    }

    /**
     * Polynomial from coefficients in ascending powers of s ({@code c_0 … c_n}).
     *
     * @throws IllegalArgumentException if no coefficient is given or one is NaN or infinite
     */
    public static Polynomial ofAscending(double... ascending) {
        if (ascending == null || ascending.length == 0) {
            throw new IllegalArgumentException(
                    "polynomial needs at least one coefficient (ascending powers of s), got none");
        }
        double[] asc = ascending.clone();
        checkFinite(asc);
        return new Polynomial(trim(asc));
    }

    /** The constant polynomial {@code c}. */
    public static Polynomial constant(double c) {
        return ofAscending(c);
    }

    /**
     * Monic polynomial with the given roots times {@code gain}. Complex roots must come in
     * conjugate pairs (within a relative 1e-9) so that the coefficients are real.
     *
     * @throws IllegalArgumentException if a complex root has no conjugate partner
     */
    public static Polynomial fromRoots(double gain, List<Complex> roots) {
        // Expand in complex arithmetic, then check the imaginary residue stays negligible.
        double[] re = {1.0};
        double[] im = {0.0};
        for (Complex r : roots) {
            double[] nre = new double[re.length + 1];
            double[] nim = new double[im.length + 1];
            for (int k = 0; k < re.length; k++) {
                // (s - r) * c_k s^k = c_k s^{k+1} - r c_k s^k
                nre[k + 1] += re[k];
                nim[k + 1] += im[k];
                nre[k] -= r.getReal() * re[k] - r.getImaginary() * im[k];
                nim[k] -= r.getReal() * im[k] + r.getImaginary() * re[k];
            }
            re = nre;
            im = nim;
        }
        double scale = 0;
        double imMax = 0;
        for (int k = 0; k < re.length; k++) {
            scale = Math.max(scale, Math.hypot(re[k], im[k]));
            imMax = Math.max(imMax, Math.abs(im[k]));
        }
        if (imMax > 1e-9 * scale) {
            throw new IllegalArgumentException("roots " + roots
                    + " do not come in complex-conjugate pairs; a real polynomial needs each complex root"
                    + " together with its conjugate");
        }
        for (int k = 0; k < re.length; k++) {
            re[k] *= gain;
        }
        checkFinite(re);
        return new Polynomial(trim(re));
    }

    private static void checkFinite(double[] c) {
        for (int i = 0; i < c.length; i++) {
            if (!Double.isFinite(c[i])) {
                throw new IllegalArgumentException("polynomial coefficient of s^" + i + " is " + c[i]
                        + "; coefficients must be finite numbers");
            }
        }
    }

    private static double[] trim(double[] asc) {
        int n = asc.length;
        while (n > 0 && asc[n - 1] == 0.0) {
            n--;
        }
        return n == asc.length ? asc : Arrays.copyOf(asc, n);
    }

    /** Degree; −1 for the zero polynomial. */
    public int degree() {
        return ascending.length - 1;
    }

    /** True for the zero polynomial. */
    public boolean isZero() {
        return ascending.length == 0;
    }

    /** Coefficient of s^power (0 beyond the degree). */
    public double coefficient(int power) {
        if (power < 0) {
            throw new IllegalArgumentException("power must be >= 0, got " + power);
        }
        return power < ascending.length ? ascending[power] : 0.0;
    }

    /** Highest-power coefficient (0 for the zero polynomial). */
    public double leadingCoefficient() {
        return ascending.length == 0 ? 0.0 : ascending[ascending.length - 1];
    }

    /** Coefficients in ascending powers (a copy). */
    public double[] ascendingCoefficients() {
        return ascending.clone();
    }

    /** Coefficients in descending powers (a copy); {@code [0]} for the zero polynomial. */
    public double[] descendingCoefficients() {
        if (ascending.length == 0) {
            return new double[] {0.0};
        }
        double[] d = new double[ascending.length];
        for (int i = 0; i < ascending.length; i++) {
            d[i] = ascending[ascending.length - 1 - i];
        }
        return d;
    }

    /**
     * Multiplicity of the root at s = 0, counting only exactly zero low-order coefficients.
     * Coefficients come from user input or exact products, so exact zeros are the meaningful
     * test; a tolerance would turn a slow real pole into a false integrator.
     */
    public int zeroRootMultiplicity() {
        if (isZero()) {
            throw new IllegalStateException("the zero polynomial has no defined root multiplicity");
        }
        int k = 0;
        while (ascending[k] == 0.0) {
            k++;
        }
        return k;
    }

    /** p(s)/s^k; requires the k lowest coefficients to be zero. */
    public Polynomial divideByPowerOfS(int k) {
        if (k < 0 || k > ascending.length) {
            throw new IllegalArgumentException("cannot divide a degree-" + degree() + " polynomial by s^" + k);
        }
        for (int i = 0; i < k; i++) {
            if (ascending[i] != 0.0) {
                throw new IllegalArgumentException("coefficient of s^" + i + " is " + ascending[i]
                        + ", so the polynomial is not divisible by s^" + k);
            }
        }
        return new Polynomial(Arrays.copyOfRange(ascending, k, ascending.length));
    }

    /** p(s)·s^k. */
    public Polynomial multiplyByPowerOfS(int k) {
        if (k < 0) {
            throw new IllegalArgumentException("power must be >= 0, got " + k);
        }
        if (isZero() || k == 0) {
            return this;
        }
        double[] r = new double[ascending.length + k];
        System.arraycopy(ascending, 0, r, k, ascending.length);
        return new Polynomial(r);
    }

    public Polynomial add(Polynomial other) {
        int n = Math.max(ascending.length, other.ascending.length);
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = coefficient(i) + other.coefficient(i);
        }
        return new Polynomial(trim(r));
    }

    public Polynomial subtract(Polynomial other) {
        int n = Math.max(ascending.length, other.ascending.length);
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = coefficient(i) - other.coefficient(i);
        }
        return new Polynomial(trim(r));
    }

    public Polynomial multiply(Polynomial other) {
        if (isZero() || other.isZero()) {
            return ZERO;
        }
        double[] r = new double[ascending.length + other.ascending.length - 1];
        for (int i = 0; i < ascending.length; i++) {
            for (int j = 0; j < other.ascending.length; j++) {
                r[i + j] += ascending[i] * other.ascending[j];
            }
        }
        return new Polynomial(trim(r));
    }

    /**
     * Coefficient-wise bound on the rounding error magnitude of {@code multiply}: the product
     * of the absolute-valued polynomials. Used to decide whether a coefficient that came out of
     * a cancellation is zero.
     */
    public Polynomial absoluteProduct(Polynomial other) {
        return abs().multiply(other.abs());
    }

    /** Polynomial with the absolute values of the coefficients. */
    public Polynomial abs() {
        double[] r = new double[ascending.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = Math.abs(ascending[i]);
        }
        return new Polynomial(r);
    }

    public Polynomial scale(double factor) {
        if (!Double.isFinite(factor)) {
            throw new IllegalArgumentException("scale factor must be finite, got " + factor);
        }
        if (factor == 0.0) {
            return ZERO;
        }
        double[] r = new double[ascending.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = ascending[i] * factor;
        }
        return new Polynomial(r);
    }

    /** p(s/a): coefficient of s^k divided by a^k (frequency scaling by a). */
    public Polynomial substituteScaledVariable(double a) {
        if (!(a > 0) || !Double.isFinite(a)) {
            throw new IllegalArgumentException("frequency scale must be a positive finite number, got " + a);
        }
        double[] r = new double[ascending.length];
        double f = 1.0;
        for (int i = 0; i < r.length; i++) {
            r[i] = ascending[i] * f;
            f /= a;
        }
        return new Polynomial(trim(r));
    }

    /** dp/ds. */
    public Polynomial derivative() {
        if (ascending.length <= 1) {
            return ZERO;
        }
        double[] r = new double[ascending.length - 1];
        for (int i = 1; i < ascending.length; i++) {
            r[i - 1] = i * ascending[i];
        }
        return new Polynomial(r);
    }

    /** p(−s): odd coefficients negated. Used for |p(jω)|² = p(jω)·p(−jω). */
    public Polynomial reflect() {
        double[] r = ascending.clone();
        for (int i = 1; i < r.length; i += 2) {
            r[i] = -r[i];
        }
        return new Polynomial(r);
    }

    /** Horner evaluation at a real point. */
    public double evaluate(double x) {
        double acc = 0.0;
        for (int i = ascending.length - 1; i >= 0; i--) {
            acc = acc * x + ascending[i];
        }
        return acc;
    }

    /** Horner evaluation at a complex point. */
    public Complex evaluate(Complex z) {
        double[] out = new double[2];
        evaluate(z.getReal(), z.getImaginary(), out);
        return new Complex(out[0], out[1]);
    }

    /**
     * Horner evaluation at {@code x + j·y} without allocation; writes {@code [re, im]} into
     * {@code out}. This is the inner loop of every frequency response.
     */
    public void evaluate(double x, double y, double[] out) {
        double re = 0.0;
        double im = 0.0;
        for (int i = ascending.length - 1; i >= 0; i--) {
            double nre = re * x - im * y + ascending[i];
            im = re * y + im * x;
            re = nre;
        }
        out[0] = re;
        out[1] = im;
    }

    /** Roots (see {@link PolynomialRoots#of(Polynomial)}). */
    public List<Complex> roots() {
        return PolynomialRoots.of(this);
    }

    /** Euclidean norm of the coefficient vector (a scale for tolerances). */
    public double coefficientNorm() {
        double s = 0;
        for (double c : ascending) {
            s += c * c;
        }
        return Math.sqrt(s);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Polynomial p && Arrays.equals(ascending, p.ascending);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(ascending);
    }

    /** Human-readable form in descending powers, e.g. {@code 1 s^2 + 15 s + 100}. */
    @Override
    public String toString() {
        if (isZero()) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        for (int i = ascending.length - 1; i >= 0; i--) {
            double c = ascending[i];
            if (c == 0.0 && ascending.length > 1) {
                continue;
            }
            if (sb.length() > 0) {
                sb.append(c < 0 ? " - " : " + ");
                c = Math.abs(c);
            }
            sb.append(formatNumber(c));
            if (i >= 1) {
                sb.append(" s");
            }
            if (i >= 2) {
                sb.append('^').append(i);
            }
        }
        return sb.toString();
    }

    private static String formatNumber(double c) {
        if (c == Math.rint(c) && Math.abs(c) < 1e15) {
            return Long.toString((long) c);
        }
        return Double.toString(c);
    }
}
