package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The ANOVA table and the studentized residuals against R 4.2.2 (R 4.x, anova(lm(...)),
 * rstandard()), weights normalised to average 1 as the fit uses them. Script:
 * <pre>
 * x &lt;- c(1,1,2,2,5,5,10,10,20,20)
 * y &lt;- c(42.3,40.9,83.1,85.6,206.2,201.4,418.8,409.5,829.0,846.3)
 * w &lt;- 1/x^2; w &lt;- w/mean(w)
 * for (fit in list(lm(y~x), lm(y~x, weights=w), lm(y~x-1, weights=w))) {
 *   print(anova(fit), digits=15); print(format(rstandard(fit), digits=15))
 *   print(format(anova(fit)[1,5], digits=15)) }
 * anova(lm(y~x, weights=w), lm(y~factor(x), weights=w))   # lack of fit
 * sum(w*(y-weighted.mean(y,w))^2)                           # total SS
 * </pre>
 */
class RegressionAnovaTest {
    private static final double[] X = {1, 1, 2, 2, 5, 5, 10, 10, 20, 20};
    private static final double[] Y = {42.3, 40.9, 83.1, 85.6, 206.2, 201.4, 418.8, 409.5, 829.0, 846.3};

    @Test
    void unweightedTableMatchesR() {
        RegressionAnova a = RegressionAnova.of(LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT))
                .orElseThrow();
        assertEquals(1, a.regressionDf());
        assertEquals(8, a.residualDf());
        assertEquals(9, a.totalDf());
        assertEquals(846527.530351575, a.ssRegression(), 846527.53 * 1e-12);
        assertEquals(276.158648424542, a.ssResidual(), 276.16 * 1e-11);
        assertEquals(34.519831053, a.msResidual(), 1e-8);
        assertEquals(24522.93376, a.f(), 1e-5);
        assertEquals(3.09327380663741e-15, a.p(), 3.09e-15 * 1e-8);
        assertEquals(a.ssTotal(), a.ssRegression() + a.ssResidual(), a.ssTotal() * 1e-13);
        // R: anova(lm(y~x), lm(y~factor(x))) gives RSS 208.514999999999 on 5 df, F 0.54068, p 0.67503
        LackOfFit lof = a.lackOfFit().orElseThrow();
        assertEquals(208.515, lof.ssPureError(), 1e-9);
        assertEquals(67.643648424543, lof.ssLackOfFit(), 1e-9);
        assertEquals(0.54068, lof.f(), 1e-5);
        assertEquals(0.67503, lof.p(), 1e-5);
    }

    @Test
    void weightedTableMatchesR() {
        RegressionAnova a = RegressionAnova.of(LeastSquares.fitLine(X, Y, Weighting.INVERSE_X2, LineModel.WITH_INTERCEPT))
                .orElseThrow();
        assertEquals(31309.161865336, a.ssRegression(), 1e-7);
        assertEquals(20.0245664300045, a.ssResidual(), 1e-10);
        assertEquals(31329.186431766, a.ssTotal(), 1e-7);
        assertEquals(31309.16186533602, a.msRegression(), 1e-7);
        assertEquals(2.50307080375, a.msResidual(), 1e-10);
        assertEquals(12508.30053, a.f(), 1e-5);
        assertEquals(4.56483576814457e-14, a.p(), 4.56e-14 * 1e-8);
        // R: anova(lm(y~x, weights=w), lm(y~factor(x), weights=w)): RSS 11.6261516314777, Sum of Sq 8.39841479852685
        LackOfFit lof = a.lackOfFit().orElseThrow();
        assertEquals(11.6261516314777, lof.ssPureError(), 1e-10);
        assertEquals(8.39841479852685, lof.ssLackOfFit(), 1e-10);
        assertEquals(1.20395, lof.f(), 1e-5);
        assertEquals(0.39818, lof.p(), 1e-5);
    }

    @Test
    void throughOriginTableIsUncentredAsInR() {
        RegressionAnova a = RegressionAnova.of(LeastSquares.fitLine(X, Y, Weighting.INVERSE_X2, LineModel.THROUGH_ORIGIN))
                .orElseThrow();
        assertEquals(1, a.regressionDf());
        assertEquals(9, a.residualDf());
        assertEquals(10, a.totalDf());
        assertEquals(66325.2945201535, a.ssRegression(), 1e-7);
        assertEquals(20.4142130518232, a.ssResidual(), 1e-10);
        assertEquals(29240.78676, a.f(), 1e-5);
        assertEquals(4.06792873674898e-17, a.p(), 4.07e-17 * 1e-7);
    }

    @Test
    void studentizedResidualsMatchRstandard() {
        double[] unweighted = {0.466848931274774, 0.202040849717269, 0.256581503187717, 0.722236852679658,
            -0.215967233349245, -1.083914414973854, 0.352641048180627, -1.327042762149458, -1.507750311965318,
            2.354375500950670};
        double[] weighted = {0.9000333801633713, -1.3786921649083239, -0.0707088487569882, 1.5735592326630314,
            -0.3674178728424357, -1.6371893856283586, 0.5278288246558648, -0.7280261955573828, -0.0339719225647252,
            1.1510441065004728};
        double[] origin = {1.0058423863067183, -0.9139658493162307, -0.0226263113484184, 1.6914881847435426,
            -0.4477267063792126, -1.7641666393778290, 0.4298999156198749, -0.8454012694725475, -0.1597554710357650,
            1.0264117602598672};
        assertArrayEquals(unweighted, LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT)
                .studentizedResiduals(), 1e-11);
        LineFit w = LeastSquares.fitLine(X, Y, Weighting.INVERSE_X2, LineModel.WITH_INTERCEPT);
        assertArrayEquals(weighted, w.studentizedResiduals(), 1e-11);
        assertArrayEquals(origin, LeastSquares.fitLine(X, Y, Weighting.INVERSE_X2, LineModel.THROUGH_ORIGIN)
                .studentizedResiduals(), 1e-11);
        // Property: the leverages of a line with intercept sum to its 2 parameters.
        double sum = 0;
        for (double h : w.leverages()) {
            sum += h;
            assertTrue(h > 0 && h < 1);
        }
        assertEquals(2, sum, 1e-12);
    }
}
