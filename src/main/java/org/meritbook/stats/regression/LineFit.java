package org.meritbook.stats.regression;

import org.meritbook.stats.Interval;

import java.util.Arrays;
import java.util.Objects;

/**
 * A fitted calibration line y = a + b·x (or y = b·x) with everything a dossier reports about it.
 * Built by {@link LeastSquares#fitLine}; the formulas are documented there. The constructor checks
 * that the values are complete and mutually consistent, so an instance never carries a NaN.
 *
 * @param model                     with intercept or through the origin
 * @param weighting                 the weighting used
 * @param n                         number of points
 * @param degreesOfFreedom          residual degrees of freedom, n − parameters
 * @param x                         concentrations (copied in and out)
 * @param y                         responses (copied in and out)
 * @param weights                   weights normalised to average 1 (all 1 when unweighted)
 * @param slope                     b, the sensitivity
 * @param intercept                 a; 0 through the origin
 * @param slopeSe                   standard error of b
 * @param interceptSe               standard error of a; 0 through the origin
 * @param slopeInterceptCovariance  cov(a, b) = −x̄w·s²/Sxx; 0 through the origin
 * @param r                         correlation coefficient Sxy/√(Sxx·Syy) (uncentred through the origin)
 * @param rSquared                  r², centred with intercept, uncentred through the origin (as NIST certifies)
 * @param adjustedRSquared          1 − (1 − R²)·(n − 1)/df, or 1 − (1 − R²)·n/df through the origin
 * @param residualSd                s(y/x) = √(Σw·e²/df)
 * @param weightedMeanX             x̄w = Σw·x/Σw
 * @param weightedMeanY             ȳw = Σw·y/Σw
 * @param sxx                       Σw(x − x̄w)², or Σw·x² through the origin
 * @param ssRegression              regression sum of squares b·Sxy
 * @param ssResidual                residual sum of squares Σw·e²
 * @param fitted                    a + b·x at each point
 * @param residuals                 e = y − fitted at each point
 * @param standardizedResiduals     e·√w / s (0 everywhere for a perfect fit)
 */
