package org.tensio.example.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IViewReference;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;
import org.tensio.ui.selection.SectionPoint;

import com.fenwickroe.tensio.housekit.PointNotesView;

/**
 * The example's own view sits in the Tensio perspective (perspective extension) and follows a SectionPoint
 * published through the standard selection service, as it would from Tensio's views.
 */
class PointNotesViewTest {

    @Test
    void viewIsInThePerspectiveAndFollowsThePointSelection() throws Exception {
        IWorkbenchPage page = PlatformUI.getWorkbench().showPerspective("org.tensio.ui.perspective",
                PlatformUI.getWorkbench().getActiveWorkbenchWindow());
        page.resetPerspective();
        boolean placed = false;
        for (IViewReference r : page.getViewReferences()) {
            placed |= r.getId().equals(PointNotesView.ID);
        }
        assertTrue(placed, "the perspective extension places the view in the Tensio perspective");
        PointNotesView notes = (PointNotesView) page.showView(PointNotesView.ID);
        PointSourceView source = (PointSourceView) page.showView("org.tensio.example.tests.pointSource");
        page.activate(source);
        SectionPoint point = new SectionPoint(Path.of("/projects/x.tensio.json").toAbsolutePath(), "gearbox_end",
                "spindle", "jammed", 3.0, -4.0);
        source.select(point);
        Display display = Display.getCurrent();
        long end = System.currentTimeMillis() + 10_000;
        while (notes.shown() == null && System.currentTimeMillis() < end) {
            display.timerExec(50, () -> { });
            if (!display.readAndDispatch()) {
                display.sleep();
            }
        }
        assertNotNull(notes.shown(), "post-selection reached the view");
        assertEquals(point, notes.shown());
        assertEquals(point, notes.shown().getAdapter(SectionPoint.class), "SectionPoint adapts to itself");
    }
}
