package org.tracewell.model.units;

import java.util.Map;
import java.util.Objects;

/**
 * The system lengths are shown in at the edges: metric (the units the metamodel declares) or inch. Inch changes only
 * the length-based display units (lengths, feeds, accelerations, position gain, lead); forces, masses, inertias,
 * times, frequencies and angles stay as declared. The model always stores SI; the conversion factors live in
 * {@link UnitTable} with every other unit.
 * <p>
 * {@link #active()} is the workbench's display preference. Headless tools (command line, report) never change it, so
 * they always print metric.
 */
public enum UnitSystem {

    /** The display units the metamodel declares (mm, µm, m/min, (m/min)/mm …). */
    METRIC,

    /** Inch counterparts of the length-based display units (in, µin, in/min, (in/min)/mil …). */
    INCH;

    /**
     * Metric display unit → inch display unit. The position gain maps onto the trade's "ipm per mil": 1 (in/min)/mil
     * is 1000/60 1/s, the same number as 1 (m/min)/mm, so a Kv reads alike in both systems (common practice).
     */
    private static final Map<String, String> INCH_FOR_METRIC = Map.of(
            "mm", "in",
            "µm", "µin",
            "m/min", "in/min",
            "mm/min", "in/min",
            "(m/min)/mm", "(in/min)/mil",
            "mm/rev", "in/rev",
            "m/s²", "in/s²",
            "m/s³", "in/s³");

    private static volatile UnitSystem active = METRIC;

    /** The unit a value declared in {@code metricUnit} is shown in under this system (unchanged when not a length). */
    public String shown(String metricUnit) {
        if (this == METRIC || metricUnit == null) {
            return metricUnit;
        }
        return INCH_FOR_METRIC.getOrDefault(metricUnit.strip(), metricUnit);
    }

    /**
     * How many {@link #shown(String) shown} units one {@code metricUnit} is (1 when this system shows it unchanged),
     * to turn a value already converted to the metric unit into the shown one: 1 mm → 0.03937 in. Only for linear
     * units (every unit this system replaces is linear).
     */
    public double perMetricUnit(String metricUnit) {
        String shown = shown(metricUnit);
        if (shown == null || shown.equals(metricUnit)) {
            return 1.0;
        }
        return UnitTable.get(metricUnit).toSi(1.0) / UnitTable.get(shown).toSi(1.0);
    }

    /** The system the workbench shows values in; {@link #METRIC} unless the workbench chose otherwise. */
    public static UnitSystem active() {
        return active;
    }

    /** Sets the display system (the workbench does this from its preference). */
    public static void activate(UnitSystem system) {
        active = Objects.requireNonNull(system, "system");
    }
}
