package org.tensio.ui.results.views;

import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.Viewer;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.ResultsTree;

/** The nodes of a {@link ResultsTree} input; parents come from the input, never from the view. */
final class ResultsContentProvider implements ITreeContentProvider {

    private ResultsTree tree;

    @Override
    public void inputChanged(Viewer viewer, Object oldInput, Object newInput) {
        tree = newInput instanceof ResultsTree t ? t : null;
    }

    @Override
    public Object[] getElements(Object input) {
        return input instanceof ResultsTree t ? t.roots().toArray() : new Object[0];
    }

    @Override
    public Object[] getChildren(Object parent) {
        return parent instanceof ResultNode n ? n.children().toArray() : new Object[0];
    }

    @Override
    public Object getParent(Object element) {
        return tree != null && element instanceof ResultNode n ? tree.parentOf(n) : null;
    }

    @Override
    public boolean hasChildren(Object element) {
        return element instanceof ResultNode n && !n.children().isEmpty();
    }
}
