package org.tracewell.ui;

import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.tracewell.core.SafetyCaution;

/** Product name, version and the safety caution every user must see. */
public final class AboutDialog extends Dialog {

    /** Widget data key so tests can find the caution text. */
    public static final String CAUTION_KEY = "org.tracewell.ui.about.caution";

    public AboutDialog(Shell parent) {
        super(parent);
    }

    @Override
    protected void configureShell(Shell shell) {
        super.configureShell(shell);
        shell.setText("About Tracewell");
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        area.setLayout(new GridLayout(1, false));

        Label name = new Label(area, SWT.NONE);
        name.setText("Tracewell " + ProductInfo.version());
        name.setFont(JFaceResources.getHeaderFont());

        Label build = new Label(area, SWT.NONE);
        build.setText("Build " + ProductInfo.buildVersion()
                + " · servo-axis and contour-accuracy design for multi-axis machines");

        Label heading = new Label(area, SWT.NONE);
        heading.setText("Safety caution");
        heading.setFont(JFaceResources.getBannerFont());

        Text caution = new Text(area, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.BORDER);
        caution.setText(SafetyCaution.TEXT);
        caution.setData(CAUTION_KEY, Boolean.TRUE);
        GridData layout = new GridData(SWT.FILL, SWT.FILL, true, true);
        layout.widthHint = 520;
        caution.setLayoutData(layout);
        return area;
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, IDialogConstants.OK_ID, IDialogConstants.CLOSE_LABEL, true);
    }
}
