package org.meritbook.stats.regression;

import org.meritbook.stats.Interval;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.meritbook.qualification.NistDataset;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Properties a least-squares quadratic must have; each says where it comes from. */
class QuadraticFitTest {

    private static final double[] X = {0, 1, 2, 3, 4, 5};
    /** y = 1 + 2x + 0.5x², exact in binary. */
    private static final double[] Y_EXACT = {1, 3.5, 7, 11.5, 17, 23.5};
    private static final double[] X_CAL = {0.1, 0.1, 0.5, 0.5, 1, 1, 2, 2, 5, 5, 10, 10};
    private static final double[] Y_CAL = {1.03, 0.98, 5.02, 4.91, 9.85, 10.1, 19.4, 19.9, 46.8, 47.9, 90.2, 88.4};

    // Source: algebra of least squares — data lying exactly on a quadratic are reproduced exactly
    // (zero residuals), whatever the weighting; predict and slopeAt follow by differentiation:
    // y(2.5) = 1 + 5 + 3.125 = 9.125, y'(2.5) = 2 + 2.5 = 4.5.
    @ParameterizedTest
    @EnumSource(value = Weighting.class, names = {"NONE", "INVERSE_Y", "INVERSE_Y2"})
    void reproducesAnExactQuadratic(Weighting weighting) {
        QuadraticFit fit = LeastSquares.fitQuadratic(X, Y_EXACT, weighting);
        assertEquals(1, fit.intercept(), 1e-12);
        assertEquals(2, fit.linear(), 1e-12);
        assertEquals(0.5, fit.quadratic(), 1e-13);
        assertEquals(0, fit.ssResidual(), 1e-24);
        assertEquals(1, fit.rSquared(), 1e-15);
        assertEquals(9.125, fit.predict(2.5), 1e-12);
        assertEquals(4.5, fit.slopeAt(2.5), 1e-12);
        assertEquals(3, fit.degreesOfFreedom());
    }

    // Source: hand arithmetic on y = 1 + 2x + 0.5x²: y = 9.125 at x = 2.5 (the other root, −6.5, lies
    // outside); y = 24.92 gives x = −2 + √(4 + 2·23.92) = −2 + √51.84 = 5.2 (inside the 10 % margin above 5);
    // y = 27.5 gives x = −2 + √(4 + 53) = 5.55, beyond 5.5; y = 0 needs x < 0 − 0.5.
    @Test
    void backCalculatesTheRootInsideTheRange() {
        QuadraticFit fit = LeastSquares.fitQuadratic(X, Y_EXACT, Weighting.NONE);
        assertEquals(2.5, fit.inverse(9.125, 0, 5), 1e-12);
        assertEquals(5.2, fit.inverse(24.92, 0, 5), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> fit.inverse(27.5, 0, 5));
        assertThrows(IllegalArgumentException.class, () -> fit.inverse(-1, 0, 5));
        assertThrows(IllegalArgumentException.class, () -> fit.inverse(5, 5, 0));
    }

    // Source: hand arithmetic on y = (x − 2)² + 1 = 5 − 4x + x²: y = 2 at x = 1 and x = 3 (both in
    // [0, 4], so ambiguous), at x = 1 only in [0, 1.5]; y = 0.5 is below the vertex (no root).
    @Test
    void refusesAmbiguousOrUnreachableResponses() {
        double[] x = {0, 1, 2, 3, 4};
        double[] y = {5, 2, 1, 2, 5};
        QuadraticFit fit = LeastSquares.fitQuadratic(x, y, Weighting.NONE);
        IllegalArgumentException two = assertThrows(IllegalArgumentException.class, () -> fit.inverse(2, 0, 4));
        assertTrue(two.getMessage().contains("two"), two.getMessage());
        assertEquals(1, fit.inverse(2, 0, 1.5), 1e-12);
        assertEquals(3, fit.inverse(2, 2.5, 4), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> fit.inverse(0.5, 0, 4));
    }

    // Source: definition — inverse undoes predict. On NIST StRD Pontius.dat the curvature is tiny (c/b ≈ −4·10⁻⁹),
    // so the second root of the quadratic lies near 2·10⁸, far outside the calibrated 1.5·10⁵ … 3·10⁶, and the
    // cancellation-free root formula must still return the near root to full precision.
    @Test
    void inverseUndoesPredictOnAnAlmostStraightCurve() {
        NistDataset nist = NistDataset.load("Pontius");
        QuadraticFit fit = LeastSquares.fitQuadratic(nist.x(), nist.y(), Weighting.NONE);
        for (double x0 : new double[] {150000, 987654.3, 3000000}) {
            assertEquals(x0, fit.inverse(fit.predict(x0), 150000, 3000000), 1e-9 * x0);
        }
    }

