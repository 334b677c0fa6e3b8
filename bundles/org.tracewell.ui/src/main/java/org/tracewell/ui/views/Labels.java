package org.tracewell.ui.views;

import org.eclipse.swt.graphics.TextLayout;
import org.eclipse.swt.widgets.Label;

/** Label updates that keep the views' layout work small: laying out a view with a tree or table is costly. */
final class Labels {

    private Labels() {
    }

    /**
     * Sets a wrapping label's text, laying its parent out again only when the text wraps to another number of lines
     * at the label's width. The lines are counted with a text layout of the label's font: asking the label for its
     * size would make GTK allocate it again, which costs as much as the layout this avoids.
     */
    static void setKeepingLayout(Label label, String text) {
        String before = label.getText();
        if (text.equals(before)) {
            return;
        }
        int width = label.getSize().x;
        label.setText(text);
        if (width <= 0 || lineCount(label, text, width) != lineCount(label, before, width)) {
            label.getParent().layout(true, true);
        }
    }

    private static int lineCount(Label label, String text, int width) {
        if (text.isEmpty()) {
            return 0;
        }
        TextLayout layout = new TextLayout(label.getDisplay());
        try {
            layout.setFont(label.getFont());
            layout.setWidth(width);
            layout.setText(text);
            return layout.getLineCount();
        } finally {
            layout.dispose();
        }
    }
}
