package org.tensio.ui.results.views;

import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerFilter;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.ResultsFilter;
import org.tensio.ui.results.model.ResultsTree;

/** Applies a {@link ResultsFilter} to the nodes of the viewer's {@link ResultsTree} input. */
final class ResultsViewerFilter extends ViewerFilter {

    private ResultsFilter filter = ResultsFilter.ALL;

    ResultsFilter filter() {
        return filter;
    }

    void set(ResultsFilter f) {
        filter = f;
    }

    @Override
    public boolean select(Viewer viewer, Object parentElement, Object element) {
        return !(viewer.getInput() instanceof ResultsTree tree) || !(element instanceof ResultNode n)
                || filter.keeps(tree, n);
    }
}
