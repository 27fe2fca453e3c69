package org.tensio.cli;

import java.util.List;
import java.util.function.Supplier;

import org.tensio.cli.report.spi.ReportSection;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Where the commands take their engine and report sections from when the command line runs inside OSGi (the
 * workbench's headless application): the engine's DS service, which has bound the contributions of the
 * extension registry, and the report sections registered as OSGi services. Outside OSGi the commands use
 * {@link java.util.ServiceLoader} instead (option {@code --extensions}). Immutable.
 *
 * @param engine   supplies the engine (called once per command run)
 * @param sections supplies the contributed report sections, in order
 * @since 0.1
 */
public record Contributions(Supplier<SectionAnalysisService> engine, Supplier<List<ReportSection>> sections) {
}
