package org.meritbook.serve;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.meritbook.dossier.DossierWriter;
import org.meritbook.pipeline.StudyFolder;
import org.meritbook.publishing.PublishingSequence;
import org.meritbook.revision.RevisionDiffer;
import org.meritbook.study.NotebookEdits;
import org.meritbook.study.StudyParser;

/**
 * "Issue revision" on the live page, in one place: it compares the preview with the latest revision
 * published in the output folder, and issues the next one — revision raised in the notebook with the
 * reason given, then the dossier written by {@link PublishingSequence}, the sequence {@code meritbook run}
 * uses. The page refuses while the preview has a problem; here the notebook is put back as it was
 * when the issuing itself fails, so a failed issue leaves no raised revision behind.
 */
final class RevisionIssuer {
    private static final Pattern REVISION_FOLDER = Pattern.compile("rev([0-9]{1,6})");

    private final Path notebook;
    private final Path out;
    private final PublishingSequence sequence;
    private final NotebookWriter writer;

    RevisionIssuer(Path notebook, Path out, PublishingSequence sequence, NotebookWriter writer) {
        this.notebook = notebook;
        this.out = out;
        this.sequence = sequence;
        this.writer = writer;
    }

    /** The study's output folder, {@code OUT/<stem>}. */
    Path folder() {
        return out.resolve(DossierWriter.stem(notebook));
    }

    /**
     * The latest published revision and whether the preview differs from it.
     *
     * @param revision the latest revision found, or 0 when none is published
     * @param differs  the preview's inputs, cells, settings or results differ from it (true when none is published)
     */
    record Latest(int revision, boolean differs) {
    }

    /** The last comparison, kept while neither the preview nor the published file changes (the page asks every second). */
    private record Compared(byte[] preview, Path file, long modified, Latest latest) {
    }

    private Compared compared;
    /** Guards only the comparison, so the page's status is answered while an issue is being written. */
    private final Object comparing = new Object();

    /** Compares the preview's results.json with the latest published revision's. */
    Latest latest(byte[] previewJson) {
        synchronized (comparing) {
            return compare(previewJson);
        }
    }

    private Latest compare(byte[] previewJson) {
        Optional<Path> json = latestResults();
        if (json.isEmpty()) {
            return new Latest(0, true);
        }
        Path file = json.get();
        int revision = revisionOf(file);
        try {
            long modified = Files.getLastModifiedTime(file).toMillis();
            if (compared != null && compared.preview() == previewJson && compared.file().equals(file)
                    && compared.modified() == modified) {
                return compared.latest();
            }
            byte[] issued = Files.readAllBytes(file);
            Latest latest = new Latest(revision, !RevisionDiffer.diff("rev" + revision, issued, "preview", previewJson)
                    .identical());
            compared = new Compared(previewJson, file, modified, latest);
            return latest;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file, e);
        }
    }

    /** The revision of a published results.json, from its folder's name ({@code rev3/results.json}: 3). */
    private static int revisionOf(Path json) {
        return Integer.parseInt(REVISION_FOLDER.matcher(json.getParent().getFileName().toString()).replaceFirst("$1"));
    }

    private Optional<Path> latestResults() {
        Path folder = folder();
        if (!Files.isDirectory(folder)) {
            return Optional.empty();
        }
        Path best = null;
        int bestRevision = 0;
        try (Stream<Path> entries = Files.list(folder)) {
            for (Path p : entries.toList()) {
                Matcher m = REVISION_FOLDER.matcher(p.getFileName().toString());
                Path json = p.resolve("results.json");
                if (m.matches() && Integer.parseInt(m.group(1)) > bestRevision && Files.isRegularFile(json)) {
                    best = json;
                    bestRevision = Integer.parseInt(m.group(1));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + folder, e);
        }
        return Optional.ofNullable(best);
    }

    /** What an issue published: the revision and its files. */
    record Result(int revision, StudyFolder.Published published) {
    }

    /**
     * The revision an issue publishes: the notebook's own when it is ahead of every published one
     * (the first issue of revision 1, or a revision the analyst raised by hand), else the one after
     * the latest published.
     *
     * @param notebook  the notebook's {@code revision:}
     * @param published the latest published revision, 0 when none
     */
    static int revisionToIssue(int notebook, int published) {
        return Math.max(notebook, published + 1);
    }

    /** The latest published revision, 0 when none. */
    int latestPublished() {
        return latestResults().map(RevisionIssuer::revisionOf).orElse(0);
    }

    /**
     * Sets the notebook's revision to the one to issue ({@link #revisionToIssue}) with {@code reason}
     * as its reason, and publishes it. Refusals of the edit come
     * as {@link NotebookEdits.EditRefused}; a failed publication as the exception that stopped it,
     * after the notebook has been put back.
     */
    synchronized Result issue(String reason) {
        int published = latestPublished();
        NotebookWriter.Written raised = writer.apply(text -> NotebookEdits.withRevision(text, notebook,
                revisionToIssue(StudyParser.parse(text, notebook).frontMatter().revision(), published), reason));
        try {
            PublishingSequence.Issued issued = sequence.issue(notebook, out, false, folder -> { });
            return new Result(issued.results().study().frontMatter().revision(), issued.published());
        } catch (RuntimeException e) {
            writer.putBack(raised.before());
            throw e;
        }
    }
}
