package org.tracewell.core.mapping;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

import org.tracewell.core.validation.TracewellValidator;
import org.tracewell.engine.axis.AxisModel;
import org.tracewell.engine.axis.AxisPlant;
import org.tracewell.engine.axis.DriveMotor;
import org.tracewell.engine.axis.PositionSensor;
import org.tracewell.engine.axis.ScrewShaft;
import org.tracewell.engine.axis.StiffnessChain;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.ArcSegment;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.path.LineSegment;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.path.Point2;
import org.tracewell.engine.path.Segment;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.model.Arc;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Controller;
import org.tracewell.model.Corner;
import org.tracewell.model.CornerKind;
import org.tracewell.model.DirectDrive;
import org.tracewell.model.Direction;
import org.tracewell.model.Encoder;
import org.tracewell.model.EncoderSide;
import org.tracewell.model.FilterStage;
import org.tracewell.model.FullCircle;
import org.tracewell.model.LeadLagFilter;
import org.tracewell.model.Line;
import org.tracewell.model.LowPassFilter;
import org.tracewell.model.LowPassOrder;
import org.tracewell.model.Machine;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.Plant;
import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.RotaryTable;
import org.tracewell.model.ScrewMounting;
import org.tracewell.model.TransferFunctionPlant;
import org.tracewell.model.TwoMassDrive;

/**
 * The one place that knows both the model and the engine: turns a {@link Machine} into engine inputs (axis models,
 * limits, contour paths). Pure functions; the engine's own constructors check the numbers again.
 * <p>
 * Unit and convention changes made here:
 * <ul>
 * <li>frequencies: the model stores Hz, the engine works in rad/s (ω = 2π·f);</li>
 * <li>velocity-loop gain: the model stores it referred to the load (N·s/m, or N·m·s/rad at a rotary table), the
 * engine at the motor: K_motor = K_load·ρ², ρ = load travel per motor radian;</li>
 * <li>rack-and-pinion gearbox inertia: the model refers it to the motor, the engine takes it at the pinion
 * (J_pinion = J_motor-side·n²);</li>
 * <li>two-mass screw drives are evaluated at the softest nut position of the model's nut range (the far end for
 * fixed–free, mid-span or the nearest end of the range for fixed–fixed), the worst case for the loop.</li>
 * </ul>
 */
public final class EngineMapping {

    private EngineMapping() {
    }

    /** All axes (inline, then library) and contours of a machine. */
    public static MachineInputs map(Machine machine) throws MappingException {
        List<Axis> axes = new ArrayList<>(machine.getAxes());
        axes.addAll(machine.getLibraryAxes());
        List<MappedAxis> mappedAxes = new ArrayList<>();
        for (Axis axis : axes) {
            if (axis.eIsProxy()) {
                throw new MappingException(machine.getId(), describe(machine) + ": a library axis is not loaded;"
                        + " load the machine with ModelFiles so its library files are read");
            }
            mappedAxes.add(mapAxis(axis));
        }
        List<MappedContour> contours = new ArrayList<>();
        for (Contour contour : machine.getContours()) {
            contours.add(mapContour(contour));
        }
        return new MachineInputs(machine.getId(), machine.getName(), machine.getInterpolationPeriod(), mappedAxes,
                contours);
    }

    // ------------------------------------------------------------------------------------------------ axes

    /** One axis: plant, cascade controller, sensor, limits. */
    public static MappedAxis mapAxis(Axis axis) throws MappingException {
        List<String> notes = new ArrayList<>();
        if (axis.getPlant() == null || axis.getController() == null) {
            throw new MappingException(axis.getId(), describe(axis) + ": needs a plant and a controller");
        }
        try {
            AxisPlant plant = plant(axis, axis.getPlant(), notes);
            org.tracewell.engine.axis.CascadeController controller = controller(axis, axis.getController(),
                    plant.loadPerMotorRadian());
            PositionSensor sensor = sensor(axis.getEncoder(), notes);
            AxisModel model = new AxisModel(axis.getName(), plant, controller, sensor, AxisModel.DEFAULT_PADE_ORDER);
            AxisLimits limits = new AxisLimits(axis.getMaxVelocity(), axis.getMaxAcceleration(), axis.getMaxJerk());
            Optional<String> partner = Optional.ofNullable(axis.getGantryPartner()).map(Axis::getId);
            return new MappedAxis(axis.getId(), axis.getName(), axis.getKind() == AxisKind.ROTARY, model, limits,
                    partner, notes, positionResolution(axis.getEncoder(), plant));
        } catch (IllegalArgumentException rejected) {
            throw new MappingException(axis.getId(), describe(axis) + ": the engine rejects a value: "
                    + rejected.getMessage() + " (run validation for the valid ranges)", rejected);
        }
    }

