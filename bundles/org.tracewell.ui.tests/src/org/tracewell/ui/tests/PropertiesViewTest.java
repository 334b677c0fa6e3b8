package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.ComboBoxCellEditor;
import org.eclipse.jface.viewers.ICellEditorValidator;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.views.properties.ComboBoxPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySheetPage;
import org.eclipse.ui.views.properties.IPropertySource;
import org.eclipse.ui.views.properties.PropertySheet;
import org.eclipse.ui.views.properties.PropertySheetPage;
import org.eclipse.ui.views.properties.TextPropertyDescriptor;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Requirement;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.ui.editor.ElementPropertySource;
import org.tracewell.ui.editor.MachineEditor;

/** The Properties view edits any element in trade units, checks entries as typed, and goes through undo. */
class PropertiesViewTest {

    /** 1 (m/min)/mm = 1000/60 1/s (DOMAIN.md §4, common practice). */
    private static final double ONE_M_PER_MIN_PER_MM = 1000.0 / 60.0;

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    @Test
    void controllerPropertiesShowTradeUnitsRejectBadEntriesAndUndo(@TempDir Path temp) throws Exception {
        MachineEditor editor = MachineEditor.open(page, copyExamples(temp).resolve("LM-3020.machine"));
        IPropertySheetPage sheetPage = editor.getAdapter(IPropertySheetPage.class);
        assertInstanceOf(PropertySheetPage.class, sheetPage);
        ElementPropertySource.Provider provider = new ElementPropertySource.Provider(
                ((org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain) editor.getEditingDomain()).getAdapterFactory(),
                editor.valueEntry());
        Axis y = editor.model().machine().getAxes().get(2);
        CascadeController controller = (CascadeController) y.getController();
        ElementPropertySource source = (ElementPropertySource) provider.getPropertySource(controller);
        assertNotNull(source);

        IPropertyDescriptor kv = descriptor(source, Literals.CASCADE_CONTROLLER__POSITION_GAIN);
        TextPropertyDescriptor text = assertInstanceOf(TextPropertyDescriptor.class, kv);
        assertTrue(kv.getDescription().contains("(m/min)/mm"), kv.getDescription());
        // 40 1/s = 2.4 (m/min)/mm (common practice, 16.667 1/s per (m/min)/mm).
        assertEquals("2.4 (m/min)/mm", source.getPropertyValue(Literals.CASCADE_CONTROLLER__POSITION_GAIN));

        ICellEditorValidator validator = cellEditor(text).getValidator();
        assertNotNull(validator, "the text property checks as it is typed");
        assertTrue(validator.isValid("fast").contains("not a number"));
        assertTrue(validator.isValid("3 m/min").contains("(m/min)/mm"), "a feed is not a gain");
        assertNull(validator.isValid("3.0 (m/min)/mm"));

        assertTrue(source.set(Literals.CASCADE_CONTROLLER__POSITION_GAIN, "3.0 (m/min)/mm").isEmpty());
        assertEquals(3.0 * ONE_M_PER_MIN_PER_MM, controller.getPositionGain(), 1e-9);
        assertTrue(editor.isDirty());
        editor.getEditingDomain().getCommandStack().undo();
        assertEquals(40.0, controller.getPositionGain(), 0.0);

        // The id is shown, not editable; the filter stages (children) are listed read-only.
        assertEquals("lm3020-y-controller", source.getPropertyValue(Literals.IDENTIFIED__ID));
        assertNull(cellEditor(descriptor(source, Literals.IDENTIFIED__ID)), "not editable");
    }

    @Test
    void choicesAreListedAndSetByCommand(@TempDir Path temp) throws Exception {
        MachineEditor editor = MachineEditor.open(page, copyExamples(temp).resolve("LM-3020.machine"));
        ElementPropertySource.Provider provider = new ElementPropertySource.Provider(
                ((org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain) editor.getEditingDomain()).getAdapterFactory(),
                editor.valueEntry());
        Requirement kvX1 = editor.model().machine().getRequirements().stream()
                .filter(r -> "lm3020-r1-x1-kv".equals(r.getId())).findFirst().orElseThrow();
        ElementPropertySource source = (ElementPropertySource) provider.getPropertySource(kvX1);
        ComboBoxPropertyDescriptor axis = assertInstanceOf(ComboBoxPropertyDescriptor.class,
                descriptor(source, Literals.REQUIREMENT__ALLOCATED_AXIS));
        List<String> labels = Arrays.asList(((ComboBoxCellEditor) cellEditor(axis)).getItems());
        assertEquals("(none)", labels.get(0));
        int yIndex = indexStartingWith(labels, "Y ");
        assertEquals(java.util.Optional.empty(), source.set(Literals.REQUIREMENT__ALLOCATED_AXIS, yIndex));
        assertEquals("Y", kvX1.getAllocatedAxis().getName());
        editor.getEditingDomain().getCommandStack().undo();
        assertEquals("X1", kvX1.getAllocatedAxis().getName());
    }

    @Test
    void propertiesViewFollowsTheEditorSelection(@TempDir Path temp) throws Exception {
        MachineEditor editor = MachineEditor.open(page, copyExamples(temp).resolve("LM-3020.machine"));
        PropertySheet sheet = (PropertySheet) page.showView(IPageLayout.ID_PROP_SHEET);
        page.activate(editor);
        editor.reveal(editor.model().machine().getAxes().get(2).getController());
        assertInstanceOf(PropertySheetPage.class, sheet.getCurrentPage(), "the editor's page, not the default");
    }

    private static IPropertyDescriptor descriptor(IPropertySource source, Object id) {
        return Arrays.stream(source.getPropertyDescriptors()).filter(d -> d.getId() == id).findFirst()
                .orElseThrow(() -> new AssertionError("no property " + id));
    }

    /** What the Properties view does to edit a value: the descriptor's cell editor (its validator, its choices). */
    private static CellEditor cellEditor(IPropertyDescriptor descriptor) {
        Composite parent = new Composite(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(), SWT.NONE);
        parents.add(parent);
        return descriptor.createPropertyEditor(parent);
    }

    private static final List<Composite> parents = new java.util.ArrayList<>();

    @AfterEach
    void disposeCellEditors() {
        parents.forEach(Composite::dispose);
        parents.clear();
    }

    private static int indexStartingWith(List<String> labels, String prefix) {
        for (int i = 0; i < labels.size(); i++) {
            if (labels.get(i).startsWith(prefix)) {
                return i;
            }
        }
        throw new AssertionError("no choice starting with " + prefix + " in " + labels);
    }
}
