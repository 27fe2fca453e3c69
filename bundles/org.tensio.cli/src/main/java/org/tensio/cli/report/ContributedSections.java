package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

import org.tensio.cli.report.spi.ReportContent;
import org.tensio.cli.report.spi.ReportContext;
import org.tensio.cli.report.spi.ReportSection;

/**
 * Lays out contributed {@link ReportSection}s in the report's document model: each gets a level-2 heading with
 * the anchor {@code x-<id>} and the paragraphs, notes and tables it writes. A section that fails (or writes a
 * malformed table) is replaced by a note naming it and the failure, so the rest of the report still stands and
 * the reader sees that something is missing.
 */
final class ContributedSections {

    private static final Pattern ID = Pattern.compile("[a-z][A-Za-z0-9]{0,63}");

    private ContributedSections() {
    }

    static void add(Doc doc, List<ReportSection> sections, ReportContext context) {
        for (ReportSection section : sections) {
            String id = section.id();
            String anchor = id != null && ID.matcher(id).matches() ? "x-" + id : "x-section";
            String title = section.title() == null ? section.getClass().getName() : section.title();
            List<Doc.Block> blocks = new ArrayList<>();
            try {
                if (!anchor.equals("x-" + id)) {
                    throw new IllegalArgumentException("id '" + id + "' must be letters and digits starting with a"
                            + " lower-case letter");
                }
                section.write(context, new Content(blocks, anchor));
                doc.add(new Doc.Heading(2, title, anchor));
                blocks.forEach(doc::add);
            } catch (RuntimeException e) {
                doc.add(new Doc.Heading(2, title, anchor));
                doc.add(new Doc.Para("This contributed section (" + section.getClass().getName() + ") could not be"
                        + " written: " + e.getMessage(), true));
            }
        }
    }

    /** Collects blocks; nothing reaches the document unless the whole section succeeds. */
    private static final class Content implements ReportContent {
        private final List<Doc.Block> blocks;
        private final String anchor;
        private int tables;

        Content(List<Doc.Block> blocks, String anchor) {
            this.blocks = blocks;
            this.anchor = anchor;
        }

        @Override
        public void paragraph(String text) {
            blocks.add(new Doc.Para(String.valueOf(text), false));
        }

        @Override
        public void note(String text) {
            blocks.add(new Doc.Para(String.valueOf(text), true));
        }

        @Override
        public void table(String caption, List<String> header, List<List<String>> rows) {
            if (header == null || header.isEmpty()) {
                throw new IllegalArgumentException("table: at least one column heading is needed");
            }
            Doc.TableBuilder t = new Doc.TableBuilder(anchor + "-t" + tables++, "contributed", null, caption,
                    header.stream().map(String::valueOf).toArray(String[]::new));
            for (int i = 0; i < rows.size(); i++) {
                List<String> row = rows.get(i);
                if (row == null || row.size() != header.size()) {
                    throw new IllegalArgumentException("table row " + (i + 1) + " has " + (row == null ? 0 : row.size())
                            + " cells for " + header.size() + " columns");
                }
                t.row(Integer.toString(i), "", row.stream().map(c -> Doc.Cell.text(String.valueOf(c)))
                        .toArray(Doc.Cell[]::new));
            }
            blocks.add(t.build());
        }
    }
}