public record LineFit(LineModel model, Weighting weighting, int n, int degreesOfFreedom,
        double[] x, double[] y, double[] weights,
        double slope, double intercept, double slopeSe, double interceptSe,
        double slopeInterceptCovariance, double r, double rSquared,
        double adjustedRSquared, double residualSd,
        double weightedMeanX, double weightedMeanY, double sxx,
        double ssRegression, double ssResidual, double[] fitted, double[] residuals,
        double[] standardizedResiduals) {

    /** Normalised weights must average 1 to this relative tolerance (a few ulps of summation error). */
    private static final double WEIGHT_SUM_TOLERANCE = 1e-9;
    /** Absolute accuracy asked of the Student t quantile; far below any printed digit. */
    private static final double T_ACCURACY = 1e-13;

    public LineFit {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(weighting, "weighting");
        x = copyFinite("x", x, n);
        y = copyFinite("y", y, n);
        weights = copyFinite("weights", weights, n);
        fitted = copyFinite("fitted", fitted, n);
        residuals = copyFinite("residuals", residuals, n);
        standardizedResiduals = copyFinite("standardizedResiduals", standardizedResiduals, n);
        if (n < model.minimumPoints()) {
            throw new IllegalArgumentException("n must be at least " + model.minimumPoints() + " but was " + n);
        }
        if (degreesOfFreedom != n - model.parameterCount()) {
            throw new IllegalArgumentException("degrees of freedom must be " + (n - model.parameterCount())
                    + " but were " + degreesOfFreedom);
        }
        double sumW = 0;
        for (double w : weights) {
            if (!(w > 0)) {
                throw new IllegalArgumentException("weights must be positive but one is " + w);
            }
            sumW += w;
        }
        if (Math.abs(sumW - n) > WEIGHT_SUM_TOLERANCE * n) {
            throw new IllegalArgumentException("weights must average 1 but sum to " + sumW + " over " + n + " points");
        }
        if (weighting.firstNonPositiveBasis(x, y) >= 0) {
            throw new IllegalArgumentException("weighting " + weighting.notation() + " needs a positive "
                    + weighting.basis() + " at every point");
        }
        requireFinite("slope", slope);
        requireFinite("intercept", intercept);
        requireFinite("slopeInterceptCovariance", slopeInterceptCovariance);
        requireFinite("adjustedRSquared", adjustedRSquared);
        requireFinite("weightedMeanX", weightedMeanX);
        requireFinite("weightedMeanY", weightedMeanY);
        requireNonNegative("slopeSe", slopeSe);
        requireNonNegative("interceptSe", interceptSe);
        requireNonNegative("residualSd", residualSd);
        requireNonNegative("ssRegression", ssRegression);
        requireNonNegative("ssResidual", ssResidual);
        if (!(sxx > 0) || Double.isInfinite(sxx)) {
            throw new IllegalArgumentException("sxx must be positive and finite but was " + sxx);
        }
        if (!(Math.abs(r) <= 1) || !(rSquared >= 0 && rSquared <= 1) || !(adjustedRSquared <= 1)) {
            throw new IllegalArgumentException("r, r² and adjusted r² must lie in [-1, 1], [0, 1] and (-∞, 1] but were "
                    + r + ", " + rSquared + ", " + adjustedRSquared);
        }
        if (model == LineModel.THROUGH_ORIGIN
                && (intercept != 0 || interceptSe != 0 || slopeInterceptCovariance != 0)) {
            throw new IllegalArgumentException("a line through the origin must have intercept, its SE and "
                    + "covariance 0, but has " + intercept + ", " + interceptSe + ", " + slopeInterceptCovariance);
        }
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    @Override
    public double[] weights() {
        return weights.clone();
    }

    @Override
    public double[] fitted() {
        return fitted.clone();
    }

    @Override
    public double[] residuals() {
        return residuals.clone();
    }

    @Override
    public double[] standardizedResiduals() {
        return standardizedResiduals.clone();
    }

    /**
     * Leverages h_ii = w_i·(1/Σw + (x_i − x̄w)²/Sxx), or w_i·x_i²/Sxx through the origin: the diagonal
     * of the weighted hat matrix W^½X(X'WX)⁻¹X'W^½ (Draper &amp; Smith, ch. 8 and 9).
     */
    public double[] leverages() {
        double sumW = 0;
        for (double w : weights) {
            sumW += w;
        }
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = model == LineModel.THROUGH_ORIGIN ? weights[i] * x[i] * x[i] / sxx
                    : weights[i] * (1 / sumW + (x[i] - weightedMeanX) * (x[i] - weightedMeanX) / sxx);
        }
        return h;
    }

    /**
     * Internally studentized residuals e_i·√w_i / (s·√(1 − h_ii)), what R's {@code rstandard()} gives
     * for a weighted {@code lm}. 0 for a perfect fit; NaN where h_ii = 1 (a point that alone fixes the
     * line has no residual to studentize).
     */
    public double[] studentizedResiduals() {
        double[] h = leverages();
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = residualSd > 0 ? residuals[i] * Math.sqrt(weights[i]) / (residualSd * Math.sqrt(1 - h[i])) : 0;
        }
        return r;
    }

    /** The response the line gives at x0: a + b·x0. */
    public double predict(double x0) {
        return intercept + slope * x0;
    }

    /**
     * The back-calculated concentration for response y0: x0 = (y0 − a)/b.
     *
     * @throws IllegalStateException when the slope is exactly zero (the line cannot be inverted)
     */
    public double inverse(double y0) {
        if (slope == 0) {
            throw new IllegalStateException("the slope is 0, so no concentration corresponds to a response");
        }
        return (y0 - intercept) / slope;
    }

    /**
     * Two-sided Student t quantile for this fit's degrees of freedom: t(1 − α/2, df) with
     * α = 1 − level; e.g. level 0.95 gives t(0.975, df). From Apache Commons Math.
     *
     * @throws IllegalArgumentException unless 0 &lt; level &lt; 1
     */
    public double tQuantile(double level) {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level must lie in (0, 1) but was " + level);
        }
        return TwoSidedT.quantile(degreesOfFreedom, level, T_ACCURACY);
    }

    /** Confidence interval of the slope: b ± t·SE(b). */
    public Interval slopeInterval(double level) {
        double half = tQuantile(level) * slopeSe;
        return new Interval(slope - half, slope + half, level);
    }

    /**
     * Confidence interval of the intercept: a ± t·SE(a). Through the origin the intercept is
     * fixed, not estimated, so the interval is the degenerate [0, 0].
     */
    public Interval interceptInterval(double level) {
        double half = tQuantile(level) * interceptSe;
        return new Interval(intercept - half, intercept + half, level);
    }

    /**
     * The normalised weight this fit's weighting gives a new point at x0, on the same scale as
     * {@link #weights()} (raw weight divided by the mean raw weight of the calibration points).
     * For y-based weighting the basis is the predicted response a + b·x0; for 1/s² the replicate SD
     * interpolated at x0 ({@link LevelVariances#sdAt}). 1 when unweighted.
     *
     * @throws IllegalArgumentException when the basis at x0 (x0 or the predicted response) is not positive
     */
    public double weightAt(double x0) {
        if (weighting == Weighting.NONE) {
            return 1;
        }
        double raw = weighting.rawWeightAt(x0, predict(x0), x, y);
        double[] calibrationRaw = weighting.rawWeights(x, y);
        double meanRaw = 0;
        for (double v : calibrationRaw) {
            meanRaw += v;
        }
        meanRaw /= n;
        return raw / meanRaw;
    }

    /**
     * Half-width of the confidence interval of the mean response at x0:
     * t·s·√(1/Σw + (x0 − x̄w)²/Sxx); through the origin t·s·|x0|/√Sxx.
     * Reference: Draper &amp; Smith, ch. 1 and 9; Miller &amp; Miller, ch. 5.
     */
    public double confidenceHalfWidth(double x0, double level) {
        return tQuantile(level) * residualSd * Math.sqrt(meanResponseVarianceFactor(x0));
    }

    /**
     * Half-width of the prediction interval of one new observation at x0, whose weight is
     * {@link #weightAt(double) w0}: t·s·√(1/w0 + 1/Σw + (x0 − x̄w)²/Sxx) (through the origin
     * t·s·√(1/w0 + x0²/Sxx)). Reference: Draper &amp; Smith, ch. 1 and 9.
     *
     * @throws IllegalArgumentException when the weighting gives no weight at x0
     */
    public double predictionHalfWidth(double x0, double level) {
        double factor = 1 / weightAt(x0) + meanResponseVarianceFactor(x0);
        return tQuantile(level) * residualSd * Math.sqrt(factor);
    }

    /** Var(a + b·x0) / s². */
    private double meanResponseVarianceFactor(double x0) {
        if (model == LineModel.THROUGH_ORIGIN) {
            return x0 * x0 / sxx;
        }
        double sumW = 0;
        for (double w : weights) {
            sumW += w;
        }
        double d = x0 - weightedMeanX;
        return 1 / sumW + d * d / sxx;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LineFit f && model == f.model && weighting == f.weighting && n == f.n
                && degreesOfFreedom == f.degreesOfFreedom && Arrays.equals(x, f.x) && Arrays.equals(y, f.y)
                && Arrays.equals(weights, f.weights) && same(slope, f.slope) && same(intercept, f.intercept)
                && same(slopeSe, f.slopeSe) && same(interceptSe, f.interceptSe)
                && same(slopeInterceptCovariance, f.slopeInterceptCovariance) && same(r, f.r)
                && same(rSquared, f.rSquared) && same(adjustedRSquared, f.adjustedRSquared)
                && same(residualSd, f.residualSd) && same(weightedMeanX, f.weightedMeanX)
                && same(weightedMeanY, f.weightedMeanY) && same(sxx, f.sxx)
                && same(ssRegression, f.ssRegression) && same(ssResidual, f.ssResidual)
                && Arrays.equals(fitted, f.fitted) && Arrays.equals(residuals, f.residuals)
                && Arrays.equals(standardizedResiduals, f.standardizedResiduals);
    }

    @Override
    public int hashCode() {
        // Every scalar derives from the inputs, so hashing the inputs is enough.
        return Objects.hash(model, weighting, Arrays.hashCode(x), Arrays.hashCode(y), slope, intercept);
    }

    @Override
    public String toString() {
        return "LineFit[model=" + model + ", weighting=" + weighting.notation() + ", n=" + n
                + ", slope=" + slope + " (SE " + slopeSe + "), intercept=" + intercept + " (SE " + interceptSe
                + "), s(y/x)=" + residualSd + ", r²=" + rSquared + "]";
    }

    private static boolean same(double a, double b) {
        return Double.compare(a, b) == 0;
    }

    private static double[] copyFinite(String name, double[] values, int n) {
        Objects.requireNonNull(values, name);
        if (values.length != n) {
            throw new IllegalArgumentException(name + " must have " + n + " values but has " + values.length);
        }
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(name + " must be finite but contains " + v);
            }
        }
        return values.clone();
    }

    private static void requireFinite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite but was " + value);
        }
    }

    private static void requireNonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and not negative but was " + value);
        }
    }
}
