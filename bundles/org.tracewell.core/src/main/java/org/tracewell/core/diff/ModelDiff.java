package org.tracewell.core.diff;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EEnumLiteral;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.tracewell.core.validation.TracewellValidator;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.units.UnitAnnotations;

/**
 * Semantic difference of two versions of a model, for design reviews: elements are matched by their stable id (not
 * by position), and changed values are shown in display units, e.g. {@code position gain: 2.4 (m/min)/mm → 3.0
 * (m/min)/mm}. Library axes a machine references are compared too. Pure function of its inputs.
 */
public final class ModelDiff {

    private ModelDiff() {
    }

    /** The changes that turn {@code before} into {@code after}, in document order of {@code after} then removals. */
    public static List<ModelChange> compare(EObject before, EObject after) {
        Map<String, EObject> old = index(before);
        Map<String, EObject> now = index(after);
        List<ModelChange> changes = new ArrayList<>();
        for (Map.Entry<String, EObject> entry : now.entrySet()) {
            EObject previous = old.get(entry.getKey());
            EObject current = entry.getValue();
            if (previous == null) {
                EObject parent = current.eContainer();
                if (parent == null || old.containsKey(idOf(parent))) {
                    changes.add(new ModelChange(ModelChange.Kind.ADDED, entry.getKey(), describe(current), "", "",
                            ""));
                }
            } else {
                compareElement(entry.getKey(), previous, current, changes);
            }
        }
        for (Map.Entry<String, EObject> entry : old.entrySet()) {
            if (!now.containsKey(entry.getKey())) {
                EObject parent = entry.getValue().eContainer();
                if (parent == null || now.containsKey(idOf(parent))) {
                    changes.add(new ModelChange(ModelChange.Kind.REMOVED, entry.getKey(), describe(entry.getValue()),
                            "", "", ""));
                }
            }
        }
        return changes;
    }

    private static void compareElement(String id, EObject previous, EObject current, List<ModelChange> changes) {
        String element = describe(current);
        if (previous.eClass() != current.eClass()) {
            changes.add(new ModelChange(ModelChange.Kind.CHANGED, id, element, "type", previous.eClass().getName(),
                    current.eClass().getName()));
            return;
        }
        for (EStructuralFeature feature : current.eClass().getEAllStructuralFeatures()) {
            if (feature.isTransient() || feature.isDerived()
                    || (feature instanceof EReference reference && reference.isContainer())) {
                continue;
            }
            if (feature instanceof EReference reference && reference.isContainment()) {
                compareOrder(id, element, previous, current, reference, changes);
                continue;
            }
            String was = show(previous, feature);
            String is = show(current, feature);
            if (!Objects.equals(was, is)) {
                changes.add(new ModelChange(ModelChange.Kind.CHANGED, id, element, words(feature.getName()), was,
                        is));
            }
        }
    }

    /**
     * Additions and removals of children are their own changes; here only a reordering of the children both versions
     * share counts (the order of axes or segments can matter, e.g. filter stages are applied in order).
     */
    private static void compareOrder(String id, String element, EObject previous, EObject current,
            EReference reference, List<ModelChange> changes) {
        List<String> was = childIds(previous, reference);
        List<String> is = childIds(current, reference);
        List<String> sharedWas = was.stream().filter(is::contains).toList();
        List<String> sharedIs = is.stream().filter(was::contains).toList();
        if (!sharedWas.equals(sharedIs)) {
            changes.add(new ModelChange(ModelChange.Kind.CHANGED, id, element, "order of " + words(reference.getName()),
                    String.join(", ", sharedWas), String.join(", ", sharedIs)));
        }
    }

    private static List<String> childIds(EObject owner, EReference reference) {
        Object value = owner.eGet(reference);
        List<?> children = reference.isMany() ? (List<?>) value : value == null ? List.of() : List.of(value);
        return children.stream().map(c -> idOf((EObject) c)).toList();
    }

    /** A feature's value as people read it: numbers in display units, references as ids. */
    private static String show(EObject owner, EStructuralFeature feature) {
        if (!owner.eIsSet(feature) && !(feature instanceof EAttribute)) {
            return "(none)";
        }
        Object value = owner.eGet(feature);
        if (feature instanceof EReference) {
            List<?> targets = feature.isMany() ? (List<?>) value : value == null ? List.of() : List.of(value);
            if (targets.isEmpty()) {
                return "(none)";
            }
            return targets.stream().map(t -> idOf((EObject) t)).collect(Collectors.joining(", "));
        }
        if (feature.isMany()) {
            return ((List<?>) value).stream().map(v -> showValue(owner, feature, v))
                    .collect(Collectors.joining(" ", "[", "]"));
        }
        return showValue(owner, feature, value);
    }

    private static String showValue(EObject owner, EStructuralFeature feature, Object value) {
        if (value instanceof Double d) {
            String unit = UnitAnnotations.displayUnit(owner, feature);
            return unit.isEmpty() ? org.tracewell.model.units.UnitTable.formatNumber(d, 0)
                    : UnitAnnotations.formatValue(owner, feature, d);
        }
        if (value instanceof EEnumLiteral literal) {
            return literal.getLiteral();
        }
        if (value instanceof org.eclipse.emf.common.util.Enumerator enumerator) {
            return enumerator.getLiteral();
        }
        return value == null ? "(none)" : value.toString();
    }

    /** Every element of the model (and of library axes a machine uses) by id, in document order. */
    private static Map<String, EObject> index(EObject root) {
        Set<EObject> roots = new LinkedHashSet<>();
        roots.add(root);
        if (root instanceof Machine machine) {
            for (Axis axis : machine.getLibraryAxes()) {
                if (!axis.eIsProxy()) {
                    roots.add(axis);
                }
            }
        }
        Map<String, EObject> index = new LinkedHashMap<>();
        for (EObject each : roots) {
            index.putIfAbsent(idOf(each), each);
            for (Iterator<EObject> it = each.eAllContents(); it.hasNext();) {
                EObject element = it.next();
                index.putIfAbsent(idOf(element), element);
            }
        }
        return index;
    }

    private static String idOf(EObject element) {
        String id = EcoreUtil.getID(element);
        if (id != null && !id.isBlank()) {
            return id;
        }
        return element.eResource() == null ? EcoreUtil.getURI(element).toString()
                : element.eResource().getURIFragment(element);
    }

    private static String describe(EObject element) {
        return TracewellValidator.describe(element);
    }

    private static String words(String camelCase) {
        return camelCase.replaceAll("([a-z0-9])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
    }
}
