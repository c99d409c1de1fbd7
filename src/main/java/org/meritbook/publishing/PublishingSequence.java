package org.meritbook.publishing;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Function;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.dossier.DossierWriter;
import org.meritbook.pipeline.InputFile;
import org.meritbook.pipeline.StudyFolder;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.PreviousRevisions;
import org.meritbook.revision.ResultsJson;
import org.meritbook.revision.RevisionContext;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.TrailMarkdown;
import org.meritbook.trail.TrailSection;

/**
 * Turns a notebook into a revision's dossier, the same way for every command: run the study, find
 * the earlier revisions in the study's output folder (history and changes since the latest), write
 * results.json with them, render. {@link #issue} publishes the output set under the folder's lock;
 * the live preview takes the steps one by one ({@link #run}, {@link #draft}, {@link #html}); verify
 * re-runs through {@link #run} and re-renders through {@link #pdf}.
 */
public final class PublishingSequence {
    private final Function<Study, StudyResults> runner;
    private final DossierRenderer renderer;

    /**
     * @param runner   the pipeline (the built-in analyses, or a test's)
     * @param renderer the dossier renderer with the templates in force
     */
    public PublishingSequence(Function<Study, StudyResults> runner, DossierRenderer renderer) {
        this.runner = Objects.requireNonNull(runner, "runner");
        this.renderer = Objects.requireNonNull(renderer, "renderer");
    }

    /**
     * The built-in analyses and the default templates, or a lab's ({@code --templates DIR}); the
     * renderer sets itself up on a second thread while the study is read and computed.
     */
    public static PublishingSequence standard(Optional<Path> templates) {
        return new PublishingSequence(StudyRunner.withBuiltInAnalyses()::run, DossierRenderer.warmingUp(templates));
    }

    /** The same with another runner (the live notebook's keeps parsed workbooks from one run to the next). */
    public static PublishingSequence standard(Optional<Path> templates, StudyRunner runner) {
        return new PublishingSequence(runner::run, DossierRenderer.warmingUp(templates));
    }

    /**
     * A revision about to be rendered: its results, what the earlier revisions say, and the
     * results.json bytes written with them (attached to the PDF, published beside it).
     */
    public record Draft(StudyResults results, RevisionContext revisions, byte[] json) {
        public Draft {
            Objects.requireNonNull(results, "results");
            Objects.requireNonNull(revisions, "revisions");
            json = json.clone();
        }

        @Override
        public byte[] json() {
            return json.clone();
        }
    }

    /** What {@link #issue} did. */
    public record Issued(StudyResults results, List<String> cleanedUp, StudyFolder.Published published) {
        public Issued {
            cleanedUp = List.copyOf(cleanedUp);
        }
    }

    /** A study's output folder: {@code <out>/<notebook name without .md>}. */
    public static Path studyFolder(Path out, Study study) {
        return out.resolve(DossierWriter.stem(study));
    }

    /** The same folder named from the notebook's path, before it is parsed (a batch checks its arguments first). */
    public static Path studyFolder(Path out, Path notebook) {
        return out.resolve(DossierWriter.stem(notebook));
    }

    /** Step 1: the study run (parse done by the caller, who may need the parse alone first). */
    public StudyResults run(Study study) {
        return runner.apply(study);
    }

    /** Steps 2 and 3: the earlier revisions published in the study's output folder, and results.json with them. */
    public Draft draft(StudyResults results, Path studyFolder) {
        return draft(results, PreviousRevisions.find(studyFolder, DossierWriter.stem(results.study()), results));
    }

    /** Step 3 with the earlier revisions already known (verify takes them from the received dossier). */
    public Draft draft(StudyResults results, RevisionContext revisions) {
        return new Draft(results, revisions, ResultsJson.toBytes(results, revisions));
    }

    /** Step 4 for the preview: the HTML dossier, the same bytes {@link #outputSet} publishes as HTML. */
    public byte[] html(Draft draft) {
        return renderer.renderHtml(draft.results(), draft.json(), draft.revisions());
    }

    /** Step 4 for verify: the PDF, as {@link #outputSet} publishes it. */
    public byte[] pdf(StudyResults results, byte[] json, RevisionContext revisions) {
        return renderer.render(results, json, revisions).pdf();
    }

    /** Step 4 for run: PDF, HTML, results.json and trail.md, named as a revision's output set. */
    public Map<String, byte[]> outputSet(Draft draft) {
        StudyResults results = draft.results();
        return DossierWriter.outputSet(DossierWriter.baseName(results.study()),
                renderer.render(results, draft.json(), draft.revisions()), draft.json(),
                trail(results).getBytes(StandardCharsets.UTF_8));
    }

    /**
     * {@code meritbook run}: runs the notebook, renders, and only then publishes the revision's output
     * set as one folder; a refused set (same revision, different content) leaves every earlier output
     * as it was. The study folder's lock is held from reading the earlier revisions to publishing, so
     * two runs of one study at the same time cannot both issue the same revision.
     *
     * @param waiting told the study folder when another run holds its lock
     */
    public Issued issue(Path notebook, Path out, boolean force, Consumer<Path> waiting) {
        Study study = StudyParser.parse(notebook);
        study.frontMatter().requireFilledIn(); // issuing a dossier: nothing left to fill in
        StudyResults results = run(study);
        StudyFolder folder = new StudyFolder(studyFolder(out, study));
        try (StudyFolder.Lock lock = folder.lock(() -> waiting.accept(folder.path()))) {
            List<String> cleaned = lock.cleanUp();
            Map<String, byte[]> files = outputSet(draft(results, folder.path()));
            return new Issued(results, cleaned, lock.publish(study.frontMatter().revision(), files, force));
        }
    }

    /** trail.md: the revision, each input's SHA-256, then every section's steps. */
    static String trail(StudyResults results) {
        List<String> preamble = new ArrayList<>();
        preamble.add("Revision " + results.study().frontMatter().revision() + ".");
        for (InputFile f : results.inputs()) {
            preamble.add("Input `" + f.path() + "` (" + f.alias() + "): SHA-256 " + f.sha256());
        }
        List<TrailSection> sections = results.sections().stream()
                .map(s -> new TrailSection(s.id(), s.title(), s.steps())).toList();
        return TrailMarkdown.render(results.study().frontMatter().title(), preamble, sections);
    }
}
