package org.meritbook.analysis.range;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

class RangeAnalysisTest {
    /**
     * Constructed: y = 10·x except a deviating bottom level (x = 1 reads 13, RF 13) and a saturating
     * top (x = 100 reads 850, RF 8.5). By hand: the levels 2…50 have RF 10 exactly, mean 10, all within
     * ±5 %. Adding x = 1 makes the mean (13 + 5·10)/6 = 10.5, and 13 lies +23.8 % from it; adding
     * x = 100 makes it (5·10 + 8.5)/6 = 9.75, and 8.5 lies −12.8 % from it. So the range is 2 to 50,
     * the lower end decided by the response factor of level 1 and the upper by that of level 100.
     */
    private static final double[] X = {1, 2, 5, 10, 20, 50, 100};
    private static final double[] Y = {13, 20, 50, 100, 200, 500, 850};

    private static DataBlock calibration() {
        List<CellValue> xv = new ArrayList<>();
        List<CellValue> yv = new ArrayList<>();
        for (int i = 0; i < X.length; i++) {
            xv.add(new CellValue(new CellRef("Cal", i + 1, 0), CellValue.Kind.NUMBER, X[i], Double.toString(X[i]), null));
            yv.add(new CellValue(new CellRef("Cal", i + 1, 1), CellValue.Kind.NUMBER, Y[i], Double.toString(Y[i]), null));
        }
        return new DataBlock(Path.of("runs.xlsx"), "Cal", "A1:B8", List.of(
                new Column("Conc (mg/L)", "Conc", "mg/L", "A", xv), new Column("Area", "Area", null, "B", yv)), List.of());
    }

    private static SectionResult run(String options, SectionResult limits) {
        Study study = StudyParser.parse("""
                ---
                title: Range test
                sources:
                  runs: runs.xlsx
                ---

                ```calibration
                id: cal
                data: runs!Cal!A1:B8
                x: Conc
                y: Area
                weighting: 1/x^2
                ```

                ```range
                calibration: cal
                %s```
                """.formatted(options), Path.of("study.md"));
        DataBlock block = calibration();
        AnalysisContext context = new AnalysisContext(study, ref -> block);
        context = context.with(new CalibrationAnalysis().run(study.cells().get(0), context));
        if (limits != null) {
            context = context.with(limits);
        }
        return new RangeAnalysis().run(study.cells().get(1), context);
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name + "; warnings " + s.warnings())).value();
    }

    @Test
    void aSaturatingTopAndADeviatingBottomLevelAreLeftOutOfTheRange() {
        SectionResult s = run("deviation: 99\n", null);
        assertEquals(2, q(s, "range_low"));
        assertEquals(50, q(s, "range_high"));
        String lowBy = s.steps().stream().filter(st -> st.id().equals("range.range_low")).findFirst().orElseThrow()
                .inputs().get(1).text();
        assertTrue(lowBy.contains("next level (1.000)") && lowBy.contains("response factor"), lowBy);
        String highBy = s.steps().stream().filter(st -> st.id().equals("range.range_high")).findFirst().orElseThrow()
                .inputs().get(1).text();
        assertTrue(highBy.contains("next level (100.0)") && highBy.contains("-12.82 %"), highBy);
        List<String> inRange = s.table().rows().stream().map(r -> r.cells().get(5).raw()).toList();
        assertEquals(List.of("no", "yes", "yes", "yes", "yes", "yes", "no"), inRange);
    }

    @Test
    void theLowerEndIsNeverBelowTheLoq() {
        Quantity loq = new Quantity("loq", "LOQ", 3.0, "mg/L", "limits.loq", null, true);
        SectionResult limits = new SectionResult("limits", AnalysisKind.DETECTION_LIMIT, "Limits", List.of(),
                List.of(loq), List.of(), new DataTable(List.of(), List.of()), List.of(), List.of(), List.of());
        SectionResult s = run("deviation: 99\nlimits: limits\n", limits);
        assertEquals(5, q(s, "range_low"), "2 mg/L is below the LOQ of 3 mg/L; the next level in the span is 5");
        assertEquals(50, q(s, "range_high"));
    }

    @Test
    void aToleranceOutsideZeroToHundredIsLocated() {
        InputException e = assertThrows(InputException.class, () -> run("tolerance: 150\n", null));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertTrue(e.getMessage().startsWith("study.md line 17"), e.getMessage());
    }
}