    private static AxisPlant plant(Axis axis, Plant plant, List<String> notes) throws MappingException {
        if (plant instanceof TwoMassDrive t) {
            return twoMass(t, notes);
        } else if (plant instanceof RigidScrewDrive s) {
            return new org.tracewell.engine.axis.RigidScrewDrive(motor(s.getMotorInertia(), s.getTorqueConstant(),
                    s.getCurrentLoopBandwidth()), s.getScrewInertia(), s.getLoadMass(), s.getLead(), s.getGearRatio(),
                    s.getViscousFriction(), s.getCoulombFriction());
        } else if (plant instanceof RackPinionDrive r) {
            if (r.getDrivetrainStiffness() > 0) {
                notes.add(describe(r) + ": drivetrain stiffness is not modelled; the engine's rack-and-pinion drive"
                        + " is rigid");
            }
            double pinionInertia = r.getGearboxInertia() * r.getGearRatio() * r.getGearRatio();
            return new org.tracewell.engine.axis.RackAndPinionDrive(motor(r.getMotorInertia(), r.getTorqueConstant(),
                    r.getCurrentLoopBandwidth()), pinionInertia, r.getPinionRadius(), r.getGearRatio(), r.getLoadMass(),
                    r.getViscousFriction(), r.getCoulombFriction());
        } else if (plant instanceof DirectDrive d) {
            return new org.tracewell.engine.axis.DirectLinearDrive(d.getMovingMass(), d.getForceConstant(),
                    radPerSec(d.getCurrentLoopBandwidth()), d.getViscousFriction(), d.getCoulombFriction());
        } else if (plant instanceof RotaryTable t) {
            if (t.getTorsionalStiffness() > 0) {
                notes.add(describe(t) + ": torsional stiffness is not modelled; the engine's rotary table is rigid");
            }
            return new org.tracewell.engine.axis.RotaryTable(motor(t.getMotorInertia(), t.getTorqueConstant(),
                    t.getCurrentLoopBandwidth()), t.getTableInertia(), t.getGearRatio(), t.getViscousFriction(),
                    t.getCoulombFriction());
        } else if (plant instanceof TransferFunctionPlant tf) {
            if (tf.getDeadTime() > 0) {
                throw new MappingException(tf.getId(), describe(tf) + ": a plant dead time ("
                        + tf.getDeadTime() + " s) is not supported by the engine's axis model; fold it into the"
                        + " controller's sample periods or fit a rational function");
            }
            TransferFunction function = TransferFunction.ofDescending(toArray(tf.getNumerator()),
                    toArray(tf.getDenominator()));
            double currentLoop = tf.getCurrentLoopBandwidth() > 0 ? radPerSec(tf.getCurrentLoopBandwidth())
                    : Double.POSITIVE_INFINITY; // unset: the function already contains the current loop
            return new org.tracewell.engine.axis.TransferFunctionPlant(function, tf.getRatio(),
                    tf.getEquivalentInertia(), currentLoop, tf.getTorqueConstant(), 0.0);
        }
        throw new MappingException(plant.getId(), describe(axis) + ": plant type " + plant.eClass().getName()
                + " is not known to the engine mapping");
    }

