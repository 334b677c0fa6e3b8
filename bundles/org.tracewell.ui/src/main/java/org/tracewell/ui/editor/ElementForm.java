package org.tracewell.ui.editor;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.util.Enumerator;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EEnumLiteral;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.jface.fieldassist.ControlDecoration;
import org.eclipse.jface.fieldassist.FieldDecorationRegistry;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.tracewell.model.units.UnitTable;
import org.tracewell.model.units.UnitAnnotations;

/**
 * The form of the selected element: one row per attribute (name, value in trade units, the SI value it stores) from
 * the element's item property descriptors. Typed values go through {@link ValueEntry}; a rejected entry stays in its
 * field, marked, with the reason below it, and the model keeps its value.
 */
public final class ElementForm {

    /** Widget data key of each value control: the feature it edits (tests find fields by it). */
    public static final String FEATURE_KEY = "org.tracewell.ui.editor.feature";

    private final ScrolledComposite scroller;
    private final Composite body;
    private final AdapterFactory adapterFactory;
    private final ValueEntry entry;
    private final Function<EObject, Optional<String>> banner;
    private final List<Row> rows = new ArrayList<>();
    private EObject element;
    private Label title;

    /**
     * @param banner a notice shown above the rows of an element, e.g. that it belongs to a shared library file
     */
    public ElementForm(Composite parent, AdapterFactory adapterFactory, ValueEntry entry,
            Function<EObject, Optional<String>> banner) {
        this.adapterFactory = adapterFactory;
        this.entry = entry;
        this.banner = banner;
        scroller = new ScrolledComposite(parent, SWT.V_SCROLL | SWT.H_SCROLL);
        scroller.setExpandHorizontal(true);
        scroller.setExpandVertical(true);
        body = new Composite(scroller, SWT.NONE);
        body.setLayout(new GridLayout(3, false));
        scroller.setContent(body);
        scroller.addListener(SWT.Resize, e -> relayout());
        show(null);
    }

    public Control control() {
        return scroller;
    }

    /** The element shown, or null. */
    public EObject element() {
        return element;
    }

