package org.tensio.ui.results.handlers;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.swt.dnd.Clipboard;
import org.eclipse.swt.dnd.TextTransfer;
import org.eclipse.swt.dnd.Transfer;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tensio.ui.results.views.ResultsView;

/**
 * {@value #COMMAND_ID}: copies the selected results (the whole tree when nothing is selected), as the filters
 * show them, to the clipboard as text or CSV (parameter {@value #FORMAT}: {@code text} or {@code csv}).
 */
public final class CopyResultsHandler extends AbstractHandler {

    /** Command id. */
    public static final String COMMAND_ID = "org.tensio.ui.results.commands.copyResults"; //$NON-NLS-1$
    /** Parameter id of the format. */
    public static final String FORMAT = "org.tensio.ui.results.commands.copyResults.format"; //$NON-NLS-1$
    /** Format value: CSV. */
    public static final String CSV = "csv"; //$NON-NLS-1$
    /** Format value: indented text. */
    public static final String TEXT = "text"; //$NON-NLS-1$

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchPart part = HandlerUtil.getActivePartChecked(event);
        if (!(part instanceof ResultsView view)) {
            throw new ExecutionException("copyResults: the active part is not the results view but " + part.getTitle()); //$NON-NLS-1$
        }
        String format = event.getParameter(FORMAT);
        if (format != null && !CSV.equals(format) && !TEXT.equals(format)) {
            throw new ExecutionException("copyResults: format must be text or csv, got '" + format + "'"); //$NON-NLS-1$ //$NON-NLS-2$
        }
        String text = view.clipboardText(CSV.equals(format));
        if (text.isEmpty()) {
            return null;
        }
        Clipboard clipboard = new Clipboard(HandlerUtil.getActiveShellChecked(event).getDisplay());
        try {
            clipboard.setContents(new Object[] { text }, new Transfer[] { TextTransfer.getInstance() });
        } finally {
            clipboard.dispose();
        }
        return text;
    }
}
