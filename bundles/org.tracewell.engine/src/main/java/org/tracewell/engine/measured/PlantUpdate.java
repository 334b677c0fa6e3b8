package org.tracewell.engine.measured;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tracewell.engine.axis.AxisPlant;
import org.tracewell.engine.axis.DirectLinearDrive;
import org.tracewell.engine.axis.DriveMotor;
import org.tracewell.engine.axis.RackAndPinionDrive;
import org.tracewell.engine.axis.RigidScrewDrive;
import org.tracewell.engine.axis.RotaryTable;
import org.tracewell.engine.axis.StiffnessChain;
import org.tracewell.engine.axis.TransferFunctionPlant;
import org.tracewell.engine.axis.TwoMassScrewDrive;

/**
 * A fitted plant offered as an update of an axis's plant: the same kind of drive with the fitted quantities put
 * where they belong (moving mass, load mass, motor inertia, stiffness, damping, viscous friction), every other
 * parameter kept; or, when the fit does not map onto the drive's parameters, an explicit transfer-function plant
 * carrying the fitted mechanics with the axis's ratio, torque constant, current loop and Coulomb friction. The
 * fitted dead time is not part of any plant: it belongs to the controller's sample periods, and {@link #changes}
 * says so.
 *
 * @param previous the axis's plant before
 * @param updated  the plant with the fit applied
 * @param changes  what changed, before → after, SI, one entry per parameter
 * @param notes    what was kept or replaced and why, and where the dead time belongs
 */
public record PlantUpdate(AxisPlant previous, AxisPlant updated, List<ParameterChange> changes, List<String> notes) {

    public PlantUpdate {
        changes = List.copyOf(changes);
        notes = List.copyOf(notes);
    }

    /** Applies {@code fit} to {@code current}; the fit must have assumed the plant's own current-loop bandwidth. */
    public static PlantUpdate of(AxisPlant current, PlantFitResult fit) {
        if (current.currentLoopBandwidth() != fit.currentLoopBandwidth()) {
            throw new IllegalArgumentException("the fit assumed a current-loop bandwidth of " + fit.currentLoopBandwidth()
                    + " rad/s but the plant has " + current.currentLoopBandwidth() + " rad/s; fit with the plant's own");
        }
        Changes changes = new Changes();
        AxisPlant updated = fit.twoMass().isPresent() ? twoMass(current, fit, changes) : rigid(current, fit, changes);
        if (fit.deadTime() > 0) {
            changes.notes.add(String.format(Locale.ROOT, "fitted dead time %.4g s is not part of the plant; compare it"
                    + " with the controller's sample periods", fit.deadTime()));
        }
        return new PlantUpdate(current, updated, changes.changes, changes.notes);
    }

    private static AxisPlant rigid(AxisPlant current, PlantFitResult fit, Changes changes) {
        double rho = current.loadPerMotorRadian();
        double j = fit.totalInertia();
        double b = fit.viscousDamping();
        switch (current) {
            case DirectLinearDrive d -> {
                change(changes, "moving mass", d.movingMass(), j, "kg");
                change(changes, "viscous friction", d.viscousFriction(), b, "N·s/m");
                return new DirectLinearDrive(j, d.forceConstant(), d.currentLoopBandwidth(), b, d.coulombFriction());
            }
            case RigidScrewDrive s -> {
                double rest = s.motor().inertia() + s.screwInertia() / (s.gearRatio() * s.gearRatio());
                if (j > rest) {
                    double mass = (j - rest) / (rho * rho);
                    change(changes, "load mass", s.loadMass(), mass, "kg");
                    change(changes, "viscous friction", s.viscousFriction(), b / (rho * rho), "N·s/m");
                    return new RigidScrewDrive(s.motor(), s.screwInertia(), mass, s.lead(), s.gearRatio(),
                            b / (rho * rho), s.coulombFriction());
                }
                return explicit(current, fit, changes, String.format(Locale.ROOT, "fitted inertia %.4g kg·m² is below"
                        + " motor and screw alone (%.4g kg·m²)", j, rest));
            }
            case RackAndPinionDrive r -> {
                double rest = r.motor().inertia() + r.pinionInertia() / (r.gearRatio() * r.gearRatio());
                if (j > rest) {
                    double mass = (j - rest) / (rho * rho);
                    change(changes, "load mass", r.loadMass(), mass, "kg");
                    change(changes, "viscous friction", r.viscousFriction(), b / (rho * rho), "N·s/m");
                    return new RackAndPinionDrive(r.motor(), r.pinionInertia(), r.pinionRadius(), r.gearRatio(), mass,
                            b / (rho * rho), r.coulombFriction());
                }
                return explicit(current, fit, changes, String.format(Locale.ROOT, "fitted inertia %.4g kg·m² is below"
                        + " motor and pinion alone (%.4g kg·m²)", j, rest));
            }
            case RotaryTable t -> {
                double n2 = t.gearRatio() * t.gearRatio();
                if (j > t.motor().inertia()) {
                    double table = (j - t.motor().inertia()) * n2;
                    change(changes, "table inertia", t.tableInertia(), table, "kg·m²");
                    change(changes, "viscous friction", t.viscousFriction(), b * n2, "N·m·s/rad");
                    return new RotaryTable(t.motor(), table, t.gearRatio(), b * n2, t.coulombFriction());
                }
                return explicit(current, fit, changes, String.format(Locale.ROOT, "fitted inertia %.4g kg·m² is below"
                        + " the motor alone (%.4g kg·m²)", j, t.motor().inertia()));
            }
            case TwoMassScrewDrive s -> {
                // A rigid fit sees the total inertia only: put the difference into the load, keep the stiffness.
                double rest = s.motorSideInertia();
                if (j > rest) {
                    double mass = (j - rest) / (rho * rho);
                    change(changes, "load mass", s.loadMass(), mass, "kg");
                    change(changes, "viscous friction", s.viscousFriction(), b / (rho * rho), "N·s/m");
                    changes.notes.add("stiffness chain and axial damping kept: a rigid fit does not see the resonance");
                    return new TwoMassScrewDrive(s.motor(), s.screwInertia(), mass, s.lead(), s.gearRatio(),
                            s.stiffnessChain(), s.nutPosition(), s.axialDamping(), b / (rho * rho),
                            s.coulombFriction());
                }
                return explicit(current, fit, changes, String.format(Locale.ROOT, "fitted inertia %.4g kg·m² is below"
                        + " the motor side alone (%.4g kg·m²)", j, rest));
            }
            case TransferFunctionPlant t -> {
                return explicit(current, fit, changes, "the plant is given as a transfer function");
            }
        }
    }

