package org.meritbook.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.InputException;

/** A lab's profile may ask every exclusion to say who and when; the run refuses one that does not. */
class ExclusionRecordTest {
    @TempDir
    Path dir;

    private Path study(String entry, String profile) throws Exception {
        Files.writeString(dir.resolve("cal.csv"), "Conc (mg/L),Area\n1,10.1\n2,20.3\n3,29.8\n4,40.4\n5,50.1\n6,59.7\n");
        Files.writeString(dir.resolve("lab.yaml"), "name: lab SOP 9\n" + profile
                + "rules:\n  - quantity: r_squared\n    at-least: 0.99\n    characteristic: Linearity\n");
        Path notebook = dir.resolve("s.md");
        Files.writeString(notebook, "---\ntitle: Exclusion record\nrevision: 1\ncriteria: lab.yaml\nsources:\n  d: cal.csv\n"
                + "---\n\n```calibration\ndata: d!cal\nx: Conc\ny: Area\nexclude:\n  - cell: cal!B4\n"
                + "    reason: vial cracked\n" + entry + "```\n");
        return notebook;
    }

    @Test
    void anEntryWithoutWhoOrWhenIsRefusedAtItsLineWhenTheProfileAsks() throws Exception {
        Path notebook = study("", "exclusions-record: [by, on]\n");
        InputException e = assertThrows(InputException.class, () -> StudyRunner.withBuiltInAnalyses().run(notebook));
        assertEquals(2, e.problems().size(), e.getMessage());
        assertTrue(e.getMessage().contains("s.md line 14"), e.getMessage());
        assertTrue(e.getMessage().contains("who excluded cal!B4 ('by:'), as profile lab SOP 9 asks of every exclusion"),
                e.getMessage());
        assertTrue(e.getMessage().contains("when cal!B4 was excluded ('on:')"), e.getMessage());
        Path complete = study("    by: A. Analyst\n    on: 2026-12-01\n", "exclusions-record: [by, on]\n");
        StudyResults results = StudyRunner.withBuiltInAnalyses().run(complete);
        assertEquals("vial cracked (A. Analyst, 2026-12-01)", results.sections().get(0).table().rows().get(2)
                .exclusionReason());
    }

    @Test
    void withoutTheAskAReasonIsEnoughAndAWrongAskIsRefused() throws Exception {
        assertEquals(1, StudyRunner.withBuiltInAnalyses().run(study("", "")).sections().size());
        Path wrong = study("", "exclusions-record: [who]\n");
        InputException e = assertThrows(InputException.class, () -> StudyRunner.withBuiltInAnalyses().run(wrong));
        assertTrue(e.getMessage().contains("'exclusions-record:' as a list of [by, on], each once"), e.getMessage());
    }
}
