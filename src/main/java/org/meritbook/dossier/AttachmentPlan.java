package org.meritbook.dossier;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.study.SourceFile;

/**
 * Which files the dossier carries, in a fixed order (notebook, workbooks in notebook order,
 * results.json) and under unique names, so that the manifest and the PDF agree.
 */
final class AttachmentPlan {
    static final String RESULTS_NAME = "results.json";

    private AttachmentPlan() {
    }

    static List<Attachment> of(StudyResults results) {
        List<Attachment> out = new ArrayList<>();
        Set<String> used = new HashSet<>();
        Path notebook = results.study().file();
        out.add(new Attachment(unique(notebook.getFileName().toString(), used), "text/markdown", "Source",
                "Study notebook", "notebook", notebook));
        for (SourceFile s : results.study().sources().values()) {
            out.add(new Attachment(unique(s.path().getFileName().toString(), used), mime(s.path()), "Source",
                    "Workbook '" + s.alias() + "'", s.alias(), s.path()));
        }
        AcceptanceProfiles.file(results.study()).ifPresent(profile -> out.add(new Attachment(
                unique(profile.getFileName().toString(), used), "application/yaml", "Source",
                "Acceptance profile", AcceptanceProfiles.MANIFEST_ALIAS, profile)));
        out.add(new Attachment(unique(RESULTS_NAME, used), "application/json", "Data",
                "Results of this run (full precision)", "results", null));
        return List.copyOf(out);
    }

    private static String unique(String name, Set<String> used) {
        String candidate = name;
        int dot = name.lastIndexOf('.');
        for (int i = 2; !used.add(candidate); i++) {
            candidate = dot > 0 ? name.substring(0, dot) + "-" + i + name.substring(dot) : name + "-" + i;
        }
        return candidate;
    }

    static String mime(Path p) {
        String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".xlsx")) {
            return "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
        }
        if (n.endsWith(".xls")) {
            return "application/vnd.ms-excel";
        }
        if (n.endsWith(".csv")) {
            return "text/csv";
        }
        if (n.endsWith(".md")) {
            return "text/markdown";
        }
        return "application/octet-stream";
    }
}
