package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;

/**
 * The report as a list of blocks, independent of the output format: {@link Html} and {@link Pdf} render the same
 * blocks in the same order, so the two files carry the same content.
 */
final class Doc {

    /** A block of the report. */
    sealed interface Block permits Heading, Para, Caution, Table, Figures, Verdict {
    }

    /** A heading; level 1 is the title. {@code id} is the HTML anchor (may be null). */
    record Heading(int level, String text, String id) implements Block {
    }

    /** A paragraph; {@code note} paragraphs are set smaller. */
    record Para(String text, boolean note) implements Block {
    }

    /** The caution, boxed; {@code id} distinguishes the top and bottom copies. */
    record Caution(String text, String id) implements Block {
    }

    /** The overall result: passed or not, and the line that says why. */
    record Verdict(boolean passed, String text) implements Block {
    }

    /**
     * A table cell. {@code value} (may be null) is the exact number shown, written as {@code data-value} in the
     * HTML for tools; {@code numeric} cells are right-aligned; {@code mono} cells use a monospace font.
     */
    record Cell(String text, Double value, boolean numeric, boolean mono) {
        static Cell text(String t) {
            return new Cell(t, null, false, false);
        }

        static Cell num(String t, Double v) {
            return new Cell(t, v, true, false);
        }

        static Cell mono(String t) {
            return new Cell(t, null, false, true);
        }
    }

    /** A table row; {@code key} is written as {@code data-key}; {@code style} is "", "governing", "fail" or both. */
    record Row(String key, List<Cell> cells, String style) {
    }

    /**
     * A table. {@code id} and {@code cssClass} identify it in the HTML ({@code dataRef}, written as
     * {@code data-ref}, carries a section or station id, may be null). An empty header means a key–value table.
     */
    record Table(String id, String cssClass, String dataRef, String caption, List<String> header, List<Row> rows)
            implements Block {
    }

    /** A drawing with its caption. */
    record Figure(Scene scene, String cssClass, String caption) {
    }

    /** Figures side by side (wrapping in the HTML, scaled to one row in the PDF). */
    record Figures(List<Figure> figures) implements Block {
    }

    final String title;
    final List<Block> blocks = new ArrayList<>();

    Doc(String title) {
        this.title = title;
    }

    Doc add(Block b) {
        blocks.add(b);
        return this;
    }

    /** Builds a table row by row. */
    static final class TableBuilder {
        private final String id, cssClass, dataRef, caption;
        private final List<String> header;
        private final List<Row> rows = new ArrayList<>();

        TableBuilder(String id, String cssClass, String dataRef, String caption, String... header) {
            this.id = id;
            this.cssClass = cssClass;
            this.dataRef = dataRef;
            this.caption = caption;
            this.header = List.of(header);
        }

        TableBuilder row(String key, String style, Cell... cells) {
            rows.add(new Row(key, List.of(cells), style));
            return this;
        }

        /** A key–value row: label, value text, exact value, unit. */
        TableBuilder kv(String key, String label, String text, Double value, String unit) {
            return row(key, "", Cell.text(label), Cell.num(text, value), Cell.text(unit));
        }

        boolean isEmpty() {
            return rows.isEmpty();
        }

        Table build() {
            return new Table(id, cssClass, dataRef, caption, header, List.copyOf(rows));
        }
    }
}
