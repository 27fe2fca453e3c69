package org.tensio.cli.report.spi;

import java.util.List;

/**
 * The blocks a contributed {@link ReportSection} can add. Text is plain (escaped by the writer). Not thread-safe:
 * use it only inside {@link ReportSection#write}.
 *
 * @since 0.1
 */
public interface ReportContent {

    /** Adds a paragraph. */
    void paragraph(String text);

    /** Adds a paragraph set as a note (smaller, muted). */
    void note(String text);

    /**
     * Adds a table.
     *
     * @param caption the caption, or null
     * @param header  column headings, at least one
     * @param rows    rows, each with as many cells as {@code header}
     * @throws IllegalArgumentException naming the row when a row has the wrong number of cells
     */
    void table(String caption, List<String> header, List<List<String>> rows);
}
