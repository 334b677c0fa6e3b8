package org.tracewell.core.mapping;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.Examples;
import org.tracewell.core.diff.ModelChange;
import org.tracewell.core.diff.ModelDiff;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.engine.axis.AxisPlant;
import org.tracewell.engine.axis.RackAndPinionDrive;
import org.tracewell.engine.axis.RigidScrewDrive;
import org.tracewell.engine.axis.TwoMassScrewDrive;
import org.tracewell.engine.measured.MeasuredFrequencyResponse;
import org.tracewell.engine.measured.MeasurementSource;
import org.tracewell.engine.measured.PlantFit;
import org.tracewell.engine.measured.PlantFitModel;
import org.tracewell.engine.measured.PlantFitOptions;
import org.tracewell.engine.measured.PlantFitResult;
import org.tracewell.engine.measured.PlantUpdate;
import org.tracewell.engine.measured.TwoMassParameters;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.units.UnitTable;

/**
 * A fit written back into the model: fit the LM-3020 demo measurements (examples/measurements/, invented), write the
 * updated copy, read it again, map it forward, and get the fitted plant back; nothing else in the file changes.
 */
class PlantParameterUpdateTest {

    /** Round trip through the file: doubles are written in full, so only arithmetic rounding remains. */
    private static final double ROUND_TRIP = 1e-9;

    private final ModelFiles files = new ModelFiles();

    @TempDir
    Path tmp;

    private record Fitted(LoadedModel model, Axis axis, AxisPlant plant, PlantFitResult fit, PlantUpdate update) {
    }

    private Fitted fit(String axisName, String csv, PlantFitModel kind) throws Exception {
        Path examples = Examples.copyTo(tmp.resolve("examples"));
        LoadedModel model = files.load(examples.resolve(Examples.LM_3020));
        Axis axis = axis(model.machine(), axisName);
        AxisPlant plant = EngineMapping.mapAxis(axis).model().plant();
        MeasuredFrequencyResponse measured = MeasuredFrequencyResponse.read(examples.resolve("measurements/" + csv));
        PlantFitResult fit = PlantFit.fit(measured, kind,
                PlantFitOptions.defaults().withCurrentLoopBandwidth(plant.currentLoopBandwidth()));
        return new Fitted(model, axis, plant, fit, PlantUpdate.of(plant, fit));
    }

    private static Axis axis(Machine machine, String name) {
        List<Axis> all = new ArrayList<>(machine.getAxes());
        all.addAll(machine.getLibraryAxes());
        return all.stream().filter(a -> a.getName().equals(name)).findFirst().orElseThrow();
    }

    private static void relative(double expected, double actual, String what) {
        assertEquals(expected, actual, ROUND_TRIP * Math.abs(expected), what);
    }

    @Test
    void twoMassFitOfYWrittenReadAndMappedForwardGivesTheFittedPlantBack() throws Exception {
        Fitted f = fit("Y", "lm3020-y-frf.csv", PlantFitModel.TWO_MASS);
        UpdatedAxisModel updated = PlantParameterUpdate.apply(f.axis(), PlantFitModel.TWO_MASS, f.update().updated());
        assertFalse(updated.fromLibrary(), "Y is inline in the machine");
        assertEquals(List.of("motorInertia", "loadMass", "nutStiffness", "dampingRatio", "viscousFriction"),
                updated.changes().stream().map(PlantAttributeChange::attribute).toList(),
                "exactly what a two-mass fit determines");
        assertEquals(180.0, axis(f.model().machine(), "Y").getPlant().eGet(
                org.tracewell.model.TracewellPackage.Literals.RIGID_SCREW_DRIVE__LOAD_MASS), "the input is untouched");
        Path original = f.model().file();
        Path out = original.resolveSibling("LM-3020-y-fitted.machine");
        updated.write(out, files);

        LoadedModel reloaded = files.load(out);
        TwoMassScrewDrive forward = assertInstanceOf(TwoMassScrewDrive.class,
                EngineMapping.mapAxis(axis(reloaded.machine(), "Y")).model().plant());
        TwoMassScrewDrive fitted = (TwoMassScrewDrive) f.update().updated();
        relative(fitted.motor().inertia(), forward.motor().inertia(), "motor inertia");
        relative(fitted.loadMass(), forward.loadMass(), "load mass");
        relative(fitted.stiffnessChain().nutStiffness(), forward.stiffnessChain().nutStiffness(), "nut stiffness");
        relative(fitted.axialDamping(), forward.axialDamping(), "axial damping");
        relative(fitted.viscousFriction(), forward.viscousFriction(), "viscous friction");
        // Against the fit itself, in its motor-side frame (PlantFitResult): J = J_M + J_L, k and c reflected by ρ²,
        // b at the load reflected by ρ² (ρ = lead/2π for a direct coupling).
        TwoMassParameters t = f.fit().twoMass().orElseThrow();
        double rho2 = forward.loadPerMotorRadian() * forward.loadPerMotorRadian();
        relative(f.fit().totalInertia(), forward.equivalentInertia(), "total inertia");
        relative(t.stiffness(), forward.stiffnessChain().stiffnessAt(forward.nutPosition()) * rho2, "stiffness");
        relative(t.damping(), forward.axialDamping() * rho2, "damping");
        relative(f.fit().viscousDamping(), forward.viscousFriction() * rho2, "viscous damping");

        assertOnlyChangedAttributesDiffer(original, out, updated, f.model(), reloaded);
    }

