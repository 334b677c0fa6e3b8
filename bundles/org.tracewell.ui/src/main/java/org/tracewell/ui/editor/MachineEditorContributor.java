package org.tracewell.ui.editor;

import org.eclipse.ui.IActionBars;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.part.EditorActionBarContributor;

/** Routes the workbench's Edit → Undo/Redo (Ctrl+Z / Ctrl+Y) to the active Machine Editor's command stack. */
public final class MachineEditorContributor extends EditorActionBarContributor {

    @Override
    public void setActiveEditor(IEditorPart part) {
        IActionBars bars = getActionBars();
        if (part instanceof MachineEditor editor) {
            bars.setGlobalActionHandler(ActionFactory.UNDO.getId(), editor.undoAction());
            bars.setGlobalActionHandler(ActionFactory.REDO.getId(), editor.redoAction());
        } else {
            bars.setGlobalActionHandler(ActionFactory.UNDO.getId(), null);
            bars.setGlobalActionHandler(ActionFactory.REDO.getId(), null);
        }
        bars.updateActionBars();
    }
}
