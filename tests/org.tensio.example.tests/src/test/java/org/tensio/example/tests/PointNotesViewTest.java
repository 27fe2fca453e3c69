package org.tensio.example.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;

import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IViewReference;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.testsupport.SelectionSourceView;
import org.tensio.ui.testsupport.UiConditions;

import com.fenwickroe.tensio.housekit.PointNotesView;

/**
 * The example's own view sits in the Tensio perspective (perspective extension) and follows a SectionPoint
 * published through the standard selection service, as it would from Tensio's views.
 */
class PointNotesViewTest {

    /** Id of the {@link SelectionSourceView} stand-in for a Tensio view that publishes points (plugin.xml). */
    private static final String POINT_SOURCE_VIEW_ID = "org.tensio.example.tests.pointSource";

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
        SelectionSourceView source = (SelectionSourceView) page.showView(POINT_SOURCE_VIEW_ID);
        page.activate(source);
        SectionPoint point = new SectionPoint(Path.of("/projects/x.tensio.json").toAbsolutePath(), "gearbox_end",
                "spindle", "jammed", 3.0, -4.0);
        source.select(point);
        UiConditions.waitUntil(Display.getCurrent(), Duration.ofSeconds(10), "the post-selection to reach the view",
                () -> notes.shown() != null);
        assertEquals(point, notes.shown());
        assertEquals(point, notes.shown().getAdapter(SectionPoint.class), "SectionPoint adapts to itself");
    }
}
