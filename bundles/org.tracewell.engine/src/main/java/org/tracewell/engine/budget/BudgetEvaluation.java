package org.tracewell.engine.budget;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * The evaluated total of an {@link ErrorBudget}, its per-line contributions and, when a target was given, the
 * comparison with it.
 *
 * @param budgetName                  name of the evaluated budget
 * @param method                      the method that produced {@code total}
 * @param coverageFactor              k of the random lines
 * @param total                       the budget total by {@code method}, metres
 * @param linearSum                   Σ c_i over all lines, metres
 * @param rootSumSquare               √(Σ c_i²) over all lines, metres
 * @param systematicSum               Σ c_i over systematic lines, metres
 * @param randomExpandedUncertainty   √(Σ c_i²) over random lines = U = k·u_c, metres
 * @param combinedStandardUncertainty u_c = √(Σ u_i²) over random lines, metres
 * @param contributions               one entry per line, in line order
 * @param comparison                  comparison with the target, empty when none was given
 */
public record BudgetEvaluation(String budgetName, CombinationMethod method, double coverageFactor, double total,
                               double linearSum, double rootSumSquare, double systematicSum,
                               double randomExpandedUncertainty, double combinedStandardUncertainty,
                               List<LineContribution> contributions, Optional<TargetComparison> comparison) {

    public BudgetEvaluation {
        BudgetChecks.requireNonNull("combination method", method);
        BudgetChecks.requireNonNull("comparison (use Optional.empty() when there is no target)", comparison);
        contributions = List.copyOf(contributions);
    }

    static BudgetEvaluation of(ErrorBudget budget, BudgetTarget target) {
        List<BudgetLine> lines = budget.lines();
        List<CombinationTerm> terms = budget.terms();
        CombinationMethod method = budget.method();
        double total = method.combine(terms);
        double[] portions = method.portions(terms);

        Integer[] order = new Integer[lines.size()];
        Arrays.setAll(order, i -> i);
        Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> -portions[i])
                .thenComparingDouble(i -> -terms.get(i).magnitude())
                .thenComparing(i -> lines.get(i).id()));
        int[] rank = new int[lines.size()];
        for (int position = 0; position < order.length; position++) {
            rank[order[position]] = position + 1;
        }

        List<LineContribution> contributions = new ArrayList<>(lines.size());
        List<CombinationTerm> randomUncertainties = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            BudgetLine line = lines.get(i);
            double u = line.standardUncertainty();
            if (line.errorClass() == ErrorClass.RANDOM) {
                randomUncertainties.add(new CombinationTerm(u, ErrorClass.RANDOM));
            }
            contributions.add(new LineContribution(line, u, terms.get(i).magnitude(), portions[i],
                    total > 0.0 ? portions[i] / total : 0.0, rank[i]));
        }
        Optional<TargetComparison> comparison = target == null
                ? Optional.empty() : Optional.of(TargetComparison.of(target, total));
        return new BudgetEvaluation(budget.name(), method, budget.coverageFactor(), total,
                CombinationMethod.sum(terms, null), CombinationMethod.rootSumSquare(terms, null),
                CombinationMethod.sum(terms, ErrorClass.SYSTEMATIC),
                CombinationMethod.rootSumSquare(terms, ErrorClass.RANDOM),
                CombinationMethod.rootSumSquare(randomUncertainties, null), contributions, comparison);
    }

    /** Contributions ordered largest portion first (rank 1 first). */
    public List<LineContribution> ranking() {
        return contributions.stream().sorted(Comparator.comparingInt(LineContribution::rank)).toList();
    }

    /** Met or violated against the target, or not evaluated when there is none. */
    public BudgetStatus status() {
        return comparison.map(TargetComparison::status).orElse(BudgetStatus.NOT_EVALUATED);
    }

    /** The total the same contributions would give under another method, metres (for side-by-side tables). */
    public double totalFor(CombinationMethod other) {
        return other.combine(contributions.stream()
                .map(c -> new CombinationTerm(c.contribution(), c.line().errorClass())).toList());
    }

    /** The contribution of the line with {@code lineId}. */
    public LineContribution contributionOf(String lineId) {
        return contributions.stream().filter(c -> c.line().id().equals(lineId)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("budget " + budgetName + " has no line with id \""
                        + lineId + "\"; known ids: "
                        + contributions.stream().map(c -> c.line().id()).toList()));
    }

    /** One-line summary with the method, its formula and coverage convention, for reports and the CLI. */
    public String methodStatement() {
        return method.displayName() + " at k = " + coverageFactor + ": " + method.description();
    }
}
