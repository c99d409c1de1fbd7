package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

/**
 * Replicate columns with their internal standards side by side (y: [B, C], internal-standard: [D, E]):
 * the fit is that of the ratios written out as plain responses, with every weighting, 1/s^2 included.
 */
class InternalStandardColumnsTest {
    private static final double[] LEVELS = {1, 2, 5, 10, 20};
    private static final double[][] AREA = {{1020, 990}, {2010, 2066}, {5090, 4970}, {10030, 10100}, {20080, 19710}};
    private static final double[][] IS = {{1005, 980}, {1012, 1044}, {998, 1003}, {1010, 990}, {1001, 1022}};

    private static DataBlock block(boolean ratiosWritten) {
        List<Column> columns = new ArrayList<>();
        List<org.meritbook.workbook.CellValue> x = new ArrayList<>();
        for (int i = 0; i < LEVELS.length; i++) {
            x.add(InverseVarianceWeightingTest.number("W", 0, i + 1, LEVELS[i]));
        }
        columns.add(new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", x));
        String[] letters = {"B", "C", "D", "E"};
        for (int c = 0; c < 4; c++) {
            List<org.meritbook.workbook.CellValue> v = new ArrayList<>();
            for (int i = 0; i < LEVELS.length; i++) {
                double value = c < 2 ? (ratiosWritten ? AREA[i][c] / IS[i][c] : AREA[i][c]) : IS[i][c - 2];
                v.add(InverseVarianceWeightingTest.number("W", c + 1, i + 1, value));
            }
            String header = c < 2 ? "Area " + (c + 1) : "IS " + (c - 1);
            columns.add(new Column(header, header, null, letters[c], v));
        }
        return new DataBlock(Path.of("lab.xlsx"), "W", "A1:E6", columns, List.of());
    }

    private static SectionResult run(String weighting, String is, DataBlock block) {
        Study study = StudyParser.parse("""
                ---
                title: Internal standard columns
                sources:
                  lab: lab.xlsx
                ---

                ```calibration
                data: lab!W!A1:E6
                x: Conc
                y: [B, C]
                weighting: %s
                %s```
                """.formatted(weighting, is), Path.of("study.md"));
        return new CalibrationAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name)).value();
    }

    @Test
    void ratiosFromSideBySideColumnsFitLikeTheRatiosWrittenOut() {
        for (String w : List.of("none", "1/x^2", "1/s^2")) {
            SectionResult ratio = run(w, "internal-standard: [D, E]\n", block(false));
            SectionResult written = run(w, "", block(true));
            for (String name : List.of("slope", "intercept", "residual_sd", "n", "back_calculated:C4")) {
                double expected = q(written, name);
                assertEquals(expected, q(ratio, name), 1e-12 * Math.max(1, Math.abs(expected)), w + " " + name);
            }
        }
    }

    @Test
    void oneInternalStandardForTwoResponseColumnsIsRefusedOnItsLine() {
        InputException e = assertThrows(InputException.class, () -> run("none", "internal-standard: D\n", block(false)));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertEquals("study.md line 12", e.problems().get(0).where());
    }
}
