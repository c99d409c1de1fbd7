package org.meritbook.study;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * Reads a study notebook (DESIGN §3): YAML front matter, narrative Markdown and analysis cells.
 * Every problem found is collected and thrown as one {@link InputException}, each located as
 * {@code "<notebook file name> line N"}, so the analyst fixes the notebook in one go.
 */
public final class StudyParser {
    private StudyParser() {
    }

    /** Reads the notebook as UTF-8. */
    public static Study parse(Path file) {
        String where = String.valueOf(file.getFileName());
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new InputException(ErrorKey.NOTEBOOK_UNREADABLE, where, "a study notebook at " + file.toAbsolutePath(),
                    "no such file", "Check the path of the notebook.");
        } catch (IOException e) {
            throw new InputException(ErrorKey.NOTEBOOK_UNREADABLE, where, "a readable study notebook",
                    e.getClass().getSimpleName() + (e.getMessage() == null ? "" : " (" + e.getMessage() + ")"),
                    "Check that the path is a file you may read.");
        }
        String text;
        try {
            // Strict decoding: a notebook saved in another encoding is reported, not silently mangled.
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new InputException(ErrorKey.NOTEBOOK_UNREADABLE, where, "a text file in UTF-8", "bytes that are not UTF-8",
                    "Save the notebook as UTF-8 in your editor.");
        }
        return parse(text, file);
    }

    /**
     * Parses notebook text.
     *
     * @param file the notebook's path: names it in messages and anchors the {@code sources:} paths
     */
    public static Study parse(String text, Path file) {
        Problems problems = new Problems(String.valueOf(file.getFileName()));
        NotebookText lines = new NotebookText(text.startsWith("\uFEFF") ? text.substring(1) : text);
        FrontMatterParser.Result front = new FrontMatterParser(lines, file, problems).parse();
        CellOptionsParser options = new CellOptionsParser(front.sources(), problems);
        List<BodyParser.Part> parts = new BodyParser(lines, options, problems).parse(front.bodyLine());

        List<CellIds.Draft> drafts = parts.stream().filter(BodyParser.CellPart.class::isInstance)
                .map(p -> ((BodyParser.CellPart) p).draft()).toList();
        Iterator<AnalysisCell> cells = new CellIds(problems).assign(drafts).iterator();
        List<StudyElement> elements = new ArrayList<>();
        for (BodyParser.Part part : parts) {
            elements.add(part instanceof BodyParser.NarrativePart n ? n.narrative() : cells.next());
        }
        problems.throwIfAny();
        return new Study(file, text, front.frontMatter(), front.sources(), elements);
    }
}
