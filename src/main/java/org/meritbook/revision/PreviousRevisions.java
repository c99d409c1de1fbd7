package org.meritbook.revision;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.meritbook.pipeline.StudyResults;

/**
 * Finds the latest earlier revision's dossier ({@code rev<M>/<stem>-rev<M>.pdf}, M below the current
 * revision) in a study's output folder, and from its attached results.json the revision history and
 * the changes since. Earlier dossiers are only read, never touched; only published revision folders
 * are looked at, never a staging folder.
 */
public final class PreviousRevisions {
    private PreviousRevisions() {
    }

    /**
     * @param folder   the study's output folder
     * @param stem     the notebook's name without .md
     * @param current  the run being issued (its results tree is built only when there is an earlier revision)
     */
    public static RevisionContext find(Path folder, String stem, StudyResults current) {
        int revision = current.study().frontMatter().revision();
        Optional<Path> latest = latestEarlier(folder, stem, revision);
        if (latest.isEmpty()) {
            return RevisionContext.none();
        }
        Path pdf = latest.get();
        JsonNode previous = RevisionDiffer.read(pdf);
        List<RevisionEntry> history = new ArrayList<>(ResultsJson.history(previous));
        history.add(ResultsJson.entry(previous));
        RevisionDiff diff = RevisionDiffer.diff(pdf.getFileName().toString(), previous, "this revision",
                ResultsJson.toTree(current));
        return new RevisionContext(history, Optional.of(diff), pdf.getFileName().toString());
    }

    private static Optional<Path> latestEarlier(Path folder, String stem, int revision) {
        if (!Files.isDirectory(folder)) {
            return Optional.empty();
        }
        Pattern name = Pattern.compile("rev([0-9]{1,6})");
        Path best = null;
        int bestRevision = 0;
        try (Stream<Path> files = Files.list(folder)) {
            for (Path p : files.toList()) {
                Matcher m = name.matcher(p.getFileName().toString());
                if (m.matches()) {
                    int r = Integer.parseInt(m.group(1));
                    Path pdf = p.resolve(stem + "-rev" + r + ".pdf");
                    if (r < revision && r > bestRevision && Files.isRegularFile(pdf)) {
                        best = pdf;
                        bestRevision = r;
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list the output folder " + folder, e);
        }
        return Optional.ofNullable(best);
    }
}
