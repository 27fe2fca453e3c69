package org.tensio.ui.views;

import org.eclipse.jface.viewers.IStructuredContentProvider;

/** Rows of the Sections table: the {@link SectionsInput#rows()} of the viewer input. */
final class SectionsContentProvider implements IStructuredContentProvider {

    @Override
    public Object[] getElements(Object input) {
        return input instanceof SectionsInput sections ? sections.rows().toArray() : new Object[0];
    }
}
