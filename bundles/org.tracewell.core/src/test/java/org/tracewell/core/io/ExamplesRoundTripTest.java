package org.tracewell.core.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.tracewell.core.Examples;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;
import org.tracewell.model.Axis;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Machine;

class ExamplesRoundTripTest {

    private final ModelFiles files = new ModelFiles();

    static Stream<Path> modelFiles() {
        return Examples.allModelFiles().stream();
    }

    @ParameterizedTest
    @MethodSource("modelFiles")
    void everyExampleLoadsAndValidatesClean(Path file) throws Exception {
        LoadedModel model = files.load(file);
        List<ValidationProblem> problems = new ModelValidation().validate(model.root());
        assertEquals(List.of(), problems.stream().map(ValidationProblem::toString).toList(), file.toString());
    }

    @ParameterizedTest
    @MethodSource("modelFiles")
    void loadThenSaveGivesTheSameBytes(Path file) throws Exception {
        byte[] original = Files.readAllBytes(file);
        LoadedModel model = files.load(file);
        byte[] saved = files.serialize(model.resource());
        assertEquals(new String(original, StandardCharsets.UTF_8), new String(saved, StandardCharsets.UTF_8));
        assertArrayEquals(original, saved);
    }

    @ParameterizedTest
    @MethodSource("modelFiles")
    void loadSaveLoadGivesAnEqualModel(Path file) throws Exception {
        LoadedModel first = files.load(file);
        LoadedModel second = files.load(files.serialize(first.resource()), file);
        assertTrue(EcoreUtil.equals(first.root(), second.root()), "models differ after a round trip: " + file);
    }

    @Test
    void examplesHaveTheDemoScenarioShape() throws Exception {
        Machine router = files.loadMachine(Examples.file(Examples.LM_3020));
        assertEquals(List.of("X1", "X2", "Y"), router.getAxes().stream().map(Axis::getName).toList());
        assertEquals(List.of("Z"), router.getLibraryAxes().stream().map(Axis::getName).toList());
        assertSame(router.getAxes().get(1), router.getAxes().get(0).getGantryPartner());
        Machine mill = files.loadMachine(Examples.file(Examples.LM_T5));
        assertEquals(List.of("Z", "A", "C"), mill.getLibraryAxes().stream().map(Axis::getName).toList());
    }

    @Test
    void savedFilesHoldNoAbsolutePaths() throws Exception {
        for (Path file : Examples.allModelFiles()) {
            String text = Files.readString(file);
            assertFalse(text.contains("file:"), file + " holds an absolute URI");
            assertFalse(text.contains(Examples.folder().toString()), file + " holds an absolute path");
        }
    }

    @Test
    void aLibraryAxisEditedOnceShowsUpInBothMachines(@TempDir Path temp) throws Exception {
        Path examples = Examples.copyTo(temp);
        LoadedModel library = files.load(examples.resolve(Examples.SHARED_Z));
        ((CascadeController) library.axis().getController()).setPositionGain(45.0);
        files.save(library.resource());

        for (String machineFile : List.of(Examples.LM_3020, Examples.LM_T5)) {
            Machine machine = files.loadMachine(examples.resolve(machineFile));
            Axis z = machine.getLibraryAxes().stream().filter(a -> "Z".equals(a.getName())).findFirst().orElseThrow();
            assertEquals(45.0, ((CascadeController) z.getController()).getPositionGain(), 0.0, machineFile);
        }
    }

    @Test
    void bothMachinesInOneResourceSetShareOneAxisObject() throws Exception {
        var resourceSet = files.newResourceSet();
        Machine router = files.load(Examples.file(Examples.LM_3020), resourceSet).machine();
        Machine mill = files.load(Examples.file(Examples.LM_T5), resourceSet).machine();
        assertSame(router.getLibraryAxes().get(0), mill.getLibraryAxes().get(0));
        assertSame(router.getLibraryAxes().get(0),
                files.load(Examples.file(Examples.SHARED_Z), resourceSet).axis(), "the library file is read once");
        assertEquals(3 + 2, resourceSet.getResources().size(), "two machines and three library files");
    }
}
