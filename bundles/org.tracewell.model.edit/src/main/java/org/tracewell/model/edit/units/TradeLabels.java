package org.tracewell.model.edit.units;

import java.util.Locale;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.tracewell.model.Arc;
import org.tracewell.model.Axis;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.Controller;
import org.tracewell.model.Corner;
import org.tracewell.model.DirectDrive;
import org.tracewell.model.Direction;
import org.tracewell.model.Encoder;
import org.tracewell.model.EncoderSide;
import org.tracewell.model.FullCircle;
import org.tracewell.model.LeadLagFilter;
import org.tracewell.model.LimitBound;
import org.tracewell.model.Line;
import org.tracewell.model.LowPassFilter;
import org.tracewell.model.LowPassOrder;
import org.tracewell.model.Machine;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.PidController;
import org.tracewell.model.Plant;
import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.RotaryTable;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.TransferFunctionController;
import org.tracewell.model.TransferFunctionPlant;
import org.tracewell.model.TwoMassDrive;
import org.tracewell.model.StudyKind;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;
import org.tracewell.model.paths.AttributePath;
import org.tracewell.model.paths.AttributeTarget;
import org.tracewell.model.units.UnitAnnotations;
import org.tracewell.model.units.UnitSystem;
import org.tracewell.model.units.UnitTable;

/**
 * Labels of model elements in trade units, e.g. {@code "Y · ball screw 10 mm · Kv 3.0 (m/min)/mm"}. The model stores
 * SI; this is the single place item providers turn it into what a machine builder reads. Each unit comes from the
 * attribute's declaration in the metamodel, so a label cannot show a unit the model does not mean; lengths follow the
 * active {@link UnitSystem} (metric or inch).
 */
public final class TradeLabels {

    /** Separates the parts of a label. */
    public static final String SEPARATOR = " · ";

    private TradeLabels() {
    }

    /** The label of any Tracewell element; falls back to the class name for elements without a special label. */
    public static String text(Object element) {
        if (element instanceof Machine m) {
            return machine(m);
        } else if (element instanceof Axis a) {
            return axis(a);
        } else if (element instanceof Plant p) {
            return plant(p);
        } else if (element instanceof Controller c) {
            return controller(c);
        } else if (element instanceof LowPassFilter f) {
            return (f.getOrder() == LowPassOrder.SECOND ? "low-pass 2nd order " : "low-pass 1st order ")
                    + quantity(f, Literals.LOW_PASS_FILTER__CUTOFF_FREQUENCY);
        } else if (element instanceof NotchFilter f) {
            return "notch " + quantity(f, Literals.NOTCH_FILTER__CENTRE_FREQUENCY) + ", width "
                    + quantity(f, Literals.NOTCH_FILTER__WIDTH);
        } else if (element instanceof LeadLagFilter f) {
            return "lead/lag zero " + quantity(f, Literals.LEAD_LAG_FILTER__ZERO_FREQUENCY) + ", pole "
                    + quantity(f, Literals.LEAD_LAG_FILTER__POLE_FREQUENCY);
        } else if (element instanceof Encoder e) {
            return encoder(e);
        } else if (element instanceof Contour c) {
            return orUnnamed(c.getName()) + SEPARATOR + quantity(c, Literals.CONTOUR__FEED);
        } else if (element instanceof Line l) {
            return "line to " + point(l, Literals.LINE__END_X, Literals.LINE__END_Y);
        } else if (element instanceof Arc a) {
            return "arc " + direction(a.getDirection()) + " to " + point(a, Literals.ARC__END_X, Literals.ARC__END_Y)
                    + " about " + point(a, Literals.ARC__CENTRE_X, Literals.ARC__CENTRE_Y);
        } else if (element instanceof FullCircle c) {
            return "full circle " + direction(c.getDirection()) + " about "
                    + point(c, Literals.FULL_CIRCLE__CENTRE_X, Literals.FULL_CIRCLE__CENTRE_Y);
        } else if (element instanceof Corner c) {
            return "corner " + words(c.getKind().getLiteral());
        } else if (element instanceof Requirement r) {
            return requirement(r);
        } else if (element instanceof BudgetLine b) {
            return budgetLine(b);
        } else if (element instanceof VariationStudy v) {
            return study(v);
        } else if (element instanceof VariedParameter p) {
            return variedParameter(p);
        } else if (element instanceof EObject e) {
            return e.eClass().getName();
        }
        return String.valueOf(element);
    }

