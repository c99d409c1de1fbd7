package org.meritbook.issuing;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.dossier.DossierWriter;
import org.meritbook.dossier.RenderedDossier;
import org.meritbook.pipeline.StudyFolder;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.InputFile;
import org.meritbook.revision.PreviousRevisions;
import org.meritbook.revision.ResultsJson;
import org.meritbook.revision.RevisionContext;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.TrailMarkdown;
import org.meritbook.trail.TrailSection;

/**
 * Runs a notebook and publishes its revision into {@code OUT/<study>/rev<N>/} (moved here from the
 * command line's {@code run} so the live page issues through the very same steps). The dossier is
 * rendered first and only then published, as one folder: a refused set (same revision, different
 * content) leaves every earlier output as it was. The study folder's lock is held from reading the
 * earlier revisions to publishing, so two issuers of one study cannot both issue the same revision.
 */
public final class RevisionIssue {
    private RevisionIssue() {
    }

    /**
     * What was issued.
     *
     * @param results   the run's results
     * @param published the output set as published
     * @param cleaned   leftovers of interrupted runs that were cleaned up
     */
    public record Issued(StudyResults results, StudyFolder.Published published, List<String> cleaned) {
        public Issued {
            cleaned = List.copyOf(cleaned);
        }
    }

    /**
     * @param notebook  the study notebook
     * @param out       the output root (the study's folder is {@code out/<stem>})
     * @param templates a lab's dossier templates, or empty for the built-in ones
     * @param force     replace an existing set of the same revision whose content differs
     * @param waiting   told when another run holds the study folder's lock
     */
    public static Issued issue(Path notebook, Path out, Optional<Path> templates, boolean force, Runnable waiting) {
        Study study = StudyParser.parse(notebook);
        study.frontMatter().requireFilledIn(); // issuing a dossier: nothing left to fill in
        StudyResults results = StudyRunner.withBuiltInAnalyses().run(study);
        String stem = baseName(notebook);
        StudyFolder folder = new StudyFolder(out.resolve(stem));
        try (StudyFolder.Lock lock = folder.lock(waiting)) {
            List<String> cleaned = lock.cleanUp();
            RevisionContext revisions = PreviousRevisions.find(folder.path(), stem, results);
            byte[] json = ResultsJson.toBytes(results, revisions);
            RenderedDossier dossier = new DossierRenderer(templates).render(results, json, revisions);
            Map<String, byte[]> files = DossierWriter.outputSet(DossierWriter.baseName(results.study()), dossier, json,
                    trail(results).getBytes(StandardCharsets.UTF_8));
            StudyFolder.Published published = lock.publish(results.study().frontMatter().revision(), files, force);
            return new Issued(results, published, cleaned);
        }
    }

    /** The notebook's name without {@code .md}: the study's folder and file names. */
    public static String baseName(Path notebook) {
        String name = notebook.getFileName().toString();
        return name.endsWith(".md") ? name.substring(0, name.length() - 3) : name;
    }

    /** trail.md of a run. */
    public static String trail(StudyResults results) {
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
