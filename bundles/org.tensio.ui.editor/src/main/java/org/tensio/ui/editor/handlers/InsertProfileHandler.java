package org.tensio.ui.editor.handlers;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.window.Window;
import org.eclipse.ui.dialogs.ListDialog;
import org.eclipse.ui.handlers.HandlerUtil;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.ui.editor.commands.AddPartCommand;
import org.tensio.ui.editor.commands.ProfileDefaults;
import org.tensio.ui.editor.commands.SetProfileCommand;
import org.tensio.ui.editor.model.Part;
import org.tensio.ui.editor.model.Profile;
import org.tensio.ui.editor.model.SectionModel;
import org.tensio.ui.editor.parts.PartEditPart;
import org.tensio.ui.editor.parts.Outlines;
import org.tensio.ui.editor.ui.ProjectEditor;

/**
 * Inserts a parametric profile: replaces the selected part's profile, or (nothing selected, or for the
 * command {@code addPart}) adds a new part with it above the section. The type comes from the parameter
 * {@value #TYPE_PARAMETER} or a list dialog.
 */
public final class InsertProfileHandler extends AbstractHandler {

    /** Command parameter: the IFC4 profile type name. */
    public static final String TYPE_PARAMETER = "org.tensio.ui.editor.profileType"; //$NON-NLS-1$
    /** Command id of "add part". */
    public static final String ADD_PART = "org.tensio.ui.editor.commands.addPart"; //$NON-NLS-1$

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        ProjectEditor editor = Selections.editor(event);
        String type = event.getParameter(TYPE_PARAMETER);
        if (type == null) {
            ListDialog dialog = new ListDialog(HandlerUtil.getActiveShellChecked(event));
            dialog.setTitle(Messages.InsertProfile_title);
            dialog.setMessage(Messages.InsertProfile_message);
            dialog.setContentProvider(ArrayContentProvider.getInstance());
            dialog.setLabelProvider(new LabelProvider());
            dialog.setInput(new ArrayList<>(ProfileTypes.names()).toArray());
            if (dialog.open() != Window.OK || dialog.getResult().length == 0) {
                return null;
            }
            type = (String) dialog.getResult()[0];
        }
        SectionModel section = editor.model().section(editor.shownSection());
        if (section == null) {
            return null;
        }
        List<double[]> loops = new ArrayList<>();
        section.parts().forEach(p -> loops.addAll(Outlines.of(p)));
        double[] b = Outlines.bounds(loops);
        double size = b == null ? 100 : Math.max(b[2] - b[0], b[3] - b[1]);
        Profile profile = ProfileDefaults.of(type, size);
        PartEditPart selected = Selections.part(editor);
        if (selected != null && !ADD_PART.equals(event.getCommand().getId())) {
            editor.execute(new SetProfileCommand(selected.part(), profile));
            return null;
        }
        String material = section.parts().isEmpty() ? null : section.parts().get(0).material();
        List<double[]> added = Outlines.of(new Part(material, profile, null, null));
        double[] ab = Outlines.bounds(added);
        double dy = b == null || ab == null ? 0 : b[3] - ab[1];
        double dx = b == null ? 0 : (b[0] + b[2]) / 2;
        editor.execute(new AddPartCommand(section, new Part(material, profile, new double[] { dx, dy }, null)));
        return null;
    }
}
