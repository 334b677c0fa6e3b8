package org.tracewell.ui.editor;

import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/** One page of the Machine Editor: a tree of one part of the model beside the form of the selected element. */
public final class ModelPage {

    private final String title;
    private final Composite control;
    private final TreeViewer tree;
    private final ElementForm form;

    /**
     * @param hint   one line above the tree saying what the page holds
     * @param roots  the top-level elements of the tree, from the editor's root object
     * @param suffix label suffix per element (marks shared library axes)
     * @param banner notice above the form of an element
     */
    ModelPage(Composite parent, String title, String hint, AdapterFactory adapterFactory, ValueEntry entry,
            Function<Object, List<?>> roots, Function<Object, String> suffix,
            Function<EObject, Optional<String>> banner, Object root) {
        this.title = title;
        control = new Composite(parent, SWT.NONE);
        control.setLayout(new GridLayout(1, false));
        SashForm sash = new SashForm(control, SWT.HORIZONTAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));

        Composite left = new Composite(sash, SWT.NONE);
        GridLayout leftLayout = new GridLayout(1, false);
        leftLayout.marginWidth = 0;
        left.setLayout(leftLayout);
        Label heading = new Label(left, SWT.WRAP);
        heading.setText(hint);
        heading.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        tree = new TreeViewer(left, SWT.BORDER | SWT.SINGLE | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        tree.getControl().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        tree.setContentProvider(new ItemProviderContentProvider(adapterFactory, roots));
        tree.setLabelProvider(new ItemProviderLabelProvider(adapterFactory, suffix));
        tree.setAutoExpandLevel(2);
        tree.setInput(root);

        form = new ElementForm(sash, adapterFactory, entry, banner);
        sash.setWeights(40, 60);
        tree.addSelectionChangedListener(event -> {
            Object first = ((IStructuredSelection) event.getSelection()).getFirstElement();
            form.show(first instanceof EObject e ? e : null);
        });
    }

    public String title() {
        return title;
    }

    public Composite control() {
        return control;
    }

    public TreeViewer tree() {
        return tree;
    }

    public ElementForm form() {
        return form;
    }

    /** Selects and reveals {@code element} in the tree (and so shows it in the form). */
    public void select(Object element) {
        tree.setSelection(new StructuredSelection(element), true);
    }
}
