package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Objects;
import org.meritbook.pipeline.StudyFolder;

/**
 * What one study of a batch {@code run} printed, held until it is its turn: the report a single
 * run prints on standard output, and the failure it prints on standard error.
 *
 * @param notebook the notebook as given on the command line
 * @param code     the exit code a single run of it would have given
 * @param outcome  what publishing did, or null when the study could not run
 * @param out      its standard output
 * @param err      its standard error
 */
record StudyReport(Path notebook, int code, StudyFolder.Outcome outcome, String out, String err) {
    /** How the batch's summary line counts a study; every study falls in exactly one. */
    enum Kind {
        WRITTEN, UNCHANGED, FAILED_ACCEPTANCE, NOT_RUN
    }

    StudyReport {
        Objects.requireNonNull(notebook, "notebook");
        Objects.requireNonNull(out, "out");
        Objects.requireNonNull(err, "err");
    }

    Kind kind() {
        if (outcome == null) {
            return Kind.NOT_RUN;
        }
        if (code == Main.ACCEPTANCE_FAILED) {
            return Kind.FAILED_ACCEPTANCE;
        }
        return outcome == StudyFolder.Outcome.UNCHANGED ? Kind.UNCHANGED : Kind.WRITTEN;
    }

    /** Prints it whole; each stream is flushed before the other is written, so a shared console keeps the order. */
    void printTo(PrintWriter stdout, PrintWriter stderr) {
        stdout.print(out);
        stdout.flush();
        stderr.print(err);
        stderr.flush();
    }
}
