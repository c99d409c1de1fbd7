package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.meritbook.revision.RevisionDiff;
import org.meritbook.revision.RevisionDiffer;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code meritbook diff OLD NEW}: what changed between two runs (dossier PDFs or results.json files). */
@Command(name = "diff", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"List the changed inputs, input cells, settings and results between two runs of a study "
                + "(each a dossier PDF or a results.json).",
            "Exit 0 when there are no differences, 1 when there are, 2 when a file cannot be read or is not a "
                + "meritbook record."})
final class DiffCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "OLD", description = "The earlier dossier PDF or results.json.")
    Path before;

    @Parameters(index = "1", paramLabel = "NEW", description = "The later dossier PDF or results.json.")
    Path after;

    @Option(names = "--json", description = "Print the differences as JSON (for tools) instead of text.")
    boolean json;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        RevisionDiff diff = RevisionDiffer.diff(before, after);
        PrintWriter out = spec.commandLine().getOut();
        int code = diff.identical() ? Main.DONE : Main.DIFFERENCES;
        if (json) {
            out.print(RevisionDiffer.toJson(diff));
            out.flush();
            return code;
        }
        out.println("meritbook: changes from " + diff.before() + " to " + diff.after()
                + (diff.identical() ? ": none" : ""));
        section(out, "Input files", diff.inputs());
        section(out, "Input cells", diff.cells());
        section(out, "Settings", diff.settings());
        section(out, "Results", diff.results());
        out.flush();
        return code;
    }

    private static void section(PrintWriter out, String title, List<RevisionDiff.Change> changes) {
        if (changes.isEmpty()) {
            return;
        }
        out.println(title + " (" + changes.size() + "):");
        changes.forEach(c -> out.println("  " + c.describe()));
    }
}
