package org.tracewell.ui.wizards;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.eclipse.jface.dialogs.IDialogSettings;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.tracewell.ui.prefs.TracewellPreferences;

/**
 * The one page of the New Machine wizard: the folder the machine goes to, and what it starts from — the template
 * (named by the user) or one of the example machines (copied with its library axes).
 */
public final class NewMachinePage extends WizardPage {

    static final String FOLDER_SETTING = "folder";

    private Text folder;
    private Button fromTemplate;
    private Text name;
    private Button fromExample;
    private Combo example;

    NewMachinePage() {
        super("newMachine");
        setTitle("New Tracewell machine");
        setDescription("Start from the template (two ball-screw axes X and Y, a circle test, one requirement) or from "
                + "an example of the Larchmont Motion scenario.");
    }

    @Override
    public void createControl(Composite parent) {
        Composite area = new Composite(parent, SWT.NONE);
        area.setLayout(new GridLayout(3, false));

        new Label(area, SWT.NONE).setText("&Folder:");
        folder = new Text(area, SWT.BORDER | SWT.SINGLE);
        folder.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        folder.setText(defaultFolder().toString());
        Button browse = new Button(area, SWT.PUSH);
        browse.setText("&Browse...");
        browse.addListener(SWT.Selection, e -> {
            DirectoryDialog dialog = new DirectoryDialog(getShell());
            dialog.setText("Folder of the new machine");
            dialog.setFilterPath(folder.getText());
            String chosen = dialog.open();
            if (chosen != null) {
                folder.setText(chosen);
            }
        });

        fromTemplate = new Button(area, SWT.RADIO);
        fromTemplate.setText("From the &template, named:");
        fromTemplate.setSelection(true);
        name = new Text(area, SWT.BORDER | SWT.SINGLE);
        name.setText("XY machine");
        name.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));

        Label periods = new Label(area, SWT.WRAP);
        periods.setText(String.format("Loop sample periods from the preferences: position %.0f µs, velocity %.0f µs "
                + "(Window → Preferences → Tracewell).", TracewellPreferences.positionSamplePeriod() * 1e6,
                TracewellPreferences.velocitySamplePeriod() * 1e6));
        GridData periodsData = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
        periodsData.horizontalIndent = 20;
        periods.setLayoutData(periodsData);

        fromExample = new Button(area, SWT.RADIO);
        fromExample.setText("From an &example:");
        example = new Combo(area, SWT.READ_ONLY | SWT.DROP_DOWN);
        List<String> examples = ExampleScenario.machines();
        examples.forEach(example::add);
        example.select(0);
        example.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        Label copyNote = new Label(area, SWT.WRAP);
        copyNote.setText("The example machine is copied into the folder with the library axes it uses (library/).");
        GridData noteData = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
        noteData.horizontalIndent = 20;
        copyNote.setLayoutData(noteData);

        folder.addListener(SWT.Modify, e -> validate());
        name.addListener(SWT.Modify, e -> validate());
        fromTemplate.addListener(SWT.Selection, e -> validate());
        fromExample.addListener(SWT.Selection, e -> validate());
        example.addListener(SWT.Selection, e -> validate());
        setControl(area);
        validate();
    }

    private Path defaultFolder() {
        IDialogSettings settings = getWizard() == null ? null : getWizard().getDialogSettings();
        String remembered = settings == null ? null : settings.get(FOLDER_SETTING);
        return remembered != null ? Path.of(remembered) : Path.of(System.getProperty("user.home"), "Tracewell");
    }

    /** Checks the entries; the reason shows at the top of the page and Finish waits until there is none. */
    private void validate() {
        Optional<String> problem = problem();
        setErrorMessage(problem.orElse(null));
        setPageComplete(problem.isEmpty());
        name.setEnabled(fromTemplate.getSelection());
        example.setEnabled(fromExample.getSelection());
    }

    private Optional<String> problem() {
        Optional<Path> target = targetFolder();
        if (target.isEmpty()) {
            return Optional.of("Choose the folder the machine goes to (an absolute path).");
        }
        if (Files.exists(target.get()) && !Files.isDirectory(target.get())) {
            return Optional.of(target.get() + " is a file, not a folder.");
        }
        if (fromTemplate.getSelection()) {
            String machine = name.getText().strip();
            if (machine.isEmpty()) {
                return Optional.of("Name the machine (its file is NAME.machine).");
            }
            if (!machine.matches("[^/\\\\:*?\"<>|]+")) {
                return Optional.of("'" + machine + "' cannot be a file name; leave out / \\ : * ? \" < > |");
            }
            if (Files.exists(target.get().resolve(machine + ".machine"))) {
                return Optional.of(machine + ".machine already exists in " + target.get()
                        + "; choose another name or folder (nothing is ever overwritten).");
            }
        }
        return Optional.empty();
    }

    // ------------------------------------------------------------------------------------------------ read by the wizard

    Optional<Path> targetFolder() {
        try {
            String text = folder.getText().strip();
            Path path = text.isEmpty() ? null : Path.of(text);
            return path != null && path.isAbsolute() ? Optional.of(path.normalize()) : Optional.empty();
        } catch (InvalidPathException bad) {
            return Optional.empty();
        }
    }

    /** The template's machine name, or empty when an example is chosen. */
    Optional<String> templateName() {
        return fromTemplate.getSelection() ? Optional.of(name.getText().strip()) : Optional.empty();
    }

    /** The example machine file name chosen. */
    String exampleMachine() {
        return example.getText();
    }

    // ------------------------------------------------------------------------------------------------ for tests

    /** Fills the page as a user would: the folder and the template with {@code machineName}. */
    public void chooseTemplate(Path target, String machineName) {
        folder.setText(target.toString());
        fromExample.setSelection(false);
        fromTemplate.setSelection(true);
        name.setText(machineName);
        validate();
    }

    /** Fills the page as a user would: the folder and the example {@code machineFile} ("LM-T5.machine"). */
    public void chooseExample(Path target, String machineFile) {
        folder.setText(target.toString());
        fromTemplate.setSelection(false);
        fromExample.setSelection(true);
        example.select(example.indexOf(machineFile));
        validate();
    }
}
