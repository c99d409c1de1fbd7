package org.meritbook.cli;

import java.io.PrintWriter;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code meritbook} command. Exit codes (DESIGN §6): 0 done, 1 acceptance failures (the
 * dossier is still written), 2 bad input, 3 internal error.
 */
@Command(name = "meritbook", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Computes the figures of merit of a quantitative analytical method from lab workbooks "
                + "named in a study notebook, and writes a reproducible validation record.",
        subcommands = {RunCommand.class, DemoCommand.class, NewCommand.class, VerifyCommand.class, DiffCommand.class,
            QualifyCommand.class, ServeCommand.class, CommandLine.HelpCommand.class})
public final class Main implements Runnable {
    public static final int DONE = 0;
    public static final int ACCEPTANCE_FAILED = 1;
    /** {@code diff}: the two runs differ (the convention of diff(1) and git diff --exit-code). */
    public static final int DIFFERENCES = 1;
    public static final int BAD_INPUT = 2;
    public static final int INTERNAL_ERROR = 3;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    public static void main(String[] args) {
        System.exit(commandLine().execute(args));
    }

    /** The configured command line; tests execute it in-process. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExecutionExceptionHandler(Main::handle);
        return cl;
    }

    private static int handle(Exception e, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        if (e instanceof InputException input) {
            err.println("meritbook: the input needs attention (" + input.problems().size() + " problem"
                    + (input.problems().size() == 1 ? "" : "s") + "):");
            for (Problem p : input.problems()) {
                err.println("  " + p.message());
            }
            err.flush();
            return BAD_INPUT;
        }
        err.println("meritbook: internal error, please report it with the input that caused it:");
        e.printStackTrace(err);
        err.flush();
        return INTERNAL_ERROR;
    }
}
