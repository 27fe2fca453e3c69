package org.tensio.ui;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;
import org.tensio.ui.views.SectionsView;

/**
 * The Tensio perspective ({@code org.tensio.ui.perspective}): the Sections view on the left of the editor area
 * (where the section editor of org.tensio.ui.editor opens project files).
 */
public final class Perspective implements IPerspectiveFactory {

    /** Perspective id as declared in plugin.xml. */
    public static final String ID = "org.tensio.ui.perspective"; //$NON-NLS-1$

    @Override
    public void createInitialLayout(IPageLayout layout) {
        layout.setEditorAreaVisible(true);
        layout.addView(SectionsView.ID, IPageLayout.LEFT, 0.3f, layout.getEditorArea());
        layout.getViewLayout(SectionsView.ID).setCloseable(false);
    }
}
