package org.tracewell.report;

import org.tracewell.engine.axis.AxisPlant;
import org.tracewell.engine.axis.CascadeController;
import org.tracewell.engine.axis.DirectLinearDrive;
import org.tracewell.engine.axis.FilterStage;
import org.tracewell.engine.axis.RackAndPinionDrive;
import org.tracewell.engine.axis.RigidScrewDrive;
import org.tracewell.engine.axis.RotaryTable;
import org.tracewell.engine.axis.TransferFunctionPlant;
import org.tracewell.engine.axis.TwoMassScrewDrive;

/** One-line descriptions of plants, controllers and filters in the units machine builders read. */
final class AxisText {

    private AxisText() {
    }

    static String plant(AxisPlant plant) {
        String kind = switch (plant) {
            case RigidScrewDrive p -> "rigid ball screw: lead " + Fmt.mm(p.lead()) + " mm, gear " + Fmt.num(p.gearRatio())
                    + ":1, load " + Fmt.num(p.loadMass()) + " kg";
            case TwoMassScrewDrive p -> "two-mass ball screw: lead " + Fmt.mm(p.lead()) + " mm, gear "
                    + Fmt.num(p.gearRatio()) + ":1, load " + Fmt.num(p.loadMass()) + " kg"
                    + p.resonance().map(r -> ", first mode " + Fmt.num(r.resonanceHz()) + " Hz").orElse("");
            case RackAndPinionDrive p -> "rack and pinion: pinion radius " + Fmt.mm(p.pinionRadius()) + " mm, gear "
                    + Fmt.num(p.gearRatio()) + ":1, load " + Fmt.num(p.loadMass()) + " kg";
            case DirectLinearDrive p -> "linear motor: moving mass " + Fmt.num(p.movingMass()) + " kg, force constant "
                    + Fmt.num(p.forceConstant()) + " N/A";
            case RotaryTable p -> "rotary table: inertia " + Fmt.num(p.tableInertia()) + " kg·m², gear "
                    + Fmt.num(p.gearRatio()) + ":1";
            case TransferFunctionPlant p -> "explicit transfer function, ratio " + Fmt.num(p.ratio());
        };
        String inertia = plant instanceof DirectLinearDrive ? "" : "; J at motor " + Fmt.num(plant.equivalentInertia())
                + " kg·m²";
        String current = Double.isInfinite(plant.currentLoopBandwidth()) ? "; ideal current loop"
                : "; current loop " + Fmt.hz(plant.currentLoopBandwidth()) + " Hz";
        return kind + inertia + current;
    }

    static String velocityPi(CascadeController c, AxisPlant plant) {
        String unit = plant instanceof DirectLinearDrive ? "N·s/m" : "N·m·s/rad";
        String integral = Double.isInfinite(c.velocityIntegralTime()) ? "no integral action"
                : "Ti " + Fmt.ms(c.velocityIntegralTime()) + " ms";
        return "Kp " + Fmt.num(c.velocityGain()) + " " + unit + ", " + integral;
    }

    static String filter(FilterStage stage) {
        return switch (stage) {
            case FilterStage.LowPass1 f -> "low-pass 1st order " + Fmt.hz(f.cornerRadPerSec()) + " Hz";
            case FilterStage.LowPass2 f -> "low-pass 2nd order " + Fmt.hz(f.cornerRadPerSec()) + " Hz, ζ "
                    + Fmt.num(f.dampingRatio());
            case FilterStage.Notch f -> "notch " + Fmt.hz(f.centreRadPerSec()) + " Hz, width "
                    + Fmt.hz(f.widthRadPerSec()) + " Hz, depth " + Fmt.num(f.depth());
            case FilterStage.LeadLag f -> "lead/lag zero " + Fmt.hz(f.zeroRadPerSec()) + " Hz, pole "
                    + Fmt.hz(f.poleRadPerSec()) + " Hz";
        };
    }

    /** Acceleration and jerk limits, linear in m/s² and m/s³, rotary in °/s² and °/s³. */
    static String acceleration(boolean rotary, double acceleration, double jerk) {
        if (rotary) {
            return Fmt.deg(acceleration) + " °/s², jerk " + Fmt.deg(jerk) + " °/s³";
        }
        return Fmt.num(acceleration) + " m/s², jerk " + Fmt.num(jerk) + " m/s³";
    }
}