    private static AxisPlant twoMass(AxisPlant current, PlantFitResult fit, Changes changes) {
        TwoMassParameters t = fit.twoMass().orElseThrow();
        if (!(current instanceof TwoMassScrewDrive s)) {
            return explicit(current, fit, changes, "a " + kind(current) + " has no two-mass parameters");
        }
        double rho = s.loadPerMotorRadian();
        double rho2 = rho * rho;
        double motorInertia = t.motorInertia() - s.screwInertia() / (s.gearRatio() * s.gearRatio());
        if (!(motorInertia > 0)) {
            return explicit(current, fit, changes, String.format(Locale.ROOT, "fitted motor-side inertia %.4g kg·m² is"
                    + " below the screw's share alone", t.motorInertia()));
        }
        // Put the fitted axial stiffness into the nut: 1/k_nut = 1/k_ax − 1/k_screw(a) − 1/k_bearing.
        StiffnessChain chain = s.stiffnessChain();
        double axial = t.stiffness() / rho2;
        double screw = chain.screw().axialStiffness(chain.mounting(), s.nutPosition());
        double nutCompliance = 1 / axial - 1 / screw - 1 / chain.bearingStiffness();
        if (!(nutCompliance > 0)) {
            return explicit(current, fit, changes, String.format(Locale.ROOT, "fitted axial stiffness %.4g N/m is"
                    + " above screw and bearings alone (%.4g N/m)", axial,
                    StiffnessChain.series(screw, chain.bearingStiffness())));
        }
        StiffnessChain fitted = new StiffnessChain(chain.screw(), chain.mounting(), 1 / nutCompliance,
                chain.bearingStiffness());
        double mass = t.loadInertia() / rho2;
        change(changes, "motor inertia", s.motor().inertia(), motorInertia, "kg·m²");
        change(changes, "load mass", s.loadMass(), mass, "kg");
        change(changes, "nut stiffness", chain.nutStiffness(), 1 / nutCompliance, "N/m");
        changes.notes.add(String.format(Locale.ROOT, "the nut stiffness is set so that screw, nut and bearings give the"
                + " fitted axial stiffness %.4g N/m at the nut position %.4g m", axial, s.nutPosition()));
        change(changes, "axial damping", s.axialDamping(), t.damping() / rho2, "N·s/m");
        change(changes, "viscous friction", s.viscousFriction(), fit.viscousDamping() / rho2, "N·s/m");
        DriveMotor motor = new DriveMotor(motorInertia, s.motor().torqueConstant(), s.motor().currentLoopBandwidth());
        return new TwoMassScrewDrive(motor, s.screwInertia(), mass, s.lead(), s.gearRatio(), fitted, s.nutPosition(),
                t.damping() / rho2, fit.viscousDamping() / rho2, s.coulombFriction());
    }

    private static AxisPlant explicit(AxisPlant current, PlantFitResult fit, Changes changes, String why) {
        changes.notes.add("replaced by an explicit transfer-function plant (" + why + "); ratio, torque constant, current"
                + " loop and Coulomb friction kept");
        change(changes, "equivalent inertia", current.equivalentInertia(), fit.totalInertia(), "kg·m²");
        return new TransferFunctionPlant(fit.mechanics(), current.loadPerMotorRadian(), fit.totalInertia(),
                current.currentLoopBandwidth(), current.torqueConstant(), current.coulombFrictionTorque());
    }

    private static String kind(AxisPlant plant) {
        return plant.getClass().getSimpleName();
    }

    private static void change(Changes changes, String what, double before, double after, String unit) {
        changes.changes.add(new ParameterChange(what, before, after, unit));
    }

    /** Collects changes and notes while the update is built. */
    private static final class Changes {
        final List<ParameterChange> changes = new ArrayList<>();
        final List<String> notes = new ArrayList<>();
    }
}
