package org.tracewell.core.variation;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.tracewell.model.StudyKind;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;

/**
 * What a study varies and collects: a Monte-Carlo run (tolerances, N, seed) or a 1-D / 2-D sweep (ranges), and the
 * metric names (none = every requirement). From the model's {@link VariationStudy} or built by the command line.
 *
 * @param name         study name (for reports and file names)
 * @param kind         Monte-Carlo or sweep
 * @param tolerances   the spreads of a Monte-Carlo study, one per attribute
 * @param ranges       the grid of a sweep, one or two attributes
 * @param metrics      metric names, see {@link StudyMetrics}
 * @param variantCount N of a Monte-Carlo study, 1..{@link #MAX_VARIANTS}
 * @param seed         seed of the Monte-Carlo streams
 * @param worstKept    worst variants kept per metric, 0..{@link #MAX_WORST}
 */
public record StudyDefinition(String name, StudyKind kind, List<Tolerance> tolerances, List<SweepRange> ranges,
        List<String> metrics, int variantCount, long seed, int worstKept) {

    /** Largest Monte-Carlo study. */
    public static final int MAX_VARIANTS = 100_000;
    /** Most worst variants kept per metric. */
    public static final int MAX_WORST = 100;
    /** Largest sweep grid. */
    public static final int MAX_GRID_POINTS = 100_000;

    public StudyDefinition {
        name = name == null || name.isBlank() ? "study" : name.strip();
        tolerances = List.copyOf(tolerances);
        ranges = List.copyOf(ranges);
        metrics = List.copyOf(metrics);
        String what = "study '" + name + "'";
        if (kind == null) {
            throw new IllegalArgumentException(what + " needs a kind: monteCarlo or sweep");
        }
        if (kind == StudyKind.MONTE_CARLO) {
            if (tolerances.isEmpty()) {
                throw new IllegalArgumentException(what + " varies nothing; give at least one tolerance (--dist)");
            }
            if (!ranges.isEmpty()) {
                throw new IllegalArgumentException(what + " is a Monte-Carlo study and takes tolerances, not sweep"
                        + " ranges");
            }
            if (variantCount < 1 || variantCount > MAX_VARIANTS) {
                throw new IllegalArgumentException(what + ": variant count must lie in 1.." + MAX_VARIANTS + ", got "
                        + variantCount);
            }
        } else {
            if (ranges.isEmpty() || ranges.size() > 2) {
                throw new IllegalArgumentException(what + ": a sweep varies one or two attributes (--param), got "
                        + ranges.size());
            }
            if (!tolerances.isEmpty()) {
                throw new IllegalArgumentException(what + " is a sweep and takes ranges, not tolerances");
            }
            long points = ranges.stream().mapToLong(SweepRange::steps).reduce(1, (a, b) -> a * b);
            if (points > MAX_GRID_POINTS) {
                throw new IllegalArgumentException(what + ": the grid has " + points + " points; at most "
                        + MAX_GRID_POINTS);
            }
        }
        if (worstKept < 0 || worstKept > MAX_WORST) {
            throw new IllegalArgumentException(what + ": worst variants kept must lie in 0.." + MAX_WORST + ", got "
                    + worstKept);
        }
        Set<String> paths = new HashSet<>();
        List<String> varied = kind == StudyKind.MONTE_CARLO ? tolerances.stream().map(Tolerance::path).toList()
                : ranges.stream().map(SweepRange::path).toList();
        for (String path : varied) {
            if (!paths.add(path)) {
                throw new IllegalArgumentException(what + " varies " + path + " twice");
            }
        }
    }

    /** The varied attribute paths, parameter order. */
    public List<String> paths() {
        return kind == StudyKind.MONTE_CARLO ? tolerances.stream().map(Tolerance::path).toList()
                : ranges.stream().map(SweepRange::path).toList();
    }

    /**
     * The study the model asks for.
     *
     * @throws IllegalArgumentException naming the study and the parameter when a field is missing or out of range
     */
    public static StudyDefinition of(VariationStudy study) {
        List<Tolerance> tolerances = new ArrayList<>();
        List<SweepRange> ranges = new ArrayList<>();
        for (VariedParameter p : study.getParameters()) {
            if (study.getKind() == StudyKind.SWEEP) {
                ranges.add(new SweepRange(p.getPath(), p.getFrom(), p.getTo(), p.getSteps()));
            } else {
                double width = p.getShape() == org.tracewell.model.ToleranceShape.NORMAL ? p.getSigma()
                        : p.getHalfWidth();
                tolerances.add(new Tolerance(p.getPath(), p.getShape(), width,
                        p.isSetMinimum() ? p.getMinimum() : Double.NaN, p.isSetMaximum() ? p.getMaximum() : Double.NaN));
            }
        }
        return new StudyDefinition(study.getName(), study.getKind(), tolerances, ranges, study.getMetrics(),
                study.getVariantCount(), study.getSeed(), study.getWorstVariantCount());
    }
}
