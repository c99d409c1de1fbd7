package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

/** Replicates side by side (one row per level, y: [B, C, D]) give the same fit as the same points in one column. */
class ReplicateColumnsTest {
    private static final double[] LEVELS = {1, 2, 4, 8, 16};
    private static final double[][] AREAS = {
        {10.2, 9.9, 10.4}, {20.1, 20.6, 19.8}, {40.9, 39.7, 40.2}, {80.3, 81.0, 79.6}, {160.8, 159.1, 161.5}};

    private static CellValue number(String sheet, int col, int row, double v) {
        return new CellValue(new CellRef(sheet, row, col), CellValue.Kind.NUMBER, v, Double.toString(v), null);
    }

    private static DataBlock wide() {
        List<CellValue> x = new ArrayList<>();
        List<List<CellValue>> ys = List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        for (int i = 0; i < LEVELS.length; i++) {
            x.add(number("Wide", 0, i + 1, LEVELS[i]));
            for (int k = 0; k < 3; k++) {
                ys.get(k).add(number("Wide", k + 1, i + 1, AREAS[i][k]));
            }
        }
        return new DataBlock(Path.of("lab.xlsx"), "Wide", "A1:D6", List.of(
                new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", x), new Column("Inj 1", "Inj 1", null, "B", ys.get(0)),
                new Column("Inj 2", "Inj 2", null, "C", ys.get(1)), new Column("Inj 3", "Inj 3", null, "D", ys.get(2))),
                List.of());
    }

    private static DataBlock longForm() {
        List<CellValue> x = new ArrayList<>();
        List<CellValue> y = new ArrayList<>();
        int row = 1;
        for (int i = 0; i < LEVELS.length; i++) {
            for (int k = 0; k < 3; k++) {
                x.add(number("Long", 0, row, LEVELS[i]));
                y.add(number("Long", 1, row, AREAS[i][k]));
                row++;
            }
        }
        return new DataBlock(Path.of("lab.xlsx"), "Long", "A1:B16", List.of(
                new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", x), new Column("Area", "Area", null, "B", y)), List.of());
    }

    private static SectionResult run(String data, String y, String extra, DataBlock block) {
        Study study = StudyParser.parse("""
                ---
                title: Layouts
                sources:
                  lab: lab.xlsx
                ---

                ```calibration
                data: %s
                x: Conc
                y: %s
                %s```
                """.formatted(data, y, extra), Path.of("study.md"));
        return new CalibrationAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name)).value();
    }

    @Test
    void replicateColumnsFitLikeTheSamePointsInOneColumnAndKeepTheirCells() {
        SectionResult wide = run("lab!Wide!A1:D6", "[B, C, D]", "", wide());
        SectionResult longForm = run("lab!Long!A1:B16", "Area", "", longForm());
        for (String name : List.of("slope", "intercept", "residual_sd", "r_squared", "lack_of_fit_f", "n")) {
            assertEquals(q(longForm, name), q(wide, name), 1e-12 * Math.max(1, Math.abs(q(longForm, name))), name);
        }
        assertEquals(15, wide.table().rows().size());
        assertEquals("Wide!C3", wide.table().rows().get(4).cells().get(2).address(), "level 2, injection 2 keeps its cell");
        assertTrue(wide.quantity("deviation_percent:C3").isPresent());
    }

    @Test
    void excludingOneReplicateLeavesTheOthersOfItsRow() {
        SectionResult s = run("lab!Wide!A1:D6", "[B, C, D]",
                "exclude:\n  - cell: Wide!D4\n    reason: injection failed\n", wide());
        assertEquals(14, q(s, "n"));
        assertTrue(s.quantity("deviation_percent:B4").isPresent() && s.quantity("deviation_percent:C4").isPresent());
    }

    @Test
    void anUnknownReplicateColumnIsLocated() {
        InputException e = assertThrows(InputException.class, () -> run("lab!Wide!A1:D6", "[B, C, Inj 9]", "", wide()));
        assertEquals(ErrorKey.MISSING_COLUMN, e.key());
    }
}
