package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.meritbook.stats.UnusableDataException;
import org.junit.jupiter.api.Test;

/** The replicate SDs behind weighting 1/s^2, and the SD given to a point between the levels. */
class LevelVariancesTest {
    private static final double[] X = {1, 1, 1, 4, 4, 4, 10, 10};
    private static final double[] Y = {2.0, 2.2, 2.4, 8.0, 8.6, 9.2, 20.0, 21.0};

    @Test
    void eachPointIsWeightedByTheInverseVarianceOfItsLevel() {
        // Sample SDs by hand: level 1: 0.2; level 4: 0.6; level 10: √0.5 (common practice, no source).
        LevelVariances v = LevelVariances.of(X, Y);
        assertEquals(0.2, v.levels().get(0).sd(), 1e-12);
        assertEquals(0.6, v.levels().get(1).sd(), 1e-12);
        assertEquals(Math.sqrt(0.5), v.levels().get(2).sd(), 1e-12);
        double[] w = Weighting.INVERSE_VARIANCE.rawWeights(X, Y);
        assertEquals(25, w[0], 1e-9);
        assertEquals(1 / 0.36, w[4], 1e-9);
        assertEquals(2, w[7], 1e-9);
    }

    @Test
    void betweenLevelsTheSdIsInterpolatedLinearlyAndHeldBeyondTheEnds() {
        LevelVariances v = LevelVariances.of(X, Y);
        assertEquals(0.2, v.sdAt(1), 1e-12);
        assertEquals(0.4, v.sdAt(2.5), 1e-12, "half-way between 0.2 at x = 1 and 0.6 at x = 4");
        assertEquals(0.6 + (Math.sqrt(0.5) - 0.6) / 6, v.sdAt(5), 1e-12);
        assertEquals(0.2, v.sdAt(0), 1e-12, "below the lowest level: its SD");
        assertEquals(Math.sqrt(0.5), v.sdAt(50), 1e-12, "above the highest level: its SD");
    }

    @Test
    void theWeightAtALevelIsTheWeightOfItsStandards() {
        // Consistency of the rule: a new point at a calibration level gets that level's normalised weight.
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.INVERSE_VARIANCE, LineModel.WITH_INTERCEPT);
        double[] w = fit.weights();
        assertEquals(w[0], fit.weightAt(1), 1e-12);
        assertEquals(w[3], fit.weightAt(4), 1e-12);
        assertEquals(w[6], fit.weightAt(10), 1e-12);
        double sum = 0;
        for (double wi : w) {
            sum += wi;
        }
        assertEquals(X.length, sum, 1e-12, "scaled to average 1 like every weighting");
    }

    // The properties LineFitPropertiesTest checks for the other weightings, on replicated data: the normal
    // equations Σw·e = 0 and Σw·x·e = 0, Σz² = df, and invariance to a constant factor on the raw weights
    // (Draper & Smith, Applied Regression Analysis, ch. 1 and 9).
    @Test
    void theWeightedFitKeepsTheLeastSquaresProperties() {
        for (LineModel model : LineModel.values()) {
            LineFit fit = LeastSquares.fitLine(X, Y, Weighting.INVERSE_VARIANCE, model);
            double[] w = fit.weights();
            double[] e = fit.residuals();
            double sumWe = 0;
            double sumWxe = 0;
            double sumZ2 = 0;
            for (int i = 0; i < X.length; i++) {
                sumWe += w[i] * e[i];
                sumWxe += w[i] * X[i] * e[i];
                sumZ2 += fit.standardizedResiduals()[i] * fit.standardizedResiduals()[i];
            }
            if (model == LineModel.WITH_INTERCEPT) {
                assertEquals(0, sumWe, 1e-12);
            }
            assertEquals(0, sumWxe, 1e-11);
            assertEquals(fit.degreesOfFreedom(), sumZ2, 1e-10);
            double[] raw = Weighting.INVERSE_VARIANCE.rawWeights(X, Y);
            for (int i = 0; i < raw.length; i++) {
                raw[i] *= 1e6;
            }
            LineFit scaled = LeastSquares.fit(X, Y, raw, Weighting.INVERSE_VARIANCE, model);
            assertEquals(fit.slope(), scaled.slope(), 1e-12 * Math.abs(fit.slope()));
            assertEquals(fit.residualSd(), scaled.residualSd(), 1e-12 * fit.residualSd());
            assertEquals(fit.slopeSe(), scaled.slopeSe(), 1e-12 * fit.slopeSe());
        }
    }

    @Test
    void aLevelWithoutReplicatesOrWithoutScatterGivesNoWeight() {
        double[] x = {1, 1, 2, 5, 5};
        UnusableDataException single = assertThrows(UnusableDataException.class,
                () -> Weighting.INVERSE_VARIANCE.rawWeights(x, new double[] {1.0, 1.1, 2.0, 5.0, 5.2}));
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, single.reason());
        assertEquals(2, Weighting.INVERSE_VARIANCE.firstNonPositiveBasis(x, new double[] {1.0, 1.1, 2.0, 5.0, 5.2}));
        UnusableDataException equal = assertThrows(UnusableDataException.class,
                () -> Weighting.INVERSE_VARIANCE.rawWeights(new double[] {1, 1, 5, 5}, new double[] {1.0, 1.1, 5.0, 5.0}));
        assertEquals(UnusableDataException.Reason.NO_VARIATION, equal.reason());
        assertEquals(Weighting.INVERSE_VARIANCE, Weighting.fromNotation("1/s²").orElseThrow());
    }
}
