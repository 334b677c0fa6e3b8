package org.tracewell.core.validation;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.util.EObjectValidator;
import org.tracewell.model.Arc;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Corner;
import org.tracewell.model.CornerKind;
import org.tracewell.model.DirectDrive;
import org.tracewell.model.Encoder;
import org.tracewell.model.EncoderSide;
import org.tracewell.model.FilterStage;
import org.tracewell.model.FullCircle;
import org.tracewell.model.Identified;
import org.tracewell.model.LeadLagFilter;
import org.tracewell.model.Line;
import org.tracewell.model.LowPassFilter;
import org.tracewell.model.LowPassOrder;
import org.tracewell.model.Machine;
import org.tracewell.model.MotorDrivenPlant;
import org.tracewell.model.Named;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.PidController;
import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.RotaryTable;
import org.tracewell.model.Segment;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.TransferFunctionController;
import org.tracewell.model.TransferFunctionPlant;
import org.tracewell.model.TwoMassDrive;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;
import org.tracewell.model.paths.AttributePath;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyMetrics;
import org.tracewell.core.variation.SweepRange;
import org.tracewell.model.units.TradeUnit;
import org.tracewell.model.units.UnitTable;
import org.tracewell.model.units.UnitAnnotations;

/**
 * Tracewell's model rules as an EMF {@link org.eclipse.emf.ecore.EValidator}: EMF's structural checks (multiplicity,
 * unique ids, resolvable references) plus physical plausibility, consistency between elements and references to axes
 * the machine has. Every message names the element, the bad value in its display unit and the valid range.
 * <p>
 * Stateless; {@link #INSTANCE} can be shared and registered for {@link TracewellPackage}.
 */
public class TracewellValidator extends EObjectValidator {

    public static final TracewellValidator INSTANCE = new TracewellValidator();
    public static final String DIAGNOSTIC_SOURCE = "org.tracewell.core";

    // Rule codes (stable: tools and tests refer to them through codeName()).
    public static final int NOT_FINITE = 1;
    public static final int NOT_POSITIVE = 2;
    public static final int NEGATIVE = 3;
    public static final int OUT_OF_RANGE = 4;
    public static final int MISSING = 5;
    public static final int DUPLICATE_NAME = 6;
    public static final int GANTRY = 7;
    public static final int AXIS_NOT_IN_MACHINE = 8;
    public static final int SAMPLE_PERIOD = 9;
    public static final int UNIT = 10;
    public static final int GEOMETRY = 11;
    public static final int TRANSFER_FUNCTION = 12;
    public static final int ID_SYNTAX = 13;
    public static final int REQUIREMENT_TREE = 14;
    public static final int STUDY = 15;

    private static final Map<Integer, String> CODE_NAMES = Map.ofEntries(Map.entry(NOT_FINITE, "tw.finite"),
            Map.entry(NOT_POSITIVE, "tw.positive"), Map.entry(NEGATIVE, "tw.nonNegative"),
            Map.entry(OUT_OF_RANGE, "tw.range"), Map.entry(MISSING, "tw.missing"),
            Map.entry(DUPLICATE_NAME, "tw.duplicateName"), Map.entry(GANTRY, "tw.gantry"),
            Map.entry(AXIS_NOT_IN_MACHINE, "tw.axisNotInMachine"), Map.entry(SAMPLE_PERIOD, "tw.samplePeriod"),
            Map.entry(UNIT, "tw.unit"), Map.entry(GEOMETRY, "tw.geometry"),
            Map.entry(TRANSFER_FUNCTION, "tw.transferFunction"), Map.entry(ID_SYNTAX, "tw.id"),
            Map.entry(REQUIREMENT_TREE, "tw.requirementTree"), Map.entry(STUDY, "tw.study"));

    /**
     * A position loop needs its time constant 1/Kv to span many samples; Kv·T ≤ 0.1 keeps the phase loss of the
     * sampling (about 1.5·T·ωc, DOMAIN.md §2) small (common practice).
     */
    public static final double MAX_KV_TIMES_SAMPLE_PERIOD = 0.1;
    /** The velocity integral time should span at least this many velocity-loop samples (common practice). */
    public static final double MIN_INTEGRAL_TIME_IN_SAMPLES = 10.0;
    /** Arc end and start radius may differ by this much before the arc is called inconsistent: 1 µm. */
    public static final double ARC_RADIUS_TOLERANCE = 1e-6;

    private static final Pattern ID_PATTERN = Pattern.compile("[A-Za-z0-9_][A-Za-z0-9_.\\-]*");

    /** The stable name of a rule code, e.g. {@code tw.positive}. */
    public static String codeName(int code) {
        return CODE_NAMES.getOrDefault(code, "tw." + code);
    }

    @Override
    protected EcorePackage getEPackage() {
        return EcorePackage.eINSTANCE;
    }

    @Override
    public boolean validate(EClass eClass, EObject eObject, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean structural = validate_EveryDefaultConstraint(eObject, diagnostics, context);
        if (eClass.getEPackage() != TracewellPackage.eINSTANCE) {
            return structural;
        }
        Rules rules = new Rules(eObject, diagnostics);
        rules.check();
        return structural && rules.ok;
    }

    // ---------------------------------------------------------------------------------------------- descriptions

