package org.meritbook.dossier;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.pipeline.AtomicFiles;
import org.meritbook.study.Study;

/**
 * Writes a dossier as {@code <base>.pdf} and {@code <base>.html} without ever losing a document:
 * each file goes to a temporary file in the same folder and is moved into place atomically, and an
 * existing dossier of the same revision with different content is kept unless {@code force} is set.
 * Re-writing identical content is allowed (a re-run of an unchanged study).
 */
public final class DossierWriter {

    /** {@code <notebook name without .md>-rev<N>}, e.g. {@code nitrite-rev2}. */
    public static String baseName(Study study) {
        String name = study.file().getFileName().toString();
        String stem = name.toLowerCase(Locale.ROOT).endsWith(".md") ? name.substring(0, name.length() - 3)
                : name;
        return stem + "-rev" + study.frontMatter().revision();
    }

    /**
     * @param studyOutDir the study's output folder, e.g. {@code out/nitrite}; created when missing
     * @param baseName    file name without extension, see {@link #baseName(Study)}
     * @param force       replace a different dossier of the same revision
     * @return the PDF and HTML paths, in that order
     * @throws InputException with {@link ErrorKey#OUTPUT_EXISTS} when a different dossier of the
     *                        same revision exists and {@code force} is false; nothing is written then
     */
    public List<Path> write(RenderedDossier dossier, Path studyOutDir, String baseName, boolean force) {
        Path pdf = studyOutDir.resolve(baseName + ".pdf");
        Path html = studyOutDir.resolve(baseName + ".html");
        byte[] pdfBytes = dossier.pdf();
        byte[] htmlBytes = dossier.html();
        if (!force) {
            List<Problem> conflicts = new ArrayList<>();
            conflict(pdf, pdfBytes).ifPresent(conflicts::add);
            conflict(html, htmlBytes).ifPresent(conflicts::add);
            if (!conflicts.isEmpty()) {
                throw new InputException(conflicts);
            }
        }
        try {
            Files.createDirectories(studyOutDir);
            replace(pdf, pdfBytes);
            replace(html, htmlBytes);
        } catch (IOException e) {
            throw new UncheckedIOException("could not write the dossier into " + studyOutDir, e);
        }
        return List.of(pdf, html);
    }

    private static Optional<Problem> conflict(Path target, byte[] bytes) {
        if (!Files.exists(target)) {
            return Optional.empty();
        }
        try {
            if (Arrays.equals(Files.readAllBytes(target), bytes)) {
                return Optional.empty();
            }
        } catch (IOException e) {
            throw new UncheckedIOException("could not read the existing " + target, e);
        }
        return Optional.of(new Problem(ErrorKey.OUTPUT_EXISTS, target.toString(),
                "no dossier of this revision yet, or one with the same content",
                "a dossier of the same revision with different content",
                "Raise 'revision:' in the notebook's front matter to issue a new revision, "
                        + "or re-run with --force to replace this one."));
    }

    /** Writes through a temporary sibling and an atomic move; identical content is left untouched. */
    private static void replace(Path target, byte[] bytes) throws IOException {
        if (Files.exists(target) && Arrays.equals(Files.readAllBytes(target), bytes)) {
            return;
        }
        AtomicFiles.write(target, bytes);
    }
}
