package org.tracewell.ui.editor;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;

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
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.ui.views.properties.ComboBoxPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySource;
import org.eclipse.ui.views.properties.IPropertySourceProvider;
import org.eclipse.ui.views.properties.PropertyDescriptor;
import org.eclipse.ui.views.properties.TextPropertyDescriptor;
import org.tracewell.model.units.UnitAnnotations;

/**
 * The Properties view's page for a model element, over EMF edit's item property descriptors (EMF's own bridge is in
 * a bundle that is not available here). Values are shown and typed in trade units as in the editor's forms, checked
 * as they are typed by the same rules ({@link ValueEntry#check}: an invalid entry shows its reason and is not
 * applied) and set by the same EMF commands, so Undo covers them.
 */
public final class ElementPropertySource implements IPropertySource {

    /** Gives the Properties view a source for every Tracewell element. */
    public static final class Provider implements IPropertySourceProvider {
        private final AdapterFactory adapterFactory;
        private final ValueEntry entry;

        public Provider(AdapterFactory adapterFactory, ValueEntry entry) {
            this.adapterFactory = adapterFactory;
            this.entry = entry;
        }

        @Override
        public IPropertySource getPropertySource(Object object) {
            if (object instanceof EObject element
                    && adapterFactory.adapt(element, IItemPropertySource.class) instanceof IItemPropertySource source) {
                return new ElementPropertySource(element, source, adapterFactory, entry);
            }
            return null;
        }
    }

    private final EObject owner;
    private final IItemPropertySource source;
    private final AdapterFactory adapterFactory;
    private final ValueEntry entry;

    ElementPropertySource(EObject owner, IItemPropertySource source, AdapterFactory adapterFactory, ValueEntry entry) {
        this.owner = owner;
        this.source = source;
        this.adapterFactory = adapterFactory;
        this.entry = entry;
    }

    @Override
    public Object getEditableValue() {
        return owner;
    }

    @Override
    public IPropertyDescriptor[] getPropertyDescriptors() {
        List<IPropertyDescriptor> descriptors = new ArrayList<>();
        for (IItemPropertyDescriptor item : source.getPropertyDescriptors(owner)) {
            if (item.getFeature(owner) instanceof EStructuralFeature feature) {
                descriptors.add(descriptor(item, feature));
            }
        }
        return descriptors.toArray(IPropertyDescriptor[]::new);
    }

    private IPropertyDescriptor descriptor(IItemPropertyDescriptor item, EStructuralFeature feature) {
        String name = item.getDisplayName(owner);
        boolean editable = item.canSetProperty(owner) && feature.isChangeable()
                && !(feature instanceof EAttribute a && a.isID());
        PropertyDescriptor descriptor;
        if (!editable || feature instanceof EReference ref && (ref.isContainment() || ref.isMany())) {
            descriptor = new PropertyDescriptor(feature, name);
            descriptor.setLabelProvider(new LabelProvider() {
                @Override
                public String getText(Object value) {
                    return String.valueOf(value);
                }
            });
        } else if (isChoice(feature)) {
            descriptor = new ComboBoxPropertyDescriptor(feature, name, choiceLabels(item, feature));
        } else {
            TextPropertyDescriptor text = new TextPropertyDescriptor(feature, name);
            text.setValidator(value -> entry.check(owner, feature, String.valueOf(value)).orElse(null));
            descriptor = text;
        }
        String unit = UnitAnnotations.displayUnit(owner, feature);
        String description = item.getDescription(owner);
        descriptor.setDescription((description == null ? name : description)
                + (unit.isEmpty() ? "" : " (typed in " + unit + " unless another unit is given)"));
        descriptor.setCategory(item.getCategory(owner));
        return descriptor;
    }

    private static boolean isChoice(EStructuralFeature feature) {
        if (feature instanceof EReference) {
            return true;
        }
        Class<?> type = feature.getEType().getInstanceClass();
        return feature.getEType() instanceof EEnum || type == boolean.class || type == Boolean.class;
    }

    /** The choices of a list-valued property, in the order {@link #choices} returns their values. */
    private String[] choiceLabels(IItemPropertyDescriptor item, EStructuralFeature feature) {
        return choices(item, feature).stream().map(this::choiceLabel).toArray(String[]::new);
    }

    private List<Object> choices(IItemPropertyDescriptor item, EStructuralFeature feature) {
        List<Object> choices = new ArrayList<>();
        if (feature.getEType() instanceof EEnum type) {
            for (EEnumLiteral literal : type.getELiterals()) {
                choices.add(literal.getInstance());
            }
        } else if (feature instanceof EReference) {
            choices.add(null);
            Collection<?> offered = item.getChoiceOfValues(owner);
            if (offered != null) {
                offered.stream().filter(o -> o != null).forEach(choices::add);
            }
        } else {
            choices.add(Boolean.FALSE);
            choices.add(Boolean.TRUE);
        }
        return choices;
    }

    private String choiceLabel(Object value) {
        if (value == null) {
            return "(none)";
        }
        if (value instanceof Enumerator literal) {
            return literal.getLiteral();
        }
        return value instanceof EObject ? labelOf(value) : String.valueOf(value);
    }

    private IItemPropertyDescriptor itemDescriptor(Object id) {
        for (IItemPropertyDescriptor item : source.getPropertyDescriptors(owner)) {
            if (item.getFeature(owner) == id) {
                return item;
            }
        }
        return null;
    }

    @Override
    public Object getPropertyValue(Object id) {
        if (!(id instanceof EStructuralFeature feature)) {
            return null;
        }
        IItemPropertyDescriptor item = itemDescriptor(id);
        Object value = owner.eGet(feature);
        if (feature instanceof EReference ref && (ref.isContainment() || ref.isMany())) {
            return referenceText(value);
        }
        if (item != null && isChoice(feature) && item.canSetProperty(owner)) {
            return Math.max(0, choices(item, feature).indexOf(value));
        }
        return ValueEntry.display(owner, feature);
    }

    private String referenceText(Object value) {
        if (value instanceof Collection<?> many) {
            return many.isEmpty() ? "(none)" : many.size() <= 4
                    ? String.join(", ", many.stream().map(this::labelOf).toList())
                    : many.size() + " elements";
        }
        return value == null ? "(none)" : labelOf(value);
    }

    @Override
    public boolean isPropertySet(Object id) {
        return false;
    }

    @Override
    public void resetPropertyValue(Object id) {
        // Tracewell has no "default" to return to: every value is the machine's own.
    }

    /**
     * Applies a value from the Properties view through the editor's command path. Text was checked as it was typed;
     * a value the rules still refuse (the model changed meanwhile) changes nothing.
     *
     * @return the rejection, empty when applied (for tests; the view ignores it)
     */
    public Optional<String> set(Object id, Object value) {
        if (!(id instanceof EStructuralFeature feature)) {
            return Optional.of("not a property of " + labelOf(owner));
        }
        IItemPropertyDescriptor item = itemDescriptor(id);
        if (item != null && isChoice(feature) && value instanceof Integer index) {
            List<Object> choices = choices(item, feature);
            if (index < 0 || index >= choices.size()) {
                return Optional.empty(); // the combo was left without a choice
            }
            return entry.set(owner, feature, choices.get(index));
        }
        return entry.enter(owner, feature, String.valueOf(value));
    }

    @Override
    public void setPropertyValue(Object id, Object value) {
        set(id, value);
    }

    private String labelOf(Object object) {
        IItemLabelProvider provider = (IItemLabelProvider) adapterFactory.adapt(object, IItemLabelProvider.class);
        return provider == null ? String.valueOf(object) : provider.getText(object);
    }
}