    /** How messages name an element: {@code Axis 'Y' [lm3020-y]}, {@code plant (TwoMassDrive) of Axis 'Y' ...}. */
    public static String describe(EObject element) {
        if (element == null) {
            return "(nothing)";
        }
        String type = words(element.eClass().getName());
        String id = element instanceof Identified identified && identified.getId() != null
                && !identified.getId().isBlank() ? " [" + identified.getId() + "]" : "";
        if (element instanceof Named named && named.getName() != null && !named.getName().isBlank()) {
            return capitalise(type) + " '" + named.getName() + "'" + id;
        }
        if (element instanceof BudgetLine line && line.getName() != null && !line.getName().isBlank()) {
            return "budget line '" + line.getName() + "'" + id;
        }
        if (element instanceof Requirement) {
            return "requirement" + id;
        }
        EObject container = element.eContainer();
        if (container == null) {
            return capitalise(type) + id;
        }
        return words(element.eContainingFeature().getName()) + " (" + element.eClass().getName() + ")" + id + " of "
                + describe(container);
    }

    private static String words(String camelCase) {
        return camelCase.replaceAll("([a-z0-9])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
    }

    private static String capitalise(String text) {
        return text.isEmpty() ? text : Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }

    // ---------------------------------------------------------------------------------------------- rules

    /** The checks of one element; collects diagnostics and whether any error was found. */
    private static final class Rules {
        private final EObject element;
        private final DiagnosticChain diagnostics;
        private final Set<EStructuralFeature> notFinite = new HashSet<>();
        boolean ok = true;

        Rules(EObject element, DiagnosticChain diagnostics) {
            this.element = element;
            this.diagnostics = diagnostics;
        }

        void check() {
            finiteNumbers();
            if (element instanceof Identified identified && identified.getId() != null
                    && !identified.getId().isBlank() && !ID_PATTERN.matcher(identified.getId()).matches()) {
                error(ID_SYNTAX, "id '" + identified.getId() + "' may contain only letters, digits, '_', '.' and '-'"
                        + " (it is used in references such as library/z.axis#ID)", Literals.IDENTIFIED__ID);
            }
            switch (element) {
                case Machine m -> machine(m);
                case Axis a -> axis(a);
                case TwoMassDrive t -> {
                    rigidScrew(t);
                    twoMass(t);
                }
                case RigidScrewDrive s -> rigidScrew(s);
                case RackPinionDrive r -> rackPinion(r);
                case DirectDrive d -> directDrive(d);
                case RotaryTable t -> rotaryTable(t);
                case TransferFunctionPlant tf -> {
                    transferFunction(tf.getNumerator(), tf.getDenominator(), Literals.TRANSFER_FUNCTION_PLANT__DENOMINATOR,
                            true);
                    nonNegative(Literals.TRANSFER_FUNCTION_PLANT__DEAD_TIME, "a delay cannot be negative");
                    positive(Literals.TRANSFER_FUNCTION_PLANT__RATIO, "load travel per motor radian");
                    positive(Literals.TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA, "the motor sees an inertia");
                    positive(Literals.TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT, null);
                    nonNegative(Literals.TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH,
                            "0 when the function contains the current loop");
                }
                case CascadeController c -> cascade(c);
                case PidController p -> pid(p);
                case TransferFunctionController tf -> {
                    transferFunction(tf.getNumerator(), tf.getDenominator(),
                            Literals.TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR, false);
                    positive(Literals.TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD, "the controller runs sampled");
                }
                case LowPassFilter f -> {
                    positive(Literals.LOW_PASS_FILTER__CUTOFF_FREQUENCY, null);
                    if (f.getOrder() == LowPassOrder.SECOND) {
                        positive(Literals.LOW_PASS_FILTER__DAMPING_RATIO, "a second-order low-pass needs damping");
                    }
                }
                case NotchFilter n -> {
                    positive(Literals.NOTCH_FILTER__CENTRE_FREQUENCY, null);
                    positive(Literals.NOTCH_FILTER__WIDTH, null);
                    range(Literals.NOTCH_FILTER__DEPTH, 0.0, true, 1.0, false, "gain at the notch centre");
                }
                case LeadLagFilter l -> {
                    positive(Literals.LEAD_LAG_FILTER__ZERO_FREQUENCY, null);
                    positive(Literals.LEAD_LAG_FILTER__POLE_FREQUENCY, null);
                    if (l.getZeroFrequency() == l.getPoleFrequency() && l.getZeroFrequency() > 0) {
                        warning(OUT_OF_RANGE, "zero and pole frequency are equal ("
                                + value(Literals.LEAD_LAG_FILTER__ZERO_FREQUENCY)
                                + "): the stage does nothing; valid: zero ≠ pole", Literals.LEAD_LAG_FILTER__POLE_FREQUENCY);
                    }
                }
                case Encoder e -> encoder(e);
                case Contour c -> contour(c);
                case Corner c -> {
                    nonNegative(Literals.CORNER__ROUNDING_TOLERANCE, null);
                    if (c.getKind() == CornerKind.ROUNDED) {
                        positive(Literals.CORNER__ROUNDING_TOLERANCE, "a rounded corner needs a tolerance");
                    }
                }
                case Requirement r -> requirement(r);
                case BudgetLine b -> budgetLine(b);
                case VariationStudy v -> study(v);
                case VariedParameter p -> variedParameter(p);
                default -> {
                    // Segments without own rules (Line, Arc, FullCircle) are checked by their contour.
                }
            }
        }

        // ---- per class

        private void machine(Machine m) {
            positive(Literals.MACHINE__INTERPOLATION_PERIOD, "the interpolator must run");
            List<Axis> axes = allAxes(m);
            if (axes.isEmpty()) {
                warning(MISSING, "has no axes; expected at least one axis (inline or from a library file)",
                        Literals.MACHINE__AXES);
            }
            Map<String, Axis> byName = new HashMap<>();
            for (Axis axis : axes) {
                if (axis.eIsProxy()) {
                    error(MISSING, "library axis " + ((org.eclipse.emf.ecore.InternalEObject) axis).eProxyURI()
                            + " cannot be found; expected an .axis file at that relative path",
                            Literals.MACHINE__LIBRARY_AXES);
                    continue;
                }
                String name = axis.getName();
                if (name != null && !name.isBlank()) {
                    Axis other = byName.putIfAbsent(name, axis);
                    if (other != null && other != axis) {
                        error(DUPLICATE_NAME, "two axes are named '" + name + "' (" + describe(other) + " and "
                                + describe(axis) + "); expected unique axis names", Literals.MACHINE__AXES);
                    }
                }
                if (axis.getGantryPartner() != null && !axis.getGantryPartner().eIsProxy()
                        && !axes.contains(axis.getGantryPartner())) {
                    error(AXIS_NOT_IN_MACHINE, describe(axis) + " has gantry partner "
                            + describe(axis.getGantryPartner()) + ", which is not an axis of this machine",
                            Literals.MACHINE__AXES);
                }
                if (axis.getController() instanceof CascadeController c && m.getInterpolationPeriod() > 0
                        && c.getPositionSamplePeriod() > m.getInterpolationPeriod()) {
                    warning(SAMPLE_PERIOD, "interpolation period " + value(Literals.MACHINE__INTERPOLATION_PERIOD)
                            + " is shorter than the position sample period "
                            + UnitTable.format(c.getPositionSamplePeriod(), "ms") + " of " + describe(axis)
                            + "; valid: interpolation period ≥ every position sample period",
                            Literals.MACHINE__INTERPOLATION_PERIOD);
                }
            }
        }

        private void axis(Axis a) {
            if (a.getName() == null || a.getName().isBlank()) {
                error(MISSING, "has no name; expected an axis name such as X, Y, Z, A, C or X2", Literals.NAMED__NAME);
            }
            if (a.getPlant() == null) {
                error(MISSING, "has no plant; expected one of rigid screw drive, two-mass drive, rack and pinion drive,"
                        + " direct drive, rotary table, transfer function plant", Literals.AXIS__PLANT);
            }
            if (a.getController() == null) {
                error(MISSING, "has no controller; expected a cascade, PID or transfer function controller",
                        Literals.AXIS__CONTROLLER);
            }
            if (a.getEncoder() == null) {
                warning(MISSING, "has no encoder; quantisation cannot be budgeted", Literals.AXIS__ENCODER);
            }
            positive(Literals.AXIS__MAX_VELOCITY, null);
            positive(Literals.AXIS__MAX_ACCELERATION, null);
            positive(Literals.AXIS__MAX_JERK, null);
            Axis partner = a.getGantryPartner();
            if (partner != null && !partner.eIsProxy()) {
                if (partner == a) {
                    error(GANTRY, "is its own gantry partner; expected the other motor of the gantry pair",
                            Literals.AXIS__GANTRY_PARTNER);
                } else if (partner.getGantryPartner() != a) {
                    error(GANTRY, "names " + describe(partner) + " as gantry partner, but that axis names "
                            + (partner.getGantryPartner() == null ? "no partner" : describe(partner.getGantryPartner()))
                            + "; expected both axes of a gantry pair to name each other", Literals.AXIS__GANTRY_PARTNER);
                } else if (partner.getKind() != a.getKind()) {
                    error(GANTRY, "is " + a.getKind().getLiteral() + " but its gantry partner " + describe(partner)
                            + " is " + partner.getKind().getLiteral() + "; expected both of the same kind",
                            Literals.AXIS__GANTRY_PARTNER);
                }
            }
        }

        private void motorDriven(MotorDrivenPlant p) {
            positive(Literals.MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH, "the current loop has a finite bandwidth");
            nonNegative(Literals.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION, "friction dissipates energy");
            nonNegative(Literals.MOTOR_DRIVEN_PLANT__COULOMB_FRICTION, "friction dissipates energy");
        }

        private void rigidScrew(RigidScrewDrive s) {
            motorDriven(s);
            positive(Literals.RIGID_SCREW_DRIVE__MOTOR_INERTIA, "a motor rotor has inertia");
            positive(Literals.RIGID_SCREW_DRIVE__SCREW_INERTIA, "a screw has inertia");
            positive(Literals.RIGID_SCREW_DRIVE__LOAD_MASS, "a moving load has mass");
            positive(Literals.RIGID_SCREW_DRIVE__LEAD, "travel per screw revolution");
            positive(Literals.RIGID_SCREW_DRIVE__GEAR_RATIO, null);
            positive(Literals.RIGID_SCREW_DRIVE__TORQUE_CONSTANT, null);
        }

        private void twoMass(TwoMassDrive t) {
            positive(Literals.TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER, null);
            positive(Literals.TWO_MASS_DRIVE__BEARING_SPAN, null);
            positive(Literals.TWO_MASS_DRIVE__NUT_STIFFNESS, "a rigid nut would be a rigid screw drive");
            positive(Literals.TWO_MASS_DRIVE__BEARING_STIFFNESS, null);
            range(Literals.TWO_MASS_DRIVE__DAMPING_RATIO, 0.0, true, 1.0, false, "modal damping of a resonance");
            nonNegative(Literals.TWO_MASS_DRIVE__NUT_POSITION_MIN, "measured from the fixed bearing");
            if (t.getNutPositionMax() <= t.getNutPositionMin()) {
                error(OUT_OF_RANGE, "nut position max " + value(Literals.TWO_MASS_DRIVE__NUT_POSITION_MAX)
                        + " is not beyond nut position min " + value(Literals.TWO_MASS_DRIVE__NUT_POSITION_MIN)
                        + "; valid: min < max ≤ bearing span", Literals.TWO_MASS_DRIVE__NUT_POSITION_MAX);
            } else if (t.getBearingSpan() > 0 && t.getNutPositionMax() > t.getBearingSpan()) {
                error(OUT_OF_RANGE, "nut position max " + value(Literals.TWO_MASS_DRIVE__NUT_POSITION_MAX)
                        + " lies beyond the bearing span " + value(Literals.TWO_MASS_DRIVE__BEARING_SPAN)
                        + "; valid: min < max ≤ bearing span", Literals.TWO_MASS_DRIVE__NUT_POSITION_MAX);
            }
        }

        private void rackPinion(RackPinionDrive r) {
            motorDriven(r);
            positive(Literals.RACK_PINION_DRIVE__MOTOR_INERTIA, "a motor rotor has inertia");
            nonNegative(Literals.RACK_PINION_DRIVE__GEARBOX_INERTIA, null);
            positive(Literals.RACK_PINION_DRIVE__PINION_RADIUS, null);
            positive(Literals.RACK_PINION_DRIVE__GEAR_RATIO, null);
            positive(Literals.RACK_PINION_DRIVE__LOAD_MASS, "a moving load has mass");
            positive(Literals.RACK_PINION_DRIVE__TORQUE_CONSTANT, null);
            nonNegative(Literals.RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS, "0 means rigid");
        }

        private void directDrive(DirectDrive d) {
            motorDriven(d);
            positive(Literals.DIRECT_DRIVE__MOVING_MASS, "a moving load has mass");
            positive(Literals.DIRECT_DRIVE__FORCE_CONSTANT, null);
        }

        private void rotaryTable(RotaryTable t) {
            motorDriven(t);
            positive(Literals.ROTARY_TABLE__MOTOR_INERTIA, "a motor rotor has inertia");
            positive(Literals.ROTARY_TABLE__TABLE_INERTIA, "a table has inertia");
            positive(Literals.ROTARY_TABLE__GEAR_RATIO, "1 for a torque motor");
            positive(Literals.ROTARY_TABLE__TORQUE_CONSTANT, null);
            nonNegative(Literals.ROTARY_TABLE__TORSIONAL_STIFFNESS, "0 means rigid");
        }

        private void transferFunction(List<Double> numerator, List<Double> denominator, EAttribute denominatorFeature,
                boolean strictlyProper) {
            if (denominator.isEmpty() || denominator.get(0) == 0.0) {
                error(TRANSFER_FUNCTION, "denominator " + denominator + " has no leading coefficient; expected"
                        + " coefficients in descending powers of s with a non-zero first one", denominatorFeature);
            } else if (numerator.isEmpty() || numerator.stream().allMatch(c -> c == 0.0)) {
                error(TRANSFER_FUNCTION, "numerator " + numerator + " is zero; expected at least one non-zero"
                        + " coefficient", denominatorFeature);
            } else if (degree(numerator) > denominator.size() - 1) {
                error(TRANSFER_FUNCTION, "numerator degree " + degree(numerator) + " exceeds denominator degree "
                        + (denominator.size() - 1) + "; expected a proper transfer function", denominatorFeature);
            } else if (strictlyProper && degree(numerator) == denominator.size() - 1) {
                error(TRANSFER_FUNCTION, "numerator degree " + degree(numerator) + " equals denominator degree "
                        + (denominator.size() - 1) + "; expected a strictly proper plant (torque cannot change"
                        + " velocity instantly)", denominatorFeature);
            }
        }

        private static int degree(List<Double> coefficients) {
            int leadingZeros = 0;
            while (leadingZeros < coefficients.size() && coefficients.get(leadingZeros) == 0.0) {
                leadingZeros++;
            }
            return coefficients.size() - 1 - leadingZeros;
        }

        private void cascade(CascadeController c) {
            positive(Literals.CASCADE_CONTROLLER__POSITION_GAIN, "Kv");
            positive(Literals.CASCADE_CONTROLLER__VELOCITY_GAIN, null);
            positive(Literals.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME, null);
            range(Literals.CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD, 0.0, true, 1.0, true, "a fraction");
            range(Literals.CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD, 0.0, true, 1.0, true, "a fraction");
            boolean position = positive(Literals.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD, null);
            boolean velocity = positive(Literals.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD, null);
            if (position && velocity && c.getVelocitySamplePeriod() > c.getPositionSamplePeriod()) {
                error(SAMPLE_PERIOD, "velocity sample period " + value(Literals.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD)
                        + " is longer than the position sample period "
                        + value(Literals.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD)
                        + "; valid: the inner loop samples at least as fast as the outer one",
                        Literals.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD);
            }
            if (position && c.getPositionGain() > 0
                    && c.getPositionGain() * c.getPositionSamplePeriod() > MAX_KV_TIMES_SAMPLE_PERIOD) {
                error(SAMPLE_PERIOD, "position sample period " + value(Literals.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD)
                        + " is too long for the position loop time constant 1/Kv = "
                        + UnitTable.format(1.0 / c.getPositionGain(), "ms") + "; valid: ≤ "
                        + UnitTable.format(MAX_KV_TIMES_SAMPLE_PERIOD / c.getPositionGain(), "ms")
                        + " (Kv·T ≤ " + MAX_KV_TIMES_SAMPLE_PERIOD + ")",
                        Literals.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD);
            }
            if (velocity && c.getVelocityIntegralTime() > 0
                    && c.getVelocityIntegralTime() < MIN_INTEGRAL_TIME_IN_SAMPLES * c.getVelocitySamplePeriod()) {
                error(SAMPLE_PERIOD, "velocity sample period " + value(Literals.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD)
                        + " is too long for the integral time " + value(Literals.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME)
                        + "; valid: ≤ " + UnitTable.format(c.getVelocityIntegralTime() / MIN_INTEGRAL_TIME_IN_SAMPLES, "ms"),
                        Literals.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD);
            }
            if (velocity) {
                double nyquist = 0.5 / c.getVelocitySamplePeriod();
                for (FilterStage stage : c.getFilterStages()) {
                    double highest = highestFrequency(stage);
                    if (highest >= nyquist) {
                        error(SAMPLE_PERIOD, describe(stage) + " acts at " + UnitTable.format(highest, "Hz")
                                + ", at or above the Nyquist frequency " + UnitTable.format(nyquist, "Hz")
                                + " of the velocity loop; valid: below " + UnitTable.format(nyquist, "Hz"),
                                Literals.CASCADE_CONTROLLER__FILTER_STAGES);
                    }
                }
            }
        }

        private static double highestFrequency(FilterStage stage) {
            return switch (stage) {
                case LowPassFilter f -> f.getCutoffFrequency();
                case NotchFilter f -> f.getCentreFrequency();
                case LeadLagFilter f -> Math.max(f.getZeroFrequency(), f.getPoleFrequency());
                default -> 0.0;
            };
        }

        private void pid(PidController p) {
            positive(Literals.PID_CONTROLLER__PROPORTIONAL_GAIN, null);
            nonNegative(Literals.PID_CONTROLLER__INTEGRAL_GAIN, null);
            nonNegative(Literals.PID_CONTROLLER__DERIVATIVE_GAIN, null);
            nonNegative(Literals.PID_CONTROLLER__DERIVATIVE_FILTER_TIME, null);
            if (positive(Literals.PID_CONTROLLER__SAMPLE_PERIOD, null) && p.getDerivativeGain() > 0
                    && p.getDerivativeFilterTime() < p.getSamplePeriod()) {
                warning(SAMPLE_PERIOD, "derivative filter time " + value(Literals.PID_CONTROLLER__DERIVATIVE_FILTER_TIME)
                        + " is shorter than the sample period " + value(Literals.PID_CONTROLLER__SAMPLE_PERIOD)
                        + "; valid: ≥ the sample period", Literals.PID_CONTROLLER__DERIVATIVE_FILTER_TIME);
            }
        }

        private void encoder(Encoder e) {
            boolean linearScale = e.getSide() == EncoderSide.LOAD && !UnitAnnotations.isRotary(e);
            if (linearScale) {
                positive(Literals.ENCODER__LINEAR_RESOLUTION, "a load-side linear scale has a resolution");
            } else if (e.getCountsPerRevolution() <= 0) {
                error(NOT_POSITIVE, "counts per revolution = " + e.getCountsPerRevolution() + "; valid range: > 0"
                        + " (a rotary encoder has a number of counts per revolution)",
                        Literals.ENCODER__COUNTS_PER_REVOLUTION);
            }
        }

        private void contour(Contour c) {
            positive(Literals.CONTOUR__FEED, null);
            positive(Literals.CONTOUR__PATH_ACCELERATION, null);
            positive(Literals.CONTOUR__PATH_JERK, null);
            positive(Literals.CONTOUR__SAMPLE_PERIOD, null);
            Machine machine = machineOf(c);
            List<Axis> axes = c.getAxisAssignment();
            if (axes.size() == 2 && axes.get(0) == axes.get(1)) {
                error(AXIS_NOT_IN_MACHINE, "uses axis " + describe(axes.get(0)) + " for both path x and path y;"
                        + " expected two different axes", Literals.CONTOUR__AXIS_ASSIGNMENT);
            }
            for (Axis axis : axes) {
                if (machine != null && !axis.eIsProxy() && !allAxes(machine).contains(axis)) {
                    error(AXIS_NOT_IN_MACHINE, "uses " + describe(axis) + ", which is not an axis of "
                            + describe(machine) + "; expected one of " + axisNames(machine),
                            Literals.CONTOUR__AXIS_ASSIGNMENT);
                }
                if (axis.getKind() == AxisKind.ROTARY) {
                    error(AXIS_NOT_IN_MACHINE, "uses rotary " + describe(axis) + " in a plane of lengths; expected"
                            + " linear axes", Literals.CONTOUR__AXIS_ASSIGNMENT);
                }
                if (c.getFeed() > 0 && axis.getMaxVelocity() > 0 && c.getFeed() > axis.getMaxVelocity()) {
                    warning(OUT_OF_RANGE, "feed " + value(Literals.CONTOUR__FEED) + " exceeds the velocity limit "
                            + UnitAnnotations.formatValue(axis, Literals.AXIS__MAX_VELOCITY, axis.getMaxVelocity())
                            + " of " + describe(axis) + "; valid: ≤ the axis limit", Literals.CONTOUR__FEED);
                }
            }
            if (c.getSegments().isEmpty()) {
                error(MISSING, "has no segments; expected at least a line, arc or full circle",
                        Literals.CONTOUR__SEGMENTS);
            }
            double x = c.getStartX();
            double y = c.getStartY();
            for (Segment segment : c.getSegments()) {
                switch (segment) {
                    case Line l -> {
                        if (l.getEndX() == x && l.getEndY() == y) {
                            error(GEOMETRY, describe(l) + " has zero length (ends where it starts, "
                                    + point(c, x, y) + "); expected an end point away from the start",
                                    Literals.CONTOUR__SEGMENTS);
                        }
                        x = l.getEndX();
                        y = l.getEndY();
                    }
                    case Arc a -> {
                        double r0 = Math.hypot(x - a.getCentreX(), y - a.getCentreY());
                        double r1 = Math.hypot(a.getEndX() - a.getCentreX(), a.getEndY() - a.getCentreY());
                        if (r0 == 0.0) {
                            error(GEOMETRY, describe(a) + " has its centre on its start point " + point(c, x, y)
                                    + "; expected a radius > 0", Literals.CONTOUR__SEGMENTS);
                        } else if (Math.abs(r0 - r1) > ARC_RADIUS_TOLERANCE) {
                            error(GEOMETRY, describe(a) + " starts at radius " + UnitTable.format(r0, "mm")
                                    + " but ends at radius " + UnitTable.format(r1, "mm") + "; valid: equal within "
                                    + UnitTable.format(ARC_RADIUS_TOLERANCE, "µm"), Literals.CONTOUR__SEGMENTS);
                        }
                        x = a.getEndX();
                        y = a.getEndY();
                    }
                    case FullCircle f -> {
                        if (Math.hypot(x - f.getCentreX(), y - f.getCentreY()) == 0.0) {
                            error(GEOMETRY, describe(f) + " has its centre on the current point " + point(c, x, y)
                                    + "; expected a radius > 0 (the circle starts at the current point)",
                                    Literals.CONTOUR__SEGMENTS);
                        }
                    }
                    default -> {
                        // Corners do not move the current point.
                    }
                }
            }
        }

        private static String point(Contour c, double x, double y) {
            return "(" + UnitTable.formatNumber(x * 1e3, 0) + ", " + UnitTable.formatNumber(y * 1e3, 0) + ") mm";
        }

        private void requirement(Requirement r) {
            if (r.getStatement() == null || r.getStatement().isBlank()) {
                warning(MISSING, "has no statement; expected the requirement in words", Literals.REQUIREMENT__STATEMENT);
            }
            String siUnit = siUnitOf(r);
            if (!element.eIsSet(Literals.REQUIREMENT__LIMIT)) {
                error(MISSING, "has no limit; expected a " + words(r.getKind().getLiteral()) + " limit in "
                        + siUnit + " (shown in its display unit)", Literals.REQUIREMENT__LIMIT);
            } else {
                positive(Literals.REQUIREMENT__LIMIT, null);
            }
            String displayUnit = r.getDisplayUnit();
            if (displayUnit == null || displayUnit.isBlank()) {
                error(UNIT, "has no unit; expected a display unit for " + words(r.getKind().getLiteral()) + " such as "
                        + String.join(", ", compatibleUnits(siUnit)), Literals.REQUIREMENT__DISPLAY_UNIT);
            } else {
                TradeUnit unit = UnitTable.find(displayUnit).orElse(null);
                if (unit == null || !unit.siSymbol().equals(siUnit)) {
                    error(UNIT, "unit '" + displayUnit + "' does not measure " + words(r.getKind().getLiteral())
                            + "; valid: " + String.join(", ", compatibleUnits(siUnit)), Literals.REQUIREMENT__DISPLAY_UNIT);
                }
            }
            Machine machine = machineOf(r);
            if (r.getKind() == RequirementKind.CONTOUR_DEVIATION) {
                if (r.getContours().isEmpty()) {
                    error(MISSING, "is a contour deviation requirement without a contour; expected at least one"
                            + " contour to evaluate it on", Literals.REQUIREMENT__CONTOURS);
                }
                for (Contour contour : r.getContours()) {
                    if (machine != null && !machine.getContours().contains(contour)) {
                        error(AXIS_NOT_IN_MACHINE, "refers to " + describe(contour) + " of another machine; expected"
                                + " a contour of " + describe(machine), Literals.REQUIREMENT__CONTOURS);
                    }
                }
            } else if (r.getAllocatedAxis() == null) {
                error(MISSING, "is a " + words(r.getKind().getLiteral()) + " requirement without an allocated axis;"
                        + " expected the axis it applies to", Literals.REQUIREMENT__ALLOCATED_AXIS);
            }
            if (r.getAllocatedAxis() != null && machine != null && !r.getAllocatedAxis().eIsProxy()
                    && !allAxes(machine).contains(r.getAllocatedAxis())) {
                error(AXIS_NOT_IN_MACHINE, "is allocated to " + describe(r.getAllocatedAxis())
                        + ", which is not an axis of " + describe(machine) + "; expected one of " + axisNames(machine),
                        Literals.REQUIREMENT__ALLOCATED_AXIS);
            }
            Set<Requirement> seen = new HashSet<>();
            for (Requirement p = r.getParent(); p != null; p = p.getParent()) {
                if (p == r || !seen.add(p)) {
                    error(REQUIREMENT_TREE, "is derived from itself through its parents; expected a tree",
                            Literals.REQUIREMENT__PARENT);
                    break;
                }
            }
        }

        private void budgetLine(BudgetLine b) {
            if (b.getAxis() == null) {
                error(MISSING, "has no axis; expected the axis the error source belongs to", Literals.BUDGET_LINE__AXIS);
            } else {
                Machine machine = machineOf(b);
                if (machine != null && !b.getAxis().eIsProxy() && !allAxes(machine).contains(b.getAxis())) {
                    error(AXIS_NOT_IN_MACHINE, "belongs to " + describe(b.getAxis()) + ", which is not an axis of "
                            + describe(machine) + "; expected one of " + axisNames(machine), Literals.BUDGET_LINE__AXIS);
                }
            }
            nonNegative(Literals.BUDGET_LINE__VALUE, "an error magnitude");
            range(Literals.BUDGET_LINE__SENSITIVITY, -1.0, true, 1.0, true, "the share seen normal to the path");
        }

        private void study(VariationStudy v) {
            if (v.getName() == null || v.getName().isBlank()) {
                error(MISSING, "has no name; expected a name to run it by (tracewell montecarlo --study NAME)",
                        Literals.NAMED__NAME);
            }
            Machine machine = machineOf(v);
            if (machine != null && v.getName() != null && !v.getName().isBlank()
                    && machine.getStudies().stream().filter(o -> v.getName().equals(o.getName())).count() > 1) {
                error(DUPLICATE_NAME, "two studies are named '" + v.getName() + "'; expected unique study names",
                        Literals.NAMED__NAME);
            }
            int n = v.getParameters().size();
            if (v.getKind() == StudyKind.SWEEP) {
                if (n < 1 || n > 2) {
                    error(STUDY, "is a sweep of " + n + " parameters; valid: 1 (a curve) or 2 (a family of curves)",
                            Literals.VARIATION_STUDY__PARAMETERS);
                }
                long points = v.getParameters().stream().mapToLong(p -> Math.max(p.getSteps(), 1)).reduce(1,
                        (a, b) -> a * b);
                if (points > StudyDefinition.MAX_GRID_POINTS) {
                    error(STUDY, "sweeps a grid of " + points + " points; valid: at most "
                            + StudyDefinition.MAX_GRID_POINTS, Literals.VARIATION_STUDY__PARAMETERS);
                }
            } else {
                if (n == 0) {
                    error(MISSING, "varies nothing; expected at least one varied parameter",
                            Literals.VARIATION_STUDY__PARAMETERS);
                }
                if (v.getVariantCount() < 1 || v.getVariantCount() > StudyDefinition.MAX_VARIANTS) {
                    error(OUT_OF_RANGE, "variant count = " + v.getVariantCount() + "; valid range: 1 … "
                            + StudyDefinition.MAX_VARIANTS, Literals.VARIATION_STUDY__VARIANT_COUNT);
                }
            }
            if (v.getWorstVariantCount() < 0 || v.getWorstVariantCount() > StudyDefinition.MAX_WORST) {
                error(OUT_OF_RANGE, "worst variant count = " + v.getWorstVariantCount() + "; valid range: 0 … "
                        + StudyDefinition.MAX_WORST, Literals.VARIATION_STUDY__WORST_VARIANT_COUNT);
            }
            Set<String> paths = new HashSet<>();
            for (VariedParameter p : v.getParameters()) {
                if (p.getPath() != null && !paths.add(p.getPath().strip())) {
                    error(STUDY, "varies " + p.getPath() + " twice; expected each attribute once",
                            Literals.VARIATION_STUDY__PARAMETERS);
                }
            }
            if (machine != null) {
                for (String metric : v.getMetrics()) {
                    try {
                        StudyMetrics.parse(metric, machine);
                    } catch (IllegalArgumentException bad) {
                        error(STUDY, bad.getMessage(), Literals.VARIATION_STUDY__METRICS);
                    }
                }
                if (v.getMetrics().isEmpty() && machine.getRequirements().isEmpty()) {
                    error(MISSING, "names no metric and the machine has no requirement to collect; expected metrics"
                            + " such as contour[NAME].G", Literals.VARIATION_STUDY__METRICS);
                }
            }
        }

        private void variedParameter(VariedParameter p) {
            Machine machine = machineOf(p);
            double nominal = Double.NaN;
            if (p.getPath() == null || p.getPath().isBlank()) {
                error(MISSING, "has no path; expected the attribute it varies, e.g. axis[X1].plant.loadMass",
                        Literals.VARIED_PARAMETER__PATH);
            } else if (machine != null) {
                try {
                    nominal = AttributePath.parse(p.getPath()).resolve(machine).get();
                } catch (IllegalArgumentException bad) {
                    error(STUDY, bad.getMessage(), Literals.VARIED_PARAMETER__PATH);
                }
            }
            if (p.eContainer() instanceof VariationStudy v && v.getKind() == StudyKind.SWEEP) {
                if (p.getSteps() < 2 || p.getSteps() > SweepRange.MAX_STEPS) {
                    error(OUT_OF_RANGE, "steps = " + p.getSteps() + "; valid range: 2 … " + SweepRange.MAX_STEPS
                            + " grid points", Literals.VARIED_PARAMETER__STEPS);
                }
                if (p.getFrom() == p.getTo()) {
                    error(STUDY, "sweeps from " + p.getFrom() + " to " + p.getTo() + "; expected two different ends",
                            Literals.VARIED_PARAMETER__TO);
                }
                return;
            }
            if (p.getShape() == ToleranceShape.NORMAL) {
                positive(Literals.VARIED_PARAMETER__SIGMA, "a normal spread needs a standard deviation");
            } else {
                positive(Literals.VARIED_PARAMETER__HALF_WIDTH, "a " + p.getShape().getLiteral()
                        + " spread needs a half-width");
            }
            if (p.isSetMinimum() && p.isSetMaximum() && !(p.getMinimum() < p.getMaximum())) {
                error(OUT_OF_RANGE, "physical range [" + p.getMinimum() + ", " + p.getMaximum() + "] is empty;"
                        + " valid: minimum < maximum", Literals.VARIED_PARAMETER__MAXIMUM);
            }
            if (Double.isFinite(nominal) && (p.isSetMinimum() && nominal < p.getMinimum()
                    || p.isSetMaximum() && nominal > p.getMaximum())) {
                error(OUT_OF_RANGE, "nominal value " + nominal + " of " + p.getPath() + " lies outside its physical"
                        + " range [" + (p.isSetMinimum() ? p.getMinimum() : "−∞") + ", "
                        + (p.isSetMaximum() ? p.getMaximum() : "∞") + "]; valid: a range holding the nominal",
                        p.isSetMinimum() && nominal < p.getMinimum() ? Literals.VARIED_PARAMETER__MINIMUM
                                : Literals.VARIED_PARAMETER__MAXIMUM);
            }
        }

        // ---- helpers

        private void finiteNumbers() {
            for (EAttribute attribute : element.eClass().getEAllAttributes()) {
                if (attribute.getEAttributeType().getInstanceClass() != double.class
                        && attribute.getEAttributeType().getInstanceClass() != Double.class) {
                    continue;
                }
                Object value = element.eGet(attribute);
                Iterable<?> values = attribute.isMany() ? (List<?>) value : java.util.Collections.singletonList(value);
                for (Object v : values) {
                    if (v instanceof Double d && !Double.isFinite(d)) {
                        notFinite.add(attribute);
                        error(NOT_FINITE, words(attribute.getName()) + " = " + d + "; valid: a finite number"
                                + unitHint(attribute), attribute);
                    }
                }
            }
        }

        private String unitHint(EAttribute attribute) {
            String unit = displayUnit(attribute);
            return unit.isEmpty() || "1".equals(unit) ? "" : " in " + unit;
        }

        /** Checks value &gt; 0; returns whether it is. */
        private boolean positive(EAttribute attribute, String why) {
            double v = number(attribute);
            if (notFinite.contains(attribute)) {
                return false;
            }
            if (v > 0) {
                return true;
            }
            error(NOT_POSITIVE, words(attribute.getName()) + " = " + value(attribute) + "; valid range: > "
                    + zero(attribute) + (why == null ? "" : " (" + why + ")"), attribute);
            return false;
        }

        private void nonNegative(EAttribute attribute, String why) {
            if (!notFinite.contains(attribute) && number(attribute) < 0) {
                error(NEGATIVE, words(attribute.getName()) + " = " + value(attribute) + "; valid range: ≥ "
                        + zero(attribute) + (why == null ? "" : " (" + why + ")"), attribute);
            }
        }

        private void range(EAttribute attribute, double low, boolean lowIncluded, double high, boolean highIncluded,
                String why) {
            double v = number(attribute);
            if (notFinite.contains(attribute)) {
                return;
            }
            boolean inside = (lowIncluded ? v >= low : v > low) && (highIncluded ? v <= high : v < high);
            if (!inside) {
                String display = displayUnit(attribute);
                error(OUT_OF_RANGE, words(attribute.getName()) + " = " + value(attribute) + "; valid range: "
                        + (lowIncluded ? "[" : "(") + UnitTable.format(low, display) + " … "
                        + UnitTable.format(high, display) + (highIncluded ? "]" : ")")
                        + (why == null ? "" : " (" + why + ")"), attribute);
            }
        }

        private double number(EAttribute attribute) {
            Object v = element.eGet(attribute);
            return v instanceof Number n ? n.doubleValue() : Double.NaN;
        }

        private String value(EAttribute attribute) {
            return UnitTable.format(number(attribute), displayUnit(attribute));
        }

        private String zero(EAttribute attribute) {
            return UnitTable.format(0.0, displayUnit(attribute));
        }

        /** The declared display unit; a requirement's limit is shown in the requirement's own (valid) unit. */
        private String displayUnit(EAttribute attribute) {
            if (attribute == Literals.REQUIREMENT__LIMIT && element instanceof Requirement r) {
                String si = siUnitOf(r);
                return UnitTable.find(r.getDisplayUnit()).filter(u -> u.siSymbol().equals(si))
                        .map(TradeUnit::symbol).orElse(si);
            }
            return UnitAnnotations.displayUnit(element, attribute);
        }

        private void error(int code, String message, EStructuralFeature feature) {
            report(Diagnostic.ERROR, code, message, feature);
            ok = false;
        }

        private void warning(int code, String message, EStructuralFeature feature) {
            report(Diagnostic.WARNING, code, message, feature);
        }

        private void report(int severity, int code, String message, EStructuralFeature feature) {
            if (diagnostics != null) {
                diagnostics.add(new BasicDiagnostic(severity, DIAGNOSTIC_SOURCE, code,
                        describe(element) + ": " + message, new Object[] {element, feature}));
            }
        }
    }

    // ---------------------------------------------------------------------------------------------- model helpers

    private static Machine machineOf(EObject element) {
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof Machine m) {
                return m;
            }
        }
        return null;
    }

    private static List<Axis> allAxes(Machine machine) {
        List<Axis> axes = new java.util.ArrayList<>(machine.getAxes());
        axes.addAll(machine.getLibraryAxes());
        return axes;
    }

    private static String axisNames(Machine machine) {
        return allAxes(machine).stream().filter(a -> !a.eIsProxy()).map(Axis::getName)
                .collect(java.util.stream.Collectors.joining(", "));
    }

    /** The SI unit a requirement's limit is stored in: by kind, in angles for errors of a rotary axis. */
    public static String siUnitOf(Requirement requirement) {
        boolean rotary = requirement.getAllocatedAxis() != null && !requirement.getAllocatedAxis().eIsProxy()
                && requirement.getAllocatedAxis().getKind() == AxisKind.ROTARY;
        return switch (requirement.getKind()) {
            case FOLLOWING_ERROR, STEADY_STATE_ERROR -> rotary ? "rad" : "m";
            default -> siUnitOf(requirement.getKind());
        };
    }

    /** The SI unit a requirement limit of this kind is stored in (linear axes). */
    public static String siUnitOf(RequirementKind kind) {
        return switch (kind) {
            case CONTOUR_DEVIATION, FOLLOWING_ERROR, STEADY_STATE_ERROR -> "m";
            case PHASE_MARGIN -> "rad";
            case GAIN_MARGIN -> "1";
            case BANDWIDTH -> "Hz";
            case SETTLING_TIME -> "s";
            case POSITION_GAIN -> "1/s";
        };
    }

    private static List<String> compatibleUnits(String siUnit) {
        return UnitTable.symbols().stream().filter(s -> UnitTable.get(s).siSymbol().equals(siUnit)).toList();
    }
}
