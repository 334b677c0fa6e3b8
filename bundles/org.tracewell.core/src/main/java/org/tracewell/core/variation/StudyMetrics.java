package org.tracewell.core.variation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.validation.TracewellValidator;
import org.tracewell.engine.budget.LimitBound;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.Contour;
import org.tracewell.model.FullCircle;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.units.UnitTable;

/**
 * Parses and lists the metrics a study of a machine can collect:
 * <ul>
 * <li>{@code requirement[ID]} (or the bare requirement id): the requirement's value as the design review evaluates
 * it;</li>
 * <li>{@code contour[NAME or ID].G | F | maxContourError}: a figure of the contour's programmed run (G and F on full
 * circles only);</li>
 * <li>{@code axis[NAME or ID].Kv | phaseMargin | gainMargin | bandwidth | velocityPhaseMargin | velocityGainMargin |
 * velocityBandwidth | followingError | settlingTime}: a loop figure of the axis.</li>
 * </ul>
 */
public final class StudyMetrics {

    private static final Pattern FORM = Pattern.compile("(requirement|contour|axis)\\[([^\\[\\]]+)\\](?:\\.(\\w+))?");

    private StudyMetrics() {
    }

    /** Every requirement of the machine, model order: what a study collects when it names no metric. */
    public static List<StudyMetric> defaults(Machine machine) {
        List<StudyMetric> out = new ArrayList<>();
        for (Requirement r : machine.getRequirements()) {
            out.add(requirement(r, "requirement[" + r.getId() + "]"));
        }
        return out;
    }

    /** Each name parsed; an empty list gives {@link #defaults}. */
    public static List<StudyMetric> parseAll(List<String> names, Machine machine) {
        if (names.isEmpty()) {
            return defaults(machine);
        }
        List<StudyMetric> out = new ArrayList<>();
        for (String name : names) {
            StudyMetric metric = parse(name, machine);
            if (out.stream().noneMatch(m -> m.name().equals(metric.name()))) {
                out.add(metric);
            }
        }
        return out;
    }

    /**
     * @throws IllegalArgumentException naming the metric, what is wrong and the valid names
     */
    public static StudyMetric parse(String text, Machine machine) {
        String name = text == null ? "" : text.strip();
        Optional<Requirement> bare = machine.getRequirements().stream().filter(r -> name.equals(r.getId()))
                .findFirst();
        if (bare.isPresent()) {
            return requirement(bare.get(), "requirement[" + name + "]");
        }
        Matcher m = FORM.matcher(name);
        if (!m.matches()) {
            throw new IllegalArgumentException("metric '" + name + "' is not of the form requirement[ID],"
                    + " contour[NAME].G|F|maxContourError or axis[NAME].FIGURE; valid here: "
                    + String.join(", ", available(machine)));
        }
        String key = m.group(2).strip();
        String token = m.group(3);
        return switch (m.group(1)) {
            case "requirement" -> {
                if (token != null) {
                    throw new IllegalArgumentException("metric '" + name + "': a requirement metric takes no ."
                            + token + "; write requirement[" + key + "]");
                }
                Requirement r = machine.getRequirements().stream().filter(q -> key.equals(q.getId())).findFirst()
                        .orElseThrow(() -> new IllegalArgumentException("metric '" + name + "': machine "
                                + machine.getName() + " has no requirement '" + key + "'; its requirements: "
                                + machine.getRequirements().stream().map(Requirement::getId).toList()));
                yield requirement(r, "requirement[" + key + "]");
            }
            case "contour" -> contour(name, key, token, machine);
            default -> axis(name, key, token, machine);
        };
    }

    /** The names of every metric the machine offers, for messages and help. */
    public static List<String> available(Machine machine) {
        List<String> names = new ArrayList<>();
        for (Requirement r : machine.getRequirements()) {
            names.add("requirement[" + r.getId() + "]");
        }
        for (Contour c : machine.getContours()) {
            for (ContourQuantity q : ContourQuantity.values()) {
                if (!q.needsCircle() || isFullCircle(c)) {
                    names.add("contour[" + c.getName() + "]." + q.token());
                }
            }
        }
        for (Axis a : axes(machine)) {
            for (AxisQuantity q : AxisQuantity.values()) {
                names.add("axis[" + a.getName() + "]." + q.token());
            }
        }
        return names;
    }

