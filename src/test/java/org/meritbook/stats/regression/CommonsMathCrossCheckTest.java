package org.meritbook.stats.regression;

import org.meritbook.stats.Interval;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Cross-checks against Apache Commons Math 3.6.1 (general-purpose library), whose regressions
 * use other algorithms (QR decomposition; one-pass updating sums). The data are an invented
 * calibration whose scatter grows with concentration, as weighting assumes.
 */
class CommonsMathCrossCheckTest {

    private static final double[] X = {0.05, 0.05, 0.1, 0.1, 0.25, 0.25, 0.5, 0.5, 1, 1, 2, 2};
    private static final double[] Y = {52.1, 49.6, 101.9, 98.2, 251.7, 259.4, 507.0, 489.5, 1012.0, 978.0, 2045.0, 1961.0};
    private static final double[] Y_CURVED = {51.8, 50.3, 100.9, 97.6, 247.2, 252.0, 489.5, 478.1, 941.0, 922.4,
        1752.0, 1703.5};
    private static final double TOLERANCE = 1e-10;

    // Source: Apache Commons Math OLSMultipleLinearRegression (QR) on the √w-scaled problem:
    // regress √w·y on [√w, √w·x] without its own intercept column; with weights averaging 1
    // its standard error of regression is s(y/x).
    @ParameterizedTest
    @EnumSource(Weighting.class)
    void weightedWithInterceptMatchesScaledOrdinaryLeastSquares(Weighting weighting) {
        LineFit fit = LeastSquares.fitLine(X, Y, weighting, LineModel.WITH_INTERCEPT);
        OLSMultipleLinearRegression ols = scaledRegression(weighting, true);
        double[] beta = ols.estimateRegressionParameters();
        double[] se = ols.estimateRegressionParametersStandardErrors();
        assertClose(beta[0], fit.intercept());
        assertClose(beta[1], fit.slope());
        assertClose(se[0], fit.interceptSe());
        assertClose(se[1], fit.slopeSe());
        assertClose(ols.estimateRegressionStandardError(), fit.residualSd());
        assertClose(ols.calculateResidualSumOfSquares(), fit.ssResidual());
        assertClose(ols.estimateRegressionParametersVariance()[0][1] * ols.estimateErrorVariance(),
                fit.slopeInterceptCovariance());
    }

    // Source: Apache Commons Math OLSMultipleLinearRegression (QR), √w-scaled, single column √w·x.
    @ParameterizedTest
    @EnumSource(Weighting.class)
    void weightedThroughOriginMatchesScaledOrdinaryLeastSquares(Weighting weighting) {
        LineFit fit = LeastSquares.fitLine(X, Y, weighting, LineModel.THROUGH_ORIGIN);
        OLSMultipleLinearRegression ols = scaledRegression(weighting, false);
        assertClose(ols.estimateRegressionParameters()[0], fit.slope());
        assertClose(ols.estimateRegressionParametersStandardErrors()[0], fit.slopeSe());
        assertClose(ols.estimateRegressionStandardError(), fit.residualSd());
        // With no intercept column Commons Math's R² is uncentred, as is ours through the origin.
        assertClose(ols.calculateRSquared(), fit.rSquared());
    }

    // Source: Apache Commons Math SimpleRegression (with intercept).
    @Test
    void unweightedMatchesSimpleRegression() {
        SimpleRegression simple = new SimpleRegression(true);
        for (int i = 0; i < X.length; i++) {
            simple.addData(X[i], Y[i]);
        }
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        assertClose(simple.getSlope(), fit.slope());
        assertClose(simple.getIntercept(), fit.intercept());
        assertClose(simple.getSlopeStdErr(), fit.slopeSe());
        assertClose(simple.getInterceptStdErr(), fit.interceptSe());
        assertClose(simple.getR(), fit.r());
        assertClose(simple.getRSquare(), fit.rSquared());
        assertClose(simple.getRegressionSumSquares(), fit.ssRegression());
        assertClose(simple.getSumSquaredErrors(), fit.ssResidual());
        assertClose(Math.sqrt(simple.getMeanSquareError()), fit.residualSd());
        Interval slope = fit.slopeInterval(0.95);
        assertClose(simple.getSlopeConfidenceInterval(0.05), (slope.high() - slope.low()) / 2);
    }

