package org.tracewell.ui.prefs;

import org.eclipse.core.runtime.preferences.AbstractPreferenceInitializer;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.tracewell.core.template.MachineTemplate;
import org.tracewell.model.units.UnitSystem;

/**
 * Tracewell's preferences (Window → Preferences → Tracewell), kept in the workspace's instance scope: the display
 * unit system, the loop periods new machines start with, and the name reports are prepared by. Values are stored as
 * typed (unit system name, periods in µs, free text); readers get them in SI.
 */
public final class TracewellPreferences {

    /** Preference node (the UI bundle's symbolic name). */
    public static final String NODE = "org.tracewell.ui";

    /** {@link UnitSystem} name: {@code METRIC} or {@code INCH}. */
    public static final String UNIT_SYSTEM = "displayUnits";
    /** Position-loop sample period of new machines, µs. */
    public static final String POSITION_PERIOD_US = "positionSamplePeriodMicroseconds";
    /** Velocity-loop sample period of new machines, µs. */
    public static final String VELOCITY_PERIOD_US = "velocitySamplePeriodMicroseconds";
    /** Who prepares design-review reports. */
    public static final String REPORT_AUTHOR = "reportAuthor";

    private static ScopedPreferenceStore store;
    private static final IPropertyChangeListener APPLY_UNITS = event -> {
        if (UNIT_SYSTEM.equals(event.getProperty())) {
            applyDisplayUnits();
        }
    };

    private TracewellPreferences() {
    }

    /** The store the preference page edits; the unit system follows every change of it. */
    public static synchronized IPreferenceStore store() {
        if (store == null) {
            store = new ScopedPreferenceStore(InstanceScope.INSTANCE, NODE);
            setDefaults(store);
            store.addPropertyChangeListener(APPLY_UNITS);
        }
        return store;
    }

    static void setDefaults(IPreferenceStore target) {
        target.setDefault(UNIT_SYSTEM, UnitSystem.METRIC.name());
        target.setDefault(POSITION_PERIOD_US, micros(MachineTemplate.DEFAULT_POSITION_SAMPLE_PERIOD));
        target.setDefault(VELOCITY_PERIOD_US, micros(MachineTemplate.DEFAULT_VELOCITY_SAMPLE_PERIOD));
        target.setDefault(REPORT_AUTHOR, "");
    }

    private static int micros(double seconds) {
        return (int) Math.round(seconds * 1e6);
    }

    /** The unit system chosen; metric when the stored value is not a known name. */
    public static UnitSystem unitSystem() {
        String name = store().getString(UNIT_SYSTEM);
        for (UnitSystem system : UnitSystem.values()) {
            if (system.name().equals(name)) {
                return system;
            }
        }
        return UnitSystem.METRIC;
    }

    /** Makes the labels, forms and views show the chosen unit system (called at start and on every change). */
    public static void applyDisplayUnits() {
        UnitSystem.activate(unitSystem());
    }

    /** Position-loop sample period for new machines, s. */
    public static double positionSamplePeriod() {
        return store().getInt(POSITION_PERIOD_US) * 1e-6;
    }

    /** Velocity-loop sample period for new machines, s. */
    public static double velocitySamplePeriod() {
        return store().getInt(VELOCITY_PERIOD_US) * 1e-6;
    }

    /** The template for a new machine with the preferred loop periods. */
    public static MachineTemplate template(String machineName) {
        return new MachineTemplate(machineName, positionSamplePeriod(), velocitySamplePeriod());
    }

    /**
     * The template with the preferred loop periods, or with the defaults when the preferences hold a combination the
     * template refuses (edited by hand).
     */
    public static MachineTemplate templateOrDefault(String machineName) {
        try {
            return template(machineName);
        } catch (IllegalArgumentException badPreference) {
            return MachineTemplate.named(machineName);
        }
    }

    /** Who prepares reports; empty when not set. */
    public static String reportAuthor() {
        return store().getString(REPORT_AUTHOR).strip();
    }

    /** Sets the defaults (the platform calls this before the first read of the node). */
    public static final class Initializer extends AbstractPreferenceInitializer {
        @Override
        public void initializeDefaultPreferences() {
            setDefaults(store());
        }
    }
}
