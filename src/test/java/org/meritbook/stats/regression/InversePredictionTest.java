package org.meritbook.stats.regression;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.meritbook.stats.Interval;
import org.meritbook.stats.UnusableDataException;

class InversePredictionTest {

    // The invented calibration of CommonsMathCrossCheckTest, scatter growing with concentration.
    private static final double[] X = {0.05, 0.05, 0.1, 0.1, 0.25, 0.25, 0.5, 0.5, 1, 1, 2, 2};
    private static final double[] Y = {52.1, 49.6, 101.9, 98.2, 251.7, 259.4, 507.0, 489.5, 1012.0, 978.0, 2045.0, 1961.0};
    private static final double[] SAMPLE = {730.2, 741.5, 722.9};

    // Source: R 4.2.2, an independent route: lm(y ~ x, weights = w) with w = 1/x^k normalised to mean 1,
    // then the delta-method variance (σ²/(w0·m) + Var(a) + x0²·Var(b) + 2·x0·Cov(a, b)) / b² from vcov(),
    // w0 = (1/x0^k)/mean(1/x^k), interval x0 ± qt(0.975, 10)·s(x0).
    @Test
    void weightedFitsAgreeWithR() {
        assertAgrees(Weighting.INVERSE_X, SAMPLE, 0.73115322447768, 0.21883237964833, 0.00998249340938913,
                0.708910843072523, 0.753395605882836);
        assertAgrees(Weighting.INVERSE_X, new double[] {60.4}, 0.0594413964679786, 2.69172680164392,
                0.00487365948710177, 0.0485822064134156, 0.0703005865225415);
        assertAgrees(Weighting.INVERSE_X2, SAMPLE, 0.730264012132723, 0.0215846685783455, 0.0115171685808642,
                0.704602161352824, 0.755925862912623);
        assertAgrees(Weighting.INVERSE_X2, new double[] {60.4}, 0.0595979533214114, 3.24072732490004,
                0.00156890726765937, 0.0561022100831759, 0.0630936965596469);
    }

    private static void assertAgrees(Weighting weighting, double[] readings, double x0, double w0, double se,
                                     double low, double high) {
        LineFit fit = LeastSquares.fitLine(X, Y, weighting, LineModel.WITH_INTERCEPT);
        InversePrediction p = InversePrediction.of(fit, readings);
        assertEquals(x0, p.x0(), 1e-12 * Math.abs(x0));
        assertEquals(w0, p.weightAtX0(), 1e-11 * w0);
        assertEquals(se, p.standardError(), 1e-10 * se);
        Interval ci = p.interval(0.95);
        assertEquals(low, ci.low(), 1e-11);
        assertEquals(high, ci.high(), 1e-11);
    }

    // Source: the definition: multiplying every concentration by c multiplies x0 and s(x0) by c, because
    // the slope becomes b/c and the normalised weights 1/x^k do not change.
    @ParameterizedTest
    @EnumSource(value = Weighting.class, names = {"NONE", "INVERSE_X", "INVERSE_X2", "INVERSE_Y"})
    void scalingTheConcentrationsScalesX0AndItsError(Weighting weighting) {
        double c = 1000;
        double[] scaled = new double[X.length];
        for (int i = 0; i < X.length; i++) {
            scaled[i] = X[i] * c;
        }
        InversePrediction p = InversePrediction.of(LeastSquares.fitLine(X, Y, weighting, LineModel.WITH_INTERCEPT), SAMPLE);
        InversePrediction q = InversePrediction.of(LeastSquares.fitLine(scaled, Y, weighting, LineModel.WITH_INTERCEPT),
                SAMPLE);
        assertEquals(c * p.x0(), q.x0(), 1e-11 * q.x0());
        assertEquals(c * p.standardError(), q.standardError(), 1e-10 * q.standardError());
    }

