package org.tracewell.engine.axis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PlantFormulasTest {

    private static final DriveMotor MOTOR = DriveMotor.withIdealCurrentLoop(1.2e-3, 1.1);

    @Test
    void screwInertiaIsSolidCylinder() {
        ScrewShaft screw = ScrewShaft.steel(1.2, 0.032, 0.027);
        // π·ρ·L·d⁴/32 (DOMAIN.md §3, from memory); recomputed by hand: 0.5·m·r² with m = ρ·π·d²/4·L
        double mass = 7850 * Math.PI * 0.032 * 0.032 / 4 * 1.2;
        assertEquals(0.5 * mass * 0.016 * 0.016, screw.inertia(), 1e-15);
        assertEquals(9.697e-4, screw.inertia(), 1e-7); // π·7850·1.2·0.032⁴/32 = 9.6972e-4 kg·m², by hand
    }

    @Test
    void reflectedLoadInertiaOfScrewIsMassTimesLeadOver2PiSquared() {
        double lead = 0.010;
        double mass = 250;
        RigidScrewDrive drive = new RigidScrewDrive(MOTOR, 9.7e-4, mass, lead, 1.0, 0, 0);
        // J = m·(h/2π)² (DOMAIN.md §3, from memory): 250·(0.01/2π)² = 6.3326e-4 kg·m²
        assertEquals(mass * Math.pow(lead / (2 * Math.PI), 2), drive.reflectedLoadInertia(), 1e-18);
        assertEquals(6.3326e-4, drive.reflectedLoadInertia(), 1e-8);
        assertEquals(1.2e-3 + 9.7e-4 + 6.3326e-4, drive.equivalentInertia(), 1e-8);
        // a 2:1 belt halves ρ: screw inertia /4, load inertia /4 (n² law, from memory)
        RigidScrewDrive geared = new RigidScrewDrive(MOTOR, 9.7e-4, mass, lead, 2.0, 0, 0);
        assertEquals(1.2e-3 + (9.7e-4 + 6.3326e-4) / 4, geared.equivalentInertia(), 1e-8);
    }

    @Test
    void rackAndPinionAndRotaryTableReflect() {
        RackAndPinionDrive rack = new RackAndPinionDrive(MOTOR, 0, 0.03, 1.0, 400, 0, 0);
        // J = m·r² (DOMAIN.md §3, from memory)
        assertEquals(1.2e-3 + 400 * 0.03 * 0.03, rack.equivalentInertia(), 1e-15);
        RotaryTable table = new RotaryTable(MOTOR, 2.5, 90, 0, 0);
        // J/n² through a gear of ratio n (from memory)
        assertEquals(1.2e-3 + 2.5 / 8100, table.equivalentInertia(), 1e-15);
        assertEquals(1.0 / 90, table.loadPerMotorRadian(), 1e-15);
    }

    @Test
    void axialStiffnessFormulasAndSeriesChain() {
        ScrewShaft screw = ScrewShaft.steel(1.0, 0.032, 0.027);
        double ea = 2.1e11 * Math.PI * 0.027 * 0.027 / 4;
        // fixed–free E·A/a; fixed–fixed E·A·L/(a(L−a)), minimum 4EA/L at mid-span (Altintas et al., CIRP Annals 60(2), 2011)
        assertEquals(ea / 0.4, screw.axialStiffness(ScrewMounting.FIXED_FREE, 0.4), 1e-6 * ea);
        assertEquals(ea * 1.0 / (0.3 * 0.7), screw.axialStiffness(ScrewMounting.FIXED_FIXED, 0.3), 1e-6 * ea);
        assertEquals(4 * ea, screw.axialStiffness(ScrewMounting.FIXED_FIXED, 0.5), 1e-6 * ea);
        // springs in series: 1/k = Σ 1/k_i (Altintas et al. 2011); 1/(1/2 + 1/3 + 1/6) = 1
        assertEquals(1.0, StiffnessChain.series(2, 3, 6), 1e-15);
        StiffnessChain chain = new StiffnessChain(screw, ScrewMounting.FIXED_FIXED, 8e8, 1e9);
        double ks = 4 * ea;
        assertEquals(1 / (1 / ks + 1 / 8e8 + 1 / 1e9), chain.stiffnessAt(0.5), 1e-3);
        assertEquals(0.5, chain.softestNutPosition(), 0);
        // rigid nut and bearing leave the shaft alone
        assertEquals(ks, new StiffnessChain(screw, ScrewMounting.FIXED_FIXED, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY).stiffnessAt(0.5), 1e-6 * ks);
    }

    @Test
    void badParametersNameTheParameterValueAndRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new RigidScrewDrive(MOTOR, 0, -5, 0.01, 1, 0, 0));
        assertTrue(e.getMessage().contains("load mass") && e.getMessage().contains("-5.0")
                && e.getMessage().contains(">= 0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new DriveMotor(1e-3, 1, 0));
        assertTrue(e.getMessage().contains("current-loop bandwidth") && e.getMessage().contains("Infinity"),
                e.getMessage());
        ScrewShaft screw = ScrewShaft.steel(1.0, 0.032, 0.027);
        e = assertThrows(IllegalArgumentException.class, () -> screw.axialStiffness(ScrewMounting.FIXED_FIXED, 1.0));
        assertTrue(e.getMessage().contains("(0, 1.0)") && e.getMessage().contains("got 1.0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new CascadeController(30, 1, 0.01, java.util.List.of(), 1.5, 0, 0, 0));
        assertTrue(e.getMessage().contains("velocity feedforward") && e.getMessage().contains("0..1"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new FilterStage.Notch(100, 20, 1.0));
        assertTrue(e.getMessage().contains("notch depth") && e.getMessage().contains("[0, 1)"), e.getMessage());
    }
}
