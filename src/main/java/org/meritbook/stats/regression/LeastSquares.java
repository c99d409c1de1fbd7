package org.meritbook.stats.regression;

import java.util.Objects;
import org.meritbook.stats.UnusableDataException;

/**
 * Least squares for calibration: the straight line, unweighted or weighted, with or without intercept
 * ({@link #fitLine}), and the weighted quadratic ({@link #fitQuadratic}).
 *
 * <p>Formulas (weights w<sub>i</sub> normalised to average 1, so Σw = n):
 * <pre>
 *   x̄w = Σw·x / Σw            ȳw = Σw·y / Σw           (through origin: centre 0, 0)
 *   Sxx = Σw(x − x̄w)²         Sxy = Σw(x − x̄w)(y − ȳw)  Syy = Σw(y − ȳw)²
 *   b = Sxy / Sxx             a = ȳw − b·x̄w           (through origin: a = 0)
 *   e = (y − ȳw) − b(x − x̄w)   s(y/x) = √(Σw·e² / (n − p))
 *   SE(b) = s / √Sxx          SE(a) = s·√(1/Σw + x̄w²/Sxx)   cov(a, b) = −x̄w·s² / Sxx
 *   r = Sxy / √(Sxx·Syy)      R² = r² = SSreg / (SSreg + SSres),  SSreg = b·Sxy
 * </pre>
 * Through the origin the sums are uncentred (Sxx = Σw·x², Syy = Σw·y²), so R² is the
 * uncentred coefficient NIST certifies for its no-intercept data sets.
 * References: Draper &amp; Smith, <i>Applied Regression Analysis</i>, 3rd ed., ch. 1 (straight
 * line), 9 (weighted least squares); Miller &amp; Miller, <i>Statistics and Chemometrics for
 * Analytical Chemistry</i>, ch. 5 (calibration); NIST StRD linear regression data sets.
 *
 * <p>Numerics: the weighted means are taken in two passes with a correction term (the mean of
 * the deviations from a first estimate is added back), and every sum is formed from centred
 * values, never as Σx² − n·x̄², which cancels catastrophically when the data sit far from zero.
 * Measured: at least 12.8 significant digits on every certified value of NIST's Norris data and
 * 14.5 on NoInt1/NoInt2 (see the tests).
 */
public final class LeastSquares {
    /** Largest magnitude whose square, times a few hundred thousand points, stays finite. */
    private static final double MAGNITUDE_LIMIT = 1e150;

    private LeastSquares() {
    }

