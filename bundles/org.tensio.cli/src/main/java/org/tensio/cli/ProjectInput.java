package org.tensio.cli;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.stream.Stream;

import org.tensio.cli.report.spi.ReportSection;
import org.tensio.engine.project.Project;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.spi.Extensions;

import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * What every command that reads a project takes: the project file {@code FILE} and the {@code --extensions PATH}
 * option: jars (or folders of jars) whose
 * {@link ServiceLoader} registrations contribute check criteria, profile types and report sections. The
 * environment variable {@code TENSIO_EXTENSIONS} (paths separated by the platform's path separator) adds to
 * it, so a build server can set it once. The jars are loaded in a class loader whose parent is the command
 * line's own, so they see the engine's public API.
 */
final class ProjectInput {

    /** The environment variable read besides the option. */
    static final String ENV = "TENSIO_EXTENSIONS";

    @Parameters(index = "0", paramLabel = "FILE", description = "project file (JSON)")
    Path file;

    @Option(names = "--extensions", paramLabel = "PATH", split = "${sys:path.separator}",
            description = "jar files or folders of jars contributing criteria, profile types and report sections"
                    + " (also from $" + ENV + ")")
    List<Path> paths = new ArrayList<>();

    private final Contributions given;
    private ClassLoader loader;
    private SectionAnalysisService engine;

    /** Contributions through {@link ServiceLoader} (outside OSGi). */
    ProjectInput() {
        this(null);
    }

    /** @param given the engine and report sections to use (inside OSGi), or null for {@link ServiceLoader} */
    ProjectInput(Contributions given) {
        this.given = given;
    }

    /** @return the project file as given */
    Path file() {
        return file;
    }

    /**
     * @return the project read by {@link #engine()}
     * @throws org.tensio.engine.io.ProjectFormatException naming the field and the value when the file is not valid
     * @throws IOException when it cannot be read
     */
    Project read() throws IOException, org.tensio.engine.io.ProjectFormatException {
        return engine().readProject(file);
    }

    /** @return the engine with the contributed criteria and profile types (one per command run) */
    SectionAnalysisService engine() {
        if (engine == null) {
            if (given != null) {
                refuseExtensionsOption();
                engine = given.engine().get();
            } else {
                engine = SectionAnalysisService.create(Extensions.discover(loader()));
            }
        }
        return engine;
    }

    /** @return the contributed report sections, in the order found */
    List<ReportSection> reportSections() {
        if (given != null) {
            refuseExtensionsOption();
            return List.copyOf(given.sections().get());
        }
        try {
            List<ReportSection> list = new ArrayList<>();
            ServiceLoader.load(ReportSection.class, loader()).forEach(list::add);
            return list;
        } catch (ServiceConfigurationError e) {
            throw new IllegalArgumentException("--extensions: " + e.getMessage(), e);
        }
    }

    private void refuseExtensionsOption() {
        if (!paths.isEmpty()) {
            throw new IllegalArgumentException("--extensions: not used inside OSGi, where contributions come from the"
                    + " extension points org.tensio.extensions.*; got " + paths);
        }
    }

    private ClassLoader loader() {
        if (loader == null) {
            List<Path> all = new ArrayList<>(paths);
            String env = System.getenv(ENV);
            if (env != null && !env.isBlank()) {
                for (String s : env.split(File.pathSeparator)) {
                    if (!s.isBlank()) {
                        all.add(Path.of(s.trim()));
                    }
                }
            }
            ClassLoader parent = ProjectInput.class.getClassLoader();
            loader = all.isEmpty() ? parent : new URLClassLoader(urls(all), parent);
        }
        return loader;
    }

    private static URL[] urls(List<Path> paths) {
        List<URL> urls = new ArrayList<>();
        for (Path p : paths) {
            if (Files.isDirectory(p)) {
                try (Stream<Path> s = Files.list(p)) {
                    for (Path jar : s.filter(f -> f.getFileName().toString().endsWith(".jar")).sorted().toList()) {
                        urls.add(url(jar));
                    }
                } catch (IOException e) {
                    throw new UncheckedIOException("--extensions: cannot list '" + p + "'", e);
                }
            } else if (Files.isRegularFile(p) && p.getFileName().toString().endsWith(".jar")) {
                urls.add(url(p));
            } else {
                throw new IllegalArgumentException("--extensions: '" + p + "' is neither a jar file nor a folder");
            }
        }
        return urls.toArray(URL[]::new);
    }

    private static URL url(Path p) {
        try {
            return p.toAbsolutePath().toUri().toURL();
        } catch (MalformedURLException e) {
            throw new IllegalArgumentException("--extensions: '" + p + "' is not a usable path", e);
        }
    }
}
