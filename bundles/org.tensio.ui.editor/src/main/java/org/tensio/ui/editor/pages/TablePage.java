package org.tensio.ui.editor.pages;

import java.util.List;
import java.util.function.Function;
import java.util.function.Supplier;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.tensio.ui.editor.commands.SetValueCommand;

import com.google.gson.JsonElement;
import com.google.gson.JsonPrimitive;

/**
 * A page of rows with cell editing (materials, load cases, combinations): the first column names the row, each
 * other column edits one key of the row's JSON object; every edit is a {@link SetValueCommand}. A cell left
 * empty removes the key; a number is written as a number, anything else as a string (the engine then names the
 * bad value).
 */
public final class TablePage {

    private final PageHost host;
    private final Supplier<List<Row>> rows;
    private final Supplier<List<String>> keys;
    private final String firstTitle;
    private TableViewer viewer;
    private org.eclipse.swt.widgets.Label problems;
    private List<String> columns = List.of();

    /**
     * @param rows       the rows, read again on {@link #refresh()}
     * @param keys       the keys shown as columns, read again on {@link #refresh()} when they change
     * @param firstTitle title of the first column
     */
    public TablePage(PageHost host, Supplier<List<Row>> rows, Supplier<List<String>> keys, String firstTitle) {
        this.host = host;
        this.rows = rows;
        this.keys = keys;
        this.firstTitle = firstTitle;
    }

    /** Creates the page: a line for the engine's messages above the table. */
    public Control create(Composite parent) {
        Composite page = new Composite(parent, SWT.NONE);
        page.setLayout(new org.eclipse.swt.layout.GridLayout(1, false));
        problems = new org.eclipse.swt.widgets.Label(page, SWT.WRAP);
        problems.setLayoutData(new org.eclipse.swt.layout.GridData(SWT.FILL, SWT.CENTER, true, false));
        problems.setForeground(page.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        viewer = new TableViewer(page, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        viewer.getControl().setLayoutData(new org.eclipse.swt.layout.GridData(SWT.FILL, SWT.FILL, true, true));
        viewer.getTable().setHeaderVisible(true);
        viewer.getTable().setLinesVisible(true);
        viewer.setContentProvider(ArrayContentProvider.getInstance());
        refresh();
        return page;
    }

    /** Shows the engine's messages (empty: none) above the table. */
    public void showProblems(String text) {
        if (problems != null && !problems.isDisposed()) {
            problems.setText(text);
            problems.getParent().layout(true);
        }
    }

    /** @return the messages shown above the table */
    public String problems() {
        return problems == null ? "" : problems.getText(); //$NON-NLS-1$
    }

    /** Reads the rows (and columns) again. */
    public void refresh() {
        if (viewer == null || viewer.getControl().isDisposed()) {
            return;
        }
        List<String> now = keys.get();
        if (!now.equals(columns)) {
            rebuildColumns(now);
        }
        viewer.setInput(rows.get().toArray());
    }

    private void rebuildColumns(List<String> now) {
        viewer.getTable().setRedraw(false);
        try {
            while (viewer.getTable().getColumnCount() > 0) {
                viewer.getTable().getColumn(0).dispose();
            }
            column(firstTitle, 160, Row::label, null);
            for (String key : now) {
                column(key, 100, r -> text(r.node().get(key)), key);
            }
            columns = List.copyOf(now);
        } finally {
            viewer.getTable().setRedraw(true);
        }
    }

    private void column(String title, int width, Function<Row, String> text, String key) {
        TableViewerColumn c = new TableViewerColumn(viewer, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((Row) element);
            }
        });
        if (key != null) {
            c.setEditingSupport(new Cell(key));
        }
    }

    static String text(JsonElement e) {
        if (e == null) {
            return ""; //$NON-NLS-1$
        }
        return e.isJsonPrimitive() && e.getAsJsonPrimitive().isString() ? e.getAsString() : e.toString();
    }

    /** @return the value a typed cell text stands for (null: remove the key) */
    static JsonElement value(String typed) {
        String t = typed.trim();
        if (t.isEmpty()) {
            return null;
        }
        try {
            double d = Double.parseDouble(t);
            if (Double.isFinite(d)) {
                return new JsonPrimitive(new java.math.BigDecimal(t));
            }
        } catch (NumberFormatException e) {
            // not a number: kept as text for the engine to name
        }
        return new JsonPrimitive(t);
    }

    /** @return the table viewer */
    public TableViewer viewer() {
        return viewer;
    }

    /** Edits the cell of {@code row} and {@code key} as if typed (for tests and handlers). */
    public void edit(Row row, String key, String typed) {
        JsonElement v = value(typed);
        if (!java.util.Objects.equals(v, row.node().get(key))) {
            host.execute(new SetValueCommand(row.node(), key, v));
        }
    }

    private final class Cell extends EditingSupport {

        private final String key;

        Cell(String key) {
            super(viewer);
            this.key = key;
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            return new TextCellEditor(viewer.getTable());
        }

        @Override
        protected boolean canEdit(Object element) {
            JsonElement e = ((Row) element).node().get(key);
            return e == null || e.isJsonPrimitive();
        }

        @Override
        protected Object getValue(Object element) {
            return text(((Row) element).node().get(key));
        }

        @Override
        protected void setValue(Object element, Object typed) {
            edit((Row) element, key, String.valueOf(typed));
        }
    }
}
