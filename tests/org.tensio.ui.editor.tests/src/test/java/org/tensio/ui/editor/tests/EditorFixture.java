package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;

import org.eclipse.draw2d.FigureCanvas;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.RequestConstants;
import org.eclipse.gef.commands.Command;
import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.gef.requests.ChangeBoundsRequest;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.tensio.ui.editor.model.Vertex;
import org.tensio.ui.editor.parts.SectionEditPart;
import org.tensio.ui.editor.parts.VertexEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;
import org.tensio.ui.editor.ui.ProjectEditors;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.SelectionSourceView;
import org.tensio.ui.testsupport.UiConditions;

/** Opens project files in the editor and drives its drawing through GEF requests. */
final class EditorFixture {

    static final Duration TIMEOUT = Duration.ofSeconds(90);
    static final String PERSPECTIVE_ID = "org.tensio.ui.perspective";
    /** Id of the {@link SelectionSourceView} stand-in for the results tree (plugin.xml of this bundle). */
    static final String STAND_IN_RESULTS_VIEW_ID = "org.tensio.ui.editor.tests.standInResults";

    private EditorFixture() {
    }

    static IWorkbenchPage page() throws Exception {
        var workbench = PlatformUI.getWorkbench();
        var window = workbench.getActiveWorkbenchWindow();
        window.getShell().setBounds(0, 0, 1600, 1000);
        return workbench.showPerspective(PERSPECTIVE_ID, window);
    }

    /** @return a copy of the demo project in {@code dir} */
    static Path demoCopy(Path dir) throws Exception {
        Path demo = Path.of(System.getProperty("tensio.demo", "../../docs/examples/demo.tensio.json"));
        Path copy = dir.resolve("demo.tensio.json");
        Files.copy(demo, copy, StandardCopyOption.REPLACE_EXISTING);
        return copy;
    }

    /** Opens {@code file} and waits until the engine has validated it. */
    static ProjectEditor open(IWorkbenchPage page, Path file) throws Exception {
        ProjectEditor editor = ProjectEditors.open(page, file);
        Display display = page.getWorkbenchWindow().getShell().getDisplay();
        waitUntil(display, TIMEOUT, "the engine to validate " + file, () -> editor.project() != null);
        return editor;
    }

    static SectionEditPart section(ProjectEditor editor) {
        return (SectionEditPart) editor.graphicalViewer().getContents();
    }

    /** @return the handle of {@code v} in the drawing */
    static VertexEditPart handle(ProjectEditor editor, Vertex v) {
        for (Object child : section(editor).getChildren()) {
            if (child instanceof VertexEditPart h && h.handle().vertex() == v) {
                return h;
            }
        }
        throw new AssertionError("no handle for vertex (" + v.x() + ", " + v.y() + ")");
    }

    /**
     * Moves a handle by (dx, dy) in the file's length unit, as a drag does: a REQ_MOVE request to the handle,
     * whose command comes from the section's layout policy; executed on the editor's command stack.
     */
    static void drag(ProjectEditor editor, EditPart handle, double dx, double dy) {
        ZoomManager zoom = editor.getAdapter(ZoomManager.class);
        double s = section(editor).transform().scale() * zoom.getZoom();
        ChangeBoundsRequest move = new ChangeBoundsRequest(RequestConstants.REQ_MOVE);
        move.setEditParts(handle);
        move.setMoveDelta(new Point((int) Math.round(dx * s), (int) Math.round(-dy * s)));
        Command command = handle.getCommand(move);
        assertNotNull(command, "the layout policy gives a move command");
        editor.getCommandStack().execute(command);
    }

    static Display display(ProjectEditor editor) {
        return editor.getSite().getShell().getDisplay();
    }

    /**
     * Paints now what draw2d has deferred in every figure canvas of {@code shell}: the {@code paintPending} action
     * of {@link Screenshots} for the editor's drawing.
     */
    static void paintFigures(Shell shell) {
        for (FigureCanvas canvas : UiConditions.find(shell, FigureCanvas.class, c -> true)) {
            canvas.getLightweightSystem().getUpdateManager().performUpdate();
        }
    }
}
