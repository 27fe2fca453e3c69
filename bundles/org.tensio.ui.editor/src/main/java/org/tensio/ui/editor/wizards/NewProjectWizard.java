package org.tensio.ui.editor.wizards;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.runtime.ILog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.osgi.util.NLS;
import org.eclipse.ui.INewWizard;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PartInitException;
import org.tensio.engine.io.AtomicFiles;
import org.tensio.ui.editor.ui.ProjectEditors;

/**
 * New Tensio project file: writes the template (a fictitious footbridge handrail post: an RHS post welded to a
 * base plate, one station, wind and crowd load cases) to the chosen file, atomically, and opens it in the
 * project editor.
 */
public final class NewProjectWizard extends Wizard implements INewWizard {

    /** Wizard id (plugin.xml). */
    public static final String ID = "org.tensio.ui.editor.newProjectWizard"; //$NON-NLS-1$
    static final String TEMPLATE = "/templates/handrail-post.tensio.json"; //$NON-NLS-1$

    private IWorkbench workbench;
    private NewProjectPage page;

    @Override
    public void init(IWorkbench wb, IStructuredSelection selection) {
        workbench = wb;
        setWindowTitle(Messages.NewProjectWizard_title);
        setNeedsProgressMonitor(false);
    }

    @Override
    public void addPages() {
        page = new NewProjectPage();
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        Path file = page.file();
        try {
            if (Files.exists(file)) {
                page.setErrorMessage(NLS.bind(Messages.NewProjectPage_exists, file));
                return false;
            }
            Files.createDirectories(file.toAbsolutePath().getParent());
            AtomicFiles.writeString(file, template());
            ProjectEditors.open(workbench.getActiveWorkbenchWindow().getActivePage(), file);
            return true;
        } catch (IOException | PartInitException e) {
            ILog.of(getClass()).error("Cannot create " + file, e); //$NON-NLS-1$
            page.setErrorMessage(NLS.bind(Messages.NewProjectPage_failed, file, e.getMessage()));
            return false;
        }
    }

    /** @return the template's text */
    public static String template() throws IOException {
        try (InputStream in = NewProjectWizard.class.getResourceAsStream(TEMPLATE)) {
            if (in == null) {
                throw new IOException("template " + TEMPLATE + " missing from the bundle"); //$NON-NLS-1$ //$NON-NLS-2$
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
