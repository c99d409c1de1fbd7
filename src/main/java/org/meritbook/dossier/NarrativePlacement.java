package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.commonmark.node.Node;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.Narrative;
import org.meritbook.study.Study;
import org.meritbook.study.StudyElement;

/**
 * Places the notebook's narrative around the analysis sections. The text between two cells is split
 * at its first heading: what comes before belongs to the previous cell (its discussion), the rest
 * leads into the next cell. Before the first cell, text above the first cell's heading is the
 * introduction; after the last cell, text from the first heading on forms the closing notes. A
 * heading that repeats the next cell's title or the study's title is dropped, since the dossier's
 * own heading says the same.
 */
final class NarrativePlacement {
    private final Map<String, List<Node>> before = new LinkedHashMap<>();
    private final Map<String, List<Node>> after = new LinkedHashMap<>();
    private final List<Node> intro = new ArrayList<>();
    private final List<Node> closing = new ArrayList<>();

    NarrativePlacement(Study study, NarrativeRenderer narrative) {
        List<AnalysisCell> cells = study.cells();
        String studyTitle = norm(study.frontMatter().title());
        List<Node> gap = new ArrayList<>();
        AnalysisCell previous = null;
        int nextIndex = 0;
        for (StudyElement e : study.elements()) {
            if (e instanceof Narrative n) {
                gap.addAll(narrative.blocks(n.markdown()));
            } else if (e instanceof AnalysisCell cell) {
                place(gap, previous, cell, studyTitle);
                gap = new ArrayList<>();
                previous = cell;
                nextIndex++;
            }
        }
        place(gap, previous, null, studyTitle);
        if (nextIndex != cells.size()) {
            throw new IllegalStateException("study cells and elements disagree");
        }
    }

    private void place(List<Node> gap, AnalysisCell previous, AnalysisCell next, String studyTitle) {
        String nextTitle = next == null ? null : norm(next.title());
        int split = -1;
        for (int i = 0; i < gap.size(); i++) {
            String h = NarrativeRenderer.headingText(gap.get(i));
            if (h == null) {
                continue;
            }
            if (previous == null) {
                // Before the first cell: the introduction runs up to that cell's own heading.
                if (norm(h).equals(nextTitle)) {
                    split = i;
                    break;
                }
            } else {
                split = i;
                break;
            }
        }
        List<Node> head = split < 0 ? (previous == null ? List.of() : gap) : gap.subList(0, split);
        List<Node> tail = split < 0 ? (previous == null ? gap : List.of()) : gap.subList(split, gap.size());
        List<Node> headTarget = previous == null ? intro : after.computeIfAbsent(previous.id(), k -> new ArrayList<>());
        List<Node> tailTarget = next == null ? closing : before.computeIfAbsent(next.id(), k -> new ArrayList<>());
        for (Node n : head) {
            keep(n, headTarget, null, studyTitle);
        }
        for (Node n : tail) {
            keep(n, tailTarget, nextTitle, studyTitle);
        }
    }

    private static void keep(Node block, List<Node> target, String nextTitle, String studyTitle) {
        String h = NarrativeRenderer.headingText(block);
        if (h != null && (norm(h).equals(nextTitle) || norm(h).equals(studyTitle))) {
            return;
        }
        target.add(block);
    }

    private static String norm(String s) {
        return s == null ? "" : s.strip().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }

    List<Node> before(String cellId) {
        return before.getOrDefault(cellId, List.of());
    }

    List<Node> after(String cellId) {
        return after.getOrDefault(cellId, List.of());
    }

    List<Node> intro() {
        return intro;
    }

    List<Node> closing() {
        return closing;
    }
}
