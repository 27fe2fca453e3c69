package org.tensio.cli.report.spi;

/**
 * A section of the HTML/PDF report contributed by a bundle or jar outside Tensio (e.g. the sign-off block a
 * firm's quality system requires). Contributed sections follow the built-in ones, before the report's closing
 * lines and caution, in the order they were found. The content is plain text and tables: the report writer
 * escapes it and lays it out in both the HTML and the PDF, so a section cannot break either.
 * <p>
 * Found like the engine's contributions: with {@link java.util.ServiceLoader}
 * ({@code META-INF/services/org.tensio.cli.report.spi.ReportSection}) outside OSGi, through the extension
 * point {@code org.tensio.extensions.reportSections} inside. Implementations are stateless, thread-safe and
 * have a public no-argument constructor.
 *
 * @since 0.1
 */
public interface ReportSection {

    /** @return a stable id, letters and digits starting with a lower-case letter; the HTML anchor is {@code x-<id>} */
    String id();

    /** @return the heading */
    String title();

    /**
     * Writes the section.
     *
     * @param context what the report is about
     * @param content where to write
     * @throws RuntimeException any failure is shown in the report in place of the section, naming it
     */
    void write(ReportContext context, ReportContent content);
}
