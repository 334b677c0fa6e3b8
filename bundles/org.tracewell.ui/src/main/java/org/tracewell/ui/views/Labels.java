package org.tracewell.ui.views;

import org.eclipse.swt.graphics.TextLayout;
import org.eclipse.swt.widgets.Label;

/** Label updates that keep the views' layout work small: laying out a view with a tree or table is costly. */
final class Labels {

    /** Pixels the native label may take for its own padding. */
    private static final int SAFETY_PX = 4;

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
        // Also a few pixels narrower: the label's own padding may wrap a line sooner than the bare text layout.
        if (width <= SAFETY_PX || lineCount(label, text, width) != lineCount(label, before, width)
                || lineCount(label, text, width - SAFETY_PX) != lineCount(label, before, width - SAFETY_PX)) {
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
