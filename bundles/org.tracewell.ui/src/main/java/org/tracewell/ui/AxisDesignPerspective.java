package org.tracewell.ui;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * Axis Design: the machine editor on the left, the Loop Analysis view beside it with the contour views (Circle Test,
 * Contour Deviation) under it, and the review views (Requirement Trace, Error Budget, Tracking) under the editor.
 */
public final class AxisDesignPerspective implements IPerspectiveFactory {

    public static final String ID = "org.tracewell.ui.perspective.axisDesign";

    /** View ids of the analysis views; their bundles register them. */
    public static final String LOOP_ANALYSIS_VIEW = "org.tracewell.ui.view.loopAnalysis";
    public static final String TRACKING_VIEW = "org.tracewell.ui.view.tracking";
    public static final String CONTOUR_DEVIATION_VIEW = "org.tracewell.ui.view.contourDeviation";
    public static final String CIRCLE_TEST_VIEW = "org.tracewell.ui.view.circleTest";
    public static final String ERROR_BUDGET_VIEW = "org.tracewell.ui.view.errorBudget";
    public static final String REQUIREMENT_TRACE_VIEW = "org.tracewell.ui.view.requirementTrace";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(true);

        IFolderLayout right = layout.createFolder("org.tracewell.ui.folder.right", IPageLayout.RIGHT, 0.52f, editorArea);
        right.addView(LOOP_ANALYSIS_VIEW);
        // The contour views below the loop: the circle test on top, so a loop and a contour chart show side by side.
        IFolderLayout contours = layout.createFolder("org.tracewell.ui.folder.contours", IPageLayout.BOTTOM, 0.5f,
                "org.tracewell.ui.folder.right");
        contours.addView(CIRCLE_TEST_VIEW);
        contours.addView(CONTOUR_DEVIATION_VIEW);

        IFolderLayout bottom = layout.createFolder("org.tracewell.ui.folder.bottom", IPageLayout.BOTTOM, 0.65f, editorArea);
        // Requirement Trace first so it is the tab on top; Error Budget beside it shows the same review.
        bottom.addView(REQUIREMENT_TRACE_VIEW);
        bottom.addView(ERROR_BUDGET_VIEW);
        bottom.addView(TRACKING_VIEW);
        bottom.addPlaceholder(IPageLayout.ID_PROBLEM_VIEW);
        bottom.addPlaceholder(IPageLayout.ID_PROP_SHEET);

        for (String view : new String[] {LOOP_ANALYSIS_VIEW, CIRCLE_TEST_VIEW, CONTOUR_DEVIATION_VIEW, TRACKING_VIEW,
            REQUIREMENT_TRACE_VIEW, ERROR_BUDGET_VIEW}) {
            layout.addShowViewShortcut(view);
        }
    }
}
