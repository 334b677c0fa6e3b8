package org.tracewell.ui.views;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Label;

/** Label updates that keep the views' layout work small: laying out a view with a tree or table is costly. */
final class Labels {

    private Labels() {
    }

    /** Sets a wrapping label's text, laying its parent out again only when the text needs other room. */
    static void setKeepingLayout(Label label, String text) {
        if (text.equals(label.getText())) {
            return;
        }
        int width = label.getSize().x;
        int before = label.getSize().y;
        label.setText(text);
        if (width <= 0 || label.computeSize(width, SWT.DEFAULT).y != before) {
            label.getParent().layout(true, true);
        }
    }
}
