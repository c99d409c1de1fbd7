package org.meritbook.dossier;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.study.SourceFile;

/**
 * Which files the dossier carries, in a fixed order (notebook, workbooks in notebook order, the lab's
 * profile file, the data tables too long to print as CSV ({@link DataTableCsv}) in section order,
 * results.json) and under unique names, so that the manifest and the PDF agree. Only
 * what the run read is attached: a declared source that no cell used is not among the run's inputs
 * and so never leaves the disk. Names come from the paths as written in the notebook, not from
 * where the files happen to lie, so a re-run from unpacked attachments names them the same.
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
        Set<String> read = new HashSet<>();
        results.inputs().forEach(f -> read.add(f.alias()));
        for (SourceFile s : results.study().sources().values()) {
            if (read.contains(s.alias())) {
                String name = fileName(s.written());
                out.add(new Attachment(unique(name, used), mime(name), "Source", "Workbook '" + s.alias() + "'",
                        s.alias(), s.path()));
            }
        }
        if (read.contains(AcceptanceProfiles.MANIFEST_ALIAS)) {
            AcceptanceProfiles.file(results.study()).ifPresent(profile -> out.add(new Attachment(
                    unique(fileName(results.study().frontMatter().criteria().strip()), used), "application/yaml",
                    "Source", "Acceptance profile", AcceptanceProfiles.MANIFEST_ALIAS, profile)));
        }
        DisplayFormatter format = new DisplayFormatter();
        for (SectionResult r : results.sections()) {
            if (DataTableCsv.summarised(r.table())) {
                out.add(new Attachment(unique("data-" + r.id().replaceAll("[^A-Za-z0-9._-]", "-") + ".csv", used), "text/csv",
                        "Data", String.format(Locale.ROOT, "Data table of section '%s', all %,d rows", r.id(),
                        r.table().rows().size()), DataTableCsv.alias(r), null, DataTableCsv.of(r, format)));
            }
        }
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

    /** The last segment of a path as written (either separator). */
    private static String fileName(String written) {
        String name = written.replace('\\', '/');
        return name.substring(name.lastIndexOf('/') + 1);
    }

    static String mime(String fileName) {
        String n = fileName.toLowerCase(Locale.ROOT);
        if (n.endsWith(".xlsx")) {
            return "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
        }
        if (n.endsWith(".xlsm")) {
            return "application/vnd.ms-excel.sheet.macroEnabled.12";
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
