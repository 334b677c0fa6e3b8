package org.tracewell.ui.help;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.ui.handlers.HandlerUtil;

/** Help → Getting Started. */
public final class GettingStartedHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) {
        new GettingStartedDialog(HandlerUtil.getActiveShell(event)).open();
        return null;
    }
}
