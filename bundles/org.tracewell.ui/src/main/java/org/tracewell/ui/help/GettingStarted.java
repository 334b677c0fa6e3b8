package org.tracewell.ui.help;

import java.util.ArrayList;
import java.util.List;

import org.tracewell.core.SafetyCaution;

/**
 * The getting-started page as text with its headings marked, so the dialog styles it and tests read it without a
 * display. The safety caution comes first.
 */
public final class GettingStarted {

    /**
     * One paragraph of the page.
     *
     * @param text    what it says
     * @param heading true for a heading
     * @param caution true for the safety caution (drawn framed)
     */
    public record Paragraph(String text, boolean heading, boolean caution) {
    }

    private GettingStarted() {
    }

    public static List<Paragraph> paragraphs() {
        List<Paragraph> page = new ArrayList<>();
        heading(page, "Safety caution");
        page.add(new Paragraph(SafetyCaution.TEXT, false, true));

        heading(page, "1. Get a machine");
        text(page, "File → New → Tracewell Machine… starts from the template (two ball-screw axes X and Y with matched "
                + "gains, an ISO 230-4 circle test and a requirement on its circular deviation G) or copies an "
                + "example machine with its library axes into a folder of your choice. File → Import Example "
                + "Scenario… copies the whole Larchmont Motion scenario (LM-3020 gantry router, LM-T5 trunnion mill "
                + "and their shared axis library) and opens the LM-3020. File → Open Machine… opens any .machine or "
                + ".axis file.");

        heading(page, "2. Describe it in the Machine Editor");
        text(page, "The pages Axes, Contours, Requirements, Budget and Studies show the machine as trees; the form "
                + "beside a tree edits the selected element. Type values with their trade unit — \"3 m/min\", "
                + "\"33.3 1/s\", \"2 (m/min)/mm\" — or without one to use the unit shown; the model stores SI. An "
                + "entry the rules refuse stays in its field with the reason. Right-click in a tree to add an axis, "
                + "contour, requirement, budget line or variation study, to add filter stages, segments and varied "
                + "parameters (New ›) or to delete. Every change "
                + "can be undone (Edit → Undo). A shared library axis is marked: its changes are saved to its own "
                + ".axis file and apply to every machine that uses it.");

        heading(page, "3. Read the analysis");
        text(page, "Loop Analysis follows the selected axis: system type, Kp/Kv/Ka, steady-state errors, margins, "
                + "poles and the Bode chart. Requirement Trace shows each machine requirement with its allocations, "
                + "value, margin and status (met, violated, not evaluated); Error Budget shows the budget lines and "
                + "their total against the target. Analyses run in the background after each change.");

        heading(page, "4. Keep the model sound");
        text(page, "The Problems view (Window → Problems) lists what the model checks find in the open machines: "
                + "the element, the bad value and the valid range. Double-click a problem to select its element. "
                + "The Properties view (Window → Properties) shows every value of the selected element and edits "
                + "it like the form. When a file changes on disk while it is open, Tracewell asks before reloading, "
                + "and it never saves over such a change without asking.");

        heading(page, "5. Share the result");
        text(page, "Analysis → Write Design Review Report… writes the design-review report (HTML with its charts) "
                + "for the machine in the editor; the headless command does the same: tracewell analyze FILE. "
                + "Window → Preferences → Tracewell sets display units (metric or inch), the loop sample periods "
                + "new machines start with, and the report author.");
        return List.copyOf(page);
    }

    private static void heading(List<Paragraph> page, String text) {
        page.add(new Paragraph(text, true, false));
    }

    private static void text(List<Paragraph> page, String text) {
        page.add(new Paragraph(text, false, false));
    }
}
