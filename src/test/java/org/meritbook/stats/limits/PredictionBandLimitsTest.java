package org.meritbook.stats.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.regression.LeastSquares;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.Weighting;

class PredictionBandLimitsTest {

    private static final double[] MM_X = {0, 2, 4, 6, 8, 10, 12};
    private static final double[] MM_Y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
    // The invented calibration of stats.regression.CommonsMathCrossCheckTest.
    private static final double[] X = {0.05, 0.05, 0.1, 0.1, 0.25, 0.25, 0.5, 0.5, 1, 1, 2, 2};
    private static final double[] Y = {52.1, 49.6, 101.9, 98.2, 251.7, 259.4, 507.0, 489.5, 1012.0, 978.0, 2045.0, 1961.0};

    // Source: R 4.2.2 on Miller & Miller's fluorescence data (lm, qt): t(0.95; 5) = 2.015048373333,
    // h(0) = √(1 + 1/7 + 36/112) = 1.210076739007, y_C = a + t·s·h(0) = 2.573297062679,
    // x_C = 0.546758885384, and ISO 11843-2's closed form x_D = 2·x_C = 1.093517770768 (α = β).
    @Test
    void unweightedFluorescenceCalibration() {
        LineFit fit = LeastSquares.fitLine(MM_X, MM_Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        PredictionBandLimits p = PredictionBandLimits.of(fit);
        assertEquals(2.015048373333, p.tAlpha(), 1e-11);
        assertEquals(2.573297062679, p.criticalResponse(), 1e-11);
        assertEquals(0.546758885384, p.criticalValue(), 1e-11);
        assertEquals(1.093517770768, p.minimumDetectable(), 1e-11);
        assertEquals(ZeroWeightSource.UNWEIGHTED, p.zeroWeightSource());
        assertEquals(5, p.degreesOfFreedom());
        // With β ≠ α the closed form adds the two quantiles: x_D = (t(0.95) + t(0.99))·x_C / t(0.95).
        PredictionBandLimits q = PredictionBandLimits.of(fit, 0.05, 0.01, 1);
        assertEquals((q.tAlpha() + q.tBeta()) / q.tAlpha() * q.criticalValue(), q.minimumDetectable(), 1e-14);
        // Three replicate measurements of a sample shrink h(0): 1/K = 1/3 in place of 1.
        PredictionBandLimits three = PredictionBandLimits.of(fit, 0.05, 0.05, 3);
        double ratio = Math.sqrt((1.0 / 3 + 1.0 / 7 + 36.0 / 112) / (1 + 1.0 / 7 + 36.0 / 112));
        assertEquals(ratio * p.criticalValue(), three.criticalValue(), 1e-14);
    }

    // Source: Monte Carlo check of the defining property (seeded, deterministic): for a true blank the
    // standardized difference (y0 − ŷ(0))/(s·h(0)) is Student t with n − 2 df, so a new blank exceeds y_C
    // with probability α exactly. 8 000 simulated calibrations on Miller & Miller's design, true line
    // y = 1.5 + 1.9x, σ = 0.43: the exceedance rate must lie within 0.05 ± 0.007 (2.9 standard errors);
    // a normal quantile in place of t (rate about 0.085) or a two-sided t (0.025) would fail.
    @Test
    void aBlankExceedsTheCriticalResponseWithProbabilityAlpha() {
        Random random = new Random(11843L);
        int exceed = 0;
        int runs = 8000;
        double[] y = new double[MM_X.length];
        for (int r = 0; r < runs; r++) {
            for (int i = 0; i < y.length; i++) {
                y[i] = 1.5 + 1.9 * MM_X[i] + 0.43 * random.nextGaussian();
            }
            PredictionBandLimits p = PredictionBandLimits.of(LeastSquares.fitLine(MM_X, y, Weighting.NONE,
                    LineModel.WITH_INTERCEPT));
            if (1.5 + 0.43 * random.nextGaussian() > p.criticalResponse()) {
                exceed++;
            }
        }
        double rate = (double) exceed / runs;
        assertTrue(Math.abs(rate - 0.05) <= 0.007, "false-positive rate " + rate);
    }

    // Source: R 4.2.2, an independent solution: lm(y ~ x, weights = w), w = 1/x normalised to mean 1;
    // the weight of the lowest standard (3.2) for the blank; x_D by uniroot of
    // b·x − t·s·√(1/w(x) + 1/Σw + (x − x̄w)²/Sxx) − t·s·h(0) = 0: y_C = 9.42259605508,
    // x_C = 0.00842005169144, x_D = 0.0141254576867, w(x_D) = 11.3270666019.
    @Test
    void weightedCalibrationUsesTheWeightAtTheLowestStandardAndAtXd() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        PredictionBandLimits p = PredictionBandLimits.of(fit);
        assertEquals(ZeroWeightSource.AT_LOWEST_STANDARD, p.zeroWeightSource());
        assertEquals(3.2, p.weightAtZero(), 1e-13);
        assertEquals(9.42259605508, p.criticalResponse(), 1e-9);
        assertEquals(0.00842005169144, p.criticalValue(), 1e-13);
        assertEquals(0.0141254576867, p.minimumDetectable(), 1e-12);
        assertEquals(11.3270666019, p.weightAtMinimum(), 1e-8);
    }

