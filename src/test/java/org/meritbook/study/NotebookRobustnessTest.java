package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.junit.jupiter.api.Test;

/**
 * Damaged notebooks must give located input errors, never an internal error: thousands of random
 * edits of a valid notebook (lines deleted, duplicated, swapped, characters changed) either parse or
 * throw {@link InputException} whose every problem names the notebook and a line.
 */
class NotebookRobustnessTest {
    private static final String VALID = """
            ---
            title: Robustness check
            method: RB-01
            revision: 2
            date: 2026-01-15
            sources:
              runs: runs.xlsx
            ---

            ## Linearity
            Some narrative with `code` and a list:
            - one
            - two

            ```calibration
            id: cal
            data: runs!Calibration!A4:C25
            x: Nominal
            y: Peak area
            weighting: 1/x
            model: linear
            exclude:
              - cell: Calibration!C17
                reason: Injection failure
            ```

            ```detection-limit
            calibration: cal
            methods: [blank, response-sd]
            blanks: {data: runs!Blanks!A1:B11, column: Signal}
            sigma: residual
            ```
            """;

    private static final String[] FRAGMENTS = {"---", "```", "```calibration", ":", "- ", "  ", "!", "'", "\"",
        "{", "}", "[", "]", "#", "\t", "data:", "exclude:", "cell:", "reason:", "runs!", "A1:B", "\u00e9", "\r", "&", "*a"};

    @Test
    void randomEditsGiveParsedStudiesOrLocatedErrors() {
        SplittableRandom random = new SplittableRandom(20261202);
        int parsed = 0;
        int rejected = 0;
        for (int round = 0; round < 3000; round++) {
            String text = mutate(VALID, random, 1 + random.nextInt(4));
            try {
                StudyParser.parse(text, Path.of("robust.md"));
                parsed++;
            } catch (InputException e) {
                rejected++;
                for (Problem p : e.problems()) {
                    if (!p.where().startsWith("robust.md")) {
                        fail("problem not located in the notebook: " + p.message() + "\n--- notebook ---\n" + text);
                    }
                }
            } catch (RuntimeException e) {
                throw new AssertionError("internal error on a damaged notebook (round " + round + "):\n" + text, e);
            }
        }
        // Both outcomes must actually occur, or the mutations test nothing.
        assertFalse(parsed == 0 || rejected == 0, "parsed " + parsed + ", rejected " + rejected);
    }

    private static String mutate(String text, SplittableRandom random, int edits) {
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
