package org.tracewell.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tracewell.ui.tests.LoopAnalysisViewTest.waitFor;
import static org.tracewell.ui.tests.MachineEditorTest.copyExamples;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.Machine;
import org.tracewell.ui.help.GettingStarted;
import org.tracewell.ui.help.GettingStartedDialog;
import org.tracewell.ui.prefs.TracewellPreferences;
import org.tracewell.ui.report.WriteReportHandler;
import org.tracewell.ui.views.WorkbenchProvenance;

/** Help → Getting Started carries the safety caution first; the report written from the workbench names its author. */
class HelpAndReportTest {

    @Test
    void gettingStartedOpensWithTheSafetyCautionFirst() {
        assertTrue(GettingStarted.paragraphs().get(1).caution());
        GettingStartedDialog dialog = new GettingStartedDialog(
                PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell());
        dialog.setBlockOnOpen(false);
        dialog.open();
        try {
            String text = dialog.shownText();
            assertTrue(text.startsWith("Safety caution\n" + SafetyCaution.TEXT), text.substring(0, 80));
            for (String step : new String[] {"New → Tracewell Machine", "Import Example Scenario", "Problems view",
                "Properties view", "Preferences → Tracewell"}) {
                assertTrue(text.contains(step), step);
            }
            assertEquals("Getting Started with Tracewell", dialog.getShell().getText());
        } finally {
            dialog.close();
        }
    }

    @Test
    void reportFromTheWorkbenchNamesTheAuthorFromThePreferences(@TempDir Path temp) throws Exception {
        Path machineFile = copyExamples(temp).resolve("LM-3020.machine");
        Machine machine = new ModelFiles().loadMachine(machineFile);
        TracewellPreferences.store().setValue(TracewellPreferences.REPORT_AUTHOR, "R. Okafor");
        try {
            AtomicReference<Path> written = new AtomicReference<>();
            Job job = WriteReportHandler.schedule(EcoreUtil.copy(machine), WorkbenchProvenance.of(machineFile, false),
                    temp.resolve("report"), TracewellPreferences.reportAuthor(), Display.getCurrent(), written::set);
            waitFor(() -> written.get() != null || job.getResult() != null && !job.getResult().isOK());
            assertTrue(job.getResult() == null || job.getResult().isOK(), String.valueOf(job.getResult()));
            waitFor(() -> written.get() != null);
            String html = Files.readString(written.get());
            assertTrue(html.contains("· prepared by R. Okafor"), "author in the report");
            assertTrue(html.contains("LM-3020.machine"));
        } finally {
            TracewellPreferences.store().setToDefault(TracewellPreferences.REPORT_AUTHOR);
        }
    }
}
