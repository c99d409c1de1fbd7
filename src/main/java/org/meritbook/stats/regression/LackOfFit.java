package org.meritbook.stats.regression;

import java.util.Arrays;
import java.util.Comparator;
import java.util.Objects;
import java.util.Optional;
import java.util.stream.IntStream;
import org.apache.commons.math3.special.Beta;

/**
 * The lack-of-fit F test of a calibration model against pure error from replicated x levels.
 *
 * <p>With m distinct levels of x (exactly equal x values form one level), level j holding the
 * points i ∈ j with weights w<sub>i</sub>, weighted level mean ȳ<sub>j</sub> = Σw·y / Σw, and the
 * model's fitted values ŷ<sub>i</sub> with p estimated parameters:
 * <pre>
 *   SSpe  = Σ_j Σ_{i∈j} w_i (y_i − ȳ_j)²          df_pe  = n − m
 *   SSlof = Σ_j Σ_{i∈j} w_i (ȳ_j − ŷ_i)²          df_lof = m − p
 *   F = (SSlof / df_lof) / (SSpe / df_pe)          p = P(F(df_lof, df_pe) ≥ F)
 * </pre>
 * SSpe + SSlof is the residual sum of squares Σw(y − ŷ)² of any model whose fitted value depends
 * on x only (the cross term vanishes because Σ_{i∈j} w_i (y_i − ȳ_j) = 0); SSlof is formed directly,
 * not as the difference SSres − SSpe, so it does not cancel when the model fits well. Unweighted
 * use passes all weights 1; the statistic does not change when all weights are multiplied by one
 * constant. The upper tail p is the regularised incomplete beta I<sub>d₂/(d₂ + d₁F)</sub>(d₂/2, d₁/2)
 * (Apache Commons Math), accurate also when p is tiny. References: Draper &amp; Smith, <i>Applied
 * Regression Analysis</i>, 3rd ed., §2.1 (lack of fit and pure error) and ch. 9 (weighted);
 * ISO 8466-1 / ISO 11095 (linearity of calibration with replicated standards).
 *
 * @param levels        m, the number of distinct x levels
 * @param lackOfFitDf   m − p (at least 1)
 * @param pureErrorDf   n − m (at least 1)
 * @param ssLackOfFit   SSlof
 * @param ssPureError   SSpe (positive)
 * @param f             the F statistic
 * @param p             its upper-tail probability under F(lackOfFitDf, pureErrorDf)
 */
public record LackOfFit(int levels, int lackOfFitDf, int pureErrorDf, double ssLackOfFit, double ssPureError,
        double f, double p) {

    /** Relative agreement asked between f and the ratio of its mean squares (rounding only). */
    private static final double F_TOLERANCE = 1e-12;

    public LackOfFit {
        if (levels < 2 || lackOfFitDf < 1 || pureErrorDf < 1) {
            throw new IllegalArgumentException("a lack-of-fit test needs at least 2 levels and 1 degree of freedom for "
                    + "lack of fit and for pure error, but has " + levels + ", " + lackOfFitDf + " and " + pureErrorDf);
        }
        if (!(ssLackOfFit >= 0) || Double.isInfinite(ssLackOfFit)) {
            throw new IllegalArgumentException("ssLackOfFit must be finite and not negative but was " + ssLackOfFit);
        }
        if (!(ssPureError > 0) || Double.isInfinite(ssPureError)) {
            throw new IllegalArgumentException("ssPureError must be positive and finite but was " + ssPureError);
        }
        double ratio = (ssLackOfFit / lackOfFitDf) / (ssPureError / pureErrorDf);
        if (!(f >= 0) || Double.isInfinite(f) || Math.abs(f - ratio) > F_TOLERANCE * ratio) {
            throw new IllegalArgumentException("f must be (SSlof/df_lof)/(SSpe/df_pe) = " + ratio + " but was " + f);
        }
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("p must lie in [0, 1] but was " + p);
        }
    }

    /**
     * The test for a fitted model.
     *
     * @param x          concentrations; finite
     * @param y          responses; finite, same length
     * @param weights    weights of the fit (any positive scale; all 1 when unweighted)
     * @param fitted     the model's fitted values at each point; finite
     * @param parameters p, the number of parameters the model estimated (2 for a line with
     *                   intercept, 1 through the origin, 3 for a quadratic); at least 1
     * @return the test, or empty when it cannot be evaluated: no level is replicated (no pure
     *         error degrees of freedom), there are no more levels than parameters (no lack-of-fit
     *         degrees of freedom), or the replicates agree exactly at every level (SSpe = 0, so F
     *         has no finite value)
     * @throws IllegalArgumentException when the arrays differ in length or are empty, a value is not
     *                                  finite, a weight is not positive, or parameters &lt; 1
     */
    public static Optional<LackOfFit> of(double[] x, double[] y, double[] weights, double[] fitted, int parameters) {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        Objects.requireNonNull(weights, "weights");
        Objects.requireNonNull(fitted, "fitted");
        int n = x.length;
        if (n == 0 || y.length != n || weights.length != n || fitted.length != n) {
            throw new IllegalArgumentException("x, y, weights and fitted must have the same, non-zero length, but have "
                    + n + ", " + y.length + ", " + weights.length + " and " + fitted.length);
        }
        if (parameters < 1) {
            throw new IllegalArgumentException("a model has at least 1 parameter, but " + parameters + " were given");
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i]) || !Double.isFinite(fitted[i])) {
                throw new IllegalArgumentException("x, y and fitted must be finite, but point " + i + " has "
                        + x[i] + ", " + y[i] + ", " + fitted[i]);
            }
            if (!(weights[i] > 0) || Double.isInfinite(weights[i])) {
                throw new IllegalArgumentException("weights must be positive and finite, but point " + i + " has " + weights[i]);
            }
        }

        Integer[] order = IntStream.range(0, n).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble(i -> x[i]));
        int levels = 0;
        double ssPure = 0;
        double ssLack = 0;
        for (int start = 0; start < n;) {
            int end = start + 1;
            while (end < n && x[order[end]] == x[order[start]]) {
                end++;
            }
            double mean = levelMean(y, weights, order, start, end);
            for (int k = start; k < end; k++) {
                int i = order[k];
                double pure = y[i] - mean;
                double lack = mean - fitted[i];
                ssPure += weights[i] * pure * pure;
                ssLack += weights[i] * lack * lack;
            }
            levels++;
            start = end;
        }
        int pureDf = n - levels;
        int lackDf = levels - parameters;
        if (pureDf < 1 || lackDf < 1 || ssPure == 0) {
            return Optional.empty();
        }
        double f = (ssLack / lackDf) / (ssPure / pureDf);
        double p = Beta.regularizedBeta(pureDf / (pureDf + lackDf * f), pureDf / 2.0, lackDf / 2.0);
        return Optional.of(new LackOfFit(levels, lackDf, pureDf, ssLack, ssPure, f, p));
    }

    /** Two-pass weighted mean of y over order[start, end). */
    private static double levelMean(double[] y, double[] w, Integer[] order, int start, int end) {
        double sumW = 0;
        double first = 0;
        for (int k = start; k < end; k++) {
            sumW += w[order[k]];
            first += w[order[k]] * y[order[k]];
        }
        first /= sumW;
        double correction = 0;
        for (int k = start; k < end; k++) {
            correction += w[order[k]] * (y[order[k]] - first);
        }
        return first + correction / sumW;
    }
}