    // Source: the defining equation of the weighted x_D, checked with the fit's own public API.
    @Test
    void weightedMinimumSolvesItsEquation() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.INVERSE_X2, LineModel.WITH_INTERCEPT);
        PredictionBandLimits p = PredictionBandLimits.of(fit, 0.05, 0.05, 2);
        double xd = p.minimumDetectable();
        double lowerBandAtXd = fit.predict(xd) - p.tBeta() * fit.residualSd()
                * Math.sqrt(1 / (fit.weightAt(xd) * 2) + 1.0 / fit.n() + Math.pow(xd - fit.weightedMeanX(), 2) / fit.sxx());
        assertEquals(p.criticalResponse(), lowerBandAtXd, 1e-10 * p.criticalResponse());
        assertTrue(xd > p.criticalValue());
    }

    // Source: the rule in ZeroWeightSource: 1/y weighting with a positive intercept gives a blank a weight.
    @Test
    void responseWeightingWeighsABlankAtTheIntercept() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.INVERSE_Y, LineModel.WITH_INTERCEPT);
        assertTrue(fit.intercept() > 0);
        PredictionBandLimits p = PredictionBandLimits.of(fit);
        assertEquals(ZeroWeightSource.AT_ZERO, p.zeroWeightSource());
        assertEquals(fit.weightAt(0), p.weightAtZero(), 1e-15);
    }

    @Test
    void unusableCalibrationsSayWhy() {
        LineFit origin = LeastSquares.fitLine(MM_X, MM_Y, Weighting.NONE, LineModel.THROUGH_ORIGIN);
        assertEquals(UnusableDataException.Reason.OUT_OF_DOMAIN, assertThrows(UnusableDataException.class,
                () -> PredictionBandLimits.of(origin)).reason());
        LineFit falling = LeastSquares.fitLine(new double[] {1, 2, 3}, new double[] {6.1, 4.0, 1.9}, Weighting.NONE,
                LineModel.WITH_INTERCEPT);
        assertEquals(UnusableDataException.Reason.NON_POSITIVE_SLOPE, assertThrows(UnusableDataException.class,
                () -> PredictionBandLimits.of(falling)).reason());
        // A weighted line whose slope is too uncertain for the lower band ever to reach y_C.
        LineFit noisy = LeastSquares.fitLine(new double[] {1, 2, 3, 4}, new double[] {1, 9, 2, 8}, Weighting.INVERSE_X,
                LineModel.WITH_INTERCEPT);
        UnusableDataException never = assertThrows(UnusableDataException.class, () -> PredictionBandLimits.of(noisy));
        assertTrue(never.getMessage().startsWith("the lower prediction band never rises"), never.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> PredictionBandLimits.of(LeastSquares.fitLine(MM_X, MM_Y, Weighting.NONE, LineModel.WITH_INTERCEPT),
                        0.5, 0.05, 1));
    }
}
