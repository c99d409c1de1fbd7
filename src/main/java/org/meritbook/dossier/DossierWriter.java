package org.meritbook.dossier;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.meritbook.study.Study;

/**
 * Names a revision's output set: the dossier as {@code <base>.pdf} and {@code <base>.html}, with
 * results.json and trail.md beside it. {@link org.meritbook.pipeline.StudyFolder} publishes the set
 * as one folder, never replacing a different set of the same revision without {@code --force}.
 */
public final class DossierWriter {
    public static final String RESULTS = "results.json";
    public static final String TRAIL = "trail.md";

    private DossierWriter() {
    }

    /** {@code <notebook name without .md>-rev<N>}, e.g. {@code nitrite-rev2}. */
    public static String baseName(Study study) {
        return stem(study) + "-rev" + study.frontMatter().revision();
    }

    /** The notebook's name without .md, e.g. {@code nitrite}: the study's output folder and its files' stem. */
    public static String stem(Study study) {
        return stem(study.file());
    }

    /** The stem of a notebook file, as {@link #stem(Study)} names it, before the notebook is parsed. */
    public static String stem(java.nio.file.Path notebook) {
        String name = notebook.getFileName().toString();
        return name.toLowerCase(Locale.ROOT).endsWith(".md") ? name.substring(0, name.length() - 3) : name;
    }

    /** File name → bytes, in the order a run reports them: PDF, HTML, results.json, trail.md. */
    public static Map<String, byte[]> outputSet(String baseName, RenderedDossier dossier, byte[] resultsJson,
                                                byte[] trail) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(baseName + ".pdf", dossier.pdf());
        files.put(baseName + ".html", dossier.html());
        files.put(RESULTS, resultsJson.clone());
        files.put(TRAIL, trail.clone());
        return files;
    }
}