    /**
     * Fits a straight line by (weighted) least squares.
     *
     * @param x         concentrations (predictor); finite
     * @param y         responses; finite, same length as x
     * @param weighting weighting; its basis must be positive at every point
     * @param model     with intercept or through the origin
     * @return the fit with every statistic the dossier reports
     * @throws IllegalArgumentException when x and y differ in length, there are too few points
     *                                  (fewer than 3 with intercept, 2 through the origin), a value
     *                                  is not finite, x does not vary (with intercept: all x equal;
     *                                  through the origin: all x zero), y does not vary likewise,
     *                                  or the weighting's basis is not positive somewhere
     */
    public static LineFit fitLine(double[] x, double[] y, Weighting weighting, LineModel model) {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        Objects.requireNonNull(weighting, "weighting");
        Objects.requireNonNull(model, "model");
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y must have the same length, but have "
                    + x.length + " and " + y.length);
        }
        if (x.length < model.minimumPoints()) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES, "a line "
                    + describe(model) + " needs at least " + model.minimumPoints() + " points, but has " + x.length);
        }
        requireFinite("x", x);
        requireFinite("y", y);
        return fit(x, y, weighting.rawWeights(x, y), weighting, model);
    }

    /**
     * The fit for given raw weights, which must be proportional to what {@code weighting}
     * gives (any positive constant factor; the weights are normalised to average 1 here).
     * Package-private so that tests can check the invariance to that factor.
     */
    static LineFit fit(double[] x, double[] y, double[] rawWeights, Weighting weighting, LineModel model) {
        int n = x.length;
        double[] w = normalise(rawWeights);
        boolean centred = model == LineModel.WITH_INTERCEPT;
        requireVariation("x", x, centred);
        requireVariation("y", y, centred);

        double sumW = sum(w);
        double meanX = WeightedMean.of(x, w, sumW);
        double meanY = WeightedMean.of(y, w, sumW);
        double cx = centred ? meanX : 0;
        double cy = centred ? meanY : 0;

        double sxx = 0;
        double sxy = 0;
        double syy = 0;
        for (int i = 0; i < n; i++) {
            double dx = x[i] - cx;
            double dy = y[i] - cy;
            sxx += w[i] * dx * dx;
            sxy += w[i] * dx * dy;
            syy += w[i] * dy * dy;
        }
        if (!(sxx > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "x must vary, but its weighted sum of squares is " + sxx);
        }
        double slope = sxy / sxx;
        double intercept = centred ? meanY - slope * meanX : 0;

        double[] fitted = new double[n];
        double[] residuals = new double[n];
        double ssResidual = 0;
        for (int i = 0; i < n; i++) {
            double dx = x[i] - cx;
            residuals[i] = (y[i] - cy) - slope * dx;
            fitted[i] = cy + slope * dx;
            ssResidual += w[i] * residuals[i] * residuals[i];
        }
        int df = n - model.parameterCount();
        double s = Math.sqrt(ssResidual / df);
        double[] standardized = new double[n];
        for (int i = 0; i < n; i++) {
            // A perfect fit (s = 0) leaves every residual at 0, and so its standardized value.
            standardized[i] = s > 0 ? residuals[i] * Math.sqrt(w[i]) / s : 0;
        }

        double r = Math.max(-1, Math.min(1, sxy / (Math.sqrt(sxx) * Math.sqrt(syy))));
        double rSquared = r * r;
        // Adjusted R²: residual and total mean squares, total df n − 1 (centred) or n (uncentred).
        double adjusted = 1 - (1 - rSquared) * (centred ? n - 1 : n) / df;
        double slopeSe = s / Math.sqrt(sxx);
        double interceptSe = centred ? s * Math.sqrt(1 / sumW + meanX * meanX / sxx) : 0;
        double covariance = centred ? -meanX * s * s / sxx : 0;

        return new LineFit(model, weighting, n, df, x, y, w, slope, intercept, slopeSe, interceptSe,
                covariance, r, rSquared, adjusted, s, meanX, meanY, sxx, slope * sxy, ssResidual,
                fitted, residuals, standardized);
    }

    /**
     * Fits a quadratic y = a + b·x + c·x² by (weighted) least squares.
     *
     * <p>Formulas (weights w normalised to average 1, as for {@link #fitLine}; X the n × 3 design
     * with rows (1, x, x²), W = diag(w)):
     * <pre>
     *   β = (a, b, c) minimises Σw(y − a − b·x − c·x²)²,  formally β = (X'WX)⁻¹X'Wy
     *   e = y − ŷ   SSres = Σw·e²   s = √(SSres / (n − 3))   SE(β_k) = s·√[(X'WX)⁻¹]_kk
     *   R² = 1 − SSres / Σw(y − ȳw)²   (centred)   standardized residual = e·√w / s
     * </pre>
     * The normal equations are never formed: x is centred and scaled and the problem solved by QR
     * (see {@link QuadraticDesign}). Measured: at least 11.9 significant digits on every certified value
     * of NIST's Pontius data (x up to 3·10⁶; 13.3 or more on all but the intercept), see the tests. References: Draper &amp; Smith, <i>Applied Regression
     * Analysis</i>, 3rd ed., ch. 9 (weighted least squares) and 12 (polynomial models); ISO 8466-2
     * (second-order calibration functions).
     *
     * @param x         concentrations; finite, at least three distinct values
     * @param y         responses; finite, same length as x, not all equal
     * @param weighting weighting; its basis must be positive at every point
     * @return the fit with every statistic the dossier reports
     * @throws IllegalArgumentException when x and y differ in length, there are fewer than 4 points
     *                                  (a quadratic needs one residual degree of freedom), a value is
     *                                  not finite, x takes fewer than three distinct values, y does not
     *                                  vary, the weighting's basis is not positive somewhere, or the x
     *                                  levels are numerically too close to separate the three terms
     */
    public static QuadraticFit fitQuadratic(double[] x, double[] y, Weighting weighting) {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        Objects.requireNonNull(weighting, "weighting");
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y must have the same length, but have "
                    + x.length + " and " + y.length);
        }
        if (x.length < QuadraticFit.MINIMUM_POINTS) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES, "a quadratic needs at least "
                    + QuadraticFit.MINIMUM_POINTS + " points, but has " + x.length);
        }
        requireFinite("x", x);
        requireFinite("y", y);
        int levels = QuadraticFit.distinctValues(x);
        if (levels < QuadraticFit.PARAMETERS) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "x must take at least 3 different values for a quadratic, but takes " + levels);
        }
        requireVariation("y", y, true);
        return fitQuadratic(x, y, weighting.rawWeights(x, y), weighting);
    }

    /**
     * The quadratic fit for given raw weights, proportional to what {@code weighting} gives (they
     * are normalised to average 1 here). Package-private so that tests can check that invariance.
     */
    static QuadraticFit fitQuadratic(double[] x, double[] y, double[] rawWeights, Weighting weighting) {
        int n = x.length;
        double[] w = normalise(rawWeights);
        QuadraticDesign design = new QuadraticDesign(x, w);
        double[] alpha = design.solveInZ(y);

        double[] fitted = new double[n];
        double[] residuals = new double[n];
        double ssResidual = 0;
        for (int i = 0; i < n; i++) {
            fitted[i] = design.valueInZ(alpha, x[i]);
            residuals[i] = y[i] - fitted[i];
            ssResidual += w[i] * residuals[i] * residuals[i];
        }
        int df = n - QuadraticFit.PARAMETERS;
        double s = Math.sqrt(ssResidual / df);
        double[] standardized = new double[n];
        for (int i = 0; i < n; i++) {
            standardized[i] = s > 0 ? residuals[i] * Math.sqrt(w[i]) / s : 0;
        }

        double sumW = sum(w);
        double meanY = WeightedMean.of(y, w, sumW);
        double ssTotal = 0;
        for (int i = 0; i < n; i++) {
            double d = y[i] - meanY;
            ssTotal += w[i] * d * d;
        }
        double rSquared = Math.max(0, Math.min(1, 1 - ssResidual / ssTotal));

        double[] beta = design.toX(alpha);
        double[][] inverse = design.inverseCrossProduct();
        return new QuadraticFit(weighting, n, df, x, y, w, beta[0], beta[1], beta[2],
                s * Math.sqrt(inverse[0][0]), s * Math.sqrt(inverse[1][1]), s * Math.sqrt(inverse[2][2]),
                s, ssResidual, rSquared, fitted, residuals, standardized);
    }

    private static String describe(LineModel model) {
        return model == LineModel.WITH_INTERCEPT ? "with intercept" : "through the origin";
    }

    /**
     * Finite, and of a magnitude whose squares and cross products stay normal doubles: beyond about
     * 1e150 they overflow to ∞, and when every value is below about 1e-150 they underflow to 0, so a
     * sum of squares would read "no variation" where there is some.
     */
    private static void requireFinite(String name, double[] values) {
        double largest = 0;
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new UnusableDataException(UnusableDataException.Reason.NOT_FINITE, name
                        + " must be a finite number at every point, but point " + i + " is " + values[i]);
            }
            largest = Math.max(largest, Math.abs(values[i]));
        }
        if (largest > MAGNITUDE_LIMIT || largest > 0 && largest < 1 / MAGNITUDE_LIMIT) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_RANGE, name + " reaches " + largest
                    + ", outside the magnitudes (1e-150 to 1e150) whose squares a double holds; express the values in "
                    + "another unit");
        }
    }

    /** With intercept a variable must take two distinct values; through the origin one non-zero value. */
    private static void requireVariation(String name, double[] values, boolean centred) {
        for (double v : values) {
            if (centred ? v != values[0] : v != 0) {
                return;
            }
        }
        throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION, name + (centred
                ? " must take at least two different values, but every point has " + name + " = " + values[0]
                : " must be non-zero somewhere for a line through the origin, but every point has " + name + " = 0"));
    }

    private static double[] normalise(double[] raw) {
        double mean = sum(raw) / raw.length;
        double[] w = new double[raw.length];
        for (int i = 0; i < raw.length; i++) {
            w[i] = raw[i] / mean;
        }
        return w;
    }

    private static double sum(double[] values) {
        double total = 0;
        for (double v : values) {
            total += v;
        }
        return total;
    }
}
