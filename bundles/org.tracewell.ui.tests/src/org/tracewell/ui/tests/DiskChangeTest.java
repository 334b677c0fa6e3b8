package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.CascadeController;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.ui.editor.DiskWatch;
import org.tracewell.ui.editor.DiskWatch.Decision;
import org.tracewell.ui.editor.MachineEditor;
import org.tracewell.ui.editor.MachineEditor.DiskPrompt;

/** A file changed on disk while open: the editor asks before reloading and never saves over it silently. */
class DiskChangeTest {

    private final IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    @Test
    void decisionTable() {
        Path a = Path.of("/m/a.machine");
        Path lib = Path.of("/m/library/z.axis");
        assertEquals(Decision.NOTHING, DiskWatch.decide(List.of(), List.of(), true));
        assertEquals(Decision.OFFER_RELOAD, DiskWatch.decide(List.of(a), List.of(), false));
        assertEquals(Decision.CONFLICT, DiskWatch.decide(List.of(lib), List.of(), true), "a library file counts too");
        assertEquals(Decision.DELETED, DiskWatch.decide(List.of(a), List.of(a), false));
        assertEquals(Decision.OFFER_RELOAD, DiskWatch.decide(List.of(a, lib), List.of(a), false),
                "one deleted, one changed: the changed one can be reloaded");
        assertFalse(DiskWatch.saveNeedsConfirmation(List.of()));
        assertTrue(DiskWatch.saveNeedsConfirmation(List.of(lib)));
    }

    @Test
    void onlyAContentChangeCounts(@TempDir Path temp) throws Exception {
        Path file = Files.writeString(temp.resolve("a.machine"), "one");
        DiskWatch watch = new DiskWatch(List.of(file));
        Files.setLastModifiedTime(file, FileTime.fromMillis(Files.getLastModifiedTime(file).toMillis() + 5000));
        assertTrue(watch.changedSinceSeen().isEmpty(), "a newer time stamp with the same bytes is no change");
        Files.writeString(file, "two");
        assertEquals(List.of(file), watch.changedSinceSeen());
        watch.acknowledge();
        assertTrue(watch.changedSinceSeen().isEmpty(), "answered: not asked again");
        assertEquals(List.of(file), watch.changedSinceBase(), "but saving still has to ask");
        Files.delete(file);
        assertEquals(List.of(file), watch.deletedSinceSeen());
        watch.restamp(List.of(file));
        assertTrue(watch.changedSinceBase().isEmpty());
    }

    /** Answers as told and records what it was asked. */
    private static final class ScriptedPrompt implements DiskPrompt {
        final List<String> asked = new ArrayList<>();
        Answer onChange = Answer.KEEP;
        Answer onSave = Answer.CANCEL;

        @Override
        public Answer changedOnDisk(Shell shell, List<Path> files, boolean dirty) {
            asked.add((dirty ? "conflict " : "changed ") + files.get(0).getFileName());
            return onChange;
        }

        @Override
        public void deletedOnDisk(Shell shell, List<Path> files) {
            asked.add("deleted " + files.get(0).getFileName());
        }

        @Override
        public Answer saveOverChange(Shell shell, List<Path> files) {
            asked.add("save over " + files.get(0).getFileName());
            return onSave;
        }
    }

    @Test
    void changedLibraryFileIsReloadedWhenTheUserSaysSo(@TempDir Path temp) throws Exception {
        Path folder = copyExamples(temp);
        MachineEditor editor = MachineEditor.open(page, folder.resolve("LM-3020.machine"));
        ScriptedPrompt prompt = new ScriptedPrompt();
        editor.setDiskPrompt(prompt);
        assertEquals(Decision.NOTHING, editor.checkDisk());

        // Someone changes the shared Z slide's Kv (50 → 45 1/s) in its library file.
        Path axis = folder.resolve("library/z-slide-25x5.axis");
        Files.writeString(axis, Files.readString(axis).replace("positionGain=\"50.0\"", "positionGain=\"45.0\""));
        prompt.onChange = DiskPrompt.Answer.RELOAD;
        assertEquals(Decision.OFFER_RELOAD, editor.checkDisk());
        assertEquals(List.of("changed z-slide-25x5.axis"), prompt.asked);

        MachineEditor reloaded = assertInstanceOf(MachineEditor.class, page.getActiveEditor());
        assertNotSame(editor, reloaded, "the file was read again");
        assertEquals(1, page.getEditorReferences().length);
        CascadeController z = (CascadeController) reloaded.model().machine().getLibraryAxes().get(0).getController();
        assertEquals(45.0, z.getPositionGain(), 0.0);
    }

    @Test
    void unsavedChangesAreNeverSavedOverAChangeOnDiskWithoutAsking(@TempDir Path temp) throws Exception {
        Path folder = copyExamples(temp);
        Path machineFile = folder.resolve("LM-3020.machine");
        MachineEditor editor = MachineEditor.open(page, machineFile);
        ScriptedPrompt prompt = new ScriptedPrompt();
        editor.setDiskPrompt(prompt);
        CascadeController y = (CascadeController) editor.model().machine().getAxes().get(2).getController();
        assertTrue(editor.valueEntry().enter(y, Literals.CASCADE_CONTROLLER__POSITION_GAIN, "3.0").isEmpty());

        String theirs = Files.readString(machineFile).replace("Larchmont Motion LM-3020:", "Larchmont Motion LM-3020 (rev B):");
        Files.writeString(machineFile, theirs);
        prompt.onChange = DiskPrompt.Answer.KEEP;
        assertEquals(Decision.CONFLICT, editor.checkDisk());
        assertEquals(Decision.NOTHING, editor.checkDisk(), "kept: not asked again for the same change");
        assertSame(editor, page.getActiveEditor());

        prompt.onSave = DiskPrompt.Answer.CANCEL;
        editor.doSave(null);
        assertEquals(theirs, Files.readString(machineFile), "cancelled: their version stays");
        assertTrue(editor.isDirty());

        prompt.onSave = DiskPrompt.Answer.OVERWRITE;
        editor.doSave(null);
        assertFalse(editor.isDirty());
        assertEquals(50.0, ((CascadeController) new ModelFiles().loadMachine(machineFile).getAxes().get(2)
                .getController()).getPositionGain(), 1e-9, "3.0 (m/min)/mm = 50 1/s, written on request");
        assertEquals(List.of("conflict LM-3020.machine", "save over LM-3020.machine", "save over LM-3020.machine"),
                prompt.asked);
        assertEquals(Decision.NOTHING, editor.checkDisk(), "its own save is no change on disk");
    }
}