    // Source: Apache Commons Math SimpleRegression without intercept.
    @Test
    void unweightedThroughOriginMatchesSimpleRegression() {
        SimpleRegression simple = new SimpleRegression(false);
        for (int i = 0; i < X.length; i++) {
            simple.addData(X[i], Y[i]);
        }
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.THROUGH_ORIGIN);
        assertClose(simple.getSlope(), fit.slope());
        assertClose(simple.getSlopeStdErr(), fit.slopeSe());
        assertClose(simple.getSumSquaredErrors(), fit.ssResidual());
        assertClose(Math.sqrt(simple.getMeanSquareError()), fit.residualSd());
    }

    // Source: Apache Commons Math OLSMultipleLinearRegression (Householder QR on the raw powers of x),
    // √w-scaled: regress √w·y on [√w, √w·x, √w·x²] without its own intercept column; with weights
    // averaging 1 its standard error of regression is s(y/x) and s²·(X'WX)⁻¹ its parameter covariance.
    // The responses bend downwards (detector saturation), as a quadratic calibration is used for.
    @ParameterizedTest
    // 1/s^2 needs replicated levels, which these data lack: LevelVariancesTest checks it on replicates.
    @EnumSource(value = Weighting.class, mode = EnumSource.Mode.EXCLUDE, names = "INVERSE_VARIANCE")
    void weightedQuadraticMatchesScaledOrdinaryLeastSquares(Weighting weighting) {
        QuadraticFit fit = LeastSquares.fitQuadratic(X, Y_CURVED, weighting);
        double[] raw = weighting.rawWeights(X, Y_CURVED);
        double meanRaw = 0;
        for (double w : raw) {
            meanRaw += w / raw.length;
        }
        double[] response = new double[X.length];
        double[][] design = new double[X.length][];
        for (int i = 0; i < X.length; i++) {
            double root = Math.sqrt(raw[i] / meanRaw);
            response[i] = root * Y_CURVED[i];
            design[i] = new double[] {root, root * X[i], root * X[i] * X[i]};
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.setNoIntercept(true);
        ols.newSampleData(response, design);
        double[] beta = ols.estimateRegressionParameters();
        double[] se = ols.estimateRegressionParametersStandardErrors();
        assertClose(beta[0], fit.intercept());
        assertClose(beta[1], fit.linear());
        assertClose(beta[2], fit.quadratic());
        assertClose(se[0], fit.interceptSe());
        assertClose(se[1], fit.linearSe());
        assertClose(se[2], fit.quadraticSe());
        assertClose(ols.estimateRegressionStandardError(), fit.residualSd());
        assertClose(ols.calculateResidualSumOfSquares(), fit.ssResidual());

        double s2 = ols.estimateErrorVariance();
        double[][] v = ols.estimateRegressionParametersVariance();
        double[][] covariance = fit.coefficientCovariance();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                assertEquals(v[i][j] * s2, covariance[i][j], 1e-9 * Math.sqrt(v[i][i] * v[j][j]) * s2);
            }
        }
        // Intervals at a new concentration: g'Vg with g = (1, x0, x0²), and the new point's own variance s²/w0.
        double t = fit.tQuantile(0.95);
        for (double x0 : new double[] {0.07, 0.8, 1.7}) {
            double[] g = {1, x0, x0 * x0};
            double gvg = 0;
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    gvg += g[i] * v[i][j] * g[j] * s2;
                }
            }
            assertClose(t * Math.sqrt(gvg), fit.confidenceHalfWidth(x0, 0.95));
            double basis = "y".equals(weighting.basis()) ? beta[0] + beta[1] * x0 + beta[2] * x0 * x0 : x0;
            double w0 = weighting.rawWeights(new double[] {basis}, new double[] {basis})[0] / meanRaw;
            assertClose(t * Math.sqrt(s2 / w0 + gvg), fit.predictionHalfWidth(x0, 0.95));
        }
    }

    private static OLSMultipleLinearRegression scaledRegression(Weighting weighting, boolean intercept) {
        double[] raw = weighting.rawWeights(X, Y);
        double mean = 0;
        for (double w : raw) {
            mean += w / raw.length;
        }
        double[] response = new double[X.length];
        double[][] design = new double[X.length][];
        for (int i = 0; i < X.length; i++) {
            double root = Math.sqrt(raw[i] / mean);
            response[i] = root * Y[i];
            design[i] = intercept ? new double[] {root, root * X[i]} : new double[] {root * X[i]};
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
        ols.setNoIntercept(true);
        ols.newSampleData(response, design);
        return ols;
    }

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, TOLERANCE * Math.max(1, Math.abs(expected)));
    }
}
