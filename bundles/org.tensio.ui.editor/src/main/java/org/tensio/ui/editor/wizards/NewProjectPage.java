package org.tensio.ui.editor.wizards;

import java.nio.file.Path;

import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

/** Folder and file name of the new project file. */
final class NewProjectPage extends WizardPage {

    private static final String SUFFIX = ".tensio.json"; //$NON-NLS-1$

    private Text folder;
    private Text name;

    NewProjectPage() {
        super("newProject"); //$NON-NLS-1$
        setTitle(Messages.NewProjectPage_title);
        setDescription(Messages.NewProjectPage_description);
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        c.setLayout(new GridLayout(3, false));
        new Label(c, SWT.NONE).setText(Messages.NewProjectPage_folder);
        folder = new Text(c, SWT.BORDER);
        folder.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        folder.setText(System.getProperty("user.home")); //$NON-NLS-1$
        Button browse = new Button(c, SWT.PUSH);
        browse.setText(Messages.NewProjectPage_browse);
        browse.addListener(SWT.Selection, e -> {
            DirectoryDialog d = new DirectoryDialog(getShell());
            d.setFilterPath(folder.getText());
            String chosen = d.open();
            if (chosen != null) {
                folder.setText(chosen);
            }
        });
        new Label(c, SWT.NONE).setText(Messages.NewProjectPage_name);
        name = new Text(c, SWT.BORDER);
        name.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        name.setText("handrail-post" + SUFFIX); //$NON-NLS-1$
        folder.addModifyListener(e -> check());
        name.addModifyListener(e -> check());
        setControl(c);
        check();
    }

    private void check() {
        String n = name.getText().trim();
        String f = folder.getText().trim();
        String error = f.isEmpty() ? Messages.NewProjectPage_noFolder
                : n.isEmpty() || n.contains("/") || n.contains("\\") ? Messages.NewProjectPage_badName : null; //$NON-NLS-1$ //$NON-NLS-2$
        setErrorMessage(error);
        setPageComplete(error == null);
    }

    Path file() {
        String n = name.getText().trim();
        return Path.of(folder.getText().trim(), n.endsWith(".json") ? n : n + SUFFIX); //$NON-NLS-1$
    }

    /** For tests: sets folder and name. */
    void set(String folderText, String nameText) {
        folder.setText(folderText);
        name.setText(nameText);
    }
}
