package org.tracewell.core.template;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.tracewell.core.io.IdAssigner;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.Direction;
import org.tracewell.model.Encoder;
import org.tracewell.model.EncoderSide;
import org.tracewell.model.FullCircle;
import org.tracewell.model.LimitBound;
import org.tracewell.model.LowPassFilter;
import org.tracewell.model.LowPassOrder;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;

/**
 * A minimal machine to start from: two ball-screw axes X and Y with matched cascade controllers, an ISO 230-4 circle
 * test in XY (R = 50 mm at 2 m/min, counter-clockwise) and one requirement on its circular deviation G. Every value is
 * a plausible mid-size machine-tool figure (common practice), so the machine validates and analyses as created; the
 * user then replaces them with the real drive data.
 *
 * @param name                 machine name, also the base of the element ids written on save
 * @param positionSamplePeriod position-loop sample period of both axes, s
 * @param velocitySamplePeriod velocity-loop sample period of both axes, s
 */
public record MachineTemplate(String name, double positionSamplePeriod, double velocitySamplePeriod) {

    /** Position-loop period used when nothing else is chosen: 0.5 ms (common practice for CNC drives). */
    public static final double DEFAULT_POSITION_SAMPLE_PERIOD = 5.0e-4;
    /** Velocity-loop period used when nothing else is chosen: 125 µs (common practice for CNC drives). */
    public static final double DEFAULT_VELOCITY_SAMPLE_PERIOD = 1.25e-4;

    /** Position gain of both axes: 2 (m/min)/mm = 33.3 1/s (common practice for a ball-screw machine). */
    public static final double POSITION_GAIN = 2.0 * 1000.0 / 60.0;
    /** Radius of the circle test, m. */
    public static final double CIRCLE_RADIUS = 0.05;
    /** Feed of the circle test: 2 m/min, in m/s. */
    public static final double CIRCLE_FEED = 2.0 / 60.0;
    /** The requirement's limit on G, m. */
    public static final double CIRCULAR_DEVIATION_LIMIT = 20e-6;

    private static final TracewellFactory F = TracewellFactory.eINSTANCE;

    public MachineTemplate {
        Objects.requireNonNull(name, "name");
        if (name.isBlank()) {
            throw new IllegalArgumentException("the machine needs a name; got an empty one");
        }
        requirePeriod("position-loop sample period", positionSamplePeriod);
        requirePeriod("velocity-loop sample period", velocitySamplePeriod);
        if (velocitySamplePeriod > positionSamplePeriod) {
            throw new IllegalArgumentException("the velocity loop samples at " + velocitySamplePeriod * 1e3
                    + " ms, slower than the position loop at " + positionSamplePeriod * 1e3
                    + " ms; valid: velocity-loop period ≤ position-loop period");
        }
    }

    /** The template with the default loop periods. */
    public static MachineTemplate named(String name) {
        return new MachineTemplate(name, DEFAULT_POSITION_SAMPLE_PERIOD, DEFAULT_VELOCITY_SAMPLE_PERIOD);
    }

    private static void requirePeriod(String what, double seconds) {
        // 10 µs … 10 ms spans every drive generation in use (common practice).
        if (!(seconds >= 1e-5 && seconds <= 1e-2)) {
            throw new IllegalArgumentException(what + " " + seconds * 1e3 + " ms is out of range; valid: 0.01 … 10 ms");
        }
    }

    /** Builds the machine (not yet in any file). */
    public Machine build() {
        Machine machine = F.createMachine();
        machine.setId(IdAssigner.slug(name));
        machine.setName(name.strip());
        machine.setDescription("XY machine from the Tracewell template: two ball-screw axes with matched position "
                + "gains and an ISO 230-4 circle test. Replace the drive data with the machine's own.");
        // The interpolator may not run faster than the position loops it feeds.
        machine.setInterpolationPeriod(Math.max(1e-3, positionSamplePeriod));
        // Y carries less mass than X (it rides on it) but gets the same Kv: interpolating axes need matched gains.
        Axis x = axis("X", 150.0, 160_000.0);
        Axis y = axis("Y", 90.0, 140_000.0);
        machine.getAxes().add(x);
        machine.getAxes().add(y);
        Contour circle = circleTest(x, y);
        machine.getContours().add(circle);

        Requirement g = F.createRequirement();
        g.setId(IdAssigner.slug(name) + "-r1");
        g.setStatement("Circular deviation G at most 20 µm at F = 2 m/min, R = 50 mm in XY (ISO 230-4).");
        g.setKind(RequirementKind.CONTOUR_DEVIATION);
        g.setMetric(ContourMetric.CIRCULAR_DEVIATION);
        g.setBound(LimitBound.AT_MOST);
        g.setLimit(CIRCULAR_DEVIATION_LIMIT);
        g.setDisplayUnit("µm");
        g.getContours().add(circle);
        g.setRationale("Template target; set the machine's own.");
        machine.getRequirements().add(g);
        return machine;
    }

    /** A new axis like the template's X (150 kg load), at this template's loop periods. */
    public Axis newAxis(String axisName) {
        return axis(axisName, 150.0, 160_000.0);
    }

