package org.tracewell.core.mapping;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.tracewell.core.validation.TracewellValidator;
import org.tracewell.engine.axis.AxisPlant;
import org.tracewell.engine.axis.DirectLinearDrive;
import org.tracewell.engine.axis.RackAndPinionDrive;
import org.tracewell.engine.axis.TwoMassScrewDrive;
import org.tracewell.engine.measured.PlantFitModel;
import org.tracewell.model.Axis;
import org.tracewell.model.DirectDrive;
import org.tracewell.model.Plant;
import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.RotaryTable;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.TwoMassDrive;
import org.tracewell.model.units.UnitAnnotations;

/**
 * The reverse of {@link EngineMapping} for the plant parameters a fit determines: writes a fitted engine plant (as
 * {@code PlantUpdate} puts a fit back into an axis's plant) into an updated copy of the model, SI as the model
 * stores it, every attribute the fit does not determine left as it was.
 * <p>
 * What each fit determines:
 * <ul>
 * <li>rigid fit (total inertia J, viscous damping b) — rigid screw and rack-and-pinion drives: load mass, viscous
 * friction; direct drive: moving mass, viscous friction; rotary table: table inertia, viscous friction;</li>
 * <li>two-mass fit (J_M, J_L, k, c, b) — two-mass drive: motor inertia, load mass, nut stiffness (the chain's
 * screw and bearings are geometry, kept), damping ratio ζ = c/(2·√(k·m)) of the axial mode at the nut position
 * the forward mapping evaluates, viscous friction.</li>
 * </ul>
 * The copy is mapped forward again and must give the fitted plant back (relative {@value #ROUND_TRIP_TOLERANCE});
 * a fitted plant that differs in anything a fit does not determine (lead, ratio, current loop…) is refused, so
 * nothing else can change unseen. Pure function: the model given is never changed.
 */
public final class PlantParameterUpdate {

    /** Relative agreement of the forward-mapped copy with the fitted plant: a few ulps of arithmetic, no more. */
    public static final double ROUND_TRIP_TOLERANCE = 1e-9;

    private PlantParameterUpdate() {
    }

    /**
     * An updated copy of the model holding {@code axis} (its machine, or its library {@code .axis} file) with the
     * fit written into the axis's plant.
     *
     * @param axis        the axis as loaded (inline in a machine, or a library axis)
     * @param fitted      the structure the fit assumed
     * @param fittedPlant the axis's engine plant with the fit applied ({@code PlantUpdate.updated()})
     * @throws MappingException when the model's plant kind and the fitted kind differ, or the fitted plant is not of
     *                          the engine kind the model's plant maps to; the message names axis and both kinds
     */
    public static UpdatedAxisModel apply(Axis axis, PlantFitModel fitted, AxisPlant fittedPlant)
            throws MappingException {
        Plant plant = axis.getPlant();
        if (plant == null) {
            throw new MappingException(axis.getId(), describe(axis) + ": has no plant to update");
        }
        checkKinds(axis, plant, fitted, fittedPlant);
        EObject original = EcoreUtil.getRootContainer(axis);
        EcoreUtil.Copier copier = new EcoreUtil.Copier();
        EObject copy = copier.copy(original);
        copier.copyReferences();
        Axis axisCopy = (Axis) copier.get(axis);
        Plant target = axisCopy.getPlant();
        List<PlantAttributeChange> changes = new ArrayList<>();
        switch (fittedPlant) {
            case TwoMassScrewDrive s -> {
                double axialStiffness = s.stiffnessChain().stiffnessAt(s.nutPosition());
                set(target, Literals.RIGID_SCREW_DRIVE__MOTOR_INERTIA, s.motor().inertia(), changes);
                set(target, Literals.RIGID_SCREW_DRIVE__LOAD_MASS, s.loadMass(), changes);
                set(target, Literals.TWO_MASS_DRIVE__NUT_STIFFNESS, s.stiffnessChain().nutStiffness(), changes);
                // The model keeps the damping as a ratio; the forward mapping turns it back with the same k and m.
                set(target, Literals.TWO_MASS_DRIVE__DAMPING_RATIO,
                        s.axialDamping() / (2 * Math.sqrt(axialStiffness * s.loadMass())), changes);
                set(target, Literals.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION, s.viscousFriction(), changes);
            }
            case org.tracewell.engine.axis.RigidScrewDrive s ->
                rigid(target, Literals.RIGID_SCREW_DRIVE__LOAD_MASS, s.loadMass(), s.viscousFriction(), changes);
            case RackAndPinionDrive r ->
                rigid(target, Literals.RACK_PINION_DRIVE__LOAD_MASS, r.loadMass(), r.viscousFriction(), changes);
            case DirectLinearDrive d ->
                rigid(target, Literals.DIRECT_DRIVE__MOVING_MASS, d.movingMass(), d.viscousFriction(), changes);
            case org.tracewell.engine.axis.RotaryTable t ->
                rigid(target, Literals.ROTARY_TABLE__TABLE_INERTIA, t.tableInertia(), t.viscousFriction(), changes);
            default -> throw new IllegalStateException("checked above: " + fittedPlant.getClass().getName());
        }
        checkRoundTrip(axisCopy, fittedPlant);
        return new UpdatedAxisModel(original, copy, axisCopy, changes);
    }

