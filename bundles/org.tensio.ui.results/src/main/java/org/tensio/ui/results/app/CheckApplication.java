package org.tensio.ui.results.app;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.osgi.framework.BundleContext;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;
import org.tensio.cli.Contributions;
import org.tensio.cli.Main;
import org.tensio.cli.report.spi.ReportSection;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * The headless check ({@code -application org.tensio.ui.results.check FILE [--format text|json|csv]
 * [--report DIR]}), for build servers that run Eclipse: exactly {@code tensio check} — the command line's own
 * code ({@link Main#execute}) with the same options, output and exit codes (0 every utilisation ≤ 1, 1 some
 * utilisation &gt; 1, 2 bad input). Needs no display and starts no workbench. The exit code is returned to the
 * launcher as an {@link Integer}. The engine is the DS service (with the criteria and profile types contributed
 * through the extension points bound to it) and the report sections are the registered {@link ReportSection}
 * services, so contributions are found the OSGi way, not with {@code --extensions}.
 */
public final class CheckApplication implements IApplication {

    /** The command line's subcommand that this application runs. */
    static final String COMMAND = "check"; //$NON-NLS-1$

    @Override
    public Object start(IApplicationContext context) {
        String[] args = (String[]) context.getArguments().get(IApplicationContext.APPLICATION_ARGS);
        context.applicationRunning();
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        return run(args, out, err);
    }

    /**
     * Runs {@code tensio check args...}.
     *
     * @param args the application arguments (may be null: prints the usage, exit 2)
     * @return the exit code
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        List<String> all = new ArrayList<>();
        all.add(COMMAND);
        if (args != null) {
            all.addAll(List.of(args));
        }
        return Main.execute(out, err, new Contributions(CheckApplication::engine, CheckApplication::sections),
                all.toArray(String[]::new));
    }

    private static final Duration SERVICE_WAIT = Duration.ofSeconds(60);

    private static SectionAnalysisService engine() {
        try (AnalysisServiceTracker tracker = new AnalysisServiceTracker(CheckApplication.class)) {
            return tracker.await(SERVICE_WAIT).orElseThrow(() -> new IllegalStateException(
                    "the engine service (SectionAnalysisService) did not appear within " + SERVICE_WAIT.toSeconds()
                            + " s: is org.apache.felix.scr started?"));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for the engine service", e);
        }
    }

    /** @return the report sections registered now (by org.tensio.extensions from the extension registry) */
    private static List<ReportSection> sections() {
        BundleContext context = FrameworkUtil.getBundle(CheckApplication.class).getBundleContext();
        List<ReportSection> list = new ArrayList<>();
        try {
            for (ServiceReference<ReportSection> ref : context.getServiceReferences(ReportSection.class, null)) {
                ReportSection s = context.getService(ref);
                if (s != null) {
                    list.add(s);
                }
            }
        } catch (InvalidSyntaxException e) {
            throw new IllegalStateException(e); // no filter is given
        }
        return list;
    }

    @Override
    public void stop() {
        // runs to completion on the launcher's thread; nothing to interrupt
    }
}
