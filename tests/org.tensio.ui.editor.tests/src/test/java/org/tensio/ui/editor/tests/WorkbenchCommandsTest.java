package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.ui.editor.tests.EditorFixture.TIMEOUT;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.handlers.IHandlerService;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.editor.model.Loop;
import org.tensio.ui.editor.model.Profile;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;
import org.tensio.ui.selection.SectionPoint;
import org.tensio.ui.selection.SectionPointerSource;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

/** Editing through the workbench's commands and handlers (menus call the same), save-as and the pointer source. */
class WorkbenchCommandsTest {

    private IWorkbenchPage page;

    @BeforeEach
    void openPerspective() throws Exception {
        page = EditorFixture.page();
    }

    @AfterEach
    void closeEditors() {
        page.closeAllEditors(false);
    }

    @Test
    void vertexArcHoleAndDeleteThroughCommands(@TempDir Path dir) throws Exception {
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        editor.showSection("bracket");
        page.activate(editor);
        IHandlerService handlers = editor.getSite().getService(IHandlerService.class);
        Profile profile = editor.model().section("bracket").parts().get(0).profile();
        Loop outer = profile.outer();
        var first = outer.vertices().get(0);
        editor.graphicalViewer().select(EditorFixture.handle(editor, first));

        handlers.executeCommand("org.tensio.ui.editor.commands.addVertex", null);
        assertEquals(6, outer.vertices().size());
        assertEquals(60, outer.vertices().get(1).x(), 0, "halfway between (0, 0) and (120, 0)");
        handlers.executeCommand("org.tensio.ui.editor.commands.toggleArc", null);
        assertNotNull(first.arcToNext(), "the edge from the selected vertex is an arc");
        handlers.executeCommand("org.tensio.ui.editor.commands.toggleArc", null);
        assertNull(first.arcToNext());

        var added = outer.vertices().get(1);
        editor.graphicalViewer().select(EditorFixture.handle(editor, added));
        handlers.executeCommand("org.eclipse.ui.edit.delete", null);
        assertEquals(5, outer.vertices().size(), "Delete removed the selected vertex");

        PartEditPart part = (PartEditPart) EditorFixture.section(editor).getChildren().get(0);
        editor.graphicalViewer().select(part);
        handlers.executeCommand("org.tensio.ui.editor.commands.addHole", null);
        assertEquals(2, profile.voids().size());
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "validation of the new hole", () -> editor.project() != null
                && editor.project().section("bracket").parts().get(0).region().holes().size() == 2);
        assertTrue(editor.problems().isEmpty(), editor.problems().toString());
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-hole-added.png", EditorFixture::paintFigures);

        for (int i = 0; i < 5; i++) {
            handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        }
        assertEquals(5, outer.vertices().size());
        assertEquals(1, profile.voids().size());
        assertFalse(editor.isDirty(), "five undos lead back to the file");
        handlers.executeCommand("org.eclipse.ui.edit.redo", null);
        assertEquals(6, outer.vertices().size());
    }

    @Test
    void insertProfileAndAddPart(@TempDir Path dir) throws Exception {
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        // the beam: the demo's fatigue block needs the drive shaft to stay a circle
        editor.showSection("platform_beam");
        page.activate(editor);
        IHandlerService handlers = editor.getSite().getService(IHandlerService.class);
        var commands = editor.getSite().getService(org.eclipse.ui.commands.ICommandService.class);
        var addPart = commands.getCommand("org.tensio.ui.editor.commands.addPart");
        var call = org.eclipse.core.commands.ParameterizedCommand.generateCommand(addPart,
                java.util.Map.of("org.tensio.ui.editor.profileType", "RectangleProfile"));
        handlers.executeCommand(call, null);
        var section = editor.model().section("platform_beam");
        assertEquals(2, section.parts().size());
        assertEquals("RectangleProfile", section.parts().get(1).profile().type());
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "validation of the composite", () -> !editor.problems().isEmpty()
                || editor.project() != null && editor.project().section("platform_beam").parts().size() == 2);
        assertTrue(editor.problems().isEmpty(), "the new part touches, not overlaps: " + editor.problems());
    }

    @Test
    void saveAsWritesTheNewFileAndEditsIt(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        Path other = dir.resolve("copy.tensio.json");
        assertTrue(editor.saveAs(other));
        assertEquals(other.toAbsolutePath().normalize(), editor.path());
        assertEquals("copy.tensio.json", editor.getPartName());
        assertEquals(com.google.gson.JsonParser.parseString(Files.readString(file)),
                com.google.gson.JsonParser.parseString(Files.readString(other)));
        assertFalse(editor.isDirty());
    }

    @Test
    void pointerMovesReachTheListeners(@TempDir Path dir) throws Exception {
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        editor.showSection("drive_shaft");
        UiConditions.flush(EditorFixture.display(editor));
        SectionPointerSource source = editor.getAdapter(SectionPointerSource.class);
        List<SectionPoint> seen = new ArrayList<>();
        source.addPointerListener(seen::add);
        org.eclipse.draw2d.geometry.Point origin = new org.eclipse.draw2d.geometry.Point(0, 0);
        EditorFixture.section(editor).getContentPane().translateToAbsolute(origin);
        Event move = new Event();
        move.x = origin.x;
        move.y = origin.y;
        editor.graphicalViewer().getControl().notifyListeners(SWT.MouseMove, move);
        assertEquals(1, seen.size());
        assertEquals("drive_shaft", seen.get(0).sectionId());
        Event outside = new Event();
        outside.x = 1;
        outside.y = 1;
        editor.graphicalViewer().getControl().notifyListeners(SWT.MouseMove, outside);
        assertEquals(2, seen.size());
        assertNull(seen.get(1), "off the section: null");

        // with the fatigue quantity the point carries the chosen load history and no load case
        editor.showStation("drive_shaft_sprocket", "SLS");
        editor.showQuantity(org.tensio.ui.editor.overlay.Quantity.FATIGUE_UTILISATION);
        editor.showStation("drive_shaft_sprocket", "start_up");
        editor.graphicalViewer().getControl().notifyListeners(SWT.MouseMove, move);
        SectionPoint f = seen.get(seen.size() - 1);
        assertEquals("start_up", f.historyId());
        assertNull(f.caseId());
        assertEquals("drive_shaft_sprocket", f.stationId());
    }
}
