package org.tracewell.model.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EClassifier;
import org.junit.jupiter.api.Test;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.TracewellPackage.Literals;

class UnitTableTest {

    @Test
    void positionGainTradeUnit() {
        // 1 (m/min)/mm = (1/60 m/s)/(1e-3 m) = 16.667 1/s — DOMAIN.md §4, common practice; exact ratio 1000/60.
        assertEquals(1000.0 / 60.0, UnitTable.get("(m/min)/mm").toSi(1.0), 1e-12);
        // Following error e[mm] = F[m/min] / Kv[(m/min)/mm] (common practice): 3 m/min at Kv 2.4 → 1.25 mm,
        // checked here through SI: e = v/Kv with v in m/s and Kv in 1/s; tolerance 1e-12 relative (rounding only).
        double v = UnitTable.get("m/min").toSi(3.0);
        double kv = UnitTable.get("(m/min)/mm").toSi(2.4);
        assertEquals(1.25, UnitTable.get("mm").fromSi(v / kv), 1e-12);
    }

    @Test
    void decibelIsTwentyLogTen() {
        // Amplitude ratio in dB = 20·log10(ratio) (definition of the decibel for gain margins); 6 dB → 1.9953.
        assertEquals(1.9952623149688795, UnitTable.get("dB").toSi(6.0), 1e-15);
        assertEquals(6.0, UnitTable.get("dB").fromSi(1.9952623149688795), 1e-12);
    }

    @Test
    void angleAndInertiaUnits() {
        // 1 kg·cm² = 1e-4 kg·m²; 180° = π rad; 1 rev/min = 2π/60 rad/s (SI definitions).
        assertEquals(1e-4, UnitTable.get("kg·cm²").toSi(1.0), 1e-18);
        assertEquals(Math.PI, UnitTable.get("deg").toSi(180.0), 1e-15);
        assertEquals(2 * Math.PI / 60, UnitTable.get("rev/min").toSi(1.0), 1e-15);
    }

    @Test
    void formattingKeepsTradeHabits() {
        assertEquals("3.0 (m/min)/mm", UnitTable.format(50.0, "(m/min)/mm"));
        assertEquals("10 mm", UnitTable.format(0.01, "mm"));
        assertEquals("2.5 mm", UnitTable.format(0.0025, "mm"));
        assertEquals("25 µm", UnitTable.format(2.5e-5, "µm"));
        assertEquals("0.707", UnitTable.format(0.707, "1"));
        assertEquals("0.05 µm", UnitTable.format(5e-8, "µm"));
        assertEquals("1e8", UnitTable.formatNumber(1e8, 0));
        assertEquals("1.235e-5", UnitTable.formatNumber(1.23456e-5, 0));
        assertEquals("NaN mm", UnitTable.format(Double.NaN, "mm"));
    }

    @Test
    void unknownUnitNamesTheKnownOnes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> UnitTable.get("furlong"));
        assertTrue(e.getMessage().contains("furlong") && e.getMessage().contains("µm"), e.getMessage());
    }

    @Test
    void everyDeclaredUnitInTheMetamodelIsKnown() {
        for (EClassifier classifier : TracewellPackage.eINSTANCE.getEClassifiers()) {
            if (classifier instanceof EClass eClass) {
                for (EAttribute attribute : eClass.getEAttributes()) {
                    var annotation = attribute.getEAnnotation(UnitAnnotations.SOURCE);
                    if (annotation == null) {
                        continue;
                    }
                    for (var detail : annotation.getDetails()) {
                        String unit = detail.getValue();
                        if (!unit.isEmpty()) {
                            assertTrue(UnitTable.find(unit).isPresent(),
                                    eClass.getName() + "." + attribute.getName() + " declares unknown unit " + unit);
                        }
                    }
                    String si = annotation.getDetails().get("unit");
                    String display = annotation.getDetails().get("displayUnit");
                    if (si != null && !si.isEmpty()) {
                        assertTrue(UnitTable.get(display).isCompatibleWith(UnitTable.get(si)),
                                eClass.getName() + "." + attribute.getName() + ": " + display + " vs " + si);
                    }
                }
            }
        }
    }

    @Test
    void rotaryAxesUseAngularUnits() {
        Axis a = TracewellFactory.eINSTANCE.createAxis();
        a.setKind(AxisKind.ROTARY);
        assertEquals("rad/s", UnitAnnotations.siUnit(a, Literals.AXIS__MAX_VELOCITY));
        assertEquals("rev/min", UnitAnnotations.displayUnit(a, Literals.AXIS__MAX_VELOCITY));
        a.setKind(AxisKind.LINEAR);
        assertEquals("m/min", UnitAnnotations.displayUnit(a, Literals.AXIS__MAX_VELOCITY));
        assertFalse(UnitAnnotations.isRotary(a));
    }
}
