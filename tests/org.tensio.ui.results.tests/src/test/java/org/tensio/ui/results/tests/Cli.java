package org.tensio.ui.results.tests;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.tensio.cli.Main;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** Runs the command line ({@code tensio ...}, the same code as ./tensio) in-process and captures its output. */
final class Cli {

    /** Output of one run. */
    record Run(int exit, String out, String err) {
        JsonObject json() {
            return JsonParser.parseString(out).getAsJsonObject();
        }
    }

    private Cli() {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter(), err = new StringWriter();
        int code = Main.execute(new PrintWriter(out), new PrintWriter(err), args);
        return new Run(code, out.toString(), err.toString());
    }
}