    @Test
    void rigidFitOfTheX1RackWrittenReadAndMappedForwardGivesTheFittedInertiaBack() throws Exception {
        Fitted f = fit("X1", "lm3020-x1-frf.csv", PlantFitModel.RIGID);
        UpdatedAxisModel updated = PlantParameterUpdate.apply(f.axis(), PlantFitModel.RIGID, f.update().updated());
        assertEquals(List.of("loadMass", "viscousFriction"), updated.changes().stream()
                .map(PlantAttributeChange::attribute).toList(), "exactly what a rigid fit determines");
        Path out = f.model().file().resolveSibling("LM-3020-x1-fitted.machine");
        updated.write(out, files);
        LoadedModel reloaded = files.load(out);
        RackAndPinionDrive forward = assertInstanceOf(RackAndPinionDrive.class,
                EngineMapping.mapAxis(axis(reloaded.machine(), "X1")).model().plant());
        RackAndPinionDrive fitted = (RackAndPinionDrive) f.update().updated();
        relative(fitted.loadMass(), forward.loadMass(), "load mass");
        relative(fitted.viscousFriction(), forward.viscousFriction(), "viscous friction");
        double rho2 = forward.loadPerMotorRadian() * forward.loadPerMotorRadian();
        relative(f.fit().totalInertia(), forward.equivalentInertia(), "total inertia");
        relative(f.fit().viscousDamping(), forward.viscousFriction() * rho2, "viscous damping");
        // README of examples/measurements: generated with 228 kg (model 210 kg) and 1 % noise; within 2 %.
        assertEquals(228, forward.loadMass(), 228 * 0.02);
        assertOnlyChangedAttributesDiffer(f.model().file(), out, updated, f.model(), reloaded);
    }

    /**
     * Line by line the saved copy equals the input except on the lines of the changed attributes, and
     * {@link ModelDiff} reports exactly those attributes (those whose value differs in display units, since diff
     * compares values as people read them).
     */
    private static void assertOnlyChangedAttributesDiffer(Path original, Path out, UpdatedAxisModel updated,
            LoadedModel before, LoadedModel after) throws Exception {
        List<String> was = Files.readAllLines(original);
        List<String> is = Files.readAllLines(out);
        assertEquals(was.size(), is.size(), "every attribute was set before: no line added or removed");
        Set<String> differing = new TreeSet<>();
        for (int i = 0; i < was.size(); i++) {
            if (!was.get(i).equals(is.get(i))) {
                differing.add(is.get(i).strip().split("=")[0]);
            }
        }
        Set<String> changed = updated.changes().stream().map(PlantAttributeChange::attribute)
                .collect(Collectors.toCollection(TreeSet::new));
        assertEquals(changed, differing);
        String plantId = updated.axis().getPlant().getId();
        List<ModelChange> diff = ModelDiff.compare(before.root(), after.root());
        Set<String> shownAsChanged = updated.changes().stream()
                .filter(c -> !UnitTable.format(c.oldValue(), c.displayUnit()).equals(
                        UnitTable.format(c.newValue(), c.displayUnit())))
                .map(PlantAttributeChange::label).collect(Collectors.toCollection(TreeSet::new));
        assertTrue(shownAsChanged.size() >= 2, "the fit moves the values visibly: " + updated.changes());
        for (ModelChange change : diff) {
            assertEquals(ModelChange.Kind.CHANGED, change.kind(), change.toString());
            assertEquals(plantId, change.id(), change.toString());
        }
        assertEquals(shownAsChanged, diff.stream().map(ModelChange::feature)
                .collect(Collectors.toCollection(TreeSet::new)));
    }

