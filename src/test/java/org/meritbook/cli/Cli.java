package org.meritbook.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the meritbook command line in-process, as a user would type it, capturing what it prints. */
final class Cli {
    private Cli() {
    }

    /** The exit code and what the command printed to standard output and standard error. */
    record Outcome(int code, String out, String err) {
    }

    static Outcome execute(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Outcome(code, out.toString(), err.toString());
    }
}
