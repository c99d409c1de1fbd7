package org.meritbook.study;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A parsed study notebook.
 *
 * @param file        the notebook file
 * @param text        the notebook text exactly as read (attached to the dossier)
 * @param frontMatter the front matter
 * @param sources     declared workbooks by alias, in notebook order
 * @param elements    narrative and analysis cells in notebook order
 */
public record Study(Path file, String text, FrontMatter frontMatter, Map<String, SourceFile> sources,
                    List<StudyElement> elements) {
    public Study {
        sources = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(sources));
        elements = List.copyOf(elements);
    }

    public List<AnalysisCell> cells() {
        return elements.stream().filter(AnalysisCell.class::isInstance).map(AnalysisCell.class::cast).toList();
    }

    public Optional<AnalysisCell> cell(String id) {
        return cells().stream().filter(c -> c.id().equals(id)).findFirst();
    }
}
