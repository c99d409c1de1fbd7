package org.meritbook.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.Verdict;
import org.meritbook.dossier.DisplayFormatter;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.dossier.DossierWriter;
import org.meritbook.dossier.RenderedDossier;
import org.meritbook.pipeline.AtomicFiles;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.InputFile;
import org.meritbook.revision.PreviousRevisions;
import org.meritbook.revision.ResultsJson;
import org.meritbook.revision.RevisionContext;
import org.meritbook.trail.TrailMarkdown;
import org.meritbook.trail.TrailSection;

/** Shared by {@code run} and {@code demo}: run a notebook and write its outputs into out/&lt;study&gt;/. */
final class StudyOutput {
    private StudyOutput() {
    }

    /**
     * Runs the notebook, renders the dossier, and only then writes anything: a refused dossier
     * (same revision, different content) leaves every earlier output as it was.
     */
    static int runAndWrite(Path notebook, OutputOptions options, PrintWriter out) {
        StudyResults results = StudyRunner.withBuiltInAnalyses().run(notebook);
        Path folder = options.out.resolve(baseName(notebook));
        String stem = baseName(notebook);
        RevisionContext revisions = PreviousRevisions.find(folder, stem, results);
        byte[] json = ResultsJson.toBytes(results, revisions);
        RenderedDossier dossier = new DossierRenderer(Optional.ofNullable(options.templates))
                .render(results, json, revisions);
        List<Path> written = new DossierWriter().write(dossier, folder, DossierWriter.baseName(results.study()),
                options.force);
        AtomicFiles.write(folder.resolve("results.json"), json);
        AtomicFiles.write(folder.resolve("trail.md"), trail(results).getBytes(StandardCharsets.UTF_8));
        out.println("meritbook: " + results.study().frontMatter().title() + ", revision "
                + results.study().frontMatter().revision());
        results.warnings().forEach(w -> out.println("  warning: " + w));
        DisplayFormatter format = new DisplayFormatter();
        for (SectionResult s : results.sections()) {
            String summary = s.quantities().stream().filter(Quantity::summary)
                    .map(q -> q.label() + " " + format.quantity(q).withUnit()).collect(Collectors.joining("; "));
            out.println("  " + s.id() + ": " + summary + (s.warnings().isEmpty() ? ""
                    : " (" + s.warnings().size() + " warning" + (s.warnings().size() == 1 ? "" : "s") + ")"));
        }
        List<Verdict> verdicts = results.sections().stream().flatMap(s -> s.verdicts().stream()).toList();
        if (results.study().frontMatter().criteria() != null) {
            out.println("  acceptance (" + results.study().frontMatter().criteria() + "): "
                    + count(verdicts, Verdict.Outcome.PASS) + " passed, " + count(verdicts, Verdict.Outcome.FAIL)
                    + " failed, " + count(verdicts, Verdict.Outcome.NOT_EVALUABLE) + " not evaluable");
            verdicts.stream().filter(v -> v.outcome() == Verdict.Outcome.FAIL)
                    .forEach(v -> out.println("    FAIL " + v.characteristic() + ": " + v.reason()));
        }
        written.forEach(p -> out.println("  wrote " + p));
        out.println("  wrote " + folder.resolve("results.json"));
        out.println("  wrote " + folder.resolve("trail.md"));
        out.flush();
        return count(verdicts, Verdict.Outcome.FAIL) > 0 ? Main.ACCEPTANCE_FAILED : Main.DONE;
    }

    private static long count(List<Verdict> verdicts, Verdict.Outcome outcome) {
        return verdicts.stream().filter(v -> v.outcome() == outcome).count();
    }

    static String baseName(Path notebook) {
        String name = notebook.getFileName().toString();
        return name.endsWith(".md") ? name.substring(0, name.length() - 3) : name;
    }

    static String trail(StudyResults results) {
        List<String> preamble = new java.util.ArrayList<>();
        preamble.add("Revision " + results.study().frontMatter().revision() + ".");
        for (InputFile f : results.inputs()) {
            preamble.add("Input `" + f.path() + "` (" + f.alias() + "): SHA-256 " + f.sha256());
        }
        List<TrailSection> sections = results.sections().stream()
                .map(s -> new TrailSection(s.id(), s.title(), s.steps())).toList();
        return TrailMarkdown.render(results.study().frontMatter().title(), preamble, sections);
    }
}
