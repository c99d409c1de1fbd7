package org.meritbook.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code meritbook run STUDY.md}: compute and write results.json, the trail and the dossier. */
@Command(name = "run", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Run a study notebook and write its results into DIR/<study>/ (-o).")
final class RunCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STUDY.md", description = "The study notebook.")
    Path notebook;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "out",
            description = "Output folder (default: ${DEFAULT-VALUE}); results go to DIR/<study>/.")
    Path out;

    @Option(names = "--templates", paramLabel = "DIR",
            description = "Use the dossier templates in DIR (a lab's own copy of report-templates/).")
    Path templates;

    @Option(names = "--force", description = "Replace an existing dossier of the same revision whose content differs.")
    boolean force;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return StudyOutput.runAndWrite(notebook, out, new StudyOutput.Options(templates, force), spec.commandLine().getOut());
    }
}
