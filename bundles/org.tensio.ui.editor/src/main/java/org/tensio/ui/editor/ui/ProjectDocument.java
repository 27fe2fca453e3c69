package org.tensio.ui.editor.ui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.tensio.ui.editor.model.ProjectModel;

/**
 * The document an editor edits: one {@link ProjectModel} for the editor's whole life (pages and commands hold
 * it) and the text last read from the file. Reading again replaces the model's content, which fires
 * {@link ProjectModel#DOCUMENT}. Text that is not a JSON object leaves the model as it was (empty on the first
 * read) and is kept, with the parser's reason, for the JSON page. UI thread only.
 */
final class ProjectDocument {

    private static final String BOM = "\uFEFF"; //$NON-NLS-1$

    private final Runnable replaced;
    private ProjectModel model;
    private String rawText;
    private String unreadable;

    /** @param replaced run when a later read or a raw-text edit replaced the whole document */
    ProjectDocument(Runnable replaced) {
        this.replaced = replaced;
    }

    /**
     * Reads {@code file} (UTF-8, a leading byte-order mark ignored) into the model.
     *
     * @return the text read, as on disk
     * @throws IOException when the file cannot be read (the model is unchanged)
     */
    String read(Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        load(text);
        return text;
    }

    private void load(String text) {
        rawText = text;
        ProjectModel read = null;
        try {
            read = ProjectModel.parse(text.startsWith(BOM) ? text.substring(1) : text);
            unreadable = null;
        } catch (IllegalArgumentException e) {
            unreadable = e.getMessage();
        }
        if (model == null) {
            // listen also when the first read failed: a later reload or raw-text edit must refresh the pages
            model = read != null ? read : ProjectModel.parse("{}"); //$NON-NLS-1$
            model.addPropertyChangeListener(e -> {
                if (ProjectModel.DOCUMENT.equals(e.getPropertyName())) {
                    replaced.run();
                }
            });
        } else if (read != null) {
            model.replace(read.toJson());
        }
    }

    /** @return the edited model (never null after the first {@link #read}) */
    ProjectModel model() {
        return model;
    }

    /** @return the text last read, as on disk */
    String rawText() {
        return rawText;
    }

    /** @return why the text last read is not a project (the parser's message), or null when it was read */
    String unreadable() {
        return unreadable;
    }
}