    private static ContourValue contour(String name, String key, String token, Machine machine) {
        Contour c = machine.getContours().stream().filter(x -> key.equals(x.getName()) || key.equals(x.getId()))
                .findFirst().orElseThrow(() -> new IllegalArgumentException("metric '" + name + "': machine "
                        + machine.getName() + " has no contour '" + key + "'; its contours: "
                        + machine.getContours().stream().map(Contour::getName).toList()));
        ContourQuantity q = Arrays.stream(ContourQuantity.values()).filter(x -> x.token().equals(token)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("metric '" + name + "': contour figure '" + token
                        + "' is unknown; valid: " + Arrays.stream(ContourQuantity.values())
                                .map(ContourQuantity::token).toList()));
        if (q.needsCircle() && !isFullCircle(c)) {
            throw new IllegalArgumentException("metric '" + name + "': " + q.token() + " is defined on full circles"
                    + " (ISO 230-4) and contour '" + c.getName() + "' is none; use maxContourError");
        }
        return new ContourValue("contour[" + key + "]." + q.token(), c.getId(), c.getName(), q);
    }

    private static AxisValue axis(String name, String key, String token, Machine machine) {
        Axis a = axes(machine).stream().filter(x -> key.equals(x.getName()) || key.equals(x.getId())).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("metric '" + name + "': machine " + machine.getName()
                        + " has no axis '" + key + "'; its axes: " + axes(machine).stream().map(Axis::getName)
                                .toList()));
        AxisQuantity q = Arrays.stream(AxisQuantity.values()).filter(x -> x.token().equals(token)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("metric '" + name + "': axis figure '" + token
                        + "' is unknown; valid: " + Arrays.stream(AxisQuantity.values()).map(AxisQuantity::token)
                                .toList()));
        return new AxisValue("axis[" + key + "]." + q.token(), a.getId(), a.getName(), a.getKind() == AxisKind.ROTARY,
                q);
    }

    private static RequirementValue requirement(Requirement r, String name) {
        String si = TracewellValidator.siUnitOf(r);
        String display = UnitTable.find(r.getDisplayUnit()).filter(u -> u.siSymbol().equals(si))
                .map(u -> u.symbol()).orElse(si);
        List<Contour> contours = r.getKind() == RequirementKind.FOLLOWING_ERROR ? inheritedContours(r)
                : r.getKind() == RequirementKind.CONTOUR_DEVIATION ? List.copyOf(r.getContours()) : List.of();
        boolean velocityLoop = r.getStatement() != null
                && r.getStatement().toLowerCase(Locale.ROOT).contains("velocity loop");
        return new RequirementValue(name, r.getId(), r.getStatement() == null ? "" : r.getStatement(), r.getKind(),
                r.getMetric(), r.getBound() == org.tracewell.model.LimitBound.AT_LEAST ? LimitBound.AT_LEAST
                        : LimitBound.AT_MOST, r.getLimit(), si, display,
                Optional.ofNullable(r.getAllocatedAxis()).map(Axis::getId), contours.stream().map(Contour::getId)
                        .toList(), velocityLoop, MachineBudgets.hasBudget(r));
    }

    /**
     * The contours verifying a following-error requirement: its own, else those of its nearest ancestor that names
     * some (the design review's rule).
     */
    public static List<Contour> inheritedContours(Requirement r) {
        for (Requirement at = r; at != null; at = at.getParent()) {
            if (!at.getContours().isEmpty()) {
                return List.copyOf(at.getContours());
            }
        }
        return List.of();
    }

    static boolean isFullCircle(Contour c) {
        long drawn = c.getSegments().stream().filter(s -> !(s instanceof org.tracewell.model.Corner)).count();
        return drawn == 1 && c.getSegments().stream().anyMatch(FullCircle.class::isInstance);
    }

    static List<Axis> axes(Machine machine) {
        List<Axis> axes = new ArrayList<>(machine.getAxes());
        axes.addAll(machine.getLibraryAxes());
        return axes;
    }
}
