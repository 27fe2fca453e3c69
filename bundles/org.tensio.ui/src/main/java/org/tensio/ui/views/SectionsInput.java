package org.tensio.ui.views;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.tensio.engine.properties.SectionProperties;

/**
 * The input of the Sections table: the properties of every section of one project file, or a message saying
 * why there are none. Immutable.
 *
 * @param file    the project file, empty before one is chosen
 * @param rows    properties in file order; empty when the file could not be read
 * @param message one line for the user: what is shown, or what went wrong
 * @param failed  true when {@code message} reports an error
 */
public record SectionsInput(Optional<Path> file, List<SectionProperties> rows, String message, boolean failed) {

    /** Copies the rows. */
    public SectionsInput {
        rows = List.copyOf(rows);
    }

    /** @return an input with no file yet */
    public static SectionsInput none() {
        return new SectionsInput(Optional.empty(), List.of(), Messages.SectionsView_noFile, false);
    }

    /** @return an input that shows {@code rows} of {@code file} */
    public static SectionsInput loaded(Path file, List<SectionProperties> rows, String message) {
        return new SectionsInput(Optional.of(file), rows, message, false);
    }

    /** @return an input with no rows that reports {@code message} */
    public static SectionsInput failed(Path file, String message) {
        return new SectionsInput(Optional.of(file), List.of(), message, true);
    }
}