    /** The model plant must be the kind the fit describes, and the fitted plant the engine record it maps to. */
    private static void checkKinds(Axis axis, Plant plant, PlantFitModel fitted, AxisPlant fittedPlant)
            throws MappingException {
        boolean twoMassModel = plant instanceof TwoMassDrive;
        boolean rigidModel = !twoMassModel && (plant instanceof RigidScrewDrive || plant instanceof RackPinionDrive
                || plant instanceof DirectDrive || plant instanceof RotaryTable);
        boolean kindsAgree = fitted == PlantFitModel.TWO_MASS ? twoMassModel : rigidModel;
        if (!kindsAgree) {
            throw new MappingException(plant.getId(), describe(axis) + ": the model's plant is a " + modelKind(plant)
                    + " but the fit is a " + fitted.displayName() + " fit; a fit updates only a plant of its own kind"
                    + " (" + (fitted == PlantFitModel.TWO_MASS ? "two-mass: a TwoMassDrive"
                            : "rigid: a RigidScrewDrive, RackPinionDrive, DirectDrive or RotaryTable")
                    + ") — fit " + (twoMassModel ? "two-mass" : "rigid") + " for this axis, or change its plant kind"
                    + " first");
        }
        boolean engineKindAgrees = switch (plant) {
            case TwoMassDrive t -> fittedPlant instanceof TwoMassScrewDrive;
            case RigidScrewDrive s -> fittedPlant instanceof org.tracewell.engine.axis.RigidScrewDrive;
            case RackPinionDrive r -> fittedPlant instanceof RackAndPinionDrive;
            case DirectDrive d -> fittedPlant instanceof DirectLinearDrive;
            case RotaryTable t -> fittedPlant instanceof org.tracewell.engine.axis.RotaryTable;
            default -> false;
        };
        if (!engineKindAgrees) {
            throw new MappingException(plant.getId(), describe(axis) + ": the model's plant is a " + modelKind(plant)
                    + " but the fitted plant is a " + engineKind(fittedPlant) + " (from a " + fitted.displayName()
                    + " fit); its values cannot be written as the model plant's attributes");
        }
    }

    private static void checkRoundTrip(Axis updated, AxisPlant fittedPlant) throws MappingException {
        AxisPlant forward = EngineMapping.mapAxis(updated).model().plant();
        Map<String, Object> expected = parameters(fittedPlant);
        Map<String, Object> actual = parameters(forward);
        for (Map.Entry<String, Object> e : expected.entrySet()) {
            Object got = actual.get(e.getKey());
            if (!agree(e.getValue(), got)) {
                throw new MappingException(updated.getPlant().getId(), describe(updated) + ": the fitted plant has "
                        + e.getKey() + " = " + e.getValue() + " but the model gives " + got + "; a fit does not"
                        + " determine " + e.getKey() + " — fit against this axis's own plant (same current loop,"
                        + " ratio and geometry)");
            }
        }
    }

    private static boolean agree(Object expected, Object actual) {
        if (expected instanceof Double a && actual instanceof Double b) {
            return a.equals(b) || Math.abs(a - b) <= ROUND_TRIP_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
        }
        return expected.equals(actual);
    }

    /**
     * Every parameter of an engine plant by path ({@code motor.inertia}, {@code stiffnessChain.nutStiffness}…),
     * numbers as doubles, enums as themselves: the engine's plants are records of records.
     */
    static Map<String, Object> parameters(AxisPlant plant) {
        Map<String, Object> out = new LinkedHashMap<>();
        if (!(plant instanceof Record record)) {
            throw new IllegalStateException("engine plants are records; " + plant.getClass().getName() + " is not");
        }
        collect("", record, out);
        return out;
    }

    private static void collect(String prefix, Record value, Map<String, Object> out) {
        for (RecordComponent component : value.getClass().getRecordComponents()) {
            Object v;
            try {
                v = component.getAccessor().invoke(value);
            } catch (IllegalAccessException | InvocationTargetException e) {
                throw new IllegalStateException("cannot read " + component.getName() + " of " + value, e);
            }
            String name = prefix + component.getName();
            if (v instanceof Record nested) {
                collect(name + ".", nested, out);
            } else if (v instanceof Number n) {
                out.put(name, n.doubleValue());
            } else {
                out.put(name, v);
            }
        }
    }

    /** What a rigid fit determines: the moving mass (or inertia) the motor drives, and the viscous friction. */
    private static void rigid(Plant plant, EAttribute moving, double movingValue, double viscousFriction,
            List<PlantAttributeChange> changes) {
        set(plant, moving, movingValue, changes);
        set(plant, Literals.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION, viscousFriction, changes);
    }

    private static void set(Plant plant, EAttribute attribute, double value, List<PlantAttributeChange> changes) {
        double before = (Double) plant.eGet(attribute);
        plant.eSet(attribute, value);
        changes.add(new PlantAttributeChange(plant.getId(), attribute.getName(), before, value,
                UnitAnnotations.siUnit(plant, attribute), UnitAnnotations.displayUnit(plant, attribute)));
    }

    /** How the model's plant kinds are called in messages. */
    static String modelKind(Plant plant) {
        String kind = switch (plant) {
            case TwoMassDrive t -> "two-mass drive";
            case RigidScrewDrive s -> "rigid screw drive";
            case RackPinionDrive r -> "rack-and-pinion drive";
            case DirectDrive d -> "direct drive";
            case RotaryTable t -> "rotary table";
            default -> TracewellValidator.describe(plant).toLowerCase(java.util.Locale.ROOT);
        };
        return kind + " (" + plant.eClass().getName() + ")";
    }

    private static String engineKind(AxisPlant plant) {
        return switch (plant) {
            case TwoMassScrewDrive t -> "two-mass screw drive";
            case org.tracewell.engine.axis.RigidScrewDrive s -> "rigid screw drive";
            case RackAndPinionDrive r -> "rack-and-pinion drive";
            case DirectLinearDrive d -> "direct linear drive";
            case org.tracewell.engine.axis.RotaryTable t -> "rotary table";
            case org.tracewell.engine.axis.TransferFunctionPlant t -> "explicit transfer-function plant";
        };
    }

    private static String describe(EObject element) {
        return TracewellValidator.describe(element);
    }
}
