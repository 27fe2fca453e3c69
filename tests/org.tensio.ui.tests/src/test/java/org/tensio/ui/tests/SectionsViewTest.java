package org.tensio.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tensio.ui.testsupport.UiConditions.find;
import static org.tensio.ui.testsupport.UiConditions.waitUntil;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tensio.ui.testsupport.Screenshots;
import org.tensio.ui.testsupport.UiConditions;
import org.tensio.ui.views.SectionsView;

/** The Tensio perspective and the Sections view, driven in the running workbench (UI thread). */
class SectionsViewTest {

    private static final String PERSPECTIVE_ID = "org.tensio.ui.perspective";
    private static final Duration TIMEOUT = Duration.ofSeconds(60);
    private static final int COLUMNS = 13;

    /** Solid circle r = 25 mm: A = π r² = 1963.50 mm² (elementary geometry). */
    private static final String SHAFT_PROJECT = """
            {"tensio":1,"units":{"length":"mm","force":"N"},\
            "materials":{"S355":{"E":210000,"nu":0.3,"fy":355}},\
            "sections":{"shaft":{"material":"S355","profile":{"type":"CircleProfile","radius":25}}},\
            "stations":{},"combinations":{}}""";

    private IWorkbenchWindow window;
    private IWorkbenchPage page;
    private Display display;

    @BeforeEach
    void openPerspective() throws Exception {
        IWorkbench workbench = PlatformUI.getWorkbench();
        window = workbench.getActiveWorkbenchWindow();
        page = workbench.showPerspective(PERSPECTIVE_ID, window);
        display = window.getShell().getDisplay();
        assertEquals(PERSPECTIVE_ID, page.getPerspective().getId());
    }

    @Test
    void tableListsTheSectionWithItsArea(@TempDir Path dir) throws Exception {
        Path file = write(dir, "shaft.tensio.json", SHAFT_PROJECT);
        SectionsView view = SectionsView.showIn(page, file);
        Table table = sectionsTable();
        waitUntil(display, TIMEOUT, "the Sections view to show " + file, () -> shows(view, file));

        assertEquals(1, table.getItemCount());
        assertEquals("shaft", table.getItem(0).getText(0));
        double expected = Math.PI * 25 * 25;
        double shown = Double.parseDouble(table.getItem(0).getText(1));
        assertEquals(expected, shown, 5e-6 * expected, "A shown with six significant digits");
        assertFalse(labels(l -> l.getText().startsWith("Results support, not replace")).isEmpty(),
                "caution line");

        UiConditions.flush(display);
        Path png = Screenshots.save(window.getShell(), "sections-view.png");
        assertTrue(Files.size(png) > 0, png + " written");
    }

    @Test
    void badFileShowsAMessageAndTheViewLives(@TempDir Path dir) throws Exception {
        Path good = write(dir, "good.tensio.json", SHAFT_PROJECT);
        Path bad = write(dir, "bad.tensio.json", "{\"tensio\":1, \"sections\": [oops");
        SectionsView view = SectionsView.showIn(page, good);
        Table table = sectionsTable();
        waitUntil(display, TIMEOUT, "the good file", () -> shows(view, good));
        assertEquals(1, table.getItemCount());

        view.showProject(bad);
        waitUntil(display, TIMEOUT, "the bad file", () -> shows(view, bad));
        assertTrue(view.input().failed());
        assertEquals(0, table.getItemCount(), "no rows for a bad file");
        assertFalse(labels(l -> l.getText().contains("bad.tensio.json") && !l.getText().startsWith("Loading"))
                .isEmpty(), "a message naming bad.tensio.json");

        view.showProject(good);
        waitUntil(display, TIMEOUT, "the view to recover", () -> shows(view, good));
        assertEquals(1, table.getItemCount());
        assertTrue(page.isPartVisible(view));
    }

    private static boolean shows(SectionsView view, Path file) {
        return view.input().file().equals(Optional.of(file));
    }

    private Table sectionsTable() {
        List<Table> tables = find(window.getShell(), Table.class, t -> t.getColumnCount() == COLUMNS);
        assertEquals(1, tables.size(), "one Sections table in the window");
        return tables.get(0);
    }

    private List<Label> labels(Predicate<Label> test) {
        Shell shell = window.getShell();
        return find(shell, Label.class, test);
    }

    private static Path write(Path dir, String name, String json) throws Exception {
        Path file = dir.resolve(name);
        Files.writeString(file, json, StandardCharsets.UTF_8);
        return file;
    }
}
