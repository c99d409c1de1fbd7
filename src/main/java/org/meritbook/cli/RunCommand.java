package org.meritbook.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code meritbook run STUDY.md}: compute and write results.json, the trail and the dossier. */
@Command(name = "run", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Run a study notebook and write its results into DIR/<study>/ (-o).")
final class RunCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STUDY.md", description = "The study notebook.")
    Path notebook;

    @CommandLine.Mixin
    OutputOptions output;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return StudyOutput.runAndWrite(notebook, output, spec.commandLine().getOut());
    }
}
