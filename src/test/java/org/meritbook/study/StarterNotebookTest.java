package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meritbook.study.StarterNotebook.Block;
import org.meritbook.study.StarterNotebook.BlockColumn;
import org.junit.jupiter.api.Test;

class StarterNotebookTest {
    private static BlockColumn text(String header, String letter) {
        return new BlockColumn(header, header.replaceAll(" \\(.*\\)", ""), letter, false);
    }

    private static BlockColumn number(String header, String letter) {
        return new BlockColumn(header, header.replaceAll(" \\(.*\\)", ""), letter, true);
    }

    /** A lab's own workbook, laid out unlike the demo: samples before the standards, other header words. */
    private static final List<Block> BLOCKS = List.of(
            new Block("w!Routine!A1:D9", "Routine", 8, List.of(text("Sample", "A"), number("Signal (counts)", "B"),
                    number("Weight (g)", "C"), number("Volume (mL)", "D"))),
            new Block("w!Recovery!A1:D13", "Recovery", 12, List.of(text("Level", "A"), number("Known (µg/kg)", "B"),
                    number("Found (µg/kg)", "C"), text("Note", "D"))),
            new Block("w!Standards!A1:C8", "Standards", 7, List.of(number("Concentration (ng/mL)", "A"),
                    number("Response", "B"), text("Comment", "C"))),
            new Block("w!Blanks!A1:B11", "Blanks", 10, List.of(text("Vial", "A"), number("Height (mAU)", "B"))),
            new Block("w!Repeats!A1:C19", "Repeats", 18, List.of(number("Run", "A"), text("QC material", "B"),
                    number("Value (µg/kg)", "C"))));

    private static List<String> infos(String notebook) {
        Matcher m = Pattern.compile("(?m)^```(\\S+)$").matcher(notebook);
        List<String> out = new ArrayList<>();
        while (m.find()) {
            out.add(m.group(1));
        }
        return out;
    }

    @Test
    void proposesACellOfEveryKindItRecognisesWithTheCalibrationFirst() {
        String md = StarterNotebook.render("w", "own.xlsx", BLOCKS, List.of("sheet Notes (only blank cells)"),
                EnumSet.allOf(AnalysisKind.class));
        assertEquals(List.of("calibration", "unknowns", "accuracy", "detection-limit", "precision"), infos(md));
        assertTrue(md.contains("sample: Sample\ny: Signal\nmass: Weight\nvolume: Volume\n"), md);
        assertTrue(md.contains("measured: Found\nknown: Known\nlevel: Level\n"), md);
        assertTrue(md.contains("value: Value\ngroup: Run\nlevel: QC material\n"), md);
        assertTrue(md.contains("Not offered as data blocks: sheet Notes (only blank cells)"), md);
        // Every proposed cell is a notebook the parser accepts once the front matter is filled in.
        String filled = md.replaceAll("<[^>\n]*>", "x");
        Study study = StudyParser.parse(filled, Path.of("own.md"));
        assertEquals(5, study.cells().size());
    }

    @Test
    void aKindThisVersionDoesNotRunStaysAPlannedTextBlock() {
        String md = StarterNotebook.render("w", "own.xlsx", BLOCKS, List.of(), EnumSet.of(AnalysisKind.CALIBRATION));
        assertEquals(List.of("calibration", "text", "text", "text", "text"), infos(md));
        assertTrue(md.contains("# A precision cell, for when this version runs that kind:"), md);
    }
}
