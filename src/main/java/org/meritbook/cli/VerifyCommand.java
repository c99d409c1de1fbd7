package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.meritbook.publishing.PublishingSequence;
import org.meritbook.revision.DossierVerifier;
import org.meritbook.revision.Verification;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code meritbook verify DOSSIER.pdf}: re-run a dossier's attached inputs and compare its results and pages. */
@Command(name = "verify", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Re-run the notebook and workbooks attached to a dossier PDF, confirm that every result "
                + "equals its attached results.json and that every page shows what those inputs render to.",
            "Exit 0 when the dossier is reproduced exactly, 1 when anything differs (each difference is listed), "
                + "2 when the file is damaged or its attachments do not match its manifest."})
final class VerifyCommand implements Callable<Integer> {
    @Parameters(paramLabel = "DOSSIER.pdf", description = "A dossier written by meritbook run.")
    Path dossier;

    @Option(names = "--against", paramLabel = "DIR",
            description = "Also confirm that the workbooks in DIR (the lab's current copies) are byte-identical to "
                    + "the ones the dossier carries, naming the first differing cell of each that is not.")
    Path against;

    @Option(names = "--templates", paramLabel = "DIR",
            description = "The lab's dossier templates the dossier was rendered with (as given to run).")
    Path templates;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        // The same sequence run issues with: the same analyses, the same renderer and templates.
        PublishingSequence sequence = PublishingSequence.standard(Optional.ofNullable(templates));
        Verification v = new DossierVerifier(sequence::run, sequence::pdf).verify(dossier, Optional.ofNullable(against));
        PrintWriter out = spec.commandLine().getOut();
        if (v.reproduced()) {
            out.println("meritbook: verified " + v.dossier() + ": all " + v.quantities() + " results of "
                    + v.sections() + " section" + (v.sections() == 1 ? "" : "s")
                    + " reproduced exactly from its attached inputs, and all " + v.pages()
                    + " pages show what those inputs give.");
        } else {
            out.println("meritbook: NOT verified " + v.dossier() + ": " + v.differences().size() + " difference"
                    + (v.differences().size() == 1 ? "" : "s") + " from what its attached inputs give:");
            v.differences().forEach(d -> out.println("  " + d));
        }
        v.notes().forEach(n -> out.println("  note: " + n));
        for (Verification.Signature s : v.signatures()) {
            out.println("  signed: " + s.describe());
        }
        if (!v.signatures().isEmpty()) {
            out.println("  (meritbook checks what each signature covers, not who signed: check the signer's "
                    + "certificate in a PDF reader.)");
        }
        out.flush();
        return v.reproduced() ? Main.DONE : Main.ACCEPTANCE_FAILED;
    }
}