    // Source: the definition: least squares does not depend on the order of the standards.
    @ParameterizedTest
    @EnumSource(value = Weighting.class, names = {"NONE", "INVERSE_X2"})
    void permutingTheStandardsChangesNothing(Weighting weighting) {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < X.length; i++) {
            order.add(i);
        }
        Collections.shuffle(order, new Random(7));
        double[] px = new double[X.length];
        double[] py = new double[X.length];
        for (int i = 0; i < X.length; i++) {
            px[i] = X[order.get(i)];
            py[i] = Y[order.get(i)];
        }
        InversePrediction p = InversePrediction.of(LeastSquares.fitLine(X, Y, weighting, LineModel.WITH_INTERCEPT), SAMPLE);
        InversePrediction q = InversePrediction.of(LeastSquares.fitLine(px, py, weighting, LineModel.WITH_INTERCEPT), SAMPLE);
        assertEquals(p.x0(), q.x0(), 1e-13 * p.x0());
        assertEquals(p.standardError(), q.standardError(), 1e-12 * p.standardError());
    }

    // Source: the formula: for an unweighted line the term (ȳ0 − ȳ)² vanishes at ȳ0 = ȳ, so a sample read at
    // the centroid has the smallest s(x0); any other reading gives a larger one.
    @Test
    void aReadingAtTheCentroidHasTheSmallestError() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);
        double centre = InversePrediction.of(fit, fit.weightedMeanY(), 1).standardError();
        assertEquals(fit.weightedMeanX(), InversePrediction.of(fit, fit.weightedMeanY(), 1).x0(), 1e-12);
        for (double d : new double[] {-500, -50, -1, 1, 50, 500}) {
            assertTrue(InversePrediction.of(fit, fit.weightedMeanY() + d, 1).standardError() > centre, "offset " + d);
        }
    }

    // Source: the through-origin formula by hand: s(x0) = (s/b)·√(1/m + ȳ0²/(b²·Σx²)).
    @Test
    void throughTheOrigin() {
        LineFit fit = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.THROUGH_ORIGIN);
        InversePrediction p = InversePrediction.of(fit, SAMPLE);
        double mean = (730.2 + 741.5 + 722.9) / 3;
        double b = fit.slope();
        double expected = fit.residualSd() / b * Math.sqrt(1.0 / 3 + mean * mean / (b * b * fit.sxx()));
        assertEquals(expected, p.standardError(), 1e-12 * expected);
        assertEquals(mean / b, p.x0(), 1e-12);
        assertEquals(11, p.degreesOfFreedom());
    }

    @Test
    void unusableReadingsSayWhy() {
        LineFit weighted = LeastSquares.fitLine(X, Y, Weighting.INVERSE_X, LineModel.WITH_INTERCEPT);
        UnusableDataException below = assertThrows(UnusableDataException.class,
                () -> InversePrediction.of(weighted, new double[] {-40}));
        assertEquals(UnusableDataException.Reason.OUT_OF_DOMAIN, below.reason());
        assertTrue(below.getMessage().startsWith("the weighting 1/x gives no weight at the concentration read back"),
                below.getMessage());
        assertEquals(UnusableDataException.Reason.TOO_FEW_VALUES, assertThrows(UnusableDataException.class,
                () -> InversePrediction.of(weighted, new double[0])).reason());
        assertEquals(UnusableDataException.Reason.NOT_FINITE, assertThrows(UnusableDataException.class,
                () -> InversePrediction.of(weighted, new double[] {Double.NaN})).reason());
        LineFit flat = LeastSquares.fitLine(new double[] {1, 2, 3}, new double[] {1, 2, 1}, Weighting.NONE,
                LineModel.WITH_INTERCEPT);
        assertEquals(0, flat.slope());
        assertEquals(UnusableDataException.Reason.ZERO_SLOPE, assertThrows(UnusableDataException.class,
                () -> InversePrediction.of(flat, new double[] {1.5})).reason());
    }
}
