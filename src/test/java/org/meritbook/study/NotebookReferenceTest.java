package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * docs/notebook.md is the notebook's language in full: every front-matter key, every option of
 * every kind, every fixed choice and every reported name the code knows must be written there, so
 * that the reference cannot fall behind the code.
 */
class NotebookReferenceTest {
    private static final List<String> EVERY_CELL = List.of("id", "role", "exclude", "censored", "formulas", "hidden",
            "merged");

    private static String reference() throws IOException {
        return Files.readString(Path.of("docs", "notebook.md"));
    }

    /** The text of the section for one kind, from its heading to the next kind's. */
    private static String section(String doc, AnalysisKind kind) {
        int start = doc.indexOf("### `" + kind.keyword() + "`");
        if (start < 0) {
            return "";
        }
        int end = doc.indexOf("\n### ", start + 1);
        return end < 0 ? doc.substring(start) : doc.substring(start, end);
    }

    @Test
    void everyFrontMatterKeyIsDescribed() throws IOException {
        String doc = reference();
        List<String> missing = FrontMatterParser.KEYS.stream().filter(k -> !doc.contains("`" + k + "`")).toList();
        assertEquals(List.of(), missing);
    }

    @Test
    void everyOptionAndReportedNameIsInItsKindsSection() throws IOException {
        String doc = reference();
        String common = doc.substring(doc.indexOf("## Options every cell takes"), doc.indexOf("## Kinds"));
        List<String> missing = new ArrayList<>();
        for (AnalysisKind kind : AnalysisKind.values()) {
            String own = section(doc, kind);
            List<String> options = new ArrayList<>(kind.requiredOptions());
            options.addAll(kind.optionalOptions());
            for (String option : options) {
                boolean written = own.contains("`" + option + "`")
                        || EVERY_CELL.contains(option) && common.contains("`" + option + "`");
                if (!written) {
                    missing.add(kind.keyword() + " option " + option);
                }
            }
            kind.reportedNames().stream().filter(n -> !own.contains("`" + n + "`"))
                    .forEach(n -> missing.add(kind.keyword() + " name " + n));
        }
        assertEquals(List.of(), missing);
    }

    @Test
    void everyFixedChoiceIsListed() throws IOException {
        String doc = reference();
        List<String> missing = new ArrayList<>();
        for (String option : OptionRules.CHOICES.keySet()) {
            if (option.equals("horwitz")) {
                continue; // a unit of mass fraction, not a word to choose: precision.md lists them
            }
            OptionRules.shown(option).stream().filter(w -> !doc.contains("`" + w + "`"))
                    .forEach(w -> missing.add(option + ": " + w));
        }
        assertEquals(List.of(), missing);
    }
}
