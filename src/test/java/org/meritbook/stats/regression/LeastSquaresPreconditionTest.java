package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Data that cannot support a straight line or a quadratic are refused before any result exists (DESIGN.md,
 * section 7: too few points, zero variance, a non-positive value under 1/x weighting).
 */
class LeastSquaresPreconditionTest {

    private static final double[] X = {1, 2, 3, 4};
    private static final double[] Y = {2.1, 3.9, 6.2, 7.8};

    private static IllegalArgumentException refused(double[] x, double[] y, Weighting w, LineModel model) {
        return assertThrows(IllegalArgumentException.class, () -> LeastSquares.fitLine(x, y, w, model));
    }

    @Test
    void tooFewPoints() {
        refused(new double[] {1, 2}, new double[] {1, 2}, Weighting.NONE, LineModel.WITH_INTERCEPT);
        refused(new double[] {1}, new double[] {1}, Weighting.NONE, LineModel.THROUGH_ORIGIN);
        // Two points are enough through the origin (one residual degree of freedom).
        LineFit two = LeastSquares.fitLine(new double[] {1, 2}, new double[] {1.1, 1.9}, Weighting.NONE, LineModel.THROUGH_ORIGIN);
        assertEquals(1, two.degreesOfFreedom());
    }

    @Test
    void lengthsDiffer() {
        refused(X, new double[] {1, 2, 3}, Weighting.NONE, LineModel.WITH_INTERCEPT);
    }

