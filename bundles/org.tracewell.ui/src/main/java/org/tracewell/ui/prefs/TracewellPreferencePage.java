package org.tracewell.ui.prefs;

import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.IntegerFieldEditor;
import org.eclipse.jface.preference.RadioGroupFieldEditor;
import org.eclipse.jface.preference.StringFieldEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;
import org.tracewell.model.units.UnitSystem;

/** Window → Preferences → Tracewell: display units, loop periods of new machines, report author. */
public final class TracewellPreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {

    /** Shortest and longest loop period the page accepts, µs (the template's range: 10 µs … 10 ms). */
    static final int MIN_PERIOD_US = 10;
    static final int MAX_PERIOD_US = 10_000;

    private IntegerFieldEditor positionPeriod;
    private IntegerFieldEditor velocityPeriod;

    public TracewellPreferencePage() {
        super(GRID);
        setDescription("How Tracewell shows values and what new machines start with. The model always stores SI "
                + "units; the display units apply to labels, forms, the Properties view and the analysis views.");
    }

    @Override
    public void init(IWorkbench workbench) {
        setPreferenceStore(TracewellPreferences.store());
    }

    @Override
    protected void createFieldEditors() {
        Composite parent = getFieldEditorParent();
        addField(new RadioGroupFieldEditor(TracewellPreferences.UNIT_SYSTEM, "Display units", 1, new String[][] {
            {"Metric (mm, µm, m/min, (m/min)/mm)", UnitSystem.METRIC.name()},
            {"Inch (in, µin, in/min, (in/min)/mil); forces, masses and times stay metric", UnitSystem.INCH.name()},
        }, parent, true));

        Label heading = new Label(parent, SWT.NONE);
        heading.setText("Loop sample periods of new machines (New Machine wizard, template):");
        heading.setLayoutData(new org.eclipse.swt.layout.GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        positionPeriod = period(TracewellPreferences.POSITION_PERIOD_US, "Position loop (µs):", parent);
        velocityPeriod = period(TracewellPreferences.VELOCITY_PERIOD_US, "Velocity loop (µs):", parent);
        addField(positionPeriod);
        addField(velocityPeriod);

        addField(new StringFieldEditor(TracewellPreferences.REPORT_AUTHOR, "Report author:", parent));
    }

    private static IntegerFieldEditor period(String key, String label, Composite parent) {
        IntegerFieldEditor editor = new IntegerFieldEditor(key, label, parent, 6);
        editor.setValidRange(MIN_PERIOD_US, MAX_PERIOD_US);
        editor.setErrorMessage(label.replace(":", "") + " must be a whole number of µs from " + MIN_PERIOD_US
                + " to " + MAX_PERIOD_US);
        return editor;
    }

    /** Besides each field's range: the velocity loop may not sample slower than the position loop it serves. */
    @Override
    protected void checkState() {
        super.checkState();
        if (isValid() && positionPeriod.isValid() && velocityPeriod.isValid()
                && velocityPeriod.getIntValue() > positionPeriod.getIntValue()) {
            setErrorMessage("Velocity loop " + velocityPeriod.getIntValue() + " µs is slower than position loop "
                    + positionPeriod.getIntValue() + " µs; valid: velocity-loop period ≤ position-loop period");
            setValid(false);
        }
    }

    @Override
    public void propertyChange(org.eclipse.jface.util.PropertyChangeEvent event) {
        super.propertyChange(event);
        if (org.eclipse.jface.preference.FieldEditor.VALUE.equals(event.getProperty())) {
            checkState();
        }
    }
}
