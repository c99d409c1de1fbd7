package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionResult;

/**
 * The calibration's regression ANOVA table: its rows name the anova_* quantities, whose values
 * {@link CalibrationFinishTest} checks against R 4.x, {@code anova(lm(y ~ x, weights = w))} with
 * w = 1/x² scaled to average 1 and {@code anova(that, lm(y ~ factor(x)))}; the numbers here are R's.
 */
class CalibrationTablesTest {
    private static ResultTable anova(SectionResult s) {
        return s.tables().stream().filter(t -> t.title().equals("Regression ANOVA")).findFirst()
                .orElseThrow(() -> new AssertionError("no regression ANOVA table"));
    }

    private static double value(SectionResult s, ResultTable.Cell c) {
        assertEquals(ResultTable.Show.QUANTITY, c.show());
        return CalibrationFinishTest.q(s, c.ref());
    }

    @Test
    void theAnovaTableHasRegressionResidualLackOfFitPureErrorAndTotal() {
        SectionResult s = CalibrationFinishTest.run("weighting: 1/x^2\n");
        ResultTable t = anova(s);
        assertEquals(List.of("Regression", "Residual", "Lack of fit", "Pure error", "Total"),
                t.rows().stream().map(r -> r.get(0).text()).toList());
        assertEquals("(mAU·s)²", t.columns().get(1).unit());
        List<ResultTable.Cell> regression = t.rows().get(0);
        assertEquals(31309.161865336, value(s, regression.get(1)), 1e-7);
        assertEquals(1, value(s, regression.get(2)));
        assertEquals(12508.30053, value(s, regression.get(4)), 1e-5);
        assertEquals(4.56483576814457e-14, value(s, regression.get(5)), 1e-21);
        List<ResultTable.Cell> residual = t.rows().get(1);
        assertEquals(20.0245664300045, value(s, residual.get(1)), 1e-10);
        assertEquals(8, value(s, residual.get(2)));
        assertEquals(2.50307080375, value(s, residual.get(3)), 1e-10);
        assertEquals(ResultTable.Show.TEXT, residual.get(4).show(), "the residual has no F");
        List<ResultTable.Cell> lackOfFit = t.rows().get(2);
        assertEquals(8.39841479852685, value(s, lackOfFit.get(1)), 1e-10);
        assertEquals(3, value(s, lackOfFit.get(2)));
        assertEquals("lack_of_fit_f", lackOfFit.get(4).ref(), "the lack-of-fit F is the linearity check's");
        assertEquals(11.6261516314777, value(s, t.rows().get(3).get(1)), 1e-10);
        assertEquals(5, value(s, t.rows().get(3).get(2)));
        assertEquals(31329.186431766, value(s, t.rows().get(4).get(1)), 1e-7);
        assertEquals(9, value(s, t.rows().get(4).get(2)));
    }
}
