package org.tensio.ui.results.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.tensio.ui.results.model.NodeKind;
import org.tensio.ui.results.model.ResultNode;
import org.tensio.ui.results.stress.StressPointView;
import org.tensio.ui.results.views.ResultsView;
import org.tensio.ui.testsupport.UiConditions;

/** The running workbench in the Tensio perspective, a large window for screenshots, and the demo file. */
final class WorkbenchFixture {

    static final String PERSPECTIVE_ID = "org.tensio.ui.perspective";
    static final Duration TIMEOUT = Duration.ofSeconds(120);
    /** Id of the {@link org.tensio.ui.testsupport.PointerSourceView} stand-in for the section editor (plugin.xml). */
    static final String POINTER_SOURCE_VIEW_ID = "org.tensio.ui.results.tests.pointerSource";

    final IWorkbenchWindow window;
    final IWorkbenchPage page;
    final Display display;

    WorkbenchFixture() throws Exception {
        IWorkbench workbench = PlatformUI.getWorkbench();
        window = workbench.getActiveWorkbenchWindow();
        page = workbench.showPerspective(PERSPECTIVE_ID, window);
        display = window.getShell().getDisplay();
        assertEquals(PERSPECTIVE_ID, page.getPerspective().getId());
        window.getShell().setBounds(0, 0, 1600, 1000);
        UiConditions.flush(display);
    }

    /** @return docs/examples/demo.tensio.json (system property tensio.demo), absolute and normalised */
    static Path demo() {
        Path p = Path.of(System.getProperty("tensio.demo", "../../docs/examples/demo.tensio.json")).toAbsolutePath()
                .normalize();
        assertNotNull(Files.exists(p) ? p : null, "demo file " + p);
        return p;
    }

    /** Waits until the results view shows a finished check of {@code file}. */
    void waitForResults(ResultsView view, Path file) {
        UiConditions.waitUntil(display, TIMEOUT, "the results of " + file,
                () -> view.input() != null && view.input().file().map(file::equals).orElse(false)
                        && (view.input().root() != null || view.input().failed()));
    }

    /**
     * Opens {@code file} in the results view and the stress-point view (not pinned), waits for the check, expands
     * the tree and activates the results view.
     *
     * @return the stress-point view
     */
    StressPointView resultsWithStressView(ResultsView results, Path file)
            throws Exception {
        StressPointView stress = (StressPointView) page
                .showView(StressPointView.ID);
        stress.setPinned(false);
        waitForResults(results, file);
        results.expandAll();
        page.activate(results);
        return stress;
    }

    /**
     * Selects the item at {@code path} below the project node as a user's click does (selection and the
     * selection event).
     *
     * @return the item
     */
    TreeItem click(ResultsView view, String... path) {
        Tree tree = tree(view);
        TreeItem item = tree.getItem(0);
        for (String name : path) {
            item = ResultsViewTest.find(item.getItems(), name);
        }
        tree.setSelection(item);
        Event click = new Event();
        click.item = item;
        tree.notifyListeners(SWT.Selection, click);
        return item;
    }

    /** @return every point node of the tree in project order */
    static List<ResultNode> points(ResultNode root) {
        List<ResultNode> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    private static void collect(ResultNode n, List<ResultNode> out) {
        if (n.kind() == NodeKind.POINT) {
            out.add(n);
        }
        for (ResultNode c : n.children()) {
            collect(c, out);
        }
    }

    /** @return the results tree widget of {@code view} */
    Tree tree(ResultsView view) {
        List<Tree> trees = UiConditions.find(window.getShell(), Tree.class,
                t -> t.getColumnCount() == 8 && !t.isDisposed());
        assertEquals(1, trees.size(), "one results tree in the window");
        return trees.get(0);
    }

    /** @return the items of {@code items} and below, depth first (expand the viewer first) */
    static List<TreeItem> allItems(TreeItem[] items) {
        List<TreeItem> out = new ArrayList<>();
        for (TreeItem i : items) {
            out.add(i);
            out.addAll(allItems(i.getItems()));
        }
        return out;
    }
}
