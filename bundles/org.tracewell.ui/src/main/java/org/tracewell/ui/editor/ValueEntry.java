package org.tracewell.ui.editor;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.util.EList;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EEnumLiteral;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;
import org.tracewell.engine.poly.CoefficientText;
import org.tracewell.model.units.UnitTable;
import org.tracewell.model.units.UnitAnnotations;

/**
 * The one path by which the Machine Editor changes a value: text as typed → value in SI → check against the model's
 * validation rules → an EMF {@link SetCommand} on the editing domain's command stack (so it can be undone). An entry
 * that cannot be read, or that the rules reject, changes nothing and is answered with the reason.
 */
public final class ValueEntry {

    private final EditingDomain domain;
    private final ModelValidation validation = new ModelValidation();

    public ValueEntry(EditingDomain domain) {
        this.domain = domain;
    }

    /** How the current value of {@code feature} is shown in its field, in trade units. */
    public static String display(EObject owner, EStructuralFeature feature) {
        Object value = owner.eGet(feature);
        if (feature.isMany()) {
            List<String> parts = new ArrayList<>();
            for (Object each : (List<?>) value) {
                parts.add(each instanceof Double d ? UnitTable.formatNumber(d, 0) : String.valueOf(each));
            }
            return String.join(" ", parts);
        }
        if (value instanceof Double d) {
            return UnitAnnotations.formatValue(owner, feature, d);
        }
        if (value instanceof org.eclipse.emf.common.util.Enumerator literal) {
            return literal.getLiteral();
        }
        return value == null ? "" : String.valueOf(value);
    }

    /**
     * Reads {@code text} as the new value of {@code feature} of {@code owner} and, when valid, sets it by a command.
     *
     * @return the reason the entry was rejected (nothing was changed), or empty when it was applied or unchanged
     */
    public Optional<String> enter(EObject owner, EStructuralFeature feature, String text) {
        return parsed(owner, feature, text, value -> set(owner, feature, value));
    }

    /**
     * The reason {@link #enter} would reject {@code text}, or empty when it would accept it. Changes nothing; for
     * editors that check as the user types (the Properties view).
     */
    public Optional<String> check(EObject owner, EStructuralFeature feature, String text) {
        return parsed(owner, feature, text, value -> java.util.Objects.equals(owner.eGet(feature), value)
                ? Optional.empty() : newProblem(owner, feature, value));
    }

    /** Reads the text, then goes on with the value; a text that cannot be read is the rejection itself. */
    private static Optional<String> parsed(EObject owner, EStructuralFeature feature, String text,
            java.util.function.Function<Object, Optional<String>> then) {
        Object value;
        try {
            value = parse(owner, feature, text);
        } catch (IllegalArgumentException rejected) {
            return Optional.of(rejected.getMessage());
        }
        return then.apply(value);
    }

    /** Sets an already typed value (a choice from a list, a check box) through the same checks and command path. */
    public Optional<String> set(EObject owner, EStructuralFeature feature, Object value) {
        if (java.util.Objects.equals(owner.eGet(feature), value)) {
            return Optional.empty();
        }
        Optional<String> broken = newProblem(owner, feature, value);
        if (broken.isPresent()) {
            return broken;
        }
        Command command = SetCommand.create(domain, owner, feature, value);
        if (!command.canExecute()) {
            return Optional.of(feature.getName() + " of this element cannot be changed");
        }
        domain.getCommandStack().execute(command);
        return Optional.empty();
    }

    /** Text → model value of the feature's type (numbers in SI). */
    static Object parse(EObject owner, EStructuralFeature feature, String text) {
        if (!(feature instanceof EAttribute attribute)) {
            throw new IllegalArgumentException(feature.getName() + " is chosen from a list, not typed");
        }
        EDataType type = attribute.getEAttributeType();
        Class<?> javaType = type.getInstanceClass();
        if (attribute.isMany()) {
            if (javaType == double.class || javaType == Double.class) {
                // Same number rules and messages as the Loop Analysis view and the command line.
                CoefficientText.parse(feature.getName(), text);
                List<Double> list = new ArrayList<>();
                for (String token : text.strip().split("[\\s,]+")) {
                    list.add(CoefficientText.parseNumber(feature.getName(), token));
                }
                return list;
            }
            throw new IllegalArgumentException(feature.getName() + " cannot be typed");
        }
        if (javaType == double.class || javaType == Double.class) {
            return TradeValueParser.toSi(text, UnitAnnotations.siUnit(owner, feature),
                    UnitAnnotations.displayUnit(owner, feature));
        }
        if (javaType == int.class || javaType == Integer.class) {
            try {
                return Integer.valueOf(text.strip());
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("'" + text.strip() + "' is not a whole number; e.g. 1048576");
            }
        }
        if (javaType == boolean.class || javaType == Boolean.class) {
            String t = text.strip();
            if (t.equalsIgnoreCase("true") || t.equalsIgnoreCase("false")) {
                return Boolean.valueOf(t);
            }
            throw new IllegalArgumentException("'" + t + "': enter true or false");
        }
        if (type instanceof EEnum enumType) {
            EEnumLiteral literal = enumType.getEEnumLiteralByLiteral(text.strip());
            if (literal == null) {
                throw new IllegalArgumentException("'" + text.strip() + "': choose one of " + enumType.getELiterals()
                        .stream().map(EEnumLiteral::getLiteral).toList());
            }
            return literal.getInstance();
        }
        if (javaType == String.class) {
            return text;
        }
        throw new IllegalArgumentException(feature.getName() + " cannot be typed");
    }

    /**
     * The first error the validation rules find on the owner with the new value that they did not find with the old
     * one. Checked on a copy, so the model and its listeners see nothing of a rejected value.
     */
    private Optional<String> newProblem(EObject owner, EStructuralFeature feature, Object value) {
        EObject root = EcoreUtil.getRootContainer(owner);
        EcoreUtil.Copier copier = new EcoreUtil.Copier();
        copier.copy(root);
        copier.copyReferences();
        EObject trial = copier.get(owner);
        if (trial == null) {
            return Optional.empty();
        }
        Set<String> before = errorsOn(trial);
        // A chosen element (an axis for an allocation) is set as its copy: the rules check it belongs to the machine.
        if (feature.isMany()) {
            @SuppressWarnings("unchecked")
            EList<Object> list = (EList<Object>) trial.eGet(feature);
            list.clear();
            for (Object each : (List<?>) value) {
                list.add(inTrial(copier, each));
            }
        } else {
            trial.eSet(feature, inTrial(copier, value));
        }
        Set<String> after = errorsOn(trial);
        after.removeAll(before);
        return after.stream().findFirst();
    }

    private static Object inTrial(EcoreUtil.Copier copier, Object value) {
        return value instanceof EObject original && copier.get(original) != null ? copier.get(original) : value;
    }

    private Set<String> errorsOn(EObject element) {
        Set<String> messages = new HashSet<>();
        for (ValidationProblem problem : validation.validate(element)) {
            if (problem.severity() == ValidationProblem.Severity.ERROR && problem.element() == element) {
                messages.add(problem.message());
            }
        }
        return messages;
    }
}
