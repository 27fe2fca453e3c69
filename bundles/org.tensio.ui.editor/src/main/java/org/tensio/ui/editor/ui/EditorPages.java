package org.tensio.ui.editor.ui;

import java.util.List;

import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.tensio.engine.project.Project;
import org.tensio.ui.editor.model.ProjectModel;
import org.tensio.ui.editor.pages.StationsPage;
import org.tensio.ui.editor.pages.TablePage;
import org.tensio.ui.editor.pages.Tables;
import org.tensio.ui.editor.parts.Inks;
import org.tensio.ui.editor.validation.Problem;

/**
 * The editor's pages, created in tab order: the section drawing, materials, stations, load cases,
 * combinations and the raw JSON. Keeps them so the editor can refresh the tables after an edit, refresh
 * everything after the document was replaced, and show each validation result on the pages that display one.
 * UI thread only.
 */
final class EditorPages {

    /** Adds a page to the multi-page editor. */
    @FunctionalInterface
    interface PageAdder {
        /** @return the index of the new page, whose tab shows {@code label} */
        int add(Control control, String label);
    }

    private final SectionPage section;
    private final TablePage materials;
    private final StationsPage stations;
    private final TablePage cases;
    private final TablePage combinations;
    private final JsonPage json;
    private final int jsonIndex;

    /** Creates the pages of {@code editor} in {@code container}, adding each with {@code adder}. */
    EditorPages(ProjectEditor editor, Inks inks, Composite container, PageAdder adder) {
        ProjectModel model = editor.model();
        section = new SectionPage(editor, inks);
        adder.add(section.create(container), Messages.ProjectEditor_pageSection);
        materials = new TablePage(editor, () -> Tables.materials(model), () -> Tables.MATERIAL_KEYS,
                Messages.ProjectEditor_columnMaterial);
        adder.add(materials.create(container), Messages.ProjectEditor_pageMaterials);
        stations = new StationsPage(editor, Messages.ProjectEditor_columnStation, Messages.ProjectEditor_columnSection,
                Messages.ProjectEditor_columnCases);
        adder.add(stations.create(container), Messages.ProjectEditor_pageStations);
        cases = new TablePage(editor, () -> Tables.cases(model), () -> Tables.FORCE_KEYS,
                Messages.ProjectEditor_columnCase);
        adder.add(cases.create(container), Messages.ProjectEditor_pageCases);
        combinations = new TablePage(editor, () -> Tables.combinations(model), () -> Tables.caseIds(model),
                Messages.ProjectEditor_columnCombination);
        adder.add(combinations.create(container), Messages.ProjectEditor_pageCombinations);
        json = new JsonPage(editor);
        jsonIndex = adder.add(json.create(container), Messages.ProjectEditor_pageJson);
        section.refreshSections();
    }

    /** The whole document was replaced (raw text edit, reload): every page shows the new content. */
    void documentReplaced() {
        section.refreshSections();
        refreshTables();
    }

    /**
     * Shows the document just read on the JSON page: the model's text, or the raw text with the reason when it
     * is not a project.
     *
     * @return true when the document was read as a project
     */
    boolean showRead(ProjectDocument document) {
        if (document.unreadable() != null) {
            json.showRaw(document.rawText(), document.unreadable());
            return false;
        }
        json.refresh();
        return true;
    }

    /**
     * Applies the JSON page's typed text when the user leaves that page.
     *
     * @return false when the text is not JSON (the user has to stay on the JSON page)
     */
    boolean mayLeave(int shown, int next) {
        return shown != jsonIndex || next == jsonIndex || json.apply();
    }

    /** Page {@code index} became visible: the JSON page shows the model's text unless edits are pending there. */
    void shown(int index) {
        if (index == jsonIndex && !json.pending()) {
            json.refresh();
        }
    }

    /** Shows the model's current rows on the table pages. */
    void refreshTables() {
        materials.refresh();
        stations.refresh();
        cases.refresh();
        combinations.refresh();
    }

    /** Shows a validation result (UI thread); nothing once the pages are disposed. */
    void validated(Project project, List<Problem> problems) {
        if (section.control().isDisposed()) {
            return;
        }
        section.validated(project, problems);
        String text = String.join("\n", problems.stream().map(Problem::message).toList()); //$NON-NLS-1$
        materials.showProblems(text);
        cases.showProblems(text);
        combinations.showProblems(text);
    }

    /** @return the table of materials, load cases or combinations (0, 1, anything else) */
    TablePage table(int index) {
        return switch (index) {
        case 0 -> materials;
        case 1 -> cases;
        default -> combinations;
        };
    }

    SectionPage section() {
        return section;
    }

    StationsPage stations() {
        return stations;
    }

    JsonPage json() {
        return json;
    }

    /** @return the index of the JSON page */
    int jsonIndex() {
        return jsonIndex;
    }
}
