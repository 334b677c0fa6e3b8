package org.tracewell.engine.linalg;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Matrix exponential by scaling and squaring with diagonal Padé approximants of degree
 * 3, 5, 7, 9 or 13, chosen from the 1-norm as in N. J. Higham, "The scaling and squaring
 * method for the matrix exponential revisited", SIAM J. Matrix Anal. Appl. 26(4), 2005
 * (Algorithm 2.3, double-precision θ_m values of its Table 2.3). Commons Math has no
 * matrix exponential.
 */
public final class MatrixExponential {

    private static final double[] THETA = {
        1.495585217958292e-2, // m = 3
        2.539398330063230e-1, // m = 5
        9.504178996162932e-1, // m = 7
        2.097847961257068e0,  // m = 9
        5.371920351148152e0,  // m = 13
    };

    private static final double[][] PADE = {
        {120, 60, 12, 1},
        {30240, 15120, 3360, 420, 30, 1},
        {17297280, 8648640, 1995840, 277200, 25200, 1512, 56, 1},
        {17643225600.0, 8821612800.0, 2075673600, 302702400, 30270240, 2162160, 110880, 3960, 90, 1},
        {64764752532480000.0, 32382376266240000.0, 7771770303897600.0, 1187353796428800.0,
            129060195264000.0, 10559470521600.0, 670442572800.0, 33522128640.0, 1323241920,
            40840800, 960960, 16380, 182, 1},
    };

    private MatrixExponential() {
    }

    /**
     * e^A for a square matrix A.
     *
     * @throws IllegalArgumentException if A is not square or holds NaN/infinite entries
     */
    public static RealMatrix exp(RealMatrix a) {
        if (!a.isSquare()) {
            throw new IllegalArgumentException("matrix exponential needs a square matrix, got "
                    + a.getRowDimension() + "x" + a.getColumnDimension());
        }
        int n = a.getRowDimension();
        double[][] m = a.getData();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (!Double.isFinite(m[i][j])) {
                    throw new IllegalArgumentException("matrix entry (" + i + "," + j + ") is " + m[i][j]
                            + "; the matrix exponential needs finite entries");
                }
            }
        }
        RealMatrix am = new Array2DRowRealMatrix(m, false);
        double norm = oneNorm(m);
        for (int k = 0; k < 4; k++) {
            if (norm <= THETA[k]) {
                return padeLowDegree(am, PADE[k]);
            }
        }
        int s = Math.max(0, (int) Math.ceil(Math.log(norm / THETA[4]) / Math.log(2.0)));
        RealMatrix scaled = s == 0 ? am : am.scalarMultiply(Math.scalb(1.0, -s));
        RealMatrix r = pade13(scaled);
        for (int i = 0; i < s; i++) {
            r = r.multiply(r);
        }
        return r;
    }

    private static RealMatrix padeLowDegree(RealMatrix a, double[] b) {
        int n = a.getRowDimension();
        RealMatrix identity = MatrixUtils.createRealIdentityMatrix(n);
        RealMatrix a2 = a.multiply(a);
        RealMatrix power = identity; // A^(2k)
        RealMatrix uInner = identity.scalarMultiply(b[1]);
        RealMatrix v = identity.scalarMultiply(b[0]);
        for (int k = 2; k < b.length; k += 2) {
            power = power.multiply(a2);
            v = v.add(power.scalarMultiply(b[k]));
            if (k + 1 < b.length) {
                uInner = uInner.add(power.scalarMultiply(b[k + 1]));
            }
        }
        RealMatrix u = a.multiply(uInner);
        return solve(v.subtract(u), v.add(u));
    }

    private static RealMatrix pade13(RealMatrix a) {
        double[] b = PADE[4];
        int n = a.getRowDimension();
        RealMatrix identity = MatrixUtils.createRealIdentityMatrix(n);
        RealMatrix a2 = a.multiply(a);
        RealMatrix a4 = a2.multiply(a2);
        RealMatrix a6 = a4.multiply(a2);
        RealMatrix uInner = a6.multiply(a6.scalarMultiply(b[13]).add(a4.scalarMultiply(b[11]))
                        .add(a2.scalarMultiply(b[9])))
                .add(a6.scalarMultiply(b[7])).add(a4.scalarMultiply(b[5])).add(a2.scalarMultiply(b[3]))
                .add(identity.scalarMultiply(b[1]));
        RealMatrix u = a.multiply(uInner);
        RealMatrix v = a6.multiply(a6.scalarMultiply(b[12]).add(a4.scalarMultiply(b[10]))
                        .add(a2.scalarMultiply(b[8])))
                .add(a6.scalarMultiply(b[6])).add(a4.scalarMultiply(b[4])).add(a2.scalarMultiply(b[2]))
                .add(identity.scalarMultiply(b[0]));
        return solve(v.subtract(u), v.add(u));
    }

    /** (V − U)⁻¹ (V + U) by LU with partial pivoting. */
    private static RealMatrix solve(RealMatrix q, RealMatrix p) {
        return new LUDecomposition(q).getSolver().solve(p);
    }

    private static double oneNorm(double[][] m) {
        double best = 0;
        int n = m.length;
        for (int j = 0; j < n; j++) {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += Math.abs(m[i][j]);
            }
            best = Math.max(best, s);
        }
        return best;
    }
}
