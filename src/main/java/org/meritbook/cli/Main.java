package org.meritbook.cli;

import java.io.PrintWriter;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code meritbook} command. Exit codes (DESIGN §6): 0 done, 1 acceptance failures (the
 * dossier is still written), 2 bad input, 3 internal error; numbered by severity, so a batch
 * {@code run} exits with the highest of its studies' codes.
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
        CommandLine cl = commandLine();
        System.exit(guarded(() -> cl.execute(args), cl.getErr()));
    }

    /**
     * Runs a command, turning running out of memory into one plain line and exit 3: never a raw
     * trace, and never exit 1, which means acceptance failures. The memory a large workbook takes
     * is the user's to give (README, the workbook budget).
     */
    static int guarded(java.util.function.IntSupplier command, PrintWriter err) {
        try {
            return command.getAsInt();
        } catch (OutOfMemoryError e) {
            return reportOutOfMemory(e, err);
        }
    }

    /** The one line {@link #guarded} prints for running out of memory; exit 3. */
    static int reportOutOfMemory(OutOfMemoryError e, PrintWriter err) {
        err.println("meritbook: out of memory (" + (e.getMessage() == null ? "Java heap" : e.getMessage())
                + "): the workbooks and ranges read need more memory than Java was given. Give it more "
                + "(MERITBOOK_JAVA_OPTS=-Xmx4g) or read a smaller range.");
        err.flush();
        return INTERNAL_ERROR;
    }

    /** The configured command line; tests execute it in-process. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExecutionExceptionHandler(Main::handle);
        return cl;
    }

    private static int handle(Exception e, CommandLine cl, CommandLine.ParseResult parsed) {
        return report(e, cl.getErr());
    }

    /**
     * How a command's failure is told: located input problems (exit 2), or an internal error with
     * its trace (exit 3). A batch {@code run} tells each study's failure the same way.
     */
    static int report(Exception e, PrintWriter err) {
        if (e instanceof java.io.UncheckedIOException io && io.getCause() instanceof java.nio.file.AccessDeniedException denied) {
            // Any path the environment refuses, wherever it is met: the user's to fix, so exit 2.
            err.println("meritbook: the input needs attention (1 problem):");
            err.println("  " + denied.getFile() + ": expected a file or folder meritbook may read or write but found "
                    + "no permission there. Change its permissions, or choose another location.");
            err.flush();
            return BAD_INPUT;
        }
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
