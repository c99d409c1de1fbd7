package org.meritbook.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;
import org.commonmark.node.Block;
import org.commonmark.node.Code;
import org.commonmark.node.FencedCodeBlock;
import org.commonmark.node.Heading;
import org.commonmark.node.Node;
import org.commonmark.node.SoftLineBreak;
import org.commonmark.node.SourceSpan;
import org.commonmark.node.Text;
import org.commonmark.parser.IncludeSourceSpans;
import org.commonmark.parser.Parser;
import org.meritbook.error.ErrorKey;

/**
 * Splits the notebook body (CommonMark) into narrative slices and analysis cells. Only fenced
 * blocks at the top level are cells: a fence inside a list or quote is part of the narrative.
 * CommonMark's block source spans give the exact lines; the narrative is then cut from the
 * original text, so it is kept verbatim rather than re-rendered.
 */
final class BodyParser {
    /** A body that starts like options ({@code name:}), the sign of a misspelt kind. */
    private static final Pattern LOOKS_LIKE_OPTIONS = Pattern.compile("^[A-Za-z][\\w-]*\\s*:");
    /** Info strings that declare a block as shown text, even when it looks like options. */
    private static final Set<String> SHOWN_AS_TEXT = Set.of("text", "txt", "plain", "plaintext", "yaml", "yml");

    /** A part of the body in order: a {@link Narrative} or a {@link CellIds.Draft}. */
    sealed interface Part permits NarrativePart, CellPart {
    }

    record NarrativePart(Narrative narrative) implements Part {
    }

    record CellPart(CellIds.Draft draft) implements Part {
    }

    private final NotebookText text;
    private final CellOptionsParser options;
    private final Problems problems;

    BodyParser(NotebookText text, CellOptionsParser options, Problems problems) {
        this.text = text;
        this.options = options;
        this.problems = problems;
    }

    /** @param firstLine notebook line where the body starts (after the front matter) */
    List<Part> parse(int firstLine) {
        List<Part> parts = new ArrayList<>();
        if (firstLine > text.lineCount()) {
            return parts;
        }
        Parser parser = Parser.builder().includeSourceSpans(IncludeSourceSpans.BLOCKS).build();
        Node document = parser.parse(text.joined(firstLine, text.lineCount()));
        int narrativeFrom = firstLine;
        String heading = null;
        for (Node node = document.getFirstChild(); node != null; node = node.getNext()) {
            if (node instanceof Heading h) {
                String words = headingText(h);
                heading = words.isEmpty() ? heading : words;
            }
            if (!(node instanceof FencedCodeBlock fence)) {
                continue;
            }
            int fenceLine = firstLine + firstSpan(fence).getLineIndex();
            int lastLine = firstLine + lastSpan(fence).getLineIndex();
            String word = infoWord(fence);
            Optional<AnalysisKind> kind = AnalysisKind.fromKeyword(word);
            if (kind.isEmpty()) {
                checkNotMisspeltKind(fence, word, fenceLine);
                continue;
            }
            boolean closed = fence.getClosingFenceLength() != null;
            if (!closed) {
                // The cell swallowed the rest of the notebook; its "options" would only yield follow-on errors.
                problems.add(ErrorKey.NOTEBOOK_SYNTAX, fenceLine, "a closing fence for the " + word + " cell",
                        "the end of the notebook", "Close the cell with a line of " + fence.getOpeningFenceLength() + " '"
                                + fence.getFenceCharacter() + "' after its options.");
            }
            narrative(narrativeFrom, fenceLine - 1).ifPresent(n -> parts.add(new NarrativePart(n)));
            CellOptionsParser.Result read = closed ? options.parse(kind.get(), fence.getLiteral(), fenceLine + 1, fenceLine)
                    : CellOptionsParser.Result.EMPTY;
            parts.add(new CellPart(new CellIds.Draft(kind.get(), fenceLine, heading, read)));
            narrativeFrom = lastLine + 1;
            heading = null; // a heading titles the cells after it up to the next cell only
        }
        narrative(narrativeFrom, text.lineCount()).ifPresent(n -> parts.add(new NarrativePart(n)));
        return parts;
    }

    private void checkNotMisspeltKind(FencedCodeBlock fence, String word, int fenceLine) {
        if (word.isEmpty() || SHOWN_AS_TEXT.contains(word)) {
            return;
        }
        String firstContent = fence.getLiteral().lines().filter(l -> !l.isBlank()).findFirst().orElse("");
        if (LOOKS_LIKE_OPTIONS.matcher(firstContent).find()) {
            List<String> kinds = AnalysisKind.keywords();
            problems.add(ErrorKey.UNKNOWN_KIND, fenceLine, "an analysis kind after the fence (" + Problems.list(kinds) + ")",
                    Problems.quote(word),
                    "Write one of the kinds" + Suggestion.hint(word, kinds)
                            + ", or mark a block that only shows text as ```text.");
        }
    }

    /** Lines {@code from..to} without the blank lines at either end, or nothing when all are blank. */
    private Optional<Narrative> narrative(int from, int to) {
        int first = from;
        int last = to;
        while (first <= last && text.isBlank(first)) {
            first++;
        }
        while (last >= first && text.isBlank(last)) {
            last--;
        }
        return first > last ? Optional.empty() : Optional.of(new Narrative(text.slice(first, last), first));
    }

    private static String infoWord(FencedCodeBlock fence) {
        String info = fence.getInfo() == null ? "" : fence.getInfo().strip();
        return info.split("\\s+", 2)[0];
    }

    private static SourceSpan firstSpan(Block block) {
        return block.getSourceSpans().get(0);
    }

    private static SourceSpan lastSpan(Block block) {
        List<SourceSpan> spans = block.getSourceSpans();
        return spans.get(spans.size() - 1);
    }

    private static String headingText(Heading heading) {
        StringBuilder sb = new StringBuilder();
        appendText(heading, sb);
        return sb.toString().strip();
    }

    private static void appendText(Node node, StringBuilder sb) {
        for (Node child = node.getFirstChild(); child != null; child = child.getNext()) {
            if (child instanceof Text t) {
                sb.append(t.getLiteral());
            } else if (child instanceof Code c) {
                sb.append(c.getLiteral());
            } else if (child instanceof SoftLineBreak) {
                sb.append(' ');
            } else {
                appendText(child, sb);
            }
        }
    }
}
