package org.tracewell.engine.budget;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A list of budget lines with the combination method and coverage factor used to total them.
 *
 * @param name           budget name (usually that of the requirement it verifies)
 * @param lines          the lines, ids unique; may be empty while a budget is being built
 * @param method         how contributions are combined
 * @param coverageFactor k at which random lines are expanded, finite and &gt; 0 (2 by default)
 */
public record ErrorBudget(String name, List<BudgetLine> lines, CombinationMethod method, double coverageFactor) {

    public ErrorBudget {
        BudgetChecks.requireNonNull("budget name", name);
        BudgetChecks.requireNonNull("lines of budget " + name, lines);
        BudgetChecks.requireNonNull("combination method of budget " + name, method);
        BudgetChecks.requirePositive("coverage factor k of budget " + name, coverageFactor, "");
        Set<String> ids = new HashSet<>();
        for (BudgetLine line : lines) {
            BudgetChecks.requireNonNull("a line of budget " + name, line);
            if (!ids.add(line.id())) {
                throw new IllegalArgumentException("budget " + name + " has two lines with id \"" + line.id()
                        + "\"; line ids must be unique");
            }
        }
        lines = List.copyOf(lines);
    }

    /** A budget at the default coverage factor k = 2. */
    public static ErrorBudget of(String name, CombinationMethod method, List<BudgetLine> lines) {
        return new ErrorBudget(name, lines, method, Distribution.DEFAULT_COVERAGE_FACTOR);
    }

    /** A copy combined by another method. */
    public ErrorBudget withMethod(CombinationMethod newMethod) {
        return new ErrorBudget(name, lines, newMethod, coverageFactor);
    }

    /** A copy at another coverage factor. */
    public ErrorBudget withCoverageFactor(double newCoverageFactor) {
        return new ErrorBudget(name, lines, method, newCoverageFactor);
    }

    /** A copy with one more line at the end. */
    public ErrorBudget withLine(BudgetLine line) {
        List<BudgetLine> more = new ArrayList<>(lines);
        more.add(line);
        return new ErrorBudget(name, more, method, coverageFactor);
    }

    /** A copy in which the line with the same id is replaced by {@code line}. */
    public ErrorBudget withReplacedLine(BudgetLine line) {
        BudgetChecks.requireNonNull("replacement line", line);
        List<BudgetLine> replaced = new ArrayList<>(lines.size());
        boolean found = false;
        for (BudgetLine existing : lines) {
            if (existing.id().equals(line.id())) {
                replaced.add(line);
                found = true;
            } else {
                replaced.add(existing);
            }
        }
        if (!found) {
            throw new IllegalArgumentException("budget " + name + " has no line with id \"" + line.id()
                    + "\"; known ids: " + lines.stream().map(BudgetLine::id).toList());
        }
        return new ErrorBudget(name, replaced, method, coverageFactor);
    }

    /** The sub-budget of one axis's lines (same method and k); {@code null} selects the machine-wide lines. */
    public ErrorBudget forAxis(String axis) {
        List<BudgetLine> selected = lines.stream().filter(l -> Objects.equals(l.axis(), axis)).toList();
        return new ErrorBudget(name + (axis == null ? " [machine-wide]" : " [" + axis + "]"), selected, method,
                coverageFactor);
    }

    /** The total and per-line figures, with no target. */
    public BudgetEvaluation evaluate() {
        return BudgetEvaluation.of(this, null);
    }

    /** The total and per-line figures compared with {@code target}. */
    public BudgetEvaluation evaluate(BudgetTarget target) {
        BudgetChecks.requireNonNull("budget target", target);
        return BudgetEvaluation.of(this, target);
    }

    /** The combination terms of the lines, in line order, at this budget's coverage factor. */
    public List<CombinationTerm> terms() {
        return lines.stream().map(l -> new CombinationTerm(l.contribution(coverageFactor), l.errorClass())).toList();
    }
}
