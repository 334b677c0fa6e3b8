package org.tracewell.ui.editor;

import java.util.List;
import java.util.function.Function;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.edit.provider.IChangeNotifier;
import org.eclipse.emf.edit.provider.INotifyChangedListener;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.eclipse.emf.edit.provider.IViewerNotification;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.StructuredViewer;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;

/**
 * The tree of a Machine Editor page from EMF edit's item providers (EMF's own viewer bridge lives in a bundle that is
 * not available here). The top level comes from {@code roots}; below it each element's item provider gives the
 * children. Item-provider notifications refresh the viewer: labels only when only a label changed.
 */
public final class ItemProviderContentProvider implements ITreeContentProvider, INotifyChangedListener {

    private static final Object[] NONE = new Object[0];

    private final AdapterFactory adapterFactory;
    private final Function<Object, List<?>> roots;
    private StructuredViewer viewer;

    /**
     * @param adapterFactory factory of the item providers; must be an {@link IChangeNotifier} to get refreshes
     * @param roots          the top-level elements for the viewer input
     */
    public ItemProviderContentProvider(AdapterFactory adapterFactory, Function<Object, List<?>> roots) {
        this.adapterFactory = adapterFactory;
        this.roots = roots;
        if (adapterFactory instanceof IChangeNotifier notifier) {
            notifier.addListener(this);
        }
    }

    @Override
    public Object[] getElements(Object input) {
        return input == null ? NONE : roots.apply(input).toArray();
    }

    @Override
    public Object[] getChildren(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider == null ? NONE : provider.getChildren(element).toArray();
    }

    @Override
    public Object getParent(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider == null ? null : provider.getParent(element);
    }

    @Override
    public boolean hasChildren(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider != null && provider.hasChildren(element);
    }

    private ITreeItemContentProvider provider(Object element) {
        return (ITreeItemContentProvider) adapterFactory.adapt(element, ITreeItemContentProvider.class);
    }

    @Override
    public void inputChanged(Viewer newViewer, Object oldInput, Object newInput) {
        viewer = (StructuredViewer) newViewer;
    }

    @Override
    public void notifyChanged(Notification notification) {
        StructuredViewer target = viewer;
        if (target == null) {
            return;
        }
        Control control = target.getControl();
        if (control == null || control.isDisposed()) {
            return;
        }
        Display display = control.getDisplay();
        if (display.getThread() == Thread.currentThread()) {
            refresh(target, notification);
        } else {
            display.asyncExec(() -> refresh(target, notification));
        }
    }

    private static void refresh(StructuredViewer target, Notification notification) {
        if (target.getControl().isDisposed()) {
            return;
        }
        if (notification instanceof IViewerNotification change) {
            Object element = change.getElement();
            if (element == null || element == target.getInput()) {
                // the input (the machine) is not itself a tree item: refresh the whole tree
                target.refresh(change.isLabelUpdate());
            } else if (change.isContentRefresh()) {
                target.refresh(element, change.isLabelUpdate());
            } else if (change.isLabelUpdate()) {
                target.update(element, null);
            }
        } else {
            target.refresh();
        }
    }

    @Override
    public void dispose() {
        if (adapterFactory instanceof IChangeNotifier notifier) {
            notifier.removeListener(this);
        }
        viewer = null;
    }
}
