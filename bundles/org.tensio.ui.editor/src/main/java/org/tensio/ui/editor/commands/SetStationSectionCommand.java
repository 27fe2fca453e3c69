package org.tensio.ui.editor.commands;

import org.eclipse.gef.commands.Command;
import org.eclipse.osgi.util.NLS;
import org.tensio.ui.editor.model.StationModel;

/** Assigns a section (by id) to a station. */
public final class SetStationSectionCommand extends Command {

    private final StationModel station;
    private final String section;
    private String old;

    /** Gives {@code station} the section {@code section}. */
    public SetStationSectionCommand(StationModel station, String section) {
        super(NLS.bind(Messages.SetStationSection_label, station.id()));
        this.station = station;
        this.section = section;
    }

    @Override
    public void execute() {
        old = station.section();
        redo();
    }

    @Override
    public void redo() {
        station.setSection(section);
    }

    @Override
    public void undo() {
        station.setSection(old);
    }
}
