package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.ui.editor.tests.EditorFixture.TIMEOUT;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySource;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.editor.pages.Row;
import org.tensio.ui.editor.pages.Tables;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.ui.ProjectEditor;
import org.tensio.ui.editor.ui.ProjectEditors;
import org.tensio.ui.editor.validation.ProblemMarkers;
import org.tensio.ui.editor.wizards.NewProjectWizard;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.SelectionSourceView;

import com.google.gson.JsonParser;

/** The table pages, the JSON page, the Properties source, the template and external changes. */
class PagesTest {

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
    void materialCellEditIsACommandAndABadValueIsAProblem(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showPage(1);
        Row s355 = Tables.materials(editor.model()).stream().filter(r -> r.label().equals("S355")).findFirst()
                .orElseThrow();
        editor.table(0).edit(s355, "E", "-5");
        assertEquals(-5, s355.node().get("E").getAsDouble());
        assertTrue(editor.isDirty());
        var display = EditorFixture.display(editor);
        ProblemMarkers markers = new ProblemMarkers(file);
        waitUntil(display, TIMEOUT, "a marker for E = -5", () -> !editor.problems().isEmpty() && count(markers) == 1);
        assertTrue(editor.problems().get(0).path().startsWith("$.materials.S355"), editor.problems().toString());
        assertTrue(editor.table(0).problems().contains("S355"), "the table page shows the message: "
                + editor.table(0).problems());
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-materials-table.png",
                EditorFixture::paintFigures);
        editor.getCommandStack().undo();
        assertEquals(210000, s355.node().get("E").getAsDouble());
        waitUntil(display, TIMEOUT, "the marker to go", () -> editor.problems().isEmpty() && count(markers) == 0
                && editor.table(0).problems().isEmpty());
        assertFalse(editor.isDirty());
    }

    @Test
    void jsonPageEditBecomesOneUndoableCommand(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showPage(5);
        String text = editor.jsonText().getText();
        assertEquals(JsonParser.parseString(Files.readString(file)), JsonParser.parseString(text),
                "the JSON page shows the file's content");
        editor.jsonText().setText(text.replace("\"radius\": 30", "\"radius\": 32"));
        assertTrue(editor.isDirty(), "typed text makes the editor dirty");
        editor.showPage(0);
        assertEquals(32, editor.model().section("drive_shaft").parts().get(0).profile().parameter("radius").getAsDouble());
        editor.getCommandStack().undo();
        assertEquals(30, editor.model().section("drive_shaft").parts().get(0).profile().parameter("radius").getAsDouble());
        assertFalse(editor.isDirty());
    }

    @Test
    void propertiesOfAPartIncludeItsProfileParameters(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showSection("platform_beam");
        PartEditPart part = (PartEditPart) EditorFixture.section(editor).getChildren().get(0);
        IPropertySource source = (IPropertySource) part.getAdapter(IPropertySource.class);
        var ids = Arrays.stream(source.getPropertyDescriptors()).map(IPropertyDescriptor::getId).toList();
        assertTrue(ids.containsAll(java.util.List.of("material", "parameter.overallWidth", "parameter.filletRadius",
                "parameter.flangeEdgeRadius")), ids.toString());
        assertEquals("15", source.getPropertyValue("parameter.filletRadius"));
    }

    @Test
    void externalChangeIsOfferedForReload(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        assertFalse(editor.checkExternalChange(), "nothing changed yet");
        String changed = Files.readString(file).replace("\"radius\": 30", "\"radius\": 31");
        Files.writeString(file, changed, StandardCharsets.UTF_8);
        Path[] asked = new Path[1];
        editor.setExternalChangePrompt(p -> {
            asked[0] = p;
            return true;
        });
        assertTrue(editor.checkExternalChange());
        assertEquals(file.toAbsolutePath().normalize(), asked[0]);
        assertEquals(31, editor.model().section("drive_shaft").parts().get(0).profile().parameter("radius").getAsDouble());
        assertFalse(editor.isDirty());
        assertFalse(editor.checkExternalChange(), "reloaded: the editor knows the new content");
    }

    /** A file that is not JSON when opened, fixed outside and reloaded: the section page shows its sections. */
    @Test
    void aFileUnreadableAtOpenShowsItsSectionsOnceFixed(@TempDir Path dir) throws Exception {
        String good = Files.readString(EditorFixture.demoCopy(dir));
        Path file = dir.resolve("broken.tensio.json");
        Files.writeString(file, "{ not json", StandardCharsets.UTF_8);
        ProjectEditor editor = ProjectEditors.open(page, file); // never validates: not JSON
        assertEquals(null, editor.shownSection(), "nothing to show in a file that is not JSON");
        Files.writeString(file, good, StandardCharsets.UTF_8);
        editor.setExternalChangePrompt(p -> true);
        assertTrue(editor.checkExternalChange());
        assertTrue(editor.model().section("drive_shaft") != null);
        assertEquals("drive_shaft", editor.shownSection(), "the section page shows the reloaded sections");
    }

    @Test
    void templateOfTheNewWizardIsAValidProject(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("post.tensio.json");
        Files.writeString(file, NewProjectWizard.template(), StandardCharsets.UTF_8);
        ProjectEditor editor = EditorFixture.open(page, file);
        assertTrue(editor.problems().isEmpty(), editor.problems().toString());
        assertEquals(2, editor.model().section("post").parts().size());
        editor.showStation("post_foot", "ULS");
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "the template's contour", () -> editor.contour() != null && !editor.contourBusy()
                && "ULS".equals(editor.contour().request().caseId()));
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-template-composite.png",
                EditorFixture::paintFigures);
    }

    @Test
    void stationSectionIsChosenByCommand(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showPage(2);
        var station = editor.model().stations().get(0);
        assertEquals("drive_shaft", station.section());
        editor.stationsPage().choose(station, "idler_axle");
        assertEquals("idler_axle", station.section());
        assertTrue(editor.isDirty());
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-stations-table.png",
                EditorFixture::paintFigures);
        editor.getCommandStack().undo();
        assertEquals("drive_shaft", station.section());
    }

    @Test
    void aStationOrPointSelectedElsewhereIsShown(@TempDir Path dir) throws Exception {
        Path file = EditorFixture.demoCopy(dir);
        ProjectEditor editor = EditorFixture.open(page, file);
        editor.showSection("drive_shaft");
        SelectionSourceView results = (SelectionSourceView) page.showView(EditorFixture.STAND_IN_RESULTS_VIEW_ID);
        var display = EditorFixture.display(editor);
        Path project = file.toAbsolutePath().normalize();
        results.select(new org.tensio.ui.selection.StationRef(project, "bracket_root", "Q"));
        waitUntil(display, TIMEOUT, "the editor to show the bracket", () -> "bracket".equals(editor.shownSection()));
        results.select(new org.tensio.ui.selection.SectionPoint(project, "platform_beam_midspan", "platform_beam", "ULS",
                10, 140));
        waitUntil(display, TIMEOUT, "the editor to mark the point on the beam",
                () -> "platform_beam".equals(editor.shownSection()) && editor.overlayFigure().mark() != null);
        var t = EditorFixture.section(editor).transform();
        assertEquals(new org.eclipse.draw2d.geometry.Point(t.fx(10), t.fy(140)), editor.overlayFigure().mark());
        page.activate(editor);
        waitUntil(display, TIMEOUT, "the ULS contour", () -> editor.contour() != null && !editor.contourBusy()
                && "ULS".equals(editor.contour().request().caseId()));
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-point-from-results.png",
                EditorFixture::paintFigures);

        // a load history of a fatigue check (a fatigue node of the results tree): the fatigue contour for it; a load
        // case afterwards brings back the quantity shown before
        org.tensio.ui.editor.overlay.Quantity before = editor.contour().request().quantity();
        page.activate(results); // the selection service reports the active part's selection
        results.select(new org.tensio.ui.selection.StationRef(project, "drive_shaft_sprocket", null, "start_up"));
        waitUntil(display, TIMEOUT, "the fatigue contour for start_up", () -> editor.contour() != null
                && !editor.contourBusy()
                && editor.contour().request().quantity() == org.tensio.ui.editor.overlay.Quantity.FATIGUE_UTILISATION
                && "start_up".equals(editor.contour().request().caseId()));
        assertEquals(List.of("running", "start_up"), editor.caseChoices());
        results.select(new org.tensio.ui.selection.StationRef(project, "drive_shaft_sprocket", "ULS"));
        waitUntil(display, TIMEOUT, "the static contour again", () -> editor.contour() != null
                && !editor.contourBusy() && editor.contour().request().quantity() == before
                && "ULS".equals(editor.contour().request().caseId()));
    }

    @Test
    void aProjectWithLoadTablesIsCheckedWithItsTables(@TempDir Path dir) throws Exception {
        Path examples = Path.of(System.getProperty("tensio.demo", "../../docs/examples/demo.tensio.json")).getParent();
        Path folder = examples.resolve("frame-export");
        Path file = dir.resolve("mezzanine.tensio.json");
        Files.copy(folder.resolve("mezzanine.tensio.json"), file);
        Files.copy(folder.resolve("mezzanine-forces.csv"), dir.resolve("mezzanine-forces.csv"));
        ProjectEditor editor = EditorFixture.open(page, file);
        assertTrue(editor.problems().isEmpty(), editor.problems().toString());
        assertFalse(editor.project().stations().isEmpty());
        Files.delete(dir.resolve("mezzanine-forces.csv"));
        // any edit validates again: the same value of nu, as a command
        editor.execute(new org.tensio.ui.editor.commands.SetValueCommand(editor.model().materials().get(0), "nu",
                editor.model().materials().get(0).get("nu")));
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "the missing table to be named", () -> !editor.problems().isEmpty());
        String message = editor.problems().get(0).message();
        assertTrue(message.contains("mezzanine-forces.csv") && message.contains("(in mezzanine.tensio.json)"), message);
        try (var files = Files.list(dir)) {
            assertEquals(List.of(file), files.toList(), "no transient copy left beside the file");
        }
    }

    private static int count(ProblemMarkers markers) {
        try {
            return markers.find().size();
        } catch (org.eclipse.core.runtime.CoreException e) {
            throw new AssertionError(e);
        }
    }
}