    @Test
    void aLibraryAxisIsUpdatedAsACopyOfItsAxisFileAndNeverOverwritesAFileInUse() throws Exception {
        Path examples = Examples.copyTo(tmp.resolve("examples"));
        LoadedModel model = files.load(examples.resolve(Examples.LM_3020));
        Axis z = axis(model.machine(), "Z");
        RigidScrewDrive plant = assertInstanceOf(RigidScrewDrive.class, EngineMapping.mapAxis(z).model().plant());
        // Synthetic response of the Z slide carrying 110 kg instead of 95 kg and 1100 N·s/m instead of 900, from
        // Newton's law for one rigid inertia behind the current-loop lag, ω/T = 1/((J·jω + b)(1 + jω/ω_i)), noise-free.
        double rho = plant.loadPerMotorRadian();
        double j = plant.motor().inertia() + plant.screwInertia() + 110 * rho * rho;
        double b = 1100 * rho * rho;
        double wi = plant.currentLoopBandwidth();
        int n = 120;
        double[] w = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 2 * Math.PI * Math.pow(10, 0.3 + 2.0 * i / (n - 1));
            // (b + jωJ)(1 + jω/ω_i) = (b − ω²J/ω_i) + j(ωJ + bω/ω_i); G = conj(D)/|D|²
            double dr = b - w[i] * w[i] * j / wi;
            double di = w[i] * j + b * w[i] / wi;
            double d2 = dr * dr + di * di;
            re[i] = dr / d2;
            im[i] = -di / d2;
        }
        MeasuredFrequencyResponse measured = MeasuredFrequencyResponse.of(new MeasurementSource("z-synthetic.csv",
                Optional.empty(), false, Map.of()), w, re, im, null);
        PlantFitResult fit = PlantFit.fit(measured, PlantFitModel.RIGID,
                PlantFitOptions.defaults().withCurrentLoopBandwidth(wi).withDeadTime(false));
        UpdatedAxisModel updated = PlantParameterUpdate.apply(z, PlantFitModel.RIGID, PlantUpdate.of(plant, fit)
                .updated());
        assertTrue(updated.fromLibrary());
        assertInstanceOf(Axis.class, updated.copy(), "the copy is the library axis file's content, not the machine");
        assertEquals("axis", updated.extension());
        // Same kind, but a lead the fit cannot have determined: refused rather than silently dropped.
        RigidScrewDrive otherLead = new RigidScrewDrive(plant.motor(), plant.screwInertia(), 110, 0.01,
                plant.gearRatio(), 1100, plant.coulombFriction());
        MappingException lead = assertThrows(MappingException.class,
                () -> PlantParameterUpdate.apply(z, PlantFitModel.RIGID, otherLead));
        assertTrue(lead.getMessage().contains("lead"), lead.getMessage());

        Path library = examples.resolve(Examples.SHARED_Z);
        for (Path inUse : List.of(library, examples.resolve(Examples.LM_3020),
                examples.resolve("library/../" + Examples.SHARED_Z))) {
            IllegalArgumentException refused = assertThrows(IllegalArgumentException.class,
                    () -> updated.write(inUse, files));
            assertTrue(refused.getMessage().contains("refusing to overwrite") || refused.getMessage().contains(
                    ".axis file"), refused.getMessage());
        }
        byte[] libraryBefore = Files.readAllBytes(library);
        Path out = library.resolveSibling("z-slide-25x5-fitted.axis");
        updated.write(out, files);
        assertEquals(new String(libraryBefore), Files.readString(library), "the shared library file is unchanged");
        RigidScrewDrive forward = assertInstanceOf(RigidScrewDrive.class,
                EngineMapping.mapAxis(files.load(out).axis()).model().plant());
        // Noise-free data: the fit lands on the generating values to the optimiser's tolerance (1e-6 relative).
        assertEquals(110, forward.loadMass(), 110 * 1e-6);
        assertEquals(1100, forward.viscousFriction(), 1100 * 1e-6);
        List<ModelChange> diff = ModelDiff.compare(files.load(library).root(), files.load(out).root());
        assertEquals(Set.of("load mass", "viscous friction"), diff.stream().map(ModelChange::feature)
                .collect(Collectors.toSet()));
    }

    @Test
    void aFitOfTheOtherKindIsRefusedNamingAxisAndBothKinds() throws Exception {
        Fitted y = fit("Y", "lm3020-y-frf.csv", PlantFitModel.TWO_MASS);
        MappingException rigidOnTwoMass = assertThrows(MappingException.class,
                () -> PlantParameterUpdate.apply(y.axis(), PlantFitModel.RIGID, y.update().updated()));
        assertEquals("lm3020-y-plant", rigidOnTwoMass.elementId());
        assertTrue(rigidOnTwoMass.getMessage().contains("Axis 'Y' [lm3020-y]"), rigidOnTwoMass.getMessage());
        assertTrue(rigidOnTwoMass.getMessage().contains("two-mass drive (TwoMassDrive)"), rigidOnTwoMass.getMessage());
        assertTrue(rigidOnTwoMass.getMessage().contains("rigid inertia fit"), rigidOnTwoMass.getMessage());

        Axis x1 = axis(y.model().machine(), "X1");
        MappingException twoMassOnRack = assertThrows(MappingException.class,
                () -> PlantParameterUpdate.apply(x1, PlantFitModel.TWO_MASS, y.update().updated()));
        assertTrue(twoMassOnRack.getMessage().contains("Axis 'X1' [lm3020-x1]"), twoMassOnRack.getMessage());
        assertTrue(twoMassOnRack.getMessage().contains("rack-and-pinion drive (RackPinionDrive)"),
                twoMassOnRack.getMessage());
        assertTrue(twoMassOnRack.getMessage().contains("two-mass resonance fit"), twoMassOnRack.getMessage());

        // Right kind, but a plant fitted against another axis (Y's lead and chain on X1's rack) is not written.
        MappingException otherAxis = assertThrows(MappingException.class,
                () -> PlantParameterUpdate.apply(x1, PlantFitModel.RIGID, y.plant()));
        assertTrue(otherAxis.getMessage().contains("two-mass screw drive"), otherAxis.getMessage());
    }
}
