package org.meritbook.stats.regression;

import org.meritbook.stats.Interval;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The unweighted fluorescence calibration worked in Miller &amp; Miller, <i>Statistics and
 * Chemometrics for Analytical Chemistry</i>, chapter 5 (from memory): seven standards,
 * x = 0 … 12 pg/mL, fluorescence intensities y.
 */
class HandbookExampleTest {

    private static final double[] X = {0, 2, 4, 6, 8, 10, 12};
    private static final double[] Y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};

    private final LineFit fit = LeastSquares.fitLine(X, Y, Weighting.NONE, LineModel.WITH_INTERCEPT);

    // Source: Miller & Miller, ch. 5 fluorescence example (from memory), values as the book prints them.
    // The book's s(y/x) = 0.4329 and sa = 0.2950 carry one unit of rounding in the last digit: exact
    // arithmetic (next test) gives 0.432848 and 0.294936; the book's figures follow from residuals
    // taken about the rounded line y = 1.52 + 1.93x (Σe² = 0.9368, s = 0.432851, sa = 0.4329 × 0.6814).
    // So those two are checked to one unit in the last printed digit, the rest to half a unit.
    @Test
    void agreesWithTheValuesTheBookPrints() {
        assertEquals(1.93, fit.slope(), 0.005);
        assertEquals(1.52, fit.intercept(), 0.005);
        assertEquals(0.9989, fit.r(), 0.00005);
        assertEquals(0.0409, fit.slopeSe(), 0.00005);
        assertEquals(0.4329, fit.residualSd(), 0.0001);
        assertEquals(0.2950, fit.interceptSe(), 0.0001);
        // Confidence limits, 95 %, t(0.975, 5) = 2.57: b = 1.93 ± 0.11, a = 1.52 ± 0.76.
        Interval slope = fit.slopeInterval(0.95);
        Interval intercept = fit.interceptInterval(0.95);
        assertEquals(0.11, (slope.high() - slope.low()) / 2, 0.005);
        assertEquals(0.76, (intercept.high() - intercept.low()) / 2, 0.005);
    }

    // Source: hand arithmetic on the book's data (centred sums are exact decimals): x̄ = 6, ȳ = 13.1,
    // Sxx = 112, Sxy = 216.2, Syy = 418.28; b = Sxy/Sxx, a = ȳ − b·x̄, SSres = Syy − Sxy²/Sxx,
    // s = √(SSres/5), sb = s/√Sxx, sa = s·√(1/7 + x̄²/Sxx), r = Sxy/√(Sxx·Syy).
    @Test
    void agreesWithExactHandArithmetic() {
        double b = 216.2 / 112;
        double a = 13.1 - 6 * b;
        double ssRes = 418.28 - 216.2 * 216.2 / 112;
        double s = Math.sqrt(ssRes / 5);
        assertRelative(b, fit.slope());
        assertRelative(a, fit.intercept());
        assertRelative(ssRes, fit.ssResidual());
        assertRelative(s, fit.residualSd());
        assertRelative(s / Math.sqrt(112), fit.slopeSe());
        assertRelative(s * Math.sqrt(1.0 / 7 + 36.0 / 112), fit.interceptSe());
        assertRelative(216.2 / Math.sqrt(112 * 418.28), fit.r());
        assertRelative(6, fit.weightedMeanX());
        assertRelative(13.1, fit.weightedMeanY());
        assertRelative(112, fit.sxx());
        assertEquals(5, fit.degreesOfFreedom());
    }

    // Source: hand arithmetic; a least-squares line passes through the centroid (x̄, ȳ) = (6, 13.1).
    @Test
    void backCalculatesTheCentroid() {
        assertEquals(6, fit.inverse(13.1), 1e-12);
    }

    // Source: Miller & Miller, ch. 5, the same fluorescence calibration read back (from memory): single
    // readings y0 = 2.9, 13.5, 23.0 give x0 = 0.72, 6.21, 11.13 pg/mL with s(x0) = 0.26, 0.24, 0.26 and
    // 95 % confidence limits x0 ± 0.68, ± 0.62, ± 0.68 (t = 2.57).
    @Test
    void readsBackTheBooksThreeSamples() {
        double[][] book = {{2.9, 0.72, 0.26, 0.68}, {13.5, 6.21, 0.24, 0.62}, {23.0, 11.13, 0.26, 0.68}};
        for (double[] row : book) {
            InversePrediction p = InversePrediction.of(fit, new double[] {row[0]});
            assertEquals(row[1], p.x0(), 0.005, "x0 for y0 = " + row[0]);
            assertEquals(row[2], p.standardError(), 0.005, "s(x0) for y0 = " + row[0]);
            Interval ci = p.interval(0.95);
            assertEquals(row[3], (ci.high() - ci.low()) / 2, 0.005, "half-width for y0 = " + row[0]);
            assertEquals(1, p.replicates());
            assertEquals(5, p.degreesOfFreedom());
        }
    }

    // Source: hand arithmetic for y0 = 2.9 with the exact sums above: s(x0) = (s/b)·√(1 + 1/7 + (2.9 − 13.1)²/(b²·112)).
    @Test
    void inversePredictionByHand() {
        double b = 216.2 / 112;
        double s = Math.sqrt((418.28 - 216.2 * 216.2 / 112) / 5);
        double expected = s / b * Math.sqrt(1 + 1.0 / 7 + Math.pow(2.9 - 13.1, 2) / (b * b * 112));
        InversePrediction p = InversePrediction.of(fit, 2.9, 1);
        assertRelative(expected, p.standardError());
        assertRelative((2.9 - (13.1 - 6 * b)) / b, p.x0());
        // Four replicate readings of the same sample shrink only the 1/m term.
        double four = s / b * Math.sqrt(0.25 + 1.0 / 7 + Math.pow(2.9 - 13.1, 2) / (b * b * 112));
        assertRelative(four, InversePrediction.of(fit, new double[] {2.8, 3.0, 2.9, 2.9}).standardError());
    }

    private static void assertRelative(double expected, double actual) {
        assertEquals(expected, actual, 1e-12 * Math.abs(expected));
    }
}
