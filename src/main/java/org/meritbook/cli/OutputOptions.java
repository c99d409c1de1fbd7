package org.meritbook.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/** The output options {@code run} and {@code demo} share. */
final class OutputOptions {
    @Option(names = {"-o", "--out"}, paramLabel = "DIR", defaultValue = "out",
            description = "Output folder (default: ${DEFAULT-VALUE}); results go to DIR/<study>/.")
    Path out;

    @Option(names = "--templates", paramLabel = "DIR",
            description = "Use the dossier templates in DIR (a lab's own copy of report-templates/).")
    Path templates;

    @Option(names = "--force", description = "Replace an existing dossier of the same revision whose content differs.")
    boolean force;
}
