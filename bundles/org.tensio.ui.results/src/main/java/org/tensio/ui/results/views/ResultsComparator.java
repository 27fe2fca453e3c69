package org.tensio.ui.results.views;

import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerComparator;
import org.tensio.ui.results.model.ResultNode;

/**
 * Orders sibling nodes by one column, ascending or descending; with no column the project order stays. Ties
 * keep the project order (the sort is stable).
 */
final class ResultsComparator extends ViewerComparator {

    private ResultsColumn column;
    private boolean descending;

    /** @return the column sorted by, or null for project order */
    ResultsColumn column() {
        return column;
    }

    /** @return true when sorted descending */
    boolean descending() {
        return descending;
    }

    /**
     * Sorts by {@code c}: a first click sorts numbers descending (largest utilisation first) and names
     * ascending, a second click reverses, a third returns to project order.
     */
    void click(ResultsColumn c) {
        boolean firstDescending = c.numeric();
        if (c != column) {
            column = c;
            descending = firstDescending;
        } else if (descending == firstDescending) {
            descending = !descending;
        } else {
            column = null;
        }
    }

    @Override
    public int compare(Viewer viewer, Object e1, Object e2) {
        if (column == null || !(e1 instanceof ResultNode a) || !(e2 instanceof ResultNode b)) {
            return 0;
        }
        int c = column.order().compare(a, b);
        return descending ? -c : c;
    }
}