    // Source: the estimator (X'WX)⁻¹X'Wy is unchanged when W is multiplied by a constant
    // (Draper & Smith, ch. 9); SEs and s are unchanged because weights are normalised to average 1.
    @ParameterizedTest
    @EnumSource(Weighting.class)
    void scalingTheWeightsChangesNothing(Weighting weighting) {
        QuadraticFit reference = LeastSquares.fitQuadratic(X_CAL, Y_CAL, weighting);
        for (double factor : new double[] {1e-8, 7.3, 1e8}) {
            double[] raw = weighting.rawWeights(X_CAL, Y_CAL);
            for (int i = 0; i < raw.length; i++) {
                raw[i] *= factor;
            }
            QuadraticFit scaled = LeastSquares.fitQuadratic(X_CAL, Y_CAL, raw, weighting);
            // The intercept's rounding error scales with y, not with itself.
            assertEquals(reference.intercept(), scaled.intercept(), 1e-12 * Y_CAL[Y_CAL.length - 1]);
            assertEquals(reference.linear(), scaled.linear(), 1e-12 * Math.abs(reference.linear()));
            assertEquals(reference.quadratic(), scaled.quadratic(), 1e-11 * Math.abs(reference.quadratic()));
            assertEquals(reference.residualSd(), scaled.residualSd(), 1e-12 * reference.residualSd());
            assertEquals(reference.quadraticSe(), scaled.quadraticSe(), 1e-12 * reference.quadraticSe());
            assertArrayEquals(reference.weights(), scaled.weights(), 1e-13);
        }
    }

    // Source: definition of the standardized residual e·√w/s with s² = Σw·e²/(n − 3): their squares sum
    // to n − 3; and the weighted residuals are orthogonal to each column of the design (normal equations).
    @ParameterizedTest
    @EnumSource(Weighting.class)
    void residualsSatisfyTheNormalEquations(Weighting weighting) {
        QuadraticFit fit = LeastSquares.fitQuadratic(X_CAL, Y_CAL, weighting);
        double sumSquares = 0;
        for (double r : fit.standardizedResiduals()) {
            sumSquares += r * r;
        }
        assertEquals(fit.n() - 3, sumSquares, 1e-10);
        double[] e = fit.residuals();
        double[] w = fit.weights();
        double[] yHat = fit.fitted();
        for (int power = 0; power <= 2; power++) {
            double dot = 0;
            double scale = 0;
            for (int i = 0; i < e.length; i++) {
                double xp = Math.pow(X_CAL[i], power);
                dot += w[i] * e[i] * xp;
                scale += w[i] * Math.abs(Y_CAL[i]) * xp;
                assertEquals(Y_CAL[i], yHat[i] + e[i], 1e-12 * Math.abs(Y_CAL[i]));
            }
            assertEquals(0, dot, 1e-13 * scale, "X'We for power " + power);
        }
    }

    // Source: definitions — a coefficient interval is β ± t·SE; at a calibration point the prediction
    // interval exceeds the confidence interval by the new observation's variance s²/w0.
    @Test
    void intervalsAreConsistentWithTheStandardErrors() {
        QuadraticFit fit = LeastSquares.fitQuadratic(X_CAL, Y_CAL, Weighting.INVERSE_X);
        double t = fit.tQuantile(0.95);
        Interval c = fit.coefficientInterval(2, 0.95);
        assertEquals(fit.quadratic() - t * fit.quadraticSe(), c.low(), 1e-15);
        assertEquals(fit.quadratic() + t * fit.quadraticSe(), c.high(), 1e-15);
        double conf = fit.confidenceHalfWidth(2, 0.95);
        double pred = fit.predictionHalfWidth(2, 0.95);
        double s = fit.residualSd();
        assertEquals(pred * pred - conf * conf, t * t * s * s / fit.weightAt(2), 1e-9 * pred * pred);
        // At x0 = 0 the mean response is the intercept, so its half-width is t·SE(a).
        assertEquals(t * fit.interceptSe(), fit.confidenceHalfWidth(0, 0.95), 1e-12 * fit.interceptSe());
    }

    // Source: records copy arrays in and out (STYLE.md, immutable results); adjusted R² =
    // 1 − (1 − R²)(n − 1)/(n − 3) is 1 when R² is 1 (hand arithmetic).
    @Test
    void recordCopiesItsArrays() {
        QuadraticFit fit = LeastSquares.fitQuadratic(X, Y_EXACT, Weighting.NONE);
        fit.x()[0] = 99;
        fit.residuals()[0] = 99;
        assertEquals(0, fit.x()[0]);
        assertEquals(0, fit.residuals()[0], 1e-12);
        assertEquals(1, fit.adjustedRSquared(), 1e-14);
    }
}