    /**
     * The template's circle test (R = 50 mm at 2 m/min, counter-clockwise, ISO 230-4) in the plane of {@code u} and
     * {@code v}; either may be null to be assigned later.
     */
    public Contour circleTest(Axis u, Axis v) {
        Contour circle = F.createContour();
        circle.setName("circle R50 F2 CCW");
        circle.setDescription("ISO 230-4 circular test, counter-clockwise.");
        circle.setFeed(CIRCLE_FEED);
        circle.setPathAcceleration(1.0);
        circle.setPathJerk(20.0);
        circle.setSamplePeriod(1e-3);
        circle.setStartX(CIRCLE_RADIUS);
        for (Axis axis : new Axis[] {u, v}) {
            if (axis != null) {
                circle.getAxisAssignment().add(axis);
            }
        }
        FullCircle segment = F.createFullCircle();
        segment.setDirection(Direction.COUNTER_CLOCKWISE);
        circle.getSegments().add(segment);
        return circle;
    }

    /** Relative standard deviation of each position gain in {@link #newStudy}: 1 % (common practice for a start). */
    public static final double STUDY_GAIN_SIGMA = 0.01;

    /**
     * A study to start from, valid and runnable as created: a Monte-Carlo run of 1000 variants (seed 1) over the
     * position gains of the first full-circle contour's axes (else of the first two cascade-controlled axes), each
     * normal with σ = 1 % of its value,
     * collecting G of the first full-circle contour (or every requirement when there is none); named "gain tolerance",
     * numbered when that name is taken. The user then sets what really varies.
     */
    public static VariationStudy newStudy(Machine machine) {
        VariationStudy study = F.createVariationStudy();
        String name = "gain tolerance";
        for (int n = 2; taken(machine, name); n++) {
            name = "gain tolerance " + n;
        }
        study.setName(name);
        study.setKind(StudyKind.MONTE_CARLO);
        study.setVariantCount(1000);
        study.setSeed(1);
        study.setDescription("Position gains varied ±1 % (1σ, normal): how much circular deviation the gain spread"
                + " of the drives costs.");
        Optional<Contour> circle = machine.getContours().stream()
                .filter(c -> c.getSegments().size() == 1 && c.getSegments().get(0) instanceof FullCircle).findFirst();
        // The circle's own axes when there is one: their gain mismatch is what G shows.
        List<Axis> axes = circle.map(c -> List.copyOf(c.getAxisAssignment())).filter(a -> !a.isEmpty())
                .orElse(machine.getAxes());
        for (Axis axis : axes) {
            if (axis.getController() instanceof CascadeController controller && study.getParameters().size() < 2) {
                VariedParameter gain = F.createVariedParameter();
                gain.setPath("axis[" + axis.getName() + "].controller.positionGain");
                gain.setShape(ToleranceShape.NORMAL);
                gain.setSigma(STUDY_GAIN_SIGMA * controller.getPositionGain());
                study.getParameters().add(gain);
            }
        }
        circle.ifPresent(c -> study.getMetrics().add("contour[" + c.getName() + "].G"));
        return study;
    }

    private static boolean taken(Machine machine, String name) {
        return machine.getStudies().stream().anyMatch(s -> name.equals(s.getName()));
    }

    /**
     * Builds the machine and writes it to {@code file} (a {@code .machine} path) through the save code: ids assigned,
     * deterministic format, atomic write.
     */
    public Machine writeTo(Path file, ModelFiles files) throws IOException {
        Machine machine = build();
        Resource resource = files.newResourceSet()
                .createResource(URI.createFileURI(file.toAbsolutePath().normalize().toString()));
        if (resource == null) {
            throw new IOException(file + " is not a Tracewell model file name; expected a name ending in ."
                    + ModelFiles.MACHINE_EXTENSION);
        }
        resource.getContents().add(machine);
        files.save(resource);
        return machine;
    }

    /**
     * A 10 mm-lead ball-screw axis (20 m/min, 2 m/s², 40 m/s³) with a cascade controller at this template's loop
     * periods: velocity-loop bandwidth about 48 Hz for the stated load (velocity gain over the motor-referred mass
     * of screw, motor and load, about 300 rad/s ≈ 9·Kv: a well-damped position loop, common practice), a
     * second-order low-pass at 600 Hz and a 2^20-count motor encoder.
     */
    private Axis axis(String axisName, double loadMassKg, double velocityGain) {
        Axis axis = F.createAxis();
        axis.setName(axisName);
        axis.setKind(AxisKind.LINEAR);
        axis.setMaxVelocity(20.0 / 60.0);
        axis.setMaxAcceleration(2.0);
        axis.setMaxJerk(40.0);

        RigidScrewDrive screw = F.createRigidScrewDrive();
        screw.setCurrentLoopBandwidth(1500.0);
        screw.setViscousFriction(400.0);
        screw.setCoulombFriction(80.0);
        screw.setMotorInertia(4.6e-4);
        screw.setScrewInertia(5.0e-4);
        screw.setLoadMass(loadMassKg);
        screw.setLead(0.010);
        screw.setGearRatio(1.0);
        screw.setTorqueConstant(0.95);
        axis.setPlant(screw);

        CascadeController controller = F.createCascadeController();
        controller.setPositionGain(POSITION_GAIN);
        controller.setVelocityGain(velocityGain);
        controller.setVelocityIntegralTime(0.008);
        controller.setPositionSamplePeriod(positionSamplePeriod);
        controller.setVelocitySamplePeriod(velocitySamplePeriod);
        LowPassFilter lowPass = F.createLowPassFilter();
        lowPass.setOrder(LowPassOrder.SECOND);
        lowPass.setCutoffFrequency(600.0);
        controller.getFilterStages().add(lowPass);
        axis.setController(controller);

        Encoder encoder = F.createEncoder();
        encoder.setSide(EncoderSide.MOTOR);
        encoder.setCountsPerRevolution(1 << 20);
        axis.setEncoder(encoder);
        return axis;
    }
}