    private static AxisPlant twoMass(TwoMassDrive t, List<String> notes) {
        org.tracewell.engine.axis.ScrewMounting mounting = t.getScrewMounting() == ScrewMounting.FIXED_FIXED
                ? org.tracewell.engine.axis.ScrewMounting.FIXED_FIXED
                : org.tracewell.engine.axis.ScrewMounting.FIXED_FREE;
        // Only the root diameter enters the axial stiffness; the screw inertia comes from the model directly.
        ScrewShaft shaft = ScrewShaft.steel(t.getBearingSpan(), t.getScrewRootDiameter(), t.getScrewRootDiameter());
        StiffnessChain chain = new StiffnessChain(shaft, mounting, t.getNutStiffness(), t.getBearingStiffness());
        double nutPosition = softestNutPosition(t);
        double damping = org.tracewell.engine.axis.TwoMassScrewDrive.dampingForRatio(t.getDampingRatio(),
                chain.stiffnessAt(nutPosition), t.getLoadMass());
        notes.add(describe(t) + ": evaluated with the nut at " + nutPosition + " m, the softest point of its range");
        return new org.tracewell.engine.axis.TwoMassScrewDrive(motor(t.getMotorInertia(), t.getTorqueConstant(),
                t.getCurrentLoopBandwidth()), t.getScrewInertia(), t.getLoadMass(), t.getLead(), t.getGearRatio(),
                chain, nutPosition, damping, t.getViscousFriction(), t.getCoulombFriction());
    }

    /**
     * Nut position of lowest axial stiffness within the model's range: fixed–free screws are softest at the far
     * end (k = E·A/a), fixed–fixed screws at mid-span (k = E·A·L/(a·(L − a))); DOMAIN.md §3, Altintas et al. 2011.
     */
    static double softestNutPosition(TwoMassDrive t) {
        if (t.getScrewMounting() == ScrewMounting.FIXED_FREE) {
            return t.getNutPositionMax();
        }
        return Math.min(Math.max(t.getBearingSpan() / 2.0, t.getNutPositionMin()), t.getNutPositionMax());
    }

    private static DriveMotor motor(double inertia, double torqueConstant, double currentLoopBandwidthHz) {
        return new DriveMotor(inertia, torqueConstant, radPerSec(currentLoopBandwidthHz));
    }

    private static org.tracewell.engine.axis.CascadeController controller(Axis axis, Controller controller,
            double loadPerMotorRadian) throws MappingException {
        if (!(controller instanceof CascadeController c)) {
            throw new MappingException(controller.getId(), describe(axis) + ": the engine's axis model takes a"
                    + " cascade controller; " + controller.eClass().getName() + " is not supported yet");
        }
        List<org.tracewell.engine.axis.FilterStage> filters = new ArrayList<>();
        for (FilterStage stage : c.getFilterStages()) {
            filters.add(filter(stage));
        }
        double velocityGainAtMotor = c.getVelocityGain() * loadPerMotorRadian * loadPerMotorRadian;
        return new org.tracewell.engine.axis.CascadeController(c.getPositionGain(), velocityGainAtMotor,
                c.getVelocityIntegralTime(), filters, c.getVelocityFeedforward(), c.getAccelerationFeedforward(),
                c.getPositionSamplePeriod(), c.getVelocitySamplePeriod());
    }

    private static org.tracewell.engine.axis.FilterStage filter(FilterStage stage) throws MappingException {
        if (stage instanceof LowPassFilter f) {
            return f.getOrder() == LowPassOrder.SECOND
                    ? new org.tracewell.engine.axis.FilterStage.LowPass2(radPerSec(f.getCutoffFrequency()),
                            f.getDampingRatio())
                    : new org.tracewell.engine.axis.FilterStage.LowPass1(radPerSec(f.getCutoffFrequency()));
        } else if (stage instanceof NotchFilter n) {
            return new org.tracewell.engine.axis.FilterStage.Notch(radPerSec(n.getCentreFrequency()),
                    radPerSec(n.getWidth()), n.getDepth());
        } else if (stage instanceof LeadLagFilter l) {
            return new org.tracewell.engine.axis.FilterStage.LeadLag(radPerSec(l.getZeroFrequency()),
                    radPerSec(l.getPoleFrequency()));
        }
        throw new MappingException(stage.getId(), describe(stage) + ": filter type " + stage.eClass().getName()
                + " is not known to the engine mapping");
    }

    private static PositionSensor sensor(Encoder encoder, List<String> notes) {
        if (encoder == null) {
            notes.add("no encoder given: the position loop is assumed to close on the motor encoder");
            return PositionSensor.MOTOR;
        }
        return encoder.getSide() == EncoderSide.LOAD ? PositionSensor.LOAD : PositionSensor.MOTOR;
    }

