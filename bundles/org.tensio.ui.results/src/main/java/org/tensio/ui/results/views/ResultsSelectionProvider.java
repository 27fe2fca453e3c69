package org.tensio.ui.results.views;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.ListenerList;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.ISelectionChangedListener;
import org.eclipse.jface.viewers.ISelectionProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.SelectionChangedEvent;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.tensio.engine.checks.CheckResult;
import org.tensio.ui.results.model.NodeKind;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.model.ResultsTree;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.StationRef;

/**
 * The results view's selection as the workbench sees it: the contract values of {@code org.tensio.ui.selection},
 * not tree nodes. A station or case node becomes a {@link StationRef}; a criterion or point node a
 * {@link SectionPoint} at its governing point (with its station, section and case); the project node nothing. For
 * fatigue results the tree's "case" is a load history: it goes into {@code historyId}, the case stays null.
 * Setting a selection of such values selects the matching nodes.
 */
final class ResultsSelectionProvider implements ISelectionProvider {

    private final TreeViewer viewer;
    private final ListenerList<ISelectionChangedListener> listeners = new ListenerList<>();

    ResultsSelectionProvider(TreeViewer viewer) {
        this.viewer = viewer;
        viewer.addSelectionChangedListener(e -> fire());
    }

    @Override
    public void addSelectionChangedListener(ISelectionChangedListener listener) {
        listeners.add(listener);
    }

    @Override
    public void removeSelectionChangedListener(ISelectionChangedListener listener) {
        listeners.remove(listener);
    }

    @Override
    public ISelection getSelection() {
        if (!(viewer.getInput() instanceof ResultsTree tree) || tree.file().isEmpty()) {
            return StructuredSelection.EMPTY;
        }
        List<Object> out = new ArrayList<>();
        for (Object o : viewer.getStructuredSelection()) {
            if (o instanceof ResultNode n) {
                Object v = toContract(tree.file().get(), n);
                if (v != null) {
                    out.add(v);
                }
            }
        }
        return new StructuredSelection(out);
    }

    @Override
    public void setSelection(ISelection selection) {
        if (!(viewer.getInput() instanceof ResultsTree tree) || tree.root() == null
                || !(selection instanceof IStructuredSelection s)) {
            return;
        }
        List<ResultNode> nodes = new ArrayList<>();
        for (Object o : s) {
            collect(tree.root(), o, nodes);
        }
        viewer.setSelection(new StructuredSelection(nodes), true);
    }

    /** @return the contract value of {@code node}, or null for the project node and unchecked nodes */
    static Object toContract(Path file, ResultNode node) {
        switch (node.kind()) {
            case STATION:
                return new StationRef(file, node.stationId(), null);
            case CASE:
                return fatigue(node) ? new StationRef(file, node.stationId(), null, node.caseId())
                        : new StationRef(file, node.stationId(), node.caseId());
            case CRITERION, POINT:
                CheckResult r = node.governing();
                if (r == null) {
                    return null;
                }
                return fatigue(node)
                        ? new SectionPoint(file, node.stationId(), node.sectionId(), null, r.point().x(), r.point().y(),
                                node.caseId())
                        : new SectionPoint(file, node.stationId(), node.sectionId(), node.caseId(), r.point().x(),
                                r.point().y());
            default:
                return null;
        }
    }

    /** @return true when the node's results are fatigue results (its case is a load history) */
    private static boolean fatigue(ResultNode node) {
        return node.governing() != null && node.governing().isFatigue();
    }

    private static void collect(ResultNode n, Object value, List<ResultNode> out) {
        boolean match = false;
        if (value instanceof StationRef ref) {
            String c = ref.historyId() != null ? ref.historyId() : ref.caseId();
            match = ref.stationId().equals(n.stationId()) && (c == null ? n.kind() == NodeKind.STATION
                    : n.kind() == NodeKind.CASE && c.equals(n.caseId()) && (ref.historyId() != null) == fatigue(n));
        } else if (value instanceof SectionPoint p && n.kind() == NodeKind.POINT && n.governing() != null) {
            String c = p.historyId() != null ? p.historyId() : p.caseId();
            match = p.stationId() != null && p.stationId().equals(n.stationId()) && c != null && c.equals(n.caseId())
                    && (p.historyId() != null) == fatigue(n) && p.x() == n.governing().point().x()
                    && p.y() == n.governing().point().y();
        }
        if (match) {
            out.add(n);
        }
        for (ResultNode c : n.children()) {
            collect(c, value, out);
        }
    }

    private void fire() {
        SelectionChangedEvent event = new SelectionChangedEvent(this, getSelection());
        for (ISelectionChangedListener l : listeners) {
            l.selectionChanged(event);
        }
    }
}
