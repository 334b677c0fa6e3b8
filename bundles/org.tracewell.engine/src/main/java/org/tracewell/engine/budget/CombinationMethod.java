package org.tracewell.engine.budget;

import java.util.List;

/**
 * How the contributions c_i of a budget's lines are combined into one total. Each c_i is already at the
 * budget's coverage (see the package comment): systematic c_i = |s·v|, random c_i = k·u_i.
 *
 * <p>All four methods are positively homogeneous of degree one (scaling every term by λ scales the total by
 * λ), which is what lets {@link Apportionment} solve every method in closed form.
 *
 * <p>Each method can also split its total into per-term <em>portions</em> that add up to the total exactly;
 * these give contributor shares that are meaningful for that method (a share of the sum, of the variance,
 * or a mix of both).
 */
public enum CombinationMethod {
    /** Worst case: every contribution adds arithmetically. */
    LINEAR_SUM("linear sum", "worst case, T = Σ c_i over all lines") {
        @Override
        public double combine(List<CombinationTerm> terms) {
            return sum(terms, null);
        }

        @Override
        public double[] portions(List<CombinationTerm> terms) {
            double[] portions = new double[terms.size()];
            for (int i = 0; i < portions.length; i++) {
                portions[i] = terms.get(i).magnitude();
            }
            return portions;
        }
    },
    /** All contributions, systematic ones included, treated as independent and added in quadrature. */
    RSS("root sum of squares", "T = √(Σ c_i²) over all lines, systematic ones included") {
        @Override
        public double combine(List<CombinationTerm> terms) {
            return rootSumSquare(terms, null);
        }

        @Override
        public double[] portions(List<CombinationTerm> terms) {
            return varianceShares(terms, null, rootSumSquare(terms, null));
        }
    },
    /** Conservative total: systematic contributions add, random ones add in quadrature. */
    SYSTEMATIC_PLUS_RSS("systematic sum plus random RSS",
            "T = Σ |systematic c_i| + √(Σ random c_i²), the second term being U = k·u_c") {
        @Override
        public double combine(List<CombinationTerm> terms) {
            return sum(terms, ErrorClass.SYSTEMATIC) + rootSumSquare(terms, ErrorClass.RANDOM);
        }

        @Override
        public double[] portions(List<CombinationTerm> terms) {
            double[] portions = varianceShares(terms, ErrorClass.RANDOM, rootSumSquare(terms, ErrorClass.RANDOM));
            for (int i = 0; i < portions.length; i++) {
                if (terms.get(i).errorClass() == ErrorClass.SYSTEMATIC) {
                    portions[i] = terms.get(i).magnitude();
                }
            }
            return portions;
        }
    },
    /** The "probable" figure: midway between the worst case and the quadrature sum. */
    MEAN_OF_LINEAR_AND_RSS("mean of linear sum and RSS", "T = (Σ c_i + √(Σ c_i²)) / 2 over all lines") {
        @Override
        public double combine(List<CombinationTerm> terms) {
            return 0.5 * (LINEAR_SUM.combine(terms) + RSS.combine(terms));
        }

        @Override
        public double[] portions(List<CombinationTerm> terms) {
            double[] linear = LINEAR_SUM.portions(terms);
            double[] quadrature = RSS.portions(terms);
            double[] portions = new double[linear.length];
            for (int i = 0; i < portions.length; i++) {
                portions[i] = 0.5 * (linear[i] + quadrature[i]);
            }
            return portions;
        }
    };

    /** The coverage convention every method relies on, printed with a budget result. */
    public static final String COVERAGE_CONVENTION = "systematic lines contribute |s·v| (a bound, not rescaled); "
            + "random lines contribute k·u with u = |s|·u(v) from the GUM conversion and k the budget's coverage "
            + "factor (2 unless stated), so √(Σ random c_i²) = U = k·u_c";

    private final String displayName;
    private final String description;

    CombinationMethod(String displayName, String description) {
        this.displayName = displayName;
        this.description = description;
    }

    /** Combined total of the terms, metres; 0 for no terms. */
    public abstract double combine(List<CombinationTerm> terms);

    /**
     * Part of the total attributed to each term, in term order, metres; the portions add up to
     * {@link #combine(List)} (up to rounding). Linear terms get their magnitude; terms inside a root sum of
     * squares get {@code c_i² / √(Σ c_j²)}, their share of the variance times that root.
     */
    public abstract double[] portions(List<CombinationTerm> terms);

    /** Name for tables and reports. */
    public String displayName() {
        return displayName;
    }

    /** One line with the formula. */
    public String description() {
        return description;
    }

    /** Name, formula and coverage convention, as printed with a result. */
    public String printable() {
        return displayName + ": " + description + " (" + COVERAGE_CONVENTION + ")";
    }

    /** Sum of magnitudes of the terms of one class, or of all terms when {@code only} is null. */
    static double sum(List<CombinationTerm> terms, ErrorClass only) {
        double total = 0.0;
        for (CombinationTerm term : terms) {
            if (only == null || term.errorClass() == only) {
                total += term.magnitude();
            }
        }
        return total;
    }

    /** Root sum of squares, scaled by the largest magnitude so that it neither overflows nor underflows. */
    static double rootSumSquare(List<CombinationTerm> terms, ErrorClass only) {
        double largest = 0.0;
        for (CombinationTerm term : terms) {
            if (only == null || term.errorClass() == only) {
                largest = Math.max(largest, term.magnitude());
            }
        }
        if (largest == 0.0) {
            return 0.0;
        }
        double scaledSquares = 0.0;
        for (CombinationTerm term : terms) {
            if (only == null || term.errorClass() == only) {
                double scaled = term.magnitude() / largest;
                scaledSquares += scaled * scaled;
            }
        }
        return largest * Math.sqrt(scaledSquares);
    }

    /** c_i² / root for the selected terms, 0 for the others (and for all when root is 0). */
    private static double[] varianceShares(List<CombinationTerm> terms, ErrorClass only, double root) {
        double[] portions = new double[terms.size()];
        if (root == 0.0) {
            return portions;
        }
        for (int i = 0; i < portions.length; i++) {
            CombinationTerm term = terms.get(i);
            if (only == null || term.errorClass() == only) {
                double ratio = term.magnitude() / root;
                portions[i] = ratio * term.magnitude();
            }
        }
        return portions;
    }
}
