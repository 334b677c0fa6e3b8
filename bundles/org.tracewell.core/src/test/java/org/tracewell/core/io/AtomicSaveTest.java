package org.tracewell.core.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.resource.Resource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.Examples;
import org.tracewell.model.Machine;

class AtomicSaveTest {

    @TempDir
    Path temp;

    private List<Path> filesIn(Path folder) throws IOException {
        try (Stream<Path> list = Files.list(folder)) {
            return list.sorted().toList();
        }
    }

    @Test
    void saveReplacesTheFileAndKeepsThePreviousVersionAsBak() throws Exception {
        Path examples = Examples.copyTo(temp);
        Path file = examples.resolve(Examples.LM_3020);
        byte[] before = Files.readAllBytes(file);
        ModelFiles files = new ModelFiles();
        LoadedModel model = files.load(file);
        model.machine().setDescription("changed for the test");
        files.save(model.resource());

        assertArrayEquals(before, Files.readAllBytes(AtomicFileWriter.backupOf(file)));
        assertEquals("changed for the test", files.loadMachine(file).getDescription());
        assertTrue(filesIn(examples).stream().noneMatch(p -> p.getFileName().toString().endsWith(".tmp")));
    }

    @Test
    void failedRenameLeavesTheOriginalIntactAndNoTemporaryFiles() throws Exception {
        Path examples = Examples.copyTo(temp);
        Path file = examples.resolve(Examples.LM_3020);
        byte[] before = Files.readAllBytes(file);
        List<Path> filesBefore = filesIn(examples);
        AtomicInteger moves = new AtomicInteger();
        // The first rename (backup) succeeds, the second (the file itself) fails as if the disk were full.
        AtomicFileWriter failing = new AtomicFileWriter((source, target) -> {
            if (moves.incrementAndGet() == 2) {
                throw new IOException("injected failure renaming " + source + " to " + target);
            }
            Files.move(source, target, StandardCopyOption.ATOMIC_MOVE);
        });
        ModelFiles files = new ModelFiles(ModelFiles.DEFAULT_MAX_FILE_BYTES, failing);
        LoadedModel model = files.load(file);
        model.machine().setName("LM-3020 broken save");

        IOException e = assertThrows(IOException.class, () -> files.save(model.resource()));
        assertTrue(e.getMessage().contains("injected failure"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        List<Path> after = filesIn(examples);
        assertTrue(after.stream().noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), after.toString());
        assertEquals(filesBefore.size() + 1, after.size(), "only the .bak was added: " + after);
        assertEquals("LM-3020", new ModelFiles().loadMachine(file).getName());
    }

    @Test
    void failedBackupLeavesTheOriginalIntact() throws Exception {
        Path examples = Examples.copyTo(temp);
        Path file = examples.resolve(Examples.LM_T5);
        byte[] before = Files.readAllBytes(file);
        AtomicFileWriter failing = new AtomicFileWriter((source, target) -> {
            throw new IOException("injected failure");
        });
        ModelFiles files = new ModelFiles(ModelFiles.DEFAULT_MAX_FILE_BYTES, failing);
        LoadedModel model = files.load(file);
        model.machine().setName("never written");
        assertThrows(IOException.class, () -> files.save(model.resource()));
        assertArrayEquals(before, Files.readAllBytes(file));
        assertFalse(Files.exists(AtomicFileWriter.backupOf(file)));
    }

    @Test
    void referenceToAnElementOutsideAnyFileFailsBeforeWriting() throws Exception {
        Path examples = Examples.copyTo(temp);
        Path file = examples.resolve(Examples.LM_3020);
        byte[] before = Files.readAllBytes(file);
        ModelFiles files = new ModelFiles();
        LoadedModel model = files.load(file);
        Machine machine = model.machine();
        // A budget line pointing at an axis that lives in no resource cannot be written as a reference.
        machine.getBudgetLines().get(0).setAxis(org.tracewell.model.TracewellFactory.eINSTANCE.createAxis());
        assertThrows(IOException.class, () -> files.save(model.resource()));
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void resourceSaveThroughEmfIsAtomicToo() throws Exception {
        Path examples = Examples.copyTo(temp);
        Path file = examples.resolve(Examples.LM_3020);
        byte[] before = Files.readAllBytes(file);
        LoadedModel model = new ModelFiles().load(file);
        Resource resource = model.resource();
        model.machine().setDescription("saved by EMF");
        resource.save(ModelFiles.saveOptions());
        assertArrayEquals(before, Files.readAllBytes(AtomicFileWriter.backupOf(file)));
        assertEquals("saved by EMF", new ModelFiles().loadMachine(file).getDescription());
    }

    @Test
    void saveModifiedWritesExactlyTheChangedFilesIncludingTheLibrary() throws Exception {
        Path examples = Examples.copyTo(temp);
        ModelFiles files = new ModelFiles();
        LoadedModel router = files.load(examples.resolve(Examples.LM_3020));
        assertEquals(List.of(), files.saveModified(router.resourceSet()), "nothing changed, nothing written");
        var z = router.machine().getLibraryAxes().get(0);
        ((org.tracewell.model.CascadeController) z.getController()).setPositionGain(45.0);
        List<Path> written = files.saveModified(router.resourceSet());
        assertEquals(List.of(examples.resolve(Examples.SHARED_Z).toAbsolutePath().normalize()), written);
        Machine mill = files.loadMachine(examples.resolve(Examples.LM_T5));
        assertEquals(45.0, ((org.tracewell.model.CascadeController) mill.getLibraryAxes().get(0).getController())
                .getPositionGain(), 0.0, "the other machine sees the library change");
    }

    @Test
    void newElementsGetStableReadableIdsAndSavingTwiceGivesTheSameBytes() throws Exception {
        Path examples = Examples.copyTo(temp);
        ModelFiles files = new ModelFiles();
        LoadedModel model = files.load(examples.resolve(Examples.LM_3020));
        var contour = org.tracewell.model.TracewellFactory.eINSTANCE.createContour();
        contour.setName("corner test");
        contour.getSegments().add(org.tracewell.model.TracewellFactory.eINSTANCE.createLine());
        model.machine().getContours().add(contour);
        byte[] first = files.serialize(model.resource());
        byte[] second = files.serialize(model.resource());
        assertArrayEquals(first, second);
        assertEquals("lm3020-corner-test", contour.getId());
        assertEquals("lm3020-corner-test-segments", contour.getSegments().get(0).getId());
    }
}
