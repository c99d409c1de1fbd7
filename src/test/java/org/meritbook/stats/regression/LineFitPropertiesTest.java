package org.meritbook.stats.regression;

import org.meritbook.stats.Interval;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Properties a least-squares line must have whatever the data; each says where it comes from. */
class LineFitPropertiesTest {

    private static final double[] X = {0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10};
    private static final double[] Y = {0.53, 0.98, 2.07, 5.1, 9.7, 20.6, 49.1, 102.3};

    private static LineFit fit(Weighting weighting, LineModel model) {
        return LeastSquares.fitLine(X, Y, weighting, model);
    }

    // Source: the estimator b = (X'WX)⁻¹X'Wy is unchanged when W is multiplied by a constant
    // (Draper & Smith, Applied Regression Analysis, ch. 9); the SEs and s are unchanged because
    // the weights are normalised to average 1 (common practice, no source).
    @ParameterizedTest
    // 1/s^2 needs replicated levels, which these data lack: LevelVariancesTest checks it on replicates.
    @EnumSource(value = Weighting.class, mode = EnumSource.Mode.EXCLUDE, names = "INVERSE_VARIANCE")
    void scalingTheWeightsChangesNothing(Weighting weighting) {
        for (LineModel model : LineModel.values()) {
            LineFit reference = fit(weighting, model);
            for (double factor : new double[] {1e-6, 3.7, 1e6}) {
                double[] raw = weighting.rawWeights(X, Y);
                for (int i = 0; i < raw.length; i++) {
                    raw[i] *= factor;
                }
                LineFit scaled = LeastSquares.fit(X, Y, raw, weighting, model);
                assertRelative(reference.slope(), scaled.slope(), 1e-13);
                // The intercept is a difference ȳw − b·x̄w: its error scales with y, not with itself.
                assertEquals(reference.intercept(), scaled.intercept(), 1e-13 * Y[Y.length - 1]);
                assertRelative(reference.slopeSe(), scaled.slopeSe(), 1e-13);
                assertRelative(reference.interceptSe(), scaled.interceptSe(), 1e-13);
                assertRelative(reference.residualSd(), scaled.residualSd(), 1e-13);
                assertArrayEquals(reference.weights(), scaled.weights(), 1e-13);
            }
        }
    }

