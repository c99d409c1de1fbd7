package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;
import org.meritbook.dossier.DisplayFormatter;
import org.meritbook.pipeline.StudyFolder;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.publishing.PublishingSequence;

/** Shared by {@code run} and {@code demo}: run a notebook and write its outputs into out/&lt;study&gt;/. */
final class StudyOutput {
    private StudyOutput() {
    }

    /** What one issued study came to: its exit code and whether its output set was new, replaced or unchanged. */
    record Written(int code, StudyFolder.Outcome outcome) {
    }

    /** Issues the notebook's revision through the publishing sequence and reports it. */
    static int runAndWrite(Path notebook, OutputOptions options, PrintWriter out) {
        return runAndWrite(sequence(options), notebook, options, out).code();
    }

    /** The publishing sequence with the templates the options name. */
    static PublishingSequence sequence(OutputOptions options) {
        return PublishingSequence.standard(Optional.ofNullable(options.templates));
    }

    /** {@link #runAndWrite(Path, OutputOptions, PrintWriter)} through a given sequence (a batch worker's own). */
    static Written runAndWrite(PublishingSequence sequence, Path notebook, OutputOptions options, PrintWriter out) {
        PublishingSequence.Issued issued = sequence
                .issue(notebook, options.out, options.force, folder -> {
                    out.println("meritbook: waiting for another run that is publishing into " + folder);
                    out.flush();
                });
        StudyResults results = issued.results();
        StudyFolder.Published published = issued.published();
        List<String> cleaned = issued.cleanedUp();
        out.println("meritbook: " + results.study().frontMatter().title() + ", revision "
                + results.study().frontMatter().revision());
        cleaned.forEach(c -> out.println("  cleaned up: " + c));
        results.warnings().forEach(w -> out.println("  warning: " + w));
        DisplayFormatter format = new DisplayFormatter();
        for (SectionResult s : results.sections()) {
            String summary = s.quantities().stream().filter(Quantity::summary)
                    .map(q -> q.label() + " " + format.quantity(q).withUnit()).collect(Collectors.joining("; "));
            out.println("  " + s.id() + ": " + summary + (s.warnings().isEmpty() ? ""
                    : " (" + s.warnings().size() + " warning" + (s.warnings().size() == 1 ? "" : "s") + ")"));
        }
        // Supporting cells are judged and shown, but only reporting cells decide the outcome.
        List<Verdict> verdicts = results.reportingVerdicts();
        if (results.study().frontMatter().criteria() != null) {
            out.println("  acceptance (" + results.study().frontMatter().criteria() + "): "
                    + count(verdicts, Verdict.Outcome.PASS) + " passed, " + count(verdicts, Verdict.Outcome.FAIL)
                    + " failed, " + count(verdicts, Verdict.Outcome.NOT_EVALUABLE) + " not evaluable");
            verdicts.stream().filter(v -> v.outcome() == Verdict.Outcome.FAIL)
                    .forEach(v -> out.println("    FAIL " + v.characteristic() + ": " + v.reason()));
            for (SectionResult s : results.sections()) {
                if (results.supporting(s) && !s.verdicts().isEmpty()) {
                    List<Verdict> own = s.verdicts();
                    out.println("  supporting " + s.id() + " (not counted): " + count(own, Verdict.Outcome.PASS)
                            + " passed, " + count(own, Verdict.Outcome.FAIL) + " failed, "
                            + count(own, Verdict.Outcome.NOT_EVALUABLE) + " not evaluable");
                }
            }
        }
        String verb = switch (published.outcome()) {
            case NEW -> "wrote ";
            case REPLACED -> "replaced ";
            case UNCHANGED -> "unchanged ";
        };
        published.files().forEach(p -> out.println("  " + verb + p));
        out.flush();
        return new Written(count(verdicts, Verdict.Outcome.FAIL) > 0 ? Main.ACCEPTANCE_FAILED : Main.DONE,
                published.outcome());
    }

    private static long count(List<Verdict> verdicts, Verdict.Outcome outcome) {
        return verdicts.stream().filter(v -> v.outcome() == outcome).count();
    }
}
