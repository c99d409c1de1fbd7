package org.meritbook.stats.regression;

import java.util.Arrays;
import java.util.Objects;
import org.apache.commons.math3.special.Beta;
import org.meritbook.stats.UnusableDataException;

/**
 * Mandel's fitting test: does a quadratic describe the calibration significantly better than a
 * straight line with intercept, fitted to the same points with the same weights?
 *
 * <p>With the residual sums of squares SSres,lin (n − 2 df) and SSres,quad (n − 3 df):
 * <pre>
 *   DS² = SSres,lin − SSres,quad  = (n − 2)·s²lin − (n − 3)·s²quad     (1 df)
 *   F = DS² / s²quad,   s²quad = SSres,quad / (n − 3)
 *   p = P(F(1, n − 3) ≥ F)
 * </pre>
 * A large F (small p) says the curvature is real and the straight line is not adequate. DS² is
 * set to 0 when rounding makes it slightly negative (the quadratic can never fit worse). This is
 * the extra-sum-of-squares F test of the quadratic term; weighted fits use weighted sums.
 * References: Mandel, <i>The Statistical Analysis of Experimental Data</i> (1964); DIN 38402-51
 * and ISO 8466-1 (test value PW = DS²/s²y2 compared with F(1, N − 3, 99 %)); Draper &amp; Smith,
 * <i>Applied Regression Analysis</i>, 3rd ed., §6.1 (extra sum of squares).
 *
 * @param ssResidualLinear     SSres of the straight line with intercept
 * @param ssResidualQuadratic  SSres of the quadratic
 * @param residualSdQuadratic  s of the quadratic, √(SSres,quad / (n − 3)); positive
 * @param df1                  numerator degrees of freedom, 1
 * @param df2                  denominator degrees of freedom, n − 3
 * @param f                    the test value DS² / s²quad
 * @param p                    its upper-tail probability under F(1, n − 3)
 */
public record MandelTest(double ssResidualLinear, double ssResidualQuadratic, double residualSdQuadratic,
        int df1, int df2, double f, double p) {

    /**
     * The quadratic's residual SD must exceed this fraction of the responses' weighted SD: below
     * it the quadratic reproduces the data to rounding precision and F is a ratio of rounding errors.
     */
    static final double ROUNDING_LEVEL = 1e-12;
    /** Relative tolerance for x, y and weights of the two fits to count as the same data. */
    private static final double SAME_WEIGHTS = 1e-12;

    public MandelTest {
        if (df1 != 1 || df2 < 1) {
            throw new IllegalArgumentException("Mandel's test has 1 and n − 3 ≥ 1 degrees of freedom, but has "
                    + df1 + " and " + df2);
        }
        requireNonNegative("ssResidualLinear", ssResidualLinear);
        requireNonNegative("ssResidualQuadratic", ssResidualQuadratic);
        if (!(residualSdQuadratic > 0) || Double.isInfinite(residualSdQuadratic)) {
            throw new IllegalArgumentException("residualSdQuadratic must be positive and finite but was " + residualSdQuadratic);
        }
        requireNonNegative("f", f);
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("p must lie in [0, 1] but was " + p);
        }
    }

    /**
     * The test comparing a straight line and a quadratic fitted to the same data.
     *
     * @param linear    a line with intercept ({@link LineModel#WITH_INTERCEPT})
     * @param quadratic the quadratic through the same x, y, with the same weighting
     * @throws IllegalArgumentException when the line is through the origin, the two fits differ in
     *                                  their x, y, weighting or weights, or the quadratic fits the data
     *                                  exactly (its residual SD below 10⁻¹² of the responses' SD), so
     *                                  that F is not defined
     */
    public static MandelTest of(LineFit linear, QuadraticFit quadratic) {
        Objects.requireNonNull(linear, "linear");
        Objects.requireNonNull(quadratic, "quadratic");
        if (linear.model() != LineModel.WITH_INTERCEPT) {
            throw new IllegalArgumentException("Mandel's test compares a quadratic with a line with intercept, but the line is "
                    + "through the origin");
        }
        double[] x = quadratic.x();
        double[] y = quadratic.y();
        double[] w = quadratic.weights();
        if (linear.weighting() != quadratic.weighting() || !Arrays.equals(linear.x(), x) || !Arrays.equals(linear.y(), y)
                || !close(linear.weights(), w)) {
            throw new IllegalArgumentException("Mandel's test needs both fits on the same x, y and weighting, but the line has "
                    + linear.n() + " points weighted " + linear.weighting().notation() + " and the quadratic "
                    + quadratic.n() + " points weighted " + quadratic.weighting().notation() + ", or their values differ");
        }
        double sumW = 0;
        for (double v : w) {
            sumW += v;
        }
        double meanY = WeightedMean.of(y, w, sumW);
        double ssTotal = 0;
        for (int i = 0; i < y.length; i++) {
            ssTotal += w[i] * (y[i] - meanY) * (y[i] - meanY);
        }
        double sdY = Math.sqrt(ssTotal / (y.length - 1));
        double s = quadratic.residualSd();
        if (!(s > ROUNDING_LEVEL * sdY)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "the quadratic reproduces the responses to "
                    + "rounding precision (residual SD " + s + " against a response SD of " + sdY + ")");
        }
        double ssLinear = linear.ssResidual();
        double ssQuadratic = quadratic.ssResidual();
        double difference = Math.max(0, ssLinear - ssQuadratic);
        int df2 = quadratic.degreesOfFreedom();
        double f = difference / (s * s);
        double p = Beta.regularizedBeta(df2 / (df2 + f), df2 / 2.0, 0.5);
        return new MandelTest(ssLinear, ssQuadratic, s, 1, df2, f, p);
    }

    private static boolean close(double[] a, double[] b) {
        if (a.length != b.length) {
            return false;
        }
        for (int i = 0; i < a.length; i++) {
            if (Math.abs(a[i] - b[i]) > SAME_WEIGHTS * Math.abs(b[i])) {
                return false;
            }
        }
        return true;
    }

    private static void requireNonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and not negative but was " + value);
        }
    }
}