    // Source: algebra of least squares (x → 1000·x rescales b by 1/1000 and leaves a, s, r alone);
    // under 1/x weighting the raw weights change by 1/1000, which normalisation must absorb
    // (common practice, no source).
    @Test
    void changingConcentrationUnitsRescalesOnlyTheSlope() {
        double[] xMicro = new double[X.length];
        for (int i = 0; i < X.length; i++) {
            xMicro[i] = X[i] * 1000;
        }
        LineFit milli = fit(Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        LineFit micro = LeastSquares.fitLine(xMicro, Y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        assertRelative(milli.slope() / 1000, micro.slope(), 1e-12);
        assertRelative(milli.slopeSe() / 1000, micro.slopeSe(), 1e-12);
        assertRelative(milli.intercept(), micro.intercept(), 1e-10);
        assertRelative(milli.interceptSe(), micro.interceptSe(), 1e-12);
        assertRelative(milli.residualSd(), micro.residualSd(), 1e-12);
        assertRelative(milli.r(), micro.r(), 1e-12);
    }

    // Source: the normal equations Σw·e = 0 (with intercept) and Σw·x·e = 0 (Draper & Smith, ch. 1, 9).
    @ParameterizedTest
    // 1/s^2 needs replicated levels, which these data lack: LevelVariancesTest checks it on replicates.
    @EnumSource(value = Weighting.class, mode = EnumSource.Mode.EXCLUDE, names = "INVERSE_VARIANCE")
    void weightedResidualsSatisfyTheNormalEquations(Weighting weighting) {
        for (LineModel model : LineModel.values()) {
            LineFit fit = fit(weighting, model);
            double[] w = fit.weights();
            double[] e = fit.residuals();
            double sumWe = 0;
            double sumWxe = 0;
            double scale = 0;
            for (int i = 0; i < e.length; i++) {
                sumWe += w[i] * e[i];
                sumWxe += w[i] * X[i] * e[i];
                scale += w[i] * X[i] * Math.abs(e[i]);
            }
            if (model == LineModel.WITH_INTERCEPT) {
                assertEquals(0, sumWe, 1e-12 * scale);
            }
            assertEquals(0, sumWxe, 1e-12 * scale);
        }
    }

    // Source: definitions: Σ(e·√w/s)² = Σw·e²/s² = df, and y = fitted + residual (common practice, no source).
    @ParameterizedTest
    // 1/s^2 needs replicated levels, which these data lack: LevelVariancesTest checks it on replicates.
    @EnumSource(value = Weighting.class, mode = EnumSource.Mode.EXCLUDE, names = "INVERSE_VARIANCE")
    void standardizedResidualsSquareToTheDegreesOfFreedom(Weighting weighting) {
        LineFit fit = fit(weighting, LineModel.WITH_INTERCEPT);
        double sum = 0;
        for (double z : fit.standardizedResiduals()) {
            sum += z * z;
        }
        assertEquals(fit.degreesOfFreedom(), sum, 1e-10);
        for (int i = 0; i < X.length; i++) {
            assertEquals(Y[i], fit.fitted()[i] + fit.residuals()[i], 1e-12 * Math.abs(Y[i]));
        }
    }

    // Source: R² = SSreg/(SSreg + SSres) and adjusted R² = 1 − MSres/MStotal (Draper & Smith, ch. 1).
    @Test
    void rSquaredAndAdjustedRSquaredFollowTheirDefinitions() {
        LineFit fit = fit(Weighting.INVERSE_X2, LineModel.WITH_INTERCEPT);
        double total = fit.ssRegression() + fit.ssResidual();
        assertRelative(fit.ssRegression() / total, fit.rSquared(), 1e-12);
        double adjusted = 1 - (fit.ssResidual() / fit.degreesOfFreedom()) / (total / (fit.n() - 1));
        assertRelative(adjusted, fit.adjustedRSquared(), 1e-12);
        assertTrue(fit.r() > 0);
    }

    // Source: inverse prediction x0 = (y0 − a)/b undoes a + b·x (common practice, no source).
    @ParameterizedTest
    @EnumSource(LineModel.class)
    void inverseUndoesPredict(LineModel model) {
        LineFit fit = fit(Weighting.INVERSE_Y, model);
        for (double x0 : new double[] {0, 0.03, 1.7, 10, 250}) {
            assertEquals(x0, fit.inverse(fit.predict(x0)), 1e-12 * Math.max(1, x0));
        }
    }

    // Source: Var(a + b·x0) = s²(1/Σw + (x0 − x̄w)²/Sxx) is least at x0 = x̄w, where it is s²/Σw
    // (Draper & Smith, ch. 1, 9).
    @ParameterizedTest
    // 1/s^2 needs replicated levels, which these data lack: LevelVariancesTest checks it on replicates.
    @EnumSource(value = Weighting.class, mode = EnumSource.Mode.EXCLUDE, names = "INVERSE_VARIANCE")
    void confidenceBandIsNarrowestAtTheWeightedMean(Weighting weighting) {
        LineFit fit = fit(weighting, LineModel.WITH_INTERCEPT);
        double centre = fit.weightedMeanX();
        double narrowest = fit.confidenceHalfWidth(centre, 0.95);
        assertRelative(fit.tQuantile(0.95) * fit.residualSd() / Math.sqrt(fit.n()), narrowest, 1e-12);
        for (double step : new double[] {-0.5, -0.01, 0.01, 0.5, 5}) {
            assertTrue(fit.confidenceHalfWidth(centre + step, 0.95) > narrowest, "at x̄w + " + step);
        }
    }

    // Source: a new observation adds its own variance s²/w0 to that of the mean response (Draper & Smith, ch. 1).
    @ParameterizedTest
    // 1/s^2 needs replicated levels, which these data lack: LevelVariancesTest checks it on replicates.
    @EnumSource(value = Weighting.class, mode = EnumSource.Mode.EXCLUDE, names = "INVERSE_VARIANCE")
    void predictionBandIsWiderThanConfidenceBand(Weighting weighting) {
        for (LineModel model : LineModel.values()) {
            LineFit fit = fit(weighting, model);
            for (double x0 : new double[] {0.05, 0.7, 3, 10}) {
                double confidence = fit.confidenceHalfWidth(x0, 0.95);
                double prediction = fit.predictionHalfWidth(x0, 0.95);
                assertTrue(prediction > confidence, x0 + ": " + prediction + " <= " + confidence);
                double t = fit.tQuantile(0.95) * fit.residualSd();
                double newPoint = prediction * prediction - confidence * confidence;
                assertRelative(t * t / fit.weightAt(x0), newPoint, 1e-9);
            }
        }
    }

    // Source: Student t table, t(0.975, 5) = 2.570581836 (Apache Commons Math TDistribution; any
    // statistical table prints 2.571).
    @Test
    void tQuantileForFiveDegreesOfFreedom() {
        LineFit fit = LeastSquares.fitLine(new double[] {1, 2, 3, 4, 5, 6, 7},
                new double[] {1.1, 1.9, 3.2, 3.9, 5.1, 6.0, 6.8}, Weighting.NONE, LineModel.WITH_INTERCEPT);
        assertEquals(5, fit.degreesOfFreedom());
        assertEquals(2.570581836, fit.tQuantile(0.95), 1e-9);
        Interval slope = fit.slopeInterval(0.95);
        assertEquals(fit.slope(), (slope.low() + slope.high()) / 2, 1e-15);
        assertRelative(2.570581836 * fit.slopeSe(), (slope.high() - slope.low()) / 2, 1e-9);
        assertEquals(0.95, slope.level());
    }

    // Source: definitions: a line through the origin has no estimated intercept, and its mean response at 0 is exact.
    @Test
    void throughOriginHasAFixedIntercept() {
        LineFit fit = fit(Weighting.INVERSE_X, LineModel.THROUGH_ORIGIN);
        assertEquals(new Interval(0, 0, 0.95), fit.interceptInterval(0.95));
        assertEquals(0, fit.confidenceHalfWidth(0, 0.95));
        assertEquals(fit.n() - 1, fit.degreesOfFreedom());
    }

    // Source: definition of the normalised weight (raw weight over the mean raw weight; common practice, no source).
    @Test
    void weightAtANewPointUsesTheCalibrationScale() {
        LineFit byX = fit(Weighting.INVERSE_X2, LineModel.WITH_INTERCEPT);
        for (int i = 0; i < X.length; i++) {
            assertRelative(byX.weights()[i], byX.weightAt(X[i]), 1e-14);
        }
        LineFit byY = fit(Weighting.INVERSE_Y, LineModel.WITH_INTERCEPT);
        double meanRaw = 0;
        for (double v : Y) {
            meanRaw += 1 / v / Y.length;
        }
        assertRelative(1 / byY.predict(3) / meanRaw, byY.weightAt(3), 1e-14);
        assertEquals(1, fit(Weighting.NONE, LineModel.WITH_INTERCEPT).weightAt(-4));
    }

    // Source: the design requires results to be immutable (STYLE: self-checking records).
    @Test
    void arraysAreCopiedInAndOut() {
        double[] x = X.clone();
        double[] y = Y.clone();
        LineFit fit = LeastSquares.fitLine(x, y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        LineFit twin = LeastSquares.fitLine(X, Y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        x[0] = 99;
        y[0] = 99;
        fit.x()[1] = 99;
        fit.weights()[1] = 99;
        fit.residuals()[1] = 99;
        assertArrayEquals(X, fit.x());
        assertArrayEquals(Y, fit.y());
        assertEquals(twin, fit);
        assertEquals(twin.hashCode(), fit.hashCode());
        assertNotEquals(fit(Weighting.NONE, LineModel.WITH_INTERCEPT), fit);
    }

    // Source: the notebook's option values (DESIGN.md, section 3).
    @Test
    void weightingNotation() {
        assertEquals(Weighting.INVERSE_X2, Weighting.fromNotation("1/x^2").orElseThrow());
        assertEquals(Weighting.INVERSE_X2, Weighting.fromNotation("1/x²").orElseThrow());
        assertEquals(Weighting.INVERSE_Y2, Weighting.fromNotation(" 1/Y² ").orElseThrow());
        assertEquals(Weighting.NONE, Weighting.fromNotation("none").orElseThrow());
        assertTrue(Weighting.fromNotation("1/x^3").isEmpty());
        assertTrue(Weighting.fromNotation(null).isEmpty());
        for (Weighting w : Weighting.values()) {
            assertEquals(w, Weighting.fromNotation(w.notation()).orElseThrow());
        }
        assertEquals("1/x", Weighting.INVERSE_X.notation());
        assertEquals("y", Weighting.INVERSE_Y2.basis());
        assertEquals(null, Weighting.NONE.basis());
    }

    // Source: definition (index of the first x or y that is not positive; -1 when none or unweighted).
    @Test
    void firstNonPositiveBasis() {
        double[] x = {1, 2, 0, -1};
        double[] y = {3, -2, 1, 1};
        assertEquals(2, Weighting.INVERSE_X.firstNonPositiveBasis(x, y));
        assertEquals(1, Weighting.INVERSE_Y2.firstNonPositiveBasis(x, y));
        assertEquals(-1, Weighting.NONE.firstNonPositiveBasis(x, y));
        assertEquals(-1, Weighting.INVERSE_X2.firstNonPositiveBasis(new double[] {1, 2}, new double[] {-1, -2}));
        assertArrayEquals(new double[] {0.25, 1.0 / 9}, Weighting.INVERSE_Y2.rawWeights(new double[] {-1, -1}, new double[] {2, 3}));
    }

    private static void assertRelative(double expected, double actual, double tolerance) {
        assertEquals(expected, actual, tolerance * Math.max(Math.abs(expected), Double.MIN_NORMAL));
    }
}
