package org.tensio.ui.results.handlers;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.Command;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tensio.ui.results.stress.StressPointView;

/**
 * {@value #COMMAND_ID}: pins the stress-point view to the point it shows (it then ignores pointer moves and
 * selections) or releases it. A toggle command; its state is the pinned flag.
 */
public final class TogglePinHandler extends AbstractHandler {

    /** Command id. */
    public static final String COMMAND_ID = "org.tensio.ui.results.commands.togglePin"; //$NON-NLS-1$

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchPart part = HandlerUtil.getActivePartChecked(event);
        if (!(part instanceof StressPointView view)) {
            throw new ExecutionException("togglePin: the active part is not the stress-point view but " //$NON-NLS-1$
                    + part.getTitle());
        }
        Command command = event.getCommand();
        boolean pinned = !HandlerUtil.toggleCommandState(command);
        view.setPinned(pinned);
        return null;
    }
}
