package org.meritbook.stats;

import java.util.Objects;

/**
 * Straight-line least squares, unweighted or weighted, with or without intercept.
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
            throw new IllegalArgumentException("a line " + describe(model) + " needs at least "
                    + model.minimumPoints() + " points, but has " + x.length);
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
        double meanX = weightedMean(x, w, sumW);
        double meanY = weightedMean(y, w, sumW);
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
            throw new IllegalArgumentException("x must vary, but its weighted sum of squares is " + sxx);
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

    private static String describe(LineModel model) {
        return model == LineModel.WITH_INTERCEPT ? "with intercept" : "through the origin";
    }

    private static void requireFinite(String name, double[] values) {
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(name + " must be a finite number at every point, but point "
                        + i + " is " + values[i]);
            }
        }
    }

    /** With intercept a variable must take two distinct values; through the origin one non-zero value. */
    private static void requireVariation(String name, double[] values, boolean centred) {
        for (double v : values) {
            if (centred ? v != values[0] : v != 0) {
                return;
            }
        }
        throw new IllegalArgumentException(name + (centred
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

    /** Two-pass weighted mean: a first estimate, then the weighted mean deviation from it added back. */
    private static double weightedMean(double[] v, double[] w, double sumW) {
        double first = 0;
        for (int i = 0; i < v.length; i++) {
            first += w[i] * v[i];
        }
        first /= sumW;
        double correction = 0;
        for (int i = 0; i < v.length; i++) {
            correction += w[i] * (v[i] - first);
        }
        return first + correction / sumW;
    }
}
