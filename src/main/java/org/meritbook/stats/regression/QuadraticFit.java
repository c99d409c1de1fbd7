package org.meritbook.stats.regression;

import org.meritbook.stats.Interval;

import java.util.Arrays;
import java.util.Objects;

/**
 * A fitted second-order calibration y = a + b·x + c·x² with everything a dossier reports about it.
 * Built by {@link LeastSquares#fitQuadratic}; the formulas are documented there and in
 * {@link QuadraticDesign}. The constructor checks that the values are complete and consistent, so
 * an instance never carries a NaN.
 *
 * @param weighting             the weighting used
 * @param n                     number of points (at least 4)
 * @param degreesOfFreedom      residual degrees of freedom, n − 3
 * @param x                     concentrations (copied in and out); at least three distinct values
 * @param y                     responses (copied in and out)
 * @param weights               weights normalised to average 1 (all 1 when unweighted)
 * @param intercept             a
 * @param linear                b, the linear coefficient (the sensitivity at x = 0)
 * @param quadratic             c, the curvature coefficient
 * @param interceptSe           standard error of a: s·√[(X'WX)⁻¹]₀₀
 * @param linearSe              standard error of b: s·√[(X'WX)⁻¹]₁₁
 * @param quadraticSe           standard error of c: s·√[(X'WX)⁻¹]₂₂
 * @param residualSd            s(y/x) = √(Σw·e² / (n − 3))
 * @param ssResidual            Σw·e²
 * @param rSquared              centred R² = 1 − SSres / Σw(y − ȳw)²
 * @param fitted                a + b·x + c·x² at each point
 * @param residuals             e = y − fitted
 * @param standardizedResiduals e·√w / s (0 everywhere for a perfect fit)
 */