    /**
     * Encoder step at the load: a linear scale's resolution as given; a rotary encoder's 2π/counts, carried to the
     * load through the drive ratio when it sits on the motor. 0 when the model gives no resolution.
     */
    static double positionResolution(Encoder encoder, AxisPlant plant) {
        if (encoder == null) {
            return 0.0;
        }
        if (encoder.getLinearResolution() > 0) {
            return encoder.getLinearResolution();
        }
        if (encoder.getCountsPerRevolution() > 0) {
            double step = 2.0 * Math.PI / encoder.getCountsPerRevolution();
            return encoder.getSide() == EncoderSide.LOAD ? step : step * Math.abs(plant.loadPerMotorRadian());
        }
        return 0.0;
    }

    // ------------------------------------------------------------------------------------------------ contours

    /** One contour: its path in the plane of its two axes, and its feed limits. */
    public static MappedContour mapContour(Contour contour) throws MappingException {
        if (contour.getAxisAssignment().size() != 2) {
            throw new MappingException(contour.getId(), describe(contour) + ": needs exactly two axes, has "
                    + contour.getAxisAssignment().size());
        }
        List<String> notes = new ArrayList<>();
        List<Segment> segments = new ArrayList<>();
        Set<Integer> exactStops = new TreeSet<>();
        double x = contour.getStartX();
        double y = contour.getStartY();
        try {
            for (org.tracewell.model.Segment segment : contour.getSegments()) {
                if (segment instanceof Line l) {
                    segments.add(LineSegment.of(x, y, l.getEndX(), l.getEndY()));
                    x = l.getEndX();
                    y = l.getEndY();
                } else if (segment instanceof Arc a) {
                    Point2 centre = new Point2(a.getCentreX(), a.getCentreY());
                    double radius = Math.hypot(x - a.getCentreX(), y - a.getCentreY());
                    double start = Math.atan2(y - a.getCentreY(), x - a.getCentreX());
                    double end = Math.atan2(a.getEndY() - a.getCentreY(), a.getEndX() - a.getCentreX());
                    segments.add(ArcSegment.of(centre, radius, start, end, direction(a.getDirection())));
                    x = a.getEndX();
                    y = a.getEndY();
                } else if (segment instanceof FullCircle c) {
                    Point2 centre = new Point2(c.getCentreX(), c.getCentreY());
                    double radius = Math.hypot(x - c.getCentreX(), y - c.getCentreY());
                    double start = Math.atan2(y - c.getCentreY(), x - c.getCentreX());
                    segments.add(ArcSegment.fullCircle(centre, radius, start, direction(c.getDirection())));
                } else if (segment instanceof Corner corner) {
                    if (corner.getKind() == CornerKind.EXACT_STOP && !segments.isEmpty()) {
                        exactStops.add(segments.size() - 1); // junction j lies between segment j and j + 1
                    } else if (corner.getKind() == CornerKind.ROUNDED) {
                        notes.add(describe(corner) + ": corner rounding is not modelled; the path keeps the sharp"
                                + " corner (and stops there)");
                    }
                }
            }
            exactStops.removeIf(junction -> junction >= segments.size() - 1); // the path end is a stop anyway
            if (segments.isEmpty()) {
                throw new MappingException(contour.getId(), describe(contour) + ": has no line, arc or circle");
            }
            Path path = Path.of(ContourPlane.xy(), segments, exactStops);
            PathLimits limits = PathLimits.of(contour.getFeed(), contour.getPathAcceleration(), contour.getPathJerk());
            return new MappedContour(contour.getId(), contour.getName(), path, limits, contour.getSamplePeriod(),
                    contour.getAxisAssignment().get(0).getId(), contour.getAxisAssignment().get(1).getId(), notes);
        } catch (IllegalArgumentException rejected) {
            throw new MappingException(contour.getId(), describe(contour) + ": the engine rejects the path: "
                    + rejected.getMessage() + " (run validation for the valid ranges)", rejected);
        }
    }

    private static ArcDirection direction(Direction direction) {
        return direction == Direction.CLOCKWISE ? ArcDirection.CW : ArcDirection.CCW;
    }

    // ------------------------------------------------------------------------------------------------ helpers

    private static double radPerSec(double hertz) {
        return 2.0 * Math.PI * hertz;
    }

    private static double[] toArray(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static String describe(org.eclipse.emf.ecore.EObject element) {
        return TracewellValidator.describe(element);
    }
}
