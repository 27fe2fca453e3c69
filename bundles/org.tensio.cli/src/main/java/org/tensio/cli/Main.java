package org.tensio.cli;

import java.io.PrintWriter;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code tensio} command line. Exit codes: 0 success, 1 a check failed (where a command checks), 2 bad
 * input or usage (one line on stderr naming the field and the value; never a stack trace for bad input).
 */
@Command(name = "tensio", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Cross-section properties and stresses for shafts, beams and columns.%n"
                + "Results support, not replace, a competent engineer's review; local codes and licensed practice govern.",
        subcommands = {PropertiesCommand.class, StressCommand.class, CheckCommand.class, EnvelopeCommand.class, DemoCommand.class, VerifyCommand.class})
public final class Main implements Runnable {

    /** Exit code: success. */
    public static final int OK = 0;
    /** Exit code: some check over its limit. */
    public static final int FAILED_CHECK = 1;
    /** Exit code: bad input or usage. */
    public static final int BAD_INPUT = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line; returns the exit code. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        return execute(out, err, null, args);
    }

    /**
     * Runs the command line with the engine and report sections given (inside OSGi); returns the exit code.
     *
     * @param contributions the engine and report sections, or null to find contributions with ServiceLoader
     * @since 0.1
     */
    public static int execute(PrintWriter out, PrintWriter err, Contributions contributions, String... args) {
        CommandLine.IFactory defaults = CommandLine.defaultFactory();
        CommandLine cl = new CommandLine(new Main(), new CommandLine.IFactory() {
            @Override
            public <K> K create(Class<K> cls) throws Exception {
                return cls == ProjectInput.class ? cls.cast(new ProjectInput(contributions)) : defaults.create(cls);
            }
        });
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler(new ErrorHandler());
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("tensio: " + ex.getMessage());
            err.println("Try 'tensio " + (ex.getCommandLine().getCommandName().equals("tensio") ? ""
                    : ex.getCommandLine().getCommandName() + " ") + "--help'.");
            err.flush();
            return BAD_INPUT;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /** Entry point. */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, java.nio.charset.StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, java.nio.charset.StandardCharsets.UTF_8), true);
        System.exit(execute(out, err, args));
    }
}
