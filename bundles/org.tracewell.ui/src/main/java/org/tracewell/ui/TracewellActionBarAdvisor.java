package org.tracewell.ui;

import org.eclipse.jface.action.GroupMarker;
import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.ui.IWorkbenchActionConstants;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.ActionFactory.IWorkbenchAction;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;

/**
 * The main menu skeleton. Menus carry the platform's well-known ids so bundles contribute
 * commands declaratively ({@code menu:file?after=additions}, {@code menu:help?after=additions}).
 */
final class TracewellActionBarAdvisor extends ActionBarAdvisor {

    private IWorkbenchAction save;
    private IWorkbenchAction saveAll;
    private IWorkbenchAction quit;
    private IWorkbenchAction undo;
    private IWorkbenchAction redo;
    private IWorkbenchAction resetPerspective;

    TracewellActionBarAdvisor(IActionBarConfigurer configurer) {
        super(configurer);
    }

    @Override
    protected void makeActions(IWorkbenchWindow window) {
        save = register(ActionFactory.SAVE.create(window));
        saveAll = register(ActionFactory.SAVE_ALL.create(window));
        quit = register(ActionFactory.QUIT.create(window));
        undo = register(ActionFactory.UNDO.create(window));
        redo = register(ActionFactory.REDO.create(window));
        resetPerspective = register(ActionFactory.RESET_PERSPECTIVE.create(window));
    }

    private IWorkbenchAction register(IWorkbenchAction action) {
        super.register(action);
        return action;
    }

    @Override
    protected void fillMenuBar(IMenuManager menuBar) {
        MenuManager file = new MenuManager("&File", IWorkbenchActionConstants.M_FILE);
        file.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));
        file.add(new Separator());
        file.add(save);
        file.add(saveAll);
        file.add(new Separator());
        file.add(quit);

        MenuManager edit = new MenuManager("&Edit", IWorkbenchActionConstants.M_EDIT);
        edit.add(undo);
        edit.add(redo);
        edit.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));

        MenuManager analysis = new MenuManager("&Analysis", "org.tracewell.ui.menu.analysis");
        analysis.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));

        MenuManager window = new MenuManager("&Window", IWorkbenchActionConstants.M_WINDOW);
        window.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));
        window.add(new Separator());
        window.add(resetPerspective);

        MenuManager help = new MenuManager("&Help", IWorkbenchActionConstants.M_HELP);
        help.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));

        menuBar.add(file);
        menuBar.add(edit);
        menuBar.add(analysis);
        menuBar.add(window);
        menuBar.add(help);
    }
}