    /** A numeric attribute of {@code owner} in its display unit, e.g. {@code "10 mm"}. */
    public static String quantity(EObject owner, EStructuralFeature feature) {
        Object value = owner.eGet(feature);
        double si = value instanceof Number n ? n.doubleValue() : Double.NaN;
        return UnitAnnotations.formatValue(owner, feature, si);
    }

    private static String machine(Machine m) {
        int axes = m.getAxes().size() + m.getLibraryAxes().size();
        return orUnnamed(m.getName()) + SEPARATOR + axes + (axes == 1 ? " axis" : " axes");
    }

    private static String axis(Axis a) {
        StringBuilder label = new StringBuilder(orUnnamed(a.getName()));
        if (a.getPlant() != null) {
            label.append(SEPARATOR).append(plantKind(a.getPlant()));
        }
        if (a.getController() instanceof CascadeController c) {
            label.append(SEPARATOR).append("Kv ").append(quantity(c, Literals.CASCADE_CONTROLLER__POSITION_GAIN));
        }
        if (a.getGantryPartner() != null) {
            label.append(SEPARATOR).append("gantry with ").append(orUnnamed(a.getGantryPartner().getName()));
        }
        return label.toString();
    }

    private static String plant(Plant p) {
        if (p instanceof RigidScrewDrive s) {
            return plantKind(p) + SEPARATOR + "load " + quantity(s, Literals.RIGID_SCREW_DRIVE__LOAD_MASS);
        } else if (p instanceof RackPinionDrive r) {
            return plantKind(p) + SEPARATOR + "load " + quantity(r, Literals.RACK_PINION_DRIVE__LOAD_MASS);
        } else if (p instanceof RotaryTable t) {
            return plantKind(p) + SEPARATOR + quantity(t, Literals.ROTARY_TABLE__TABLE_INERTIA);
        }
        return plantKind(p);
    }

    /** Short name of the drive with its defining dimension, e.g. {@code "ball screw 10 mm"}. */
    private static String plantKind(Plant p) {
        if (p instanceof TwoMassDrive s) {
            return "ball screw " + quantity(s, Literals.RIGID_SCREW_DRIVE__LEAD) + ", two-mass";
        } else if (p instanceof RigidScrewDrive s) {
            return "ball screw " + quantity(s, Literals.RIGID_SCREW_DRIVE__LEAD);
        } else if (p instanceof RackPinionDrive r) {
            return "rack and pinion r " + quantity(r, Literals.RACK_PINION_DRIVE__PINION_RADIUS);
        } else if (p instanceof DirectDrive d) {
            return "linear motor " + quantity(d, Literals.DIRECT_DRIVE__MOVING_MASS);
        } else if (p instanceof RotaryTable t) {
            return t.getGearRatio() == 1.0 ? "rotary table, torque motor"
                    : "rotary table i = " + quantity(t, Literals.ROTARY_TABLE__GEAR_RATIO);
        } else if (p instanceof TransferFunctionPlant tf) {
            return "transfer function plant, order " + Math.max(0, tf.getDenominator().size() - 1);
        }
        return p.eClass().getName();
    }

    private static String controller(Controller c) {
        if (c instanceof CascadeController k) {
            return "cascade" + SEPARATOR + "Kv " + quantity(k, Literals.CASCADE_CONTROLLER__POSITION_GAIN) + SEPARATOR
                    + "Tn " + quantity(k, Literals.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME);
        } else if (c instanceof PidController pid) {
            return "PID" + SEPARATOR + "Kp " + quantity(pid, Literals.PID_CONTROLLER__PROPORTIONAL_GAIN);
        } else if (c instanceof TransferFunctionController tf) {
            return "transfer function controller, order " + Math.max(0, tf.getDenominator().size() - 1);
        }
        return c.eClass().getName();
    }

    private static String encoder(Encoder e) {
        if (e.getSide() == EncoderSide.LOAD && !UnitAnnotations.isRotary(e)) {
            return "linear scale " + quantity(e, Literals.ENCODER__LINEAR_RESOLUTION);
        }
        return "encoder " + e.getSide().getLiteral() + " side, " + e.getCountsPerRevolution() + " counts/rev";
    }

    private static String requirement(Requirement r) {
        String what = r.getKind() == RequirementKind.CONTOUR_DEVIATION ? metric(r) : words(r.getKind().getLiteral());
        String bound = r.getBound() == LimitBound.AT_LEAST ? " ≥ " : " ≤ ";
        StringBuilder label = new StringBuilder(orUnnamed(r.getId())).append(SEPARATOR);
        if (r.getAllocatedAxis() != null) {
            label.append(orUnnamed(r.getAllocatedAxis().getName())).append(' ');
        }
        label.append(what).append(bound)
                .append(UnitTable.format(r.getLimit(), UnitSystem.active().shown(r.getDisplayUnit())));
        return label.toString();
    }

