package org.meritbook.robustness;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.meritbook.error.ErrorKey;
import org.meritbook.robustness.CorpusCase.Anything;
import org.meritbook.robustness.CorpusCase.Refused;

/**
 * The demo notebook damaged by hand: random edits (lines deleted, repeated, swapped, characters
 * inserted or removed) run through the whole pipeline, and targeted mistakes in the reading options
 * and references. A random edit may still be a valid notebook, so it may end in any result.
 */
final class NotebookMutations {
    private static final String[] FRAGMENTS = {"---", "```", "```calibration", ":", "- ", "  ", "!", "'", "\"", "{", "}", "[", "]",
        "#", "\t", "data:", "exclude:", "cell:", "reason:", "lab!", "A1:B", "é", "\r", "&", "*a", "formulas: evaluate",
        "hidden: leave-out", "merged: once", "weighting: auto", "model: quadratic", "x: Peak area", "censored: drop"};

    private final Demo demo;
    private final SplittableRandom random;

    NotebookMutations(Demo demo, SplittableRandom random) {
        this.demo = demo;
        this.random = random;
    }

    List<CorpusCase> random(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int edits = 1 + random.nextInt(3);
            out.add(demo.workbook("notebook", edits + " random edits, case " + i, demo.parts, mutate(demo.notebook, edits), new Anything()));
        }
        return out;
    }

    List<CorpusCase> targeted() {
        Set<ErrorKey> badValue = Set.of(ErrorKey.BAD_OPTION_VALUE);
        List<CorpusCase> out = new ArrayList<>();
        for (String option : List.of("formulas: maybe", "hidden: yes", "merged: twice", "hidden: refuse", "formulas: ")) {
            out.add(demo.workbook("notebook", "option '" + option + "'", demo.parts, Demo.withOption(demo.notebook, option),
                    new Refused(badValue)));
        }
        out.add(demo.workbook("notebook", "option 'hiden: include'", demo.parts, Demo.withOption(demo.notebook, "hiden: include"),
                new Refused(Set.of(ErrorKey.UNKNOWN_OPTION))));
        out.add(demo.workbook("notebook", "exclusion of a cell outside the block", demo.parts,
                demo.notebook.replace("cell: Calibration!D23", "cell: Calibration!D99"), new Refused(badValue)));
        out.add(demo.workbook("notebook", "a sheet that does not exist", demo.parts,
                demo.notebook.replace("lab!Calibration!A8:F31", "lab!Calibrations!A8:F31"), new Refused(Set.of(ErrorKey.MISSING_SHEET))));
        out.add(demo.workbook("notebook", "a workbook that does not exist", demo.parts,
                demo.notebook.replace("lab: hmf-honey-validation.xlsx", "lab: missing.xlsx"), new Refused(Set.of(ErrorKey.FILE_NOT_FOUND))));
        for (String option : List.of("weighting: auto", "model: quadratic", "model: linear-through-origin", "weighting: 1/x^2",
                "formulas: evaluate", "hidden: include", "merged: repeat", "censored: drop")) {
            out.add(demo.workbook("notebook", "option '" + option + "' on an intact workbook", demo.parts,
                    demo.notebook.replace("weighting: auto\n", option + "\n").replace("weighting: none\n", option + "\n"), new Anything()));
        }
        return out;
    }

    private String mutate(String text, int edits) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        for (int e = 0; e < edits; e++) {
            int i = random.nextInt(lines.size());
            switch (random.nextInt(5)) {
                case 0 -> lines.remove(i);
                case 1 -> lines.add(i, lines.get(i));
                case 2 -> {
                    int j = random.nextInt(lines.size());
                    String t = lines.get(i);
                    lines.set(i, lines.get(j));
                    lines.set(j, t);
                }
                case 3 -> {
                    String line = lines.get(i);
                    int at = line.isEmpty() ? 0 : random.nextInt(line.length() + 1);
                    lines.set(i, line.substring(0, at) + FRAGMENTS[random.nextInt(FRAGMENTS.length)] + line.substring(at));
                }
                default -> {
                    String line = lines.get(i);
                    if (!line.isEmpty()) {
                        int at = random.nextInt(line.length());
                        lines.set(i, line.substring(0, at) + line.substring(at + 1));
                    }
                }
            }
            if (lines.isEmpty()) {
                lines.add("");
            }
        }
        return String.join("\n", lines);
    }
}
