package org.tensio.cli;

import java.io.IOException;
import java.nio.file.NoSuchFileException;

import org.tensio.engine.io.ProjectFormatException;

import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;

/**
 * Turns bad input into one line on stderr and exit code 2. Anything else is a defect in Tensio: it is
 * reported with its stack trace and exit code 70 so that it is never mistaken for a user error.
 */
final class ErrorHandler implements IExecutionExceptionHandler {

    /** Exit code for an internal error (BSD sysexits EX_SOFTWARE). */
    static final int INTERNAL = 70;

    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, ParseResult parsed) {
        var err = cl.getErr();
        if (ex instanceof ProjectFormatException || ex instanceof IllegalArgumentException) {
            err.println("tensio: error: " + ex.getMessage());
            return Main.BAD_INPUT;
        }
        if (ex instanceof NoSuchFileException nf) {
            err.println("tensio: error: FILE: no such file '" + nf.getFile() + "'");
            return Main.BAD_INPUT;
        }
        if (ex instanceof IOException io) {
            err.println("tensio: error: FILE: cannot read: " + io.getMessage());
            return Main.BAD_INPUT;
        }
        err.println("tensio: internal error (please report): " + ex);
        ex.printStackTrace(err);
        return INTERNAL;
    }
}
