package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Mandel's fitting test, linear against quadratic (DIN 38402-51, ISO 8466-1). */
class MandelTestTest {

    private static MandelTest mandel(double[] x, double[] y, Weighting w) {
        return MandelTest.of(LeastSquares.fitLine(x, y, w, LineModel.WITH_INTERCEPT), LeastSquares.fitQuadratic(x, y, w));
    }

    // Source: hand arithmetic. x = 1…5, y = 1, 2, 3, 4, 6: x̄ = 3, ȳ = 3.2, Sxx = 10, Sxy = 12, Syy = 14.8, so
    // SSres,lin = 14.8 − 12²/10 = 0.4. The orthogonal quadratic contrast (2, −1, −2, −1, 2) has Σc² = 14 and
    // Σc·y = 2, so the quadratic term removes 2²/14 = 2/7: SSres,quad = 0.4 − 2/7 = 4/35, s² = 2/35 (2 df),
    // F = (2/7)/(2/35) = 5. F(1, 2) is the square of Student's t with 2 df, whose two-sided tail is
    // 1 − t/√(t² + 2); at t = √5: p = 1 − √(5/7).
    @Test
    void byHand() {
        MandelTest test = mandel(new double[] {1, 2, 3, 4, 5}, new double[] {1, 2, 3, 4, 6}, Weighting.NONE);
        assertEquals(0.4, test.ssResidualLinear(), 1e-14);
        assertEquals(4.0 / 35, test.ssResidualQuadratic(), 1e-14);
        assertEquals(Math.sqrt(2.0 / 35), test.residualSdQuadratic(), 1e-14);
        assertEquals(1, test.df1());
        assertEquals(2, test.df2());
        assertEquals(5, test.f(), 1e-12);
        assertEquals(1 - Math.sqrt(5.0 / 7), test.p(), 1e-12);
    }

    // Source: Apache Commons Math OLSMultipleLinearRegression (QR) on the √w-scaled problems, line and
    // quadratic; F = (SSres,lin − SSres,quad)/(SSres,quad/(n − 3)), p from Commons Math FDistribution(1, n − 3).
    @ParameterizedTest
    @EnumSource(Weighting.class)
    void weightedAgreesWithTwoGeneralPurposeFits(Weighting weighting) {
        double[] x = {0.5, 0.5, 1, 1, 2, 2, 4, 4, 8, 8};
        double[] y = {10.3, 9.8, 19.9, 20.6, 39.1, 40.4, 76.2, 78.0, 146.0, 149.5};
        MandelTest test = mandel(x, y, weighting);
        double ssLine = scaledResidualSs(x, y, weighting, 2);
        double ssQuad = scaledResidualSs(x, y, weighting, 3);
        double f = (ssLine - ssQuad) / (ssQuad / 7);
        assertEquals(ssLine, test.ssResidualLinear(), 1e-10 * ssLine);
        assertEquals(ssQuad, test.ssResidualQuadratic(), 1e-10 * ssQuad);
        assertEquals(f, test.f(), 1e-8 * f);
        assertEquals(1 - new FDistribution(1, 7).cumulativeProbability(f), test.p(), 1e-9);
    }

    // Source: property of the test — data on an exact quadratic with scatter 100 times smaller than the
    // curvature's effect give an F far above the 99 % quantile F(1, 5) ≈ 16.3, and a tiny p.
    @Test
    void curvedDataGiveALargeF() {
        double[] x = {1, 2, 3, 4, 5, 6, 7, 8};
        double[] noise = {0.01, -0.02, 0.015, 0.0, -0.01, 0.02, -0.015, 0.005};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 2 + 10 * x[i] - 0.3 * x[i] * x[i] + noise[i];
        }
        MandelTest test = mandel(x, y, Weighting.NONE);
        assertTrue(test.f() > 1e4, () -> "F = " + test.f());
        assertTrue(test.p() < 1e-6, () -> "p = " + test.p());
    }

    // Source: property of the test — a line plus scatter orthogonal to 1, x and x² (the cubic contrast
    // −5, 7, 4, −4, −7, 5 for x = 1…6: Σc = Σc·x = Σc·x² = 0) leaves the quadratic term nothing to explain:
    // both fits have the same residuals, so F = 0 up to rounding and p = 1.
    @Test
    void linearDataGiveAnFOfZero() {
        double[] x = {1, 2, 3, 4, 5, 6};
        double[] cubic = {-5, 7, 4, -4, -7, 5};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = 0.5 + 3 * x[i] + 0.01 * cubic[i];
        }
        MandelTest test = mandel(x, y, Weighting.NONE);
        assertEquals(0, test.f(), 1e-9);
        assertEquals(1, test.p(), 1e-6);
        assertEquals(test.ssResidualLinear(), test.ssResidualQuadratic(), 1e-12);
    }

    @Test
    void preconditions() {
        double[] x = {1, 2, 3, 4, 5};
        double[] y = {1, 2, 3, 4, 6};
        QuadraticFit quadratic = LeastSquares.fitQuadratic(x, y, Weighting.NONE);
        // Through the origin is not the line Mandel's test compares.
        assertThrows(IllegalArgumentException.class, () -> MandelTest.of(
                LeastSquares.fitLine(x, y, Weighting.NONE, LineModel.THROUGH_ORIGIN), quadratic));
        // Different data or weighting.
        assertThrows(IllegalArgumentException.class, () -> MandelTest.of(
                LeastSquares.fitLine(x, new double[] {1, 2, 3, 4, 7}, Weighting.NONE, LineModel.WITH_INTERCEPT), quadratic));
        assertThrows(IllegalArgumentException.class, () -> MandelTest.of(
                LeastSquares.fitLine(x, y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT), quadratic));
        // Exact data: both residual sums are rounding errors, F would be their ratio.
        double[] exact = {3, 5, 7, 9, 11};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> mandel(x, exact, Weighting.NONE));
        assertTrue(e.getMessage().contains("rounding"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new MandelTest(0.4, 4.0 / 35, 0.24, 2, 2, 5, 0.15));
        assertThrows(IllegalArgumentException.class, () -> new MandelTest(0.4, 4.0 / 35, 0, 1, 2, 5, 0.15));
        assertThrows(IllegalArgumentException.class, () -> new MandelTest(0.4, 4.0 / 35, 0.24, 1, 2, Double.NaN, 0.15));
    }

    private static double scaledResidualSs(double[] x, double[] y, Weighting weighting, int columns) {
        double[] raw = weighting.rawWeights(x, y);
        double mean = 0;
        for (double w : raw) {
            mean += w / raw.length;
        }
        double[] response = new double[x.length];
        double[][] design = new double[x.length][columns];
        for (int i = 0; i < x.length; i++) {
            double root = Math.sqrt(raw[i] / mean);
            response[i] = root * y[i];
            for (int k = 0; k < columns; k++) {
                design[i][k] = root * Math.pow(x[i], k);
            }
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.setNoIntercept(true);
        ols.newSampleData(response, design);
        return ols.calculateResidualSumOfSquares();
    }
}
