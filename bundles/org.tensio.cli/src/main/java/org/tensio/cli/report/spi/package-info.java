/**
 * Service provider interface for report sections a firm adds to the HTML/PDF report:
 * {@link org.tensio.cli.report.spi.ReportSection}. Public API (see the contributor guide, "API and versions").
 *
 * @since 0.1
 */
package org.tensio.cli.report.spi;
