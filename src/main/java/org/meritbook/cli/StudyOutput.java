package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.Verdict;
import org.meritbook.dossier.DisplayFormatter;
import org.meritbook.issuing.RevisionIssue;
import org.meritbook.pipeline.StudyFolder;
import org.meritbook.pipeline.StudyResults;

/** Shared by {@code run} and {@code demo}: run a notebook and write its outputs into out/&lt;study&gt;/. */
final class StudyOutput {
    private StudyOutput() {
    }

    /**
     * Runs the notebook, renders the dossier, and only then publishes the revision's output set, as
     * one folder: a refused set (same revision, different content) leaves every earlier output as it
     * was. The study folder's lock is held from reading the earlier revisions to publishing, so two
     * runs of one study at the same time cannot both issue the same revision.
     */
    static int runAndWrite(Path notebook, OutputOptions options, PrintWriter out) {
        Path folder = options.out.resolve(baseName(notebook));
        RevisionIssue.Issued issued = RevisionIssue.issue(notebook, options.out, Optional.ofNullable(options.templates),
                options.force, () -> {
                    out.println("meritbook: waiting for another run that is publishing into " + folder);
                    out.flush();
                });
        StudyResults results = issued.results();
        StudyFolder.Published published = issued.published();
        List<String> cleaned = issued.cleaned();
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
        return count(verdicts, Verdict.Outcome.FAIL) > 0 ? Main.ACCEPTANCE_FAILED : Main.DONE;
    }

    private static long count(List<Verdict> verdicts, Verdict.Outcome outcome) {
        return verdicts.stream().filter(v -> v.outcome() == outcome).count();
    }

    static String baseName(Path notebook) {
        return RevisionIssue.baseName(notebook);
    }

    static String trail(StudyResults results) {
        return RevisionIssue.trail(results);
    }
}
