package org.meritbook.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/**
 * {@code meritbook run STUDY.md...}: compute and write results.json, the trail and the dossier; several
 * notebooks run at once as a {@link StudyBatch}.
 */
@Command(name = "run", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Run a study notebook and write its results into DIR/<study>/ (-o).",
            "Several notebooks run at once in one process, one per processor; each study's report is printed whole, "
                + "in the order given, then a summary line. The exit code is the most severe of the studies' codes. "
                + "Two notebooks that are one file, or that would write into one DIR/<study>/, are refused before "
                + "anything runs."})
final class RunCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STUDY.md", arity = "1..*", description = "The study notebook, or several.")
    List<Path> notebooks;

    @CommandLine.Mixin
    OutputOptions output;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        if (notebooks.size() == 1) {
            return StudyOutput.runAndWrite(notebooks.get(0), output, spec.commandLine().getOut());
        }
        return new StudyBatch(notebooks, output).run(spec.commandLine().getOut(), spec.commandLine().getErr());
    }
}
