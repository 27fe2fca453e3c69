package org.tensio.ui.results.views;

import java.util.function.DoubleSupplier;

import org.eclipse.jface.resource.ColorDescriptor;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.resource.LocalResourceManager;
import org.eclipse.jface.resource.ResourceManager;
import org.eclipse.jface.viewers.ITableColorProvider;
import org.eclipse.jface.viewers.ITableFontProvider;
import org.eclipse.jface.viewers.ITableLabelProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.RGB;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.UtilisationScale;

/**
 * Cell texts of the results tree, one {@link ResultsColumn} per column index; the utilisation cell coloured by
 * {@link UtilisationScale}, failing verdicts in dark red, failing nodes in bold. Colours and fonts belong to this
 * provider's resource manager and are disposed with it.
 */
final class ResultsLabelProvider extends LabelProvider
        implements ITableLabelProvider, ITableColorProvider, ITableFontProvider {

    private static final RGB FAIL_TEXT = new RGB(0x8A, 0x10, 0x1E);

    private final DoubleSupplier warningThreshold;
    private final ResourceManager resources = new LocalResourceManager(JFaceResources.getResources());

    /** @param warningThreshold the current warning threshold (preference), in (0, 1] */
    ResultsLabelProvider(DoubleSupplier warningThreshold) {
        this.warningThreshold = warningThreshold;
    }

    @Override
    public Image getColumnImage(Object element, int columnIndex) {
        return null;
    }

    @Override
    public String getColumnText(Object element, int columnIndex) {
        ResultsColumn c = column(columnIndex);
        return element instanceof ResultNode n && c != null ? c.text(n) : ""; //$NON-NLS-1$
    }

    @Override
    public Color getBackground(Object element, int columnIndex) {
        if (element instanceof ResultNode n && n.checked() && column(columnIndex) == ResultsColumn.UTILISATION) {
            int rgb = UtilisationScale.rgb(n.utilisation(), warningThreshold.getAsDouble());
            return resources.create(ColorDescriptor.createFrom(new RGB(rgb >> 16 & 0xFF, rgb >> 8 & 0xFF, rgb & 0xFF)));
        }
        return null;
    }

    @Override
    public Color getForeground(Object element, int columnIndex) {
        if (element instanceof ResultNode n && n.checked() && !n.passed()
                && column(columnIndex) == ResultsColumn.RESULT) {
            return resources.create(ColorDescriptor.createFrom(FAIL_TEXT));
        }
        return null;
    }

    @Override
    public Font getFont(Object element, int columnIndex) {
        if (element instanceof ResultNode n && n.checked() && !n.passed()) {
            return JFaceResources.getFontRegistry().getBold(JFaceResources.DEFAULT_FONT);
        }
        return null;
    }

    private static ResultsColumn column(int index) {
        return index >= 0 && index < ResultsColumn.values().length ? ResultsColumn.values()[index] : null;
    }

    @Override
    public void dispose() {
        resources.dispose();
        super.dispose();
    }
}