    /** Shows the attributes of {@code newElement} (null: a hint to select something). */
    public void show(EObject newElement) {
        element = newElement;
        for (Control child : body.getChildren()) {
            child.dispose();
        }
        rows.clear();
        if (newElement == null) {
            Label hint = new Label(body, SWT.WRAP);
            hint.setText("Select an element in the tree to see and edit its values.");
            hint.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1));
            relayout();
            return;
        }
        title = new Label(body, SWT.WRAP);
        title.setText(labelOf(newElement));
        title.setFont(JFaceResources.getBannerFont());
        GridData titleData = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
        titleData.widthHint = 320; // wraps instead of widening the form
        title.setLayoutData(titleData);
        banner.apply(newElement).ifPresent(text -> {
            Label notice = new Label(body, SWT.WRAP);
            notice.setText(text);
            notice.setBackground(new Color(255, 243, 205));
            notice.setForeground(body.getDisplay().getSystemColor(SWT.COLOR_BLACK));
            GridData data = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
            data.widthHint = 300;
            notice.setLayoutData(data);
        });
        IItemPropertySource source = (IItemPropertySource) adapterFactory.adapt(newElement, IItemPropertySource.class);
        if (source != null) {
            for (IItemPropertyDescriptor descriptor : source.getPropertyDescriptors(newElement)) {
                if (descriptor.getFeature(newElement) instanceof EStructuralFeature feature
                        && !(feature instanceof EReference ref && (ref.isContainment() || ref.isMany()))) {
                    rows.add(new Row(newElement, descriptor, feature));
                }
            }
        }
        relayout();
    }

    /** Re-reads every value from the model (after a command, an undo or a redo). */
    public void refresh() {
        if (element == null || body.isDisposed()) {
            return;
        }
        List<Control> changed = new ArrayList<>();
        if (title != null && !title.isDisposed() && !labelOf(element).equals(title.getText())) {
            title.setText(labelOf(element));
            changed.add(title);
        }
        for (Row row : rows) {
            row.refresh(changed);
        }
        relayout(changed);
    }

    /**
     * Lays the form out again after {@code changed} controls changed size. Only they are measured again (the others
     * keep their cached sizes): measuring every row of a long form after each edit took longer than the edit itself.
     */
    private void relayout(List<Control> changed) {
        if (!changed.isEmpty() && !body.isDisposed()) {
            body.layout(changed.toArray(Control[]::new));
            scroller.setMinSize(body.computeSize(SWT.DEFAULT, SWT.DEFAULT, false));
        }
    }

    /** The value control of {@code feature} in the current form, if shown. */
    public Optional<Control> field(EStructuralFeature feature) {
        return rows.stream().filter(r -> r.feature == feature).map(r -> r.value).findFirst();
    }

    /** The rejection message shown under {@code feature}'s field, empty when the field holds an accepted value. */
    public Optional<String> rejection(EStructuralFeature feature) {
        return rows.stream().filter(r -> r.feature == feature && r.rejected).map(r -> r.reason.getText()).findFirst();
    }

    private String labelOf(Object object) {
        IItemLabelProvider provider = (IItemLabelProvider) adapterFactory.adapt(object, IItemLabelProvider.class);
        return provider == null ? String.valueOf(object) : provider.getText(object);
    }

    private void relayout() {
        if (scroller.isDisposed()) {
            return;
        }
        // Natural width (value fields at their width hint): narrower editors scroll rather than squeeze the fields.
        scroller.setMinSize(body.computeSize(SWT.DEFAULT, SWT.DEFAULT));
        body.layout(true, true);
    }

    /** One attribute: name | value control | stored SI value; and the rejection reason beneath, when there is one. */
    private final class Row {
        final EObject owner;
        final EStructuralFeature feature;
        final Control value;
        final Label stored;
        final Label spacer;
        final Label reason;
        final ControlDecoration decoration;
        boolean rejected;

        Row(EObject owner, IItemPropertyDescriptor descriptor, EStructuralFeature feature) {
            this.owner = owner;
            this.feature = feature;
            Label name = new Label(body, SWT.NONE);
            name.setText(descriptor.getDisplayName(owner));
            name.setToolTipText(descriptor.getDescription(owner));
            name.setLayoutData(new GridData(SWT.LEFT, SWT.CENTER, false, false));
            boolean editable = descriptor.canSetProperty(owner) && feature.isChangeable()
                    && !(feature instanceof EAttribute a && a.isID());
            value = createValueControl(descriptor, editable);
            value.setData(FEATURE_KEY, feature);
            GridData valueData = new GridData(SWT.FILL, SWT.CENTER, true, false);
            valueData.widthHint = 180;
            valueData.minimumWidth = 140;
            valueData.horizontalIndent = 8; // room for the error decoration
            value.setLayoutData(valueData);
            stored = new Label(body, SWT.NONE);
            stored.setForeground(body.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
            stored.setLayoutData(new GridData(SWT.LEFT, SWT.CENTER, false, false));
            spacer = new Label(body, SWT.NONE);
            GridData spacerData = new GridData(0, 0);
            spacerData.exclude = true;
            spacer.setLayoutData(spacerData);
            reason = new Label(body, SWT.WRAP);
            reason.setForeground(body.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            GridData reasonData = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
            reasonData.exclude = true;
            reasonData.widthHint = 260;
            reason.setLayoutData(reasonData);
            reason.setVisible(false);
            decoration = new ControlDecoration(value, SWT.LEFT | SWT.CENTER);
            decoration.setImage(FieldDecorationRegistry.getDefault()
                    .getFieldDecoration(FieldDecorationRegistry.DEC_ERROR).getImage());
            decoration.hide();
            refresh(new ArrayList<>()); // the form is laid out once all rows are there
        }

        /** Shows or hides the reason line (and the empty cell before it, under the name). */
        private void showReason(String text) {
            boolean visible = text != null;
            reason.setText(visible ? text : "");
            ((GridData) reason.getLayoutData()).exclude = !visible;
            ((GridData) spacer.getLayoutData()).exclude = !visible;
            reason.setVisible(visible);
            spacer.setVisible(visible);
        }

        private Control createValueControl(IItemPropertyDescriptor descriptor, boolean editable) {
            if (feature instanceof EAttribute a && (a.getEAttributeType().getInstanceClass() == boolean.class
                    || a.getEAttributeType().getInstanceClass() == Boolean.class)) {
                Button check = new Button(body, SWT.CHECK);
                check.setEnabled(editable);
                check.addListener(SWT.Selection, e -> apply(entry.set(owner, feature, check.getSelection())));
                return check;
            }
            if (feature instanceof EAttribute a && a.getEAttributeType() instanceof EEnum type && !a.isMany()) {
                Combo combo = new Combo(body, SWT.READ_ONLY | SWT.DROP_DOWN);
                for (EEnumLiteral literal : type.getELiterals()) {
                    combo.add(literal.getLiteral());
                }
                combo.setEnabled(editable);
                combo.addListener(SWT.Selection, e -> {
                    EEnumLiteral literal = type.getEEnumLiteral(combo.getSelectionIndex());
                    apply(entry.set(owner, feature, literal == null ? null : literal.getInstance()));
                });
                return combo;
            }
            if (feature instanceof EReference) {
                Combo combo = new Combo(body, SWT.READ_ONLY | SWT.DROP_DOWN);
                List<Object> choices = new ArrayList<>();
                Collection<?> offered = descriptor.getChoiceOfValues(owner);
                if (offered != null) {
                    choices.addAll(offered);
                }
                if (!choices.contains(null)) {
                    choices.add(0, null);
                }
                for (Object choice : choices) {
                    combo.add(choice == null ? "(none)" : labelOf(choice));
                }
                combo.setData(choices);
                combo.setEnabled(editable);
                combo.addListener(SWT.Selection, e -> apply(entry.set(owner, feature,
                        choices.get(combo.getSelectionIndex()))));
                return combo;
            }
            Text text = new Text(body, SWT.BORDER | SWT.SINGLE);
            text.setEditable(editable);
            if (editable) {
                text.addListener(SWT.DefaultSelection, e -> commit(text));
                text.addListener(SWT.FocusOut, e -> commit(text));
                text.addListener(SWT.KeyDown, e -> {
                    if (e.keyCode == SWT.ESC) {
                        rejected = false;
                        refresh();
                    }
                });
            }
            text.setToolTipText(toolTip());
            return text;
        }

        private String toolTip() {
            String display = UnitAnnotations.displayUnit(owner, feature);
            String si = UnitAnnotations.siUnit(owner, feature);
            if (display.isEmpty()) {
                return feature.isMany() ? "Numbers separated by spaces, in descending powers of s" : null;
            }
            return "Enter a number, optionally with a unit (" + display + " when none is given); stored in " + si
                    + ". Enter applies, Esc restores the stored value.";
        }

        private void commit(Text text) {
            if (text.isDisposed() || element != owner) {
                return;
            }
            if (!rejected && text.getText().equals(ValueEntry.display(owner, feature))) {
                return; // unchanged: nothing to do (focus left a field that was not edited)
            }
            apply(entry.enter(owner, feature, text.getText()));
        }

        /** Shows the outcome of an entry: the reason in place, or the stored value re-read. */
        private void apply(Optional<String> rejection) {
            if (rejection.isPresent()) {
                rejected = true;
                decoration.setDescriptionText(rejection.get());
                decoration.show();
                showReason(rejection.get());
                relayout();
                if (!(value instanceof Text)) {
                    refreshValue(); // a list choice cannot stay "typed": show the model's value again
                }
            } else {
                rejected = false;
                refresh();
                relayout();
            }
        }

        void refresh() {
            List<Control> changed = new ArrayList<>();
            refresh(changed);
            relayout(changed);
        }

        /** Shows the model's value again; adds the controls whose size may have changed to {@code changed}. */
        void refresh(List<Control> changed) {
            if (value.isDisposed()) {
                return;
            }
            if (!rejected) {
                decoration.hide();
                if (reason.getVisible()) {
                    changed.add(reason);
                }
                showReason(null);
                refreshValue();
            }
            String text = storedText();
            if (!text.equals(stored.getText())) {
                stored.setText(text);
                changed.add(stored);
            }
        }

        private void refreshValue() {
            Object current = owner.eGet(feature);
            if (value instanceof Button check) {
                check.setSelection(Boolean.TRUE.equals(current));
            } else if (value instanceof Combo combo && feature instanceof EReference) {
                @SuppressWarnings("unchecked")
                List<Object> choices = (List<Object>) combo.getData();
                combo.select(Math.max(0, choices.indexOf(current)));
            } else if (value instanceof Combo combo) {
                combo.select(current instanceof Enumerator literal ? literal.getValue() >= 0
                        ? indexOfLiteral(literal) : -1 : -1);
            } else if (value instanceof Text text && !text.getText().equals(ValueEntry.display(owner, feature))) {
                text.setText(ValueEntry.display(owner, feature));
            }
        }

        private int indexOfLiteral(Enumerator literal) {
            EEnum type = (EEnum) ((EAttribute) feature).getEAttributeType();
            return type.getELiterals().indexOf(type.getEEnumLiteral(literal.getValue()));
        }

        /** "= 40 1/s" when the field shows another unit than the model stores. */
        private String storedText() {
            String si = UnitAnnotations.siUnit(owner, feature);
            String display = UnitAnnotations.displayUnit(owner, feature);
            if (si.isEmpty() || si.equals(display) || feature.isMany() || !(owner.eGet(feature) instanceof Double d)) {
                return "";
            }
            return "= " + UnitTable.format(d, si);
        }
    }
}
