package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class SourcePathTest {
    private static Study parse(String path) {
        return StudyParser.parse("""
                ---
                title: Paths
                sources:
                  runs: %s
                ---
                """.formatted(path), Path.of("/lab/studies/2026/study.md"));
    }

    @Test
    void aRelativePathResolvesAgainstTheNotebooksFolder() {
        assertEquals(Path.of("/lab/studies/data/runs.xlsx"), parse("../data/runs.xlsx").sources().get("runs").path());
    }

    @Test
    void anAbsolutePathOnASharedDriveStandsAsWritten() {
        SourceFile s = parse("/mnt/share/qc/runs.xlsx").sources().get("runs");
        assertEquals(Path.of("/mnt/share/qc/runs.xlsx"), s.path());
        assertEquals("/mnt/share/qc/runs.xlsx", s.written());
    }
}
