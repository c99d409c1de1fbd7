package org.meritbook.stats.descriptive;

import org.meritbook.stats.Interval;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.distributions.ChiSquared;
import org.meritbook.stats.distributions.StudentT;

/**
 * Mean, standard deviation and the intervals of one sample of replicate results.
 *
 * <p>Formulas (n values x, n ≥ 2):
 * <pre>
 *   x̄ = Σx / n        s² = Σ(x − x̄)² / (n − 1)        s = √s²        (see {@link Moments} for how)
 *   SE(x̄) = s / √n    %CV (RSD) = 100 · s / |x̄|
 *   mean, level 1 − α:  x̄ ± t(1 − α/2; n − 1) · s / √n
 *   SD,   level 1 − α:  [ s·√((n − 1) / χ²(1 − α/2; n − 1)),  s·√((n − 1) / χ²(α/2; n − 1)) ]
 * </pre>
 * The chi-square interval assumes normally distributed results (ISO 16269-6 style; Miller &amp;
 * Miller, ch. 2 and 3; Montgomery, <i>Introduction to Statistical Quality Control</i>, ch. 4).
 * The CV uses |x̄| so that it is positive; it means something only on a ratio scale (a
 * concentration, a recovery), not for blank signals around zero.
 *
 * <p>Accuracy, measured against NIST StRD univariate certified values (tests, log relative
 * error): on data centred exactly before conversion to doubles (as {@code meritbook qualify}
 * reads them) at least 15.2 digits for mean and SD on all nine sets. On the doubles nearest the
 * printed decimals the mean and SD of those doubles are reproduced to 15.7 digits or more, while
 * the doubles themselves differ from NIST's decimals: the SD then agrees with the certificate on
 * 13.1 (Mavro), 13.8 (Michelso), 9.5 (NumAcc3) and 8.3 (NumAcc4, values such as 10000000.1)
 * digits, 15.2 or more on the others.
 *
 * @param n        number of values, at least 2
 * @param mean     x̄
 * @param variance s², with divisor n − 1
 * @param sd       s
 * @param min      smallest value
 * @param max      largest value
 */
public record SampleSummary(int n, double mean, double variance, double sd, double min, double max) {
    /** Fewest values that give a standard deviation. */
    public static final int MINIMUM = 2;

    public SampleSummary {
        if (n < MINIMUM) {
            throw new IllegalArgumentException("a summary needs at least " + MINIMUM + " values, but n = " + n);
        }
        SampleChecks.finite("the mean", mean);
        SampleChecks.finite("the minimum", min);
        SampleChecks.finite("the maximum", max);
        if (!(variance >= 0) || Double.isInfinite(variance) || !(sd >= 0) || Double.isInfinite(sd)) {
            throw new IllegalArgumentException("variance and SD must be finite and not negative, but are "
                    + variance + " and " + sd);
        }
        if (Math.abs(sd * sd - variance) > 1e-12 * variance) {
            throw new IllegalArgumentException("the SD must be the square root of the variance, but " + sd + "² ≠ " + variance);
        }
        if (!(min <= max)) {
            throw new IllegalArgumentException("min must not exceed max, but " + min + " > " + max);
        }
    }

    /**
     * Summarises a sample.
     *
     * @param values the results; finite, at least 2 (order does not matter)
     * @throws UnusableDataException with {@code TOO_FEW_VALUES} or {@code NOT_FINITE}
     */
    public static SampleSummary of(double[] values) {
        double[] v = SampleChecks.finiteCopy("the sample", values, MINIMUM);
        double mean = Moments.mean(v);
        double variance = Moments.sumOfSquares(v, mean) / (v.length - 1);
        double min = v[0];
        double max = v[0];
        for (double x : v) {
            min = Math.min(min, x);
            max = Math.max(max, x);
        }
        // A mean computed in two passes can stray outside [min, max] by an ulp on constant data.
        mean = Math.max(min, Math.min(max, mean));
        return new SampleSummary(v.length, mean, variance, Math.sqrt(variance), min, max);
    }

    /** n − 1, the degrees of freedom of s. */
    public int degreesOfFreedom() {
        return n - 1;
    }

    /** The standard error of the mean, s / √n. */
    public double standardError() {
        return sd / Math.sqrt(n);
    }

    /**
     * The relative standard deviation in percent, 100 · s / |x̄|.
     *
     * @throws UnusableDataException with {@code ZERO_MEAN} when x̄ = 0
     */
    public double cvPercent() {
        if (mean == 0) {
            throw new UnusableDataException(UnusableDataException.Reason.ZERO_MEAN,
                    "the relative standard deviation needs a non-zero mean, but the mean is 0");
        }
        return 100 * sd / Math.abs(mean);
    }

    /** The two-sided t confidence interval of the mean, x̄ ± t(1 − α/2; n − 1)·s/√n. */
    public Interval meanInterval(double level) {
        double half = new StudentT(degreesOfFreedom()).twoSidedQuantile(level) * standardError();
        return new Interval(mean - half, mean + half, level);
    }

    /** The two-sided chi-square confidence interval of the standard deviation (normal data). */
    public Interval sdInterval(double level) {
        return sdInterval(sd, degreesOfFreedom(), level);
    }

    /**
     * The chi-square interval of a standard deviation s with ν degrees of freedom (ν may be
     * fractional, e.g. Satterthwaite's): [s·√(ν/χ²(1 − α/2; ν)), s·√(ν/χ²(α/2; ν))].
     */
    public static Interval sdInterval(double sd, double df, double level) {
        SampleChecks.openUnit("the confidence level", level);
        ChiSquared chi = new ChiSquared(df);
        double alpha = 1 - level;
        return new Interval(sd * Math.sqrt(df / chi.quantile(1 - alpha / 2)), sd * Math.sqrt(df / chi.quantile(alpha / 2)),
                level);
    }
}
