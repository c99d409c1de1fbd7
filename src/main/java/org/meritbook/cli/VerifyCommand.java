package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.DossierVerifier;
import org.meritbook.revision.Verification;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code meritbook verify DOSSIER.pdf}: re-run a dossier's attached inputs and compare every result. */
@Command(name = "verify", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Re-run the notebook and workbooks attached to a dossier PDF and confirm that every result "
                + "equals its attached results.json.",
            "Exit 0 when every result is reproduced exactly, 1 when any differs (each is listed)."})
final class VerifyCommand implements Callable<Integer> {
    @Parameters(paramLabel = "DOSSIER.pdf", description = "A dossier written by meritbook run.")
    Path dossier;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        StudyRunner runner = StudyRunner.withBuiltInAnalyses();
        Verification v = new DossierVerifier(runner::run).verify(dossier);
        PrintWriter out = spec.commandLine().getOut();
        if (v.reproduced()) {
            out.println("meritbook: verified " + v.dossier() + ": all " + v.quantities() + " results of "
                    + v.sections() + " section" + (v.sections() == 1 ? "" : "s")
                    + " reproduced exactly from its attached inputs.");
            out.flush();
            return Main.DONE;
        }
        out.println("meritbook: NOT verified " + v.dossier() + ": " + v.differences().size() + " of "
                + v.quantities() + " results differ from its attached results.json:");
        v.differences().forEach(d -> out.println("  " + d));
        out.flush();
        return Main.ACCEPTANCE_FAILED;
    }
}
