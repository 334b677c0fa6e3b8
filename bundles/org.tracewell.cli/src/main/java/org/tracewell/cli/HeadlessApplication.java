package org.tracewell.cli;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;

/** The headless commands as an Eclipse application, for runs inside an OSGi runtime. */
public final class HeadlessApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) {
        String[] args = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        return new TracewellCommand().run(args == null ? new String[0] : args, System.out, System.err);
    }

    @Override
    public void stop() {
        // Every command is short and synchronous; nothing to interrupt.
    }
}
