package org.tensio.ui.editor.pages;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.ComboBoxCellEditor;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.tensio.ui.editor.commands.SetStationSectionCommand;
import org.tensio.ui.editor.model.StationModel;

/** The stations: id, section (a choice of the project's sections; each change a command) and load-case count. */
public final class StationsPage {

    private final PageHost host;
    private final String[] titles;
    private TableViewer viewer;

    /** @param titles titles of the id, section and case-count columns */
    public StationsPage(PageHost host, String... titles) {
        this.host = host;
        this.titles = titles.clone();
    }

    /** Creates the table. */
    public Control create(Composite parent) {
        viewer = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        viewer.getTable().setHeaderVisible(true);
        viewer.getTable().setLinesVisible(true);
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        column(titles[0], 200, StationModel::id, false);
        column(titles[1], 200, s -> s.section() == null ? "" : s.section(), true); //$NON-NLS-1$
        column(titles[2], 120, s -> Integer.toString(s.cases().size()), false);
        refresh();
        return viewer.getControl();
    }

    /** Reads the stations again. */
    public void refresh() {
        if (viewer != null && !viewer.getControl().isDisposed()) {
            viewer.setInput(host.model().stations().toArray());
        }
    }

    /** Sets the section of {@code station} as the cell editor does. */
    public void choose(StationModel station, String section) {
        if (!section.equals(station.section())) {
            host.execute(new SetStationSectionCommand(station, section));
        }
    }

    private void column(String title, int width, java.util.function.Function<StationModel, String> text,
            boolean editable) {
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((StationModel) element);
            }
        });
        if (editable) {
            c.setEditingSupport(new SectionCell());
        }
    }

    private String[] sections() {
        return host.model().sections().stream().map(s -> s.id()).toArray(String[]::new);
    }

    private final class SectionCell extends EditingSupport {

        SectionCell() {
            super(viewer);
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            return new ComboBoxCellEditor(viewer.getTable(), sections(), SWT.READ_ONLY);
        }

        @Override
        protected boolean canEdit(Object element) {
            return true;
        }

        @Override
        protected Object getValue(Object element) {
            return Math.max(0, java.util.List.of(sections()).indexOf(((StationModel) element).section()));
        }

        @Override
        protected void setValue(Object element, Object value) {
            int i = (Integer) value;
            String[] all = sections();
            if (i >= 0 && i < all.length) {
                choose((StationModel) element, all[i]);
            }
        }
    }
}
