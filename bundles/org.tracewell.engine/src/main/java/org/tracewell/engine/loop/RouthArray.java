package org.tracewell.engine.loop;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracewell.engine.poly.Polynomial;

/**
 * Routh array of a characteristic polynomial with the two textbook special cases (Routh–
 * Hurwitz criterion; Nise, Control Systems Engineering, ch. 6):
 * <ul>
 * <li>a zero first element in an otherwise non-zero row is replaced by a small positive ε
 * (ε method); ε = 1e-9 times the largest entry of the row above;</li>
 * <li>a row of zeros is replaced by the coefficients of the derivative of the auxiliary
 * polynomial formed from the row above. The auxiliary polynomial's roots are symmetric about
 * the origin; those not counted as right-half-plane roots lie on the jω axis.</li>
 * </ul>
 * Exact roots at s = 0 are split off before the array is built and counted as jω-axis roots.
 * An entry is treated as zero when it is below 1e-12 of the magnitude of the products it was
 * computed from (cancellation noise).
 *
 * @param polynomial the characteristic polynomial as given
 * @param rows array rows, first row for the highest power; entries after the special-case
 *        substitutions
 * @param signChanges sign changes down the first column
 * @param epsilonRows indices of rows whose first element was replaced by ε
 * @param zeroRows indices of rows that were all zero and replaced by the auxiliary derivative
 * @param auxiliaryPolynomial the first auxiliary polynomial, if a row of zeros occurred
 * @param rightHalfPlaneRoots roots with Re &gt; 0 (the sign changes)
 * @param imaginaryAxisRoots roots on the jω axis, s = 0 included
 */
public record RouthArray(Polynomial polynomial, List<double[]> rows, int signChanges, List<Integer> epsilonRows,
        List<Integer> zeroRows, Optional<Polynomial> auxiliaryPolynomial, int rightHalfPlaneRoots,
        int imaginaryAxisRoots) {

    private static final double ZERO_TOLERANCE = 1e-12;

    public RouthArray {
        List<double[]> copy = new ArrayList<>(rows.size());
        for (double[] r : rows) {
            copy.add(r.clone());
        }
        rows = List.copyOf(copy);
        epsilonRows = List.copyOf(epsilonRows);
        zeroRows = List.copyOf(zeroRows);
    }

    /** Row {@code i} (a copy). */
    public double[] row(int i) {
        return rows.get(i).clone();
    }

    @Override
    public List<double[]> rows() {
        List<double[]> copy = new ArrayList<>(rows.size());
        for (double[] r : rows) {
            copy.add(r.clone());
        }
        return copy;
    }

    /** First column. */
    public double[] firstColumn() {
        double[] c = new double[rows.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = rows.get(i)[0];
        }
        return c;
    }

    /**
     * All roots strictly in the left half plane: no sign change, no jω-axis root and no ε
     * substitution (a zero first element in a non-zero row always means a root on or right of
     * the jω axis).
     */
    public boolean stable() {
        return rightHalfPlaneRoots == 0 && imaginaryAxisRoots == 0 && epsilonRows.isEmpty();
    }

    /** Builds the array for {@code p} (degree ≥ 0, not the zero polynomial). */
    public static RouthArray of(Polynomial p) {
        if (p.isZero()) {
            throw new IllegalArgumentException("Routh array of the zero polynomial is undefined");
        }
        int rootsAtOrigin = p.zeroRootMultiplicity();
        Polynomial q = p.divideByPowerOfS(rootsAtOrigin);
        int n = q.degree();
        int width = n / 2 + 1;
        double[][] r = new double[n + 1][width];
        for (int j = 0; j < width; j++) {
            r[0][j] = q.coefficient(n - 2 * j);
            if (n >= 1 && n - 1 - 2 * j >= 0) {
                r[1][j] = q.coefficient(n - 1 - 2 * j);
            }
        }
        List<Integer> epsilonRows = new ArrayList<>();
        List<Integer> zeroRows = new ArrayList<>();
        Polynomial auxiliary = null;
        int auxiliaryRow = -1;
        for (int i = 1; i <= n; i++) {
            if (i >= 2) {
                for (int j = 0; j < width; j++) {
                    double a = r[i - 1][0] * next(r[i - 2], j);
                    double b = r[i - 2][0] * next(r[i - 1], j);
                    double v = (a - b) / r[i - 1][0];
                    double scale = (Math.abs(a) + Math.abs(b)) / Math.abs(r[i - 1][0]);
                    r[i][j] = Math.abs(v) <= ZERO_TOLERANCE * scale ? 0.0 : v;
                }
            }
            if (allZero(r[i])) {
                // Row of zeros: auxiliary polynomial from the row above, powers n-(i-1), n-(i-1)-2, ...
                int power = n - (i - 1);
                double[] asc = new double[power + 1];
                for (int j = 0; j < width && power - 2 * j >= 0; j++) {
                    asc[power - 2 * j] = r[i - 1][j];
                }
                Polynomial aux = Polynomial.ofAscending(asc);
                if (auxiliary == null) {
                    auxiliary = aux;
                    auxiliaryRow = i - 1;
                }
                zeroRows.add(i);
                Polynomial d = aux.derivative();
                for (int j = 0; j < width; j++) {
                    int pw = power - 1 - 2 * j;
                    r[i][j] = pw >= 0 ? d.coefficient(pw) : 0.0;
                }
            }
            if (r[i][0] == 0.0) {
                double rowScale = 0;
                for (double v : r[i - 1]) {
                    rowScale = Math.max(rowScale, Math.abs(v));
                }
                // ε → 0+ as in the textbook method.
                r[i][0] = 1e-9 * (rowScale > 0 ? rowScale : 1.0);
                epsilonRows.add(i);
            }
        }
        int changes = signChanges(r, 0);
        int jw = rootsAtOrigin;
        if (auxiliary != null) {
            int rhpOfAuxiliary = signChanges(r, auxiliaryRow);
            jw += auxiliary.degree() - 2 * rhpOfAuxiliary;
        }
        List<double[]> rows = new ArrayList<>();
        for (double[] row : r) {
            rows.add(row);
        }
        return new RouthArray(p, rows, changes, epsilonRows, zeroRows, Optional.ofNullable(auxiliary), changes, jw);
    }

    private static double next(double[] row, int j) {
        return j + 1 < row.length ? row[j + 1] : 0.0;
    }

    private static boolean allZero(double[] row) {
        for (double v : row) {
            if (v != 0.0) {
                return false;
            }
        }
        return true;
    }

    private static int signChanges(double[][] r, int from) {
        int changes = 0;
        for (int i = from + 1; i < r.length; i++) {
            if ((r[i][0] > 0) != (r[i - 1][0] > 0)) {
                changes++;
            }
        }
        return changes;
    }
}
