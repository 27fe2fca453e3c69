package org.tensio.ui.results.app;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.tensio.cli.Main;

/**
 * The headless check ({@code -application org.tensio.ui.results.check FILE [--format text|json|csv]
 * [--report DIR]}), for build servers that run Eclipse: exactly {@code tensio check} — the command line's own
 * code ({@link Main#execute}) with the same options, output and exit codes (0 every utilisation ≤ 1, 1 some
 * utilisation &gt; 1, 2 bad input). Needs no display and starts no workbench. The exit code is returned to the
 * launcher as an {@link Integer}.
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
        return Main.execute(out, err, all.toArray(String[]::new));
    }

    @Override
    public void stop() {
        // runs to completion on the launcher's thread; nothing to interrupt
    }
}
