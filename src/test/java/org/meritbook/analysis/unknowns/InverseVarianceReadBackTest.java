package org.meritbook.analysis.unknowns;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

/** Samples read back through a 1/s^2-weighted calibration: w₀ from the replicate SD interpolated at x₀. */
class InverseVarianceReadBackTest {
    private static final double[] X = {1, 1, 1, 2, 2, 2, 5, 5, 5, 10, 10, 10, 20, 20, 20};
    private static final double[] Y = {10.2, 9.9, 10.4, 20.1, 20.6, 19.8, 50.9, 49.7, 50.2, 100.3, 101.0, 99.6,
        200.8, 197.1, 202.5};

    private static CellValue cell(String sheet, int col, int row, String raw) {
        CellRef ref = new CellRef(sheet, row, col);
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static DataBlock block(String sheet, String[] headers, String[] names, String[][] columns) {
        List<Column> out = new ArrayList<>();
        for (int c = 0; c < headers.length; c++) {
            List<CellValue> values = new ArrayList<>();
            for (int r = 0; r < columns[c].length; r++) {
                values.add(cell(sheet, c, r + 1, columns[c][r]));
            }
            String unit = headers[c].contains("(") ? headers[c].substring(headers[c].indexOf('(') + 1,
                    headers[c].length() - 1) : null;
            out.add(new Column(headers[c], names[c], unit, CellRef.columnLetters(c), values));
        }
        return new DataBlock(Path.of("runs.xlsx"), sheet, "A1:B" + (columns[0].length + 1), out, List.of());
    }

    private static String[] text(double[] v) {
        String[] s = new String[v.length];
        for (int i = 0; i < v.length; i++) {
            s[i] = Double.toString(v[i]);
        }
        return s;
    }

    private static SectionResult run(String[][] samples) {
        Study study = StudyParser.parse("""
                ---
                title: Read back
                sources:
                  runs: runs.xlsx
                ---

                ```calibration
                id: cal
                data: runs!Cal!A1:B16
                x: Conc
                y: Area
                weighting: 1/s^2
                ```

                ```unknowns
                calibration: cal
                data: runs!Samples!A1:B9
                sample: Sample
                y: Area
                ```
                """, Path.of("study.md"));
        DataBlock cal = block("Cal", new String[] {"Conc (ng/mL)", "Area (mAU·s)"}, new String[] {"Conc", "Area"},
                new String[][] {text(X), text(Y)});
        DataBlock smp = block("Samples", new String[] {"Sample", "Area (mAU·s)"}, new String[] {"Sample", "Area"},
                samples);
        AnalysisContext context = new AnalysisContext(study, ref -> ref.target().equals("Cal") ? cal : smp);
        SectionResult calibration = new CalibrationAnalysis().run(study.cells().get(0), context);
        return new UnknownsAnalysis().run(study.cells().get(1), context.with(calibration));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name)).value();
    }

    private static double w0(SectionResult s, String sample) {
        Step step = s.steps().stream().filter(t -> t.id().equals(s.id() + ".x0_se:" + sample)).findFirst().orElseThrow();
        return step.inputs().stream().filter(i -> i.name().equals("w₀")).mapToDouble(StepInput::value).findFirst()
                .orElseThrow();
    }

    @Test
    void aSampleBetweenTwoLevelsIsWeightedByTheInterpolatedSdAndAgreesWithR() {
        // R 4.x, lm with weights and vcov (the delta method, an independent route to s(x₀)):
        //   (x, y as above) s <- tapply(y, x, sd); raw <- 1/s[as.character(x)]^2; w <- raw/mean(raw)
        //   f <- lm(y ~ x, weights = w); a <- coef(f)[1]; b <- coef(f)[2]
        //   y0 <- c(75.0, 75.6); x0 <- (mean(y0) - a)/b
        //   s0 <- s["5"] + (x0 - 5)/(10 - 5)*(s["10"] - s["5"]); w0 <- (1/s0^2)/mean(raw)
        //   V <- vcov(f); se <- sqrt(summary(f)$sigma^2/(w0*2) + V[1,1] + x0^2*V[2,2] + 2*x0*V[1,2])/abs(b)
        // → x0 7.50474132038695, s0 0.651477887077254, w0 0.438984801141487, se 0.0452929962126384
        SectionResult s = run(new String[][] {{"S1", "S1"}, {"75.0", "75.6"}});
        assertEquals(7.50474132038695, q(s, "x0:S1"), 1e-11);
        assertEquals(0.438984801141487, w0(s, "S1"), 1e-11);
        assertEquals(0.0452929962126384, q(s, "x0_se:S1"), 1e-12);
        Step se = s.steps().stream().filter(t -> t.id().endsWith("x0_se:S1")).findFirst().orElseThrow();
        assertTrue(se.inputs().stream().anyMatch(i -> i.source().startsWith("weight at x₀: 1/s(x₀)², s(x₀) interpolated "
                + "linearly between the replicate SDs")), se.inputs().toString());
    }

    @Test
    void aSampleReadingAtALevelGetsTheWeightOfThatLevelsStandards() {
        // At x₀ = 10 exactly (y₀ = a + 10·b) w₀ is the weight of the three standards at 10: the rule is continuous.
        double a = 0.155718737417256;
        double b = 10.012907581298;
        SectionResult s = run(new String[][] {{"L"}, {Double.toString(a + 10 * b)}});
        assertEquals(10, q(s, "x0:L"), 1e-9);
        // R: w[10:12] = (1/0.7^2)/mean(raw) = 2.04081632653060/5.36724175633892
        assertEquals(2.04081632653060 / 5.36724175633892, w0(s, "L"), 1e-9);
    }
}
