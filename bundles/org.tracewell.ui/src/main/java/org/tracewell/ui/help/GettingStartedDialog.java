package org.tracewell.ui.help;

import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.StyleRange;
import org.eclipse.swt.custom.StyledText;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Shell;

/** Help → Getting Started: the page of {@link GettingStarted}, headings bold, the safety caution highlighted. */
public final class GettingStartedDialog extends Dialog {

    private StyledText text;

    public GettingStartedDialog(Shell parent) {
        super(parent);
        setShellStyle(getShellStyle() | SWT.RESIZE | SWT.MAX);
    }

    @Override
    protected void configureShell(Shell shell) {
        super.configureShell(shell);
        shell.setText("Getting Started with Tracewell");
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        text = new StyledText(area, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL | SWT.BORDER);
        text.setMargins(12, 10, 12, 10);
        text.setWordWrap(true);
        GridData layout = new GridData(SWT.FILL, SWT.FILL, true, true);
        layout.widthHint = 640;
        layout.heightHint = 520;
        text.setLayoutData(layout);
        StringBuilder content = new StringBuilder();
        java.util.List<StyleRange> styles = new java.util.ArrayList<>();
        Color cautionBackground = new Color(255, 243, 205);
        for (GettingStarted.Paragraph paragraph : GettingStarted.paragraphs()) {
            int start = content.length();
            content.append(paragraph.text()).append(paragraph.heading() ? "\n" : "\n\n");
            if (paragraph.heading()) {
                StyleRange style = new StyleRange(start, paragraph.text().length(), null, null, SWT.BOLD);
                style.font = JFaceResources.getBannerFont();
                styles.add(style);
            } else if (paragraph.caution()) {
                styles.add(new StyleRange(start, paragraph.text().length(), text.getDisplay()
                        .getSystemColor(SWT.COLOR_BLACK), cautionBackground));
            }
        }
        text.setText(content.toString());
        styles.forEach(text::setStyleRange);
        return area;
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, IDialogConstants.OK_ID, IDialogConstants.CLOSE_LABEL, true);
    }

    /** The text shown (for tests). */
    public String shownText() {
        return text == null ? "" : text.getText();
    }
}