    @Test
    void notFinite() {
        refused(new double[] {1, 2, Double.NaN, 4}, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        refused(X, new double[] {1, Double.POSITIVE_INFINITY, 3, 4}, Weighting.NONE, LineModel.WITH_INTERCEPT);
        refused(X, new double[] {1, 2, 3, Double.NaN}, Weighting.INVERSE_X, LineModel.THROUGH_ORIGIN);
    }

    @Test
    void zeroVarianceInX() {
        IllegalArgumentException e = refused(new double[] {2, 2, 2}, new double[] {1, 2, 3}, Weighting.INVERSE_Y,
                LineModel.WITH_INTERCEPT);
        assertTrue(e.getMessage().contains("x"), e.getMessage());
        refused(new double[] {0, 0, 0}, new double[] {1, 2, 3}, Weighting.NONE, LineModel.THROUGH_ORIGIN);
    }

    @Test
    void constantResponse() {
        refused(X, new double[] {5, 5, 5, 5}, Weighting.NONE, LineModel.WITH_INTERCEPT);
        refused(X, new double[] {0, 0, 0, 0}, Weighting.NONE, LineModel.THROUGH_ORIGIN);
    }

    @Test
    void nonPositiveBasisUnderWeighting() {
        IllegalArgumentException e = refused(new double[] {0, 1, 2, 3}, Y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        assertTrue(e.getMessage().contains("point 0"), e.getMessage());
        refused(X, new double[] {2, -1, 3, 4}, Weighting.INVERSE_Y2, LineModel.WITH_INTERCEPT);
        // The same data are fine unweighted.
        LeastSquares.fitLine(new double[] {0, 1, 2, 3}, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
    }

    @Test
    void nullArguments() {
        assertThrows(NullPointerException.class, () -> LeastSquares.fitLine(null, Y, Weighting.NONE, LineModel.WITH_INTERCEPT));
        assertThrows(NullPointerException.class, () -> LeastSquares.fitLine(X, Y, null, LineModel.WITH_INTERCEPT));
    }

    @Test
    void levelOutsideTheUnitInterval() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        assertThrows(IllegalArgumentException.class, () -> fit.tQuantile(1));
        assertThrows(IllegalArgumentException.class, () -> fit.slopeInterval(0));
        assertThrows(IllegalArgumentException.class, () -> fit.confidenceHalfWidth(2, Double.NaN));
    }

    @Test
    void noWeightOutsideTheBasisDomain() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        assertThrows(IllegalArgumentException.class, () -> fit.weightAt(0));
        assertThrows(IllegalArgumentException.class, () -> fit.predictionHalfWidth(-1, 0.95));
    }

    @Test
    void zeroSlopeCannotBeInverted() {
        // x symmetric about its mean with a symmetric response: Sxy = 0 exactly.
        LineFit flat = LeastSquares.fitLine(new double[] {1, 2, 3}, new double[] {1, 2, 1}, Weighting.NONE,
                LineModel.WITH_INTERCEPT);
        assertEquals(0, flat.slope());
        assertThrows(IllegalStateException.class, () -> flat.inverse(1.5));
    }

    @Test
    void recordRejectsInconsistentValues() {
        LineFit ok = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        double[] w = {1, 1, 1, 1.5}; // does not average 1
        assertThrows(IllegalArgumentException.class, () -> new LineFit(ok.model(), ok.weighting(), ok.n(),
                ok.degreesOfFreedom(), ok.x(), ok.y(), w, ok.slope(), ok.intercept(), ok.slopeSe(),
                ok.interceptSe(), ok.slopeInterceptCovariance(), ok.r(), ok.rSquared(), ok.adjustedRSquared(),
                ok.residualSd(), ok.weightedMeanX(), ok.weightedMeanY(), ok.sxx(), ok.ssRegression(),
                ok.ssResidual(), ok.fitted(), ok.residuals(), ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new LineFit(ok.model(), ok.weighting(), ok.n(),
                ok.degreesOfFreedom() + 1, ok.x(), ok.y(), ok.weights(), ok.slope(), ok.intercept(), ok.slopeSe(),
                ok.interceptSe(), ok.slopeInterceptCovariance(), ok.r(), ok.rSquared(), ok.adjustedRSquared(),
                ok.residualSd(), ok.weightedMeanX(), ok.weightedMeanY(), ok.sxx(), ok.ssRegression(),
                ok.ssResidual(), ok.fitted(), ok.residuals(), ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new LineFit(ok.model(), ok.weighting(), ok.n(),
                ok.degreesOfFreedom(), ok.x(), ok.y(), ok.weights(), Double.NaN, ok.intercept(), ok.slopeSe(),
                ok.interceptSe(), ok.slopeInterceptCovariance(), ok.r(), ok.rSquared(), ok.adjustedRSquared(),
                ok.residualSd(), ok.weightedMeanX(), ok.weightedMeanY(), ok.sxx(), ok.ssRegression(),
                ok.ssResidual(), ok.fitted(), ok.residuals(), ok.standardizedResiduals()));
    }

    private static IllegalArgumentException refusedQuadratic(double[] x, double[] y, Weighting w) {
        return assertThrows(IllegalArgumentException.class, () -> LeastSquares.fitQuadratic(x, y, w));
    }

    @Test
    void quadraticNeedsFourPointsAndThreeLevels() {
        refusedQuadratic(new double[] {1, 2, 3}, new double[] {1, 4, 9}, Weighting.NONE);
        IllegalArgumentException e = refusedQuadratic(new double[] {1, 1, 2, 2}, new double[] {1.1, 0.9, 2.1, 1.9},
                Weighting.NONE);
        assertTrue(e.getMessage().contains("3 different values"), e.getMessage());
        QuadraticFit four = LeastSquares.fitQuadratic(new double[] {1, 1, 2, 3}, new double[] {1.1, 0.9, 4.2, 8.8},
                Weighting.NONE);
        assertEquals(1, four.degreesOfFreedom());
    }

    @Test
    void quadraticRefusesBadValues() {
        refusedQuadratic(X, new double[] {1, 2, 3}, Weighting.NONE);
        refusedQuadratic(new double[] {1, 2, Double.NaN, 4}, Y, Weighting.NONE);
        refusedQuadratic(X, new double[] {1, Double.NEGATIVE_INFINITY, 3, 4}, Weighting.NONE);
        refusedQuadratic(X, new double[] {5, 5, 5, 5}, Weighting.NONE);
        IllegalArgumentException e = refusedQuadratic(new double[] {0, 1, 2, 3}, Y, Weighting.INVERSE_X2);
        assertTrue(e.getMessage().contains("point 0"), e.getMessage());
        refusedQuadratic(X, new double[] {2, -1, 3, 4}, Weighting.INVERSE_Y);
        // Two of the three levels differ only in the last bit of a double: numerically there are two levels,
        // and the curvature cannot be separated from the line.
        IllegalArgumentException close = refusedQuadratic(new double[] {0, 1, 1 + 2.3e-16, 1}, Y, Weighting.NONE);
        assertTrue(close.getMessage().contains("too close"), close.getMessage());
        assertThrows(NullPointerException.class, () -> LeastSquares.fitQuadratic(X, Y, null));
    }

    @Test
    void quadraticMethodsRefuseBadArguments() {
        QuadraticFit fit = LeastSquares.fitQuadratic(new double[] {1, 2, 3, 4, 5}, new double[] {1.2, 3.8, 9.1, 16.2, 24.8},
                Weighting.INVERSE_X);
        assertThrows(IllegalArgumentException.class, () -> fit.coefficientInterval(3, 0.95));
        assertThrows(IllegalArgumentException.class, () -> fit.coefficientInterval(-1, 0.95));
        assertThrows(IllegalArgumentException.class, () -> fit.coefficientInterval(0, 1));
        assertThrows(IllegalArgumentException.class, () -> fit.tQuantile(0));
        assertThrows(IllegalArgumentException.class, () -> fit.predictionHalfWidth(0, 0.95));
        assertThrows(IllegalArgumentException.class, () -> fit.inverse(Double.NaN, 1, 5));
        assertThrows(IllegalArgumentException.class, () -> fit.inverse(9, 1, 1));
    }

    @Test
    void quadraticRecordRejectsInconsistentValues() {
        QuadraticFit ok = LeastSquares.fitQuadratic(new double[] {1, 2, 3, 4, 5}, new double[] {1.2, 3.8, 9.1, 16.2, 24.8},
                Weighting.NONE);
        assertThrows(IllegalArgumentException.class, () -> new QuadraticFit(ok.weighting(), ok.n(), ok.degreesOfFreedom() + 1,
                ok.x(), ok.y(), ok.weights(), ok.intercept(), ok.linear(), ok.quadratic(), ok.interceptSe(), ok.linearSe(),
                ok.quadraticSe(), ok.residualSd(), ok.ssResidual(), ok.rSquared(), ok.fitted(), ok.residuals(),
                ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new QuadraticFit(ok.weighting(), ok.n(), ok.degreesOfFreedom(),
                ok.x(), ok.y(), new double[] {1, 1, 1, 1, 2}, ok.intercept(), ok.linear(), ok.quadratic(), ok.interceptSe(),
                ok.linearSe(), ok.quadraticSe(), ok.residualSd(), ok.ssResidual(), ok.rSquared(), ok.fitted(), ok.residuals(),
                ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new QuadraticFit(ok.weighting(), ok.n(), ok.degreesOfFreedom(),
                ok.x(), ok.y(), ok.weights(), ok.intercept(), Double.NaN, ok.quadratic(), ok.interceptSe(), ok.linearSe(),
                ok.quadraticSe(), ok.residualSd(), ok.ssResidual(), ok.rSquared(), ok.fitted(), ok.residuals(),
                ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new QuadraticFit(ok.weighting(), ok.n(), ok.degreesOfFreedom(),
                ok.x(), ok.y(), ok.weights(), ok.intercept(), ok.linear(), ok.quadratic(), ok.interceptSe(), -1,
                ok.quadraticSe(), ok.residualSd(), ok.ssResidual(), ok.rSquared(), ok.fitted(), ok.residuals(),
                ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new QuadraticFit(ok.weighting(), ok.n(), ok.degreesOfFreedom(),
                ok.x(), ok.y(), ok.weights(), ok.intercept(), ok.linear(), ok.quadratic(), ok.interceptSe(), ok.linearSe(),
                ok.quadraticSe(), ok.residualSd(), ok.ssResidual(), 1.5, ok.fitted(), ok.residuals(),
                ok.standardizedResiduals()));
        assertThrows(IllegalArgumentException.class, () -> new QuadraticFit(ok.weighting(), ok.n(), ok.degreesOfFreedom(),
                new double[] {1, 1, 2, 2, 2}, ok.y(), ok.weights(), ok.intercept(), ok.linear(), ok.quadratic(), ok.interceptSe(),
                ok.linearSe(), ok.quadraticSe(), ok.residualSd(), ok.ssResidual(), ok.rSquared(), ok.fitted(), ok.residuals(),
                ok.standardizedResiduals()));
    }
}