    private static String metric(Requirement r) {
        return switch (r.getMetric()) {
            case CIRCULAR_DEVIATION -> "circular deviation G";
            case RADIAL_DEVIATION -> "radial deviation F";
            case MAX_NORMAL_DEVIATION -> "max contour error";
        };
    }

    private static String budgetLine(BudgetLine b) {
        StringBuilder label = new StringBuilder();
        if (b.getAxis() != null) {
            label.append(orUnnamed(b.getAxis().getName())).append(' ');
        }
        label.append(b.getName() == null || b.getName().isBlank() ? words(b.getSource().getLiteral()) : b.getName());
        label.append(SEPARATOR).append(quantity(b, Literals.BUDGET_LINE__VALUE)).append(' ')
                .append(b.getErrorClass().getLiteral());
        return label.toString();
    }

    private static String study(VariationStudy v) {
        StringBuilder label = new StringBuilder(orUnnamed(v.getName())).append(SEPARATOR);
        if (v.getKind() == StudyKind.SWEEP) {
            label.append("sweep ").append(String.join(" × ", v.getParameters().stream()
                    .map(p -> String.valueOf(p.getSteps())).toList())).append(" points");
        } else {
            label.append("Monte-Carlo ").append(v.getVariantCount()).append(" variants, seed ").append(v.getSeed());
        }
        int n = v.getParameters().size();
        return label.append(SEPARATOR).append(n).append(n == 1 ? " parameter" : " parameters").toString();
    }

    /** The path, and the spread or grid in the trade unit of the attribute it leads to (SI when it leads nowhere). */
    private static String variedParameter(VariedParameter p) {
        String unit = "";
        if (p.eContainer() != null && p.eContainer().eContainer() != null && p.getPath() != null) {
            try {
                AttributeTarget target = AttributePath.parse(p.getPath()).resolve(p.eContainer().eContainer());
                unit = target.displayUnit();
            } catch (IllegalArgumentException notFound) {
                unit = "";
            }
        }
        StringBuilder label = new StringBuilder(p.getPath() == null || p.getPath().isBlank() ? "(no path)" : p.getPath())
                .append(SEPARATOR);
        boolean sweep = p.eContainer() instanceof VariationStudy v && v.getKind() == StudyKind.SWEEP;
        if (sweep) {
            return label.append(shown(p.getFrom(), unit)).append(" to ").append(shown(p.getTo(), unit)).append(", ")
                    .append(p.getSteps()).append(" points").toString();
        }
        switch (p.getShape()) {
            case NORMAL -> label.append("normal σ ").append(shown(p.getSigma(), unit));
            case UNIFORM -> label.append("uniform ± ").append(shown(p.getHalfWidth(), unit));
            case TRIANGULAR -> label.append("triangular ± ").append(shown(p.getHalfWidth(), unit));
        }
        if (p.isSetMinimum() || p.isSetMaximum()) {
            label.append(" in [").append(p.isSetMinimum() ? shown(p.getMinimum(), unit) : "−∞").append(", ")
                    .append(p.isSetMaximum() ? shown(p.getMaximum(), unit) : "∞").append(']');
        }
        return label.toString();
    }

    /**
     * An SI value (a spread or a grid end) in a display unit; a bare number when the unit is unknown or logarithmic
     * (a spread of a ratio has no meaning in dB).
     */
    private static String shown(double si, String displayUnit) {
        boolean linear = UnitTable.find(displayUnit).map(u -> !u.decibel()).orElse(false);
        return linear ? UnitTable.format(si, displayUnit) : UnitTable.formatNumber(si, 0);
    }

    private static String point(EObject owner, EStructuralFeature x, EStructuralFeature y) {
        String unit = UnitAnnotations.displayUnit(owner, x);
        String xs = quantity(owner, x);
        String ys = quantity(owner, y);
        return "(" + stripUnit(xs, unit) + ", " + stripUnit(ys, unit) + ") " + unit;
    }

    private static String stripUnit(String formatted, String unit) {
        return formatted.endsWith(" " + unit) ? formatted.substring(0, formatted.length() - unit.length() - 1) : formatted;
    }

    private static String direction(Direction d) {
        return d == Direction.CLOCKWISE ? "CW" : "CCW";
    }

    /** {@code "frictionReversal"} → {@code "friction reversal"}. */
    private static String words(String camelCase) {
        return camelCase.replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
    }

    private static String orUnnamed(String name) {
        return name == null || name.isBlank() ? "(unnamed)" : name;
    }
}
