package org.tensio.ui.views;

import org.eclipse.jface.viewers.ITableLabelProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.swt.graphics.Image;
import org.tensio.engine.properties.SectionProperties;

/** Cell texts of the Sections table, one {@link SectionColumn} per column index. */
final class SectionsLabelProvider extends LabelProvider implements ITableLabelProvider {

    @Override
    public Image getColumnImage(Object element, int columnIndex) {
        return null;
    }

    @Override
    public String getColumnText(Object element, int columnIndex) {
        if (element instanceof SectionProperties properties && columnIndex >= 0
                && columnIndex < SectionColumn.values().length) {
            return SectionColumn.values()[columnIndex].text(properties);
        }
        return ""; //$NON-NLS-1$
    }
}
