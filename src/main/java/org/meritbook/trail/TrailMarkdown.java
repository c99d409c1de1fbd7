package org.meritbook.trail;

import java.util.List;

/**
 * The human-readable calculation trail (trail.md): every step with its formula, its inputs and
 * where they came from, and its value at full precision.
 */
public final class TrailMarkdown {
    private TrailMarkdown() {
    }

    /**
     * @param heading  document heading, e.g. the study title and revision
     * @param preamble lines printed under the heading (notebook, checksums)
     * @param sections the sections in notebook order
     */
    public static String render(String heading, List<String> preamble, List<TrailSection> sections) {
        StringBuilder md = new StringBuilder();
        md.append("# Calculation trail: ").append(oneLine(heading)).append("\n\n");
        for (String line : preamble) {
            md.append(oneLine(line)).append("  \n");
        }
        md.append('\n');
        for (TrailSection s : sections) {
            md.append("## ").append(oneLine(s.title())).append(" (`").append(s.id()).append("`)\n\n");
            for (Step step : s.steps()) {
                md.append("### ").append(oneLine(step.label())).append("\n\n");
                md.append("- Step: `").append(step.id()).append("`\n");
                md.append("- Formula: `").append(step.formula()).append("`\n");
                if (step.method() != null) {
                    md.append("- Method: ").append(oneLine(step.method())).append('\n');
                }
                md.append("- Result: **").append(FullPrecision.of(step.value())).append("**")
                        .append(step.unit() == null ? "" : " " + step.unit()).append("\n\n");
                if (!step.inputs().isEmpty()) {
                    md.append("| Input | Value | Unit | Source |\n|---|---|---|---|\n");
                    for (StepInput in : step.inputs()) {
                        String value = in.text() != null ? in.text() : FullPrecision.of(in.value());
                        md.append("| ").append(cell(in.name())).append(" | ").append(cell(value)).append(" | ")
                                .append(cell(in.unit() == null ? "" : in.unit())).append(" | ")
                                .append(cell(in.source())).append(" |\n");
                    }
                    md.append('\n');
                }
            }
        }
        return md.toString();
    }

    private static String oneLine(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }

    private static String cell(String s) {
        return oneLine(s).replace("|", "\\|");
    }
}