public record QuadraticFit(Weighting weighting, int n, int degreesOfFreedom,
        double[] x, double[] y, double[] weights,
        double intercept, double linear, double quadratic,
        double interceptSe, double linearSe, double quadraticSe,
        double residualSd, double ssResidual, double rSquared,
        double[] fitted, double[] residuals, double[] standardizedResiduals) {

    /** Estimated parameters: a, b, c. */
    static final int PARAMETERS = 3;
    /** Fewest points that leave one residual degree of freedom. */
    static final int MINIMUM_POINTS = PARAMETERS + 1;
    /** Normalised weights must average 1 to this relative tolerance (a few ulps of summation error). */
    private static final double WEIGHT_SUM_TOLERANCE = 1e-9;
    /** Absolute accuracy asked of the Student t quantile; far below any printed digit. */
    private static final double T_ACCURACY = 1e-13;
    /** The search interval of {@link #inverse} is widened by this fraction of its span on each side. */
    private static final double INVERSE_MARGIN = 0.10;

    public QuadraticFit {
        Objects.requireNonNull(weighting, "weighting");
        x = copyFinite("x", x, n);
        y = copyFinite("y", y, n);
        weights = copyFinite("weights", weights, n);
        fitted = copyFinite("fitted", fitted, n);
        residuals = copyFinite("residuals", residuals, n);
        standardizedResiduals = copyFinite("standardizedResiduals", standardizedResiduals, n);
        if (n < MINIMUM_POINTS) {
            throw new IllegalArgumentException("n must be at least " + MINIMUM_POINTS + " but was " + n);
        }
        if (degreesOfFreedom != n - PARAMETERS) {
            throw new IllegalArgumentException("degrees of freedom must be " + (n - PARAMETERS)
                    + " but were " + degreesOfFreedom);
        }
        if (distinctValues(x) < PARAMETERS) {
            throw new IllegalArgumentException("x must take at least 3 different values but takes " + distinctValues(x));
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
        requireFinite("intercept", intercept);
        requireFinite("linear", linear);
        requireFinite("quadratic", quadratic);
        requireNonNegative("interceptSe", interceptSe);
        requireNonNegative("linearSe", linearSe);
        requireNonNegative("quadraticSe", quadraticSe);
        requireNonNegative("residualSd", residualSd);
        requireNonNegative("ssResidual", ssResidual);
        if (!(rSquared >= 0 && rSquared <= 1)) {
            throw new IllegalArgumentException("R² must lie in [0, 1] but was " + rSquared);
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

    /** The response the curve gives at x0: a + b·x0 + c·x0². */
    public double predict(double x0) {
        return intercept + x0 * (linear + x0 * quadratic);
    }

    /** The local sensitivity dy/dx at x0: b + 2c·x0. */
    public double slopeAt(double x0) {
        return linear + 2 * quadratic * x0;
    }

    /**
     * Adjusted R²: 1 − (1 − R²)·(n − 1)/(n − 3) (residual and total mean squares).
     * Reference: Draper &amp; Smith, ch. 2.
     */
    public double adjustedRSquared() {
        return 1 - (1 - rSquared) * (n - 1) / degreesOfFreedom;
    }

    /**
     * The back-calculated concentration for response y0: the root of a + b·x + c·x² = y0 that lies
     * in [xLow − m, xHigh + m], m = 10 % of (xHigh − xLow) (the calibrated range and a margin for
     * extrapolation). The roots of c·x² + b·x + (a − y0) = 0 are taken in the cancellation-free form
     * q = −(b + sign(b)·√(b² − 4c(a − y0)))/2, x₁ = q/c, x₂ = (a − y0)/q (Press et al.,
     * <i>Numerical Recipes</i>, 3rd ed., §5.6); with c = 0 the line's root (y0 − a)/b.
     *
     * @param y0    a response; finite
     * @param xLow  lower end of the range searched; finite
     * @param xHigh upper end of the range searched; finite, greater than xLow
     * @throws IllegalArgumentException when the arguments are not as stated, or when no root or two
     *                                  distinct roots lie in the widened range (the response is
     *                                  outside the curve's reach there, or the curve turns inside it)
     */
    public double inverse(double y0, double xLow, double xHigh) {
        if (!Double.isFinite(y0) || !Double.isFinite(xLow) || !Double.isFinite(xHigh) || !(xLow < xHigh)) {
            throw new IllegalArgumentException("inverse needs a finite response and a finite range low < high, but has y0 = "
                    + y0 + " in [" + xLow + ", " + xHigh + "]");
        }
        double margin = INVERSE_MARGIN * (xHigh - xLow);
        double low = xLow - margin;
        double high = xHigh + margin;
        double c0 = intercept - y0;
        double[] roots;
        if (quadratic == 0) {
            roots = linear == 0 ? new double[0] : new double[] {-c0 / linear};
        } else {
            double discriminant = linear * linear - 4 * quadratic * c0;
            if (discriminant < 0) {
                roots = new double[0];
            } else {
                double q = -0.5 * (linear + Math.copySign(Math.sqrt(discriminant), linear));
                roots = q == 0 ? new double[] {0} : new double[] {q / quadratic, c0 / q};
            }
        }
        double found = Double.NaN;
        int count = 0;
        for (double root : roots) {
            if (root >= low && root <= high && !(count == 1 && root == found)) {
                found = root;
                count++;
            }
        }
        if (count != 1) {
            throw new IllegalArgumentException((count == 0 ? "no concentration" : "two concentrations")
                    + " in [" + low + ", " + high + "] give the response " + y0 + " on the quadratic; "
                    + "expected exactly one");
        }
        return found;
    }

    /**
     * Two-sided Student t quantile for this fit's degrees of freedom: t(1 − α/2, n − 3) with
     * α = 1 − level. From Apache Commons Math.
     *
     * @throws IllegalArgumentException unless 0 &lt; level &lt; 1
     */
    public double tQuantile(double level) {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("confidence level must lie in (0, 1) but was " + level);
        }
        return TwoSidedT.quantile(degreesOfFreedom, level, T_ACCURACY);
    }

    /**
     * Confidence interval of a coefficient: β_k ± t·SE(β_k).
     *
     * @param index 0 for a, 1 for b, 2 for c
     * @throws IllegalArgumentException for another index or a level outside (0, 1)
     */
    public Interval coefficientInterval(int index, double level) {
        double estimate;
        double se;
        switch (index) {
            case 0 -> {
                estimate = intercept;
                se = interceptSe;
            }
            case 1 -> {
                estimate = linear;
                se = linearSe;
            }
            case 2 -> {
                estimate = quadratic;
                se = quadraticSe;
            }
            default -> throw new IllegalArgumentException("coefficient index must be 0 (a), 1 (b) or 2 (c) but was " + index);
        }
        double half = tQuantile(level) * se;
        return new Interval(estimate - half, estimate + half, level);
    }

    /**
     * The covariance matrix of (a, b, c): s²·(X'WX)⁻¹, computed from the QR factors (see
     * {@link QuadraticDesign}). A fresh array each call.
     */
    public double[][] coefficientCovariance() {
        double[][] inverse = design().inverseCrossProduct();
        double s2 = residualSd * residualSd;
        for (double[] row : inverse) {
            for (int j = 0; j < row.length; j++) {
                row[j] *= s2;
            }
        }
        return inverse;
    }

    /**
     * The normalised weight this fit's weighting gives a new point at x0, on the scale of
     * {@link #weights()}; as {@link LineFit#weightAt}, with the predicted response a + b·x0 + c·x0²
     * as the basis of y-based weighting. 1 when unweighted.
     *
     * @throws IllegalArgumentException when the basis at x0 is not positive
     */
    public double weightAt(double x0) {
        if (weighting == Weighting.NONE) {
            return 1;
        }
        double raw = weighting.rawWeightAt(x0, predict(x0), x, y);
        double meanRaw = 0;
        for (double v : weighting.rawWeights(x, y)) {
            meanRaw += v;
        }
        meanRaw /= n;
        return raw / meanRaw;
    }

    /**
     * Half-width of the confidence interval of the mean response at x0: t·s·√(g'(X'WX)⁻¹g) with
     * g = (1, x0, x0²). Reference: Draper &amp; Smith, ch. 9 and 12.
     */
    public double confidenceHalfWidth(double x0, double level) {
        return tQuantile(level) * residualSd * Math.sqrt(design().meanResponseFactor(x0));
    }

    /**
     * Half-width of the prediction interval of one new observation at x0 of weight
     * {@link #weightAt(double) w0}: t·s·√(1/w0 + g'(X'WX)⁻¹g). Reference: Draper &amp; Smith, ch. 9.
     *
     * @throws IllegalArgumentException when the weighting gives no weight at x0
     */
    public double predictionHalfWidth(double x0, double level) {
        double factor = 1 / weightAt(x0) + design().meanResponseFactor(x0);
        return tQuantile(level) * residualSd * Math.sqrt(factor);
    }

    /** The design rebuilt from x and the normalised weights: the same arithmetic as at fitting time. */
    private QuadraticDesign design() {
        return new QuadraticDesign(x, weights);
    }

    /** Number of distinct values (compared with ==, so 0.0 and −0.0 are one value). */
    static int distinctValues(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int count = sorted.length == 0 ? 0 : 1;
        for (int i = 1; i < sorted.length; i++) {
            if (sorted[i] != sorted[i - 1]) {
                count++;
            }
        }
        return count;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof QuadraticFit f && weighting == f.weighting && n == f.n
                && degreesOfFreedom == f.degreesOfFreedom && Arrays.equals(x, f.x) && Arrays.equals(y, f.y)
                && Arrays.equals(weights, f.weights) && same(intercept, f.intercept) && same(linear, f.linear)
                && same(quadratic, f.quadratic) && same(interceptSe, f.interceptSe) && same(linearSe, f.linearSe)
                && same(quadraticSe, f.quadraticSe) && same(residualSd, f.residualSd)
                && same(ssResidual, f.ssResidual) && same(rSquared, f.rSquared)
                && Arrays.equals(fitted, f.fitted) && Arrays.equals(residuals, f.residuals)
                && Arrays.equals(standardizedResiduals, f.standardizedResiduals);
    }

    @Override
    public int hashCode() {
        // Every scalar derives from the inputs, so hashing the inputs is enough.
        return Objects.hash(weighting, Arrays.hashCode(x), Arrays.hashCode(y), intercept, linear, quadratic);
    }

    @Override
    public String toString() {
        return "QuadraticFit[weighting=" + weighting.notation() + ", n=" + n + ", a=" + intercept + " (SE " + interceptSe
                + "), b=" + linear + " (SE " + linearSe + "), c=" + quadratic + " (SE " + quadraticSe
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
