package org.tensio.ui.editor.ui;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.StyledText;
import org.eclipse.swt.graphics.Font;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.tensio.ui.editor.commands.ReplaceDocumentCommand;
import org.tensio.ui.editor.model.ProjectModel;

import com.google.gson.JsonObject;

/**
 * The raw JSON of the project. It shows the model's text whenever it becomes visible; edits typed here become
 * one {@link ReplaceDocumentCommand} when the user leaves the page or saves (text that is not JSON stays here
 * with a message and is not applied).
 */
final class JsonPage {

    private final ProjectEditor editor;
    private StyledText text;
    private Label message;
    private String shown = ""; //$NON-NLS-1$

    JsonPage(ProjectEditor editor) {
        this.editor = editor;
    }

    Control create(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        c.setLayout(new GridLayout(1, false));
        message = new Label(c, SWT.WRAP);
        message.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        text = new StyledText(c, SWT.MULTI | SWT.V_SCROLL | SWT.H_SCROLL | SWT.BORDER);
        Font mono = JFaceResources.getTextFont();
        text.setFont(mono);
        text.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        text.addModifyListener(e -> editor.dirtyChanged());
        return c;
    }

    /** Shows the model's current text. */
    void refresh() {
        shown = editor.model().toText();
        text.setText(shown);
        message.setText(""); //$NON-NLS-1$
    }

    /** Shows {@code raw} (a file that could not be read as JSON) with a message. */
    void showRaw(String raw, String why) {
        shown = editor.model().toText();
        text.setText(raw);
        message.setText(why);
    }

    /** @return true when the text differs from the model's */
    boolean pending() {
        return text != null && !text.isDisposed() && !text.getText().equals(shown);
    }

    /**
     * Applies typed edits as a command.
     *
     * @return false when the text is not a JSON object (then nothing is applied and the message says why)
     */
    boolean apply() {
        if (!pending()) {
            return true;
        }
        JsonObject root;
        try {
            root = ProjectModel.parseObject(text.getText());
        } catch (IllegalArgumentException e) {
            message.setText(e.getMessage());
            return false;
        }
        editor.execute(new ReplaceDocumentCommand(editor.model(), root));
        refresh();
        return true;
    }

    StyledText text() {
        return text;
    }
}
