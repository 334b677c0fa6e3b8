package org.tracewell.model.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.CascadeController;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TracewellPackage.Literals;

class UnitSystemTest {

    @AfterEach
    void backToMetric() {
        UnitSystem.activate(UnitSystem.METRIC);
    }

    @Test
    void inchUnitsFollowTheInternationalInch() {
        // International yard and pound agreement (1959): 1 in = 25.4 mm exactly; tolerance: rounding of doubles only.
        assertEquals(0.0254, UnitTable.get("in").toSi(1.0), 1e-17);
        assertEquals(25.4e-9, UnitTable.get("µin").toSi(1.0), 1e-22);
        assertEquals(25.4e-6, UnitTable.get("mil").toSi(1.0), 1e-20);
        // 100 in/min = 2.54 m/min.
        assertEquals(2.54, UnitTable.get("m/min").fromSi(UnitTable.get("in/min").toSi(100.0)), 1e-12);
        // 0.2 in lead per revolution = 5.08 mm/rev.
        assertEquals(5.08, UnitTable.get("mm/rev").fromSi(UnitTable.get("in/rev").toSi(0.2)), 1e-12);
    }

    @Test
    void positionGainReadsAlikeInBothSystems() {
        // 1 (in/min)/mil = (0.0254/60 m/s)/(25.4e-6 m) = 1000/60 1/s, the same as 1 (m/min)/mm (common practice,
        // "ipm per mil"); tolerance: rounding of doubles only.
        assertEquals(UnitTable.get("(m/min)/mm").toSi(1.0), UnitTable.get("(in/min)/mil").toSi(1.0), 1e-12);
        assertEquals("3.0 (in/min)/mil", UnitTable.format(50.0, UnitSystem.INCH.shown("(m/min)/mm")));
    }

    @Test
    void inchChangesOnlyLengthBasedUnits() {
        assertEquals("in", UnitSystem.INCH.shown("mm"));
        assertEquals("µin", UnitSystem.INCH.shown("µm"));
        assertEquals("in/min", UnitSystem.INCH.shown("m/min"));
        assertEquals("ms", UnitSystem.INCH.shown("ms"));
        assertEquals("Hz", UnitSystem.INCH.shown("Hz"));
        assertEquals("rev/min", UnitSystem.INCH.shown("rev/min"));
        assertEquals("mm", UnitSystem.METRIC.shown("mm"));
        // 1 µm = 39.37 µin (1e-6 / 25.4e-9); a margin already in µm becomes one in µin by the same factor.
        assertEquals(1e-6 / 25.4e-9, UnitSystem.INCH.perMetricUnit("µm"), 1e-12);
        assertEquals(1.0, UnitSystem.INCH.perMetricUnit("deg"), 0.0);
        assertEquals(1.0, UnitSystem.METRIC.perMetricUnit("µm"), 0.0);
        for (String metric : new String[] {"mm", "µm", "m/min", "mm/min", "(m/min)/mm", "mm/rev", "m/s²", "m/s³"}) {
            TradeUnit inch = UnitTable.get(UnitSystem.INCH.shown(metric));
            assertEquals(UnitTable.get(metric).siSymbol(), inch.siSymbol(), metric + " and its inch unit measure alike");
        }
    }

    @Test
    void activeSystemChangesDisplayUnitsButNotTheSiUnits() {
        Axis x = TracewellFactory.eINSTANCE.createAxis();
        CascadeController c = TracewellFactory.eINSTANCE.createCascadeController();
        x.setController(c);
        c.setPositionGain(50.0);
        UnitSystem.activate(UnitSystem.INCH);
        assertEquals("(in/min)/mil", UnitAnnotations.displayUnit(c, Literals.CASCADE_CONTROLLER__POSITION_GAIN));
        assertEquals("1/s", UnitAnnotations.siUnit(c, Literals.CASCADE_CONTROLLER__POSITION_GAIN));
        // 3 m/min = 118.11 in/min (3 / 0.0254).
        x.setMaxVelocity(0.05);
        assertEquals("118.1 in/min", UnitAnnotations.formatValue(x, Literals.AXIS__MAX_VELOCITY, x.getMaxVelocity()));
        x.setKind(AxisKind.ROTARY);
        assertEquals("rev/min", UnitAnnotations.displayUnit(x, Literals.AXIS__MAX_VELOCITY), "angles stay as declared");
    }
}
