package org.tensio.ui.editor.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.ui.editor.tests.EditorFixture.TIMEOUT;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.file.Path;

import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.ui.IWorkbenchPage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.editor.overlay.ColourScale;
import org.tensio.ui.editor.overlay.Quantity;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.preferences.EditorPreferences;
import org.tensio.ui.editor.ui.ProjectEditor;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;

/** Preferences change the contour (colour scale, mesh density); the Properties view shows a part. */
class PreferencesTest {

    private IWorkbenchPage page;

    @BeforeEach
    void openPerspective() throws Exception {
        page = EditorFixture.page();
    }

    @AfterEach
    void reset() throws Exception {
        page.closeAllEditors(false);
        EditorPreferences.node().clear();
    }

    @Test
    void greyScaleAndACoarserMesh(@TempDir Path dir) throws Exception {
        EditorPreferences.node().put(EditorPreferences.COLOUR_SCALE, ColourScale.GREY.name());
        EditorPreferences.node().putInt(EditorPreferences.MESH_DENSITY, 600);
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        editor.showSection("platform_beam");
        editor.showStation("platform_beam_midspan", "ULS");
        editor.showQuantity(Quantity.SIGMA_Z);
        var display = EditorFixture.display(editor);
        waitUntil(display, TIMEOUT, "the contour", () -> editor.contour() != null && !editor.contourBusy()
                && editor.contour().request().quantity() == Quantity.SIGMA_Z
                && "ULS".equals(editor.contour().request().caseId()));
        assertEquals(600, editor.contour().request().targetElements());
        assertTrue(editor.contour().elementCount() < 1500,
                "about 600 triangles asked, the default is 2500: " + editor.contour().elementCount());
        int[] grey = ColourScale.GREY.band(ColourScale.BANDS_COUNT - 1, true);
        RGB expected = new RGB(grey[0], grey[1], grey[2]);
        var t = EditorFixture.section(editor).transform();
        waitUntil(display, TIMEOUT, "the bottom flange in the darkest grey", () -> {
            org.eclipse.draw2d.geometry.Point p = new org.eclipse.draw2d.geometry.Point(t.fx(40), t.fy(-145));
            EditorFixture.section(editor).getContentPane().translateToAbsolute(p);
            return expected.equals(Screenshots.pixel(editor.graphicalViewer().getControl(), p.x, p.y,
                    EditorFixture::paintFigures));
        });
        editor.showMesh(true);
        assertEquals(3 * editor.contour().elementCount(), editor.overlayFigure().meshEdgeCount(),
                "three edges drawn per triangle");
        Screenshots.save(page.getWorkbenchWindow().getShell(), "editor-grey-coarse-mesh.png",
                EditorFixture::paintFigures);
    }

    @Test
    void propertiesViewShowsTheSelectedPart(@TempDir Path dir) throws Exception {
        ProjectEditor editor = EditorFixture.open(page, EditorFixture.demoCopy(dir));
        editor.showSection("platform_beam");
        var view = page.showView("org.eclipse.ui.views.PropertySheet");
        page.activate(editor);
        PartEditPart part = (PartEditPart) EditorFixture.section(editor).getChildren().get(0);
        editor.graphicalViewer().select(part);
        var display = EditorFixture.display(editor);
        var shell = page.getWorkbenchWindow().getShell();
        waitUntil(display, TIMEOUT, "the Properties view to list the profile parameters",
                () -> !UiConditions.find(shell, Tree.class, tree -> has(tree, "overallDepth")).isEmpty());
        assertFalse(view == null);
        Screenshots.save(shell, "editor-properties-view.png", EditorFixture::paintFigures);
    }

    private static boolean has(Tree tree, String text) {
        for (var item : tree.getItems()) {
            item.setExpanded(true);
            for (var child : item.getItems()) {
                if (text.equals(child.getText(0))) {
                    return true;
                }
            }
        }
        return false;
    }
}
