package org.tensio.ui.editor.ui;

import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import java.util.function.Predicate;
import java.util.function.Supplier;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.osgi.util.NLS;
import org.eclipse.swt.widgets.Shell;

/**
 * Notices that the edited file was changed outside the editor: remembers the bytes the editor last read or
 * wrote ({@link FileStamp}) and, when the file on disk differs, asks once per change whether to reload it (a
 * question dialog by default; tests replace the question). Never asks again while a question is open (the
 * dialog takes the focus, and focus is when the editor checks). UI thread only.
 */
final class ExternalChangeWatcher {

    private final Supplier<Shell> shell;
    private final BooleanSupplier dirty;
    private Predicate<Path> prompt = this::askReload;
    private FileStamp stamp;
    private boolean checking;

    /**
     * @param shell parent of the question dialog
     * @param dirty whether the editor has unsaved changes (the question then says they would be lost)
     */
    ExternalChangeWatcher(Supplier<Shell> shell, BooleanSupplier dirty) {
        this.shell = shell;
        this.dirty = dirty;
    }

    /** The editor read or wrote {@code text}: that is the file's content now. */
    void remember(String text) {
        stamp = FileStamp.of(text);
    }

    /**
     * Compares {@code file} with what was remembered; when it differs, remembers the new content and runs
     * {@code reload} if the question says so.
     *
     * @return true when the file had changed
     */
    boolean check(Path file, Runnable reload) {
        if (checking) {
            return false;
        }
        FileStamp now = FileStamp.read(file);
        if (now.sameAs(stamp)) {
            return false;
        }
        checking = true;
        try {
            stamp = now;
            if (prompt.test(file)) {
                reload.run();
            }
        } finally {
            checking = false;
        }
        return true;
    }

    /** Replaces the question (null: the dialog); the predicate gets the file and answers whether to reload it. */
    void setPrompt(Predicate<Path> question) {
        prompt = question == null ? this::askReload : question;
    }

    private boolean askReload(Path file) {
        return MessageDialog.openQuestion(shell.get(), Messages.ProjectEditor_changedTitle, NLS.bind(
                dirty.getAsBoolean() ? Messages.ProjectEditor_changedDirty : Messages.ProjectEditor_changed,
                file.getFileName()));
    }
}
