package org.meritbook.stats.anova;

import java.util.Objects;
import org.meritbook.stats.Interval;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;

/**
 * Repeatability and intermediate precision from a one-way ANOVA of replicates grouped by run,
 * day, analyst or laboratory (random-effects model xᵢⱼ = μ + Lᵢ + eᵢⱼ), for unequal group sizes.
 *
 * <p>Formulas (ISO 5725-2:2019 §7.4; ISO 5725-3 for intermediate precision; Searle, Casella &amp;
 * McCulloch, <i>Variance Components</i>, ch. 3):
 * <pre>
 *   n₀   = (N − Σnᵢ² / N) / (k − 1)                 (= n when every group has n values)
 *   s_r² = MS_within                                repeatability variance, df N − k
 *   s_L² = (MS_between − MS_within) / n₀            between-group variance; when negative it is set
 *                                                   to 0 and {@code betweenSetToZero} says so
 *   s_I² = s_r² + s_L²                              intermediate-precision (or reproducibility) variance
 *   r = 2.8·s_r,  R = 2.8·s_I                       ISO 5725-2 limits; 2.8 ≈ 1.96·√2 = 2.77: the
 *                                                   difference of two results, each with SD s, has SD
 *                                                   s·√2, and 95 % of such differences lie within 1.96 of it
 * </pre>
 * Interval of s_I (Satterthwaite 1946; Burdick &amp; Graybill, <i>Confidence Intervals on Variance
 * Components</i>, 1992, ch. 3): s_I² = MS_between/n₀ + (1 − 1/n₀)·MS_within is a linear combination
 * of mean squares, approximated as a scaled chi-square with
 * <pre>
 *   ν = s_I⁴ / [ (MS_between/n₀)² / (k − 1) + ((1 − 1/n₀)·MS_within)² / (N − k) ]
 * </pre>
 * degrees of freedom, so s_I lies in [s_I·√(ν/χ²(1 − α/2; ν)), s_I·√(ν/χ²(α/2; ν))]. When s_L² was
 * set to zero, s_I = s_r and its interval is the repeatability interval, ν = N − k. Interval of s_r:
 * chi-square with N − k degrees of freedom. Precondition: the groups' replicates are independent
 * and normal with a common within-group variance; with unequal groups the estimators are the ANOVA
 * (method of moments) estimators, unbiased but not optimal.
 *
 * @param groupCount            k
 * @param totalCount            N
 * @param n0                    n₀, the effective group size
 * @param grandMean             the mean of all values, for the RSDs
 * @param repeatabilityVariance s_r² = MS_within (positive)
 * @param betweenEstimate       (MS_between − MS_within)/n₀ as computed, negative when the groups agree
 *                              more closely than their replicates suggest
 * @param betweenVariance       s_L² = max(0, betweenEstimate)
 * @param betweenSetToZero      whether a negative estimate was set to zero
 * @param intermediateVariance  s_I² = s_r² + s_L²
 * @param intermediateDf        Satterthwaite's ν for s_I² (N − k when s_L² was set to zero)
 */
public record VarianceComponents(int groupCount, int totalCount, double n0, double grandMean,
        double repeatabilityVariance, double betweenEstimate, double betweenVariance, boolean betweenSetToZero,
        double intermediateVariance, double intermediateDf) {

    /** The ISO 5725-2 factor of the repeatability and reproducibility limits, 1.96·√2 rounded. */
    public static final double LIMIT_FACTOR = 2.8;

    public VarianceComponents {
        if (groupCount < 2 || totalCount <= groupCount) {
            throw new IllegalArgumentException("variance components need k ≥ 2 groups and N > k values, but k = "
                    + groupCount + ", N = " + totalCount);
        }
        if (!(n0 >= 1) || !(n0 <= totalCount) || !Double.isFinite(grandMean) || !Double.isFinite(betweenEstimate)) {
            throw new IllegalArgumentException("n₀ must lie in [1, N] and the mean and between estimate be finite, but are "
                    + n0 + ", " + grandMean + ", " + betweenEstimate);
        }
        if (!(repeatabilityVariance > 0) || Double.isInfinite(repeatabilityVariance)) {
            throw new IllegalArgumentException("the repeatability variance must be positive, but is " + repeatabilityVariance);
        }
        if (betweenVariance != Math.max(0, betweenEstimate) || betweenSetToZero != (betweenEstimate < 0)) {
            throw new IllegalArgumentException("the between-group variance must be max(0, " + betweenEstimate
                    + ") with the flag set exactly when the estimate is negative");
        }
        if (intermediateVariance != repeatabilityVariance + betweenVariance) {
            throw new IllegalArgumentException("s_I² must equal s_r² + s_L²");
        }
        if (!(intermediateDf > 0) || Double.isInfinite(intermediateDf)) {
            throw new IllegalArgumentException("the Satterthwaite degrees of freedom must be positive, but are " + intermediateDf);
        }
    }

    /**
     * The variance components of a one-way ANOVA.
     *
     * @throws NullPointerException when {@code anova} is null (an ANOVA always has MS_within &gt; 0)
     */
    public static VarianceComponents of(OneWayAnova anova) {
        Objects.requireNonNull(anova, "anova");
        int k = anova.groupCount();
        int total = anova.totalCount();
        double sumSquares = 0;
        for (int size : anova.groupSizes()) {
            sumSquares += (double) size * size;
        }
        double n0 = (total - sumSquares / total) / (k - 1);
        double msB = anova.msBetween();
        double msW = anova.msWithin();
        double estimate = (msB - msW) / n0;
        boolean truncated = estimate < 0;
        double between = truncated ? 0 : estimate;
        double intermediate = msW + between;
        double df;
        if (truncated) {
            df = anova.dfWithin();
        } else {
            double termB = msB / n0;
            double termW = (1 - 1 / n0) * msW;
            df = intermediate * intermediate / (termB * termB / anova.dfBetween() + termW * termW / anova.dfWithin());
        }
        return new VarianceComponents(k, total, n0, anova.grandMean(), msW, estimate, between, truncated, intermediate, df);
    }

    /** s_r, the repeatability standard deviation. */
    public double repeatabilitySd() {
        return Math.sqrt(repeatabilityVariance);
    }

    /** s_L, the between-group standard deviation (0 when the estimate was set to zero). */
    public double betweenSd() {
        return Math.sqrt(betweenVariance);
    }

    /** s_I = √(s_r² + s_L²), the intermediate-precision (or reproducibility) standard deviation. */
    public double intermediateSd() {
        return Math.sqrt(intermediateVariance);
    }

    /** N − k, the degrees of freedom of s_r. */
    public int repeatabilityDf() {
        return totalCount - groupCount;
    }

    /** Chi-square interval of s_r with N − k degrees of freedom. */
    public Interval repeatabilitySdInterval(double level) {
        return SampleSummary.sdInterval(repeatabilitySd(), repeatabilityDf(), level);
    }

    /** Satterthwaite interval of s_I (the repeatability interval when s_L² was set to zero). */
    public Interval intermediateSdInterval(double level) {
        return SampleSummary.sdInterval(intermediateSd(), intermediateDf, level);
    }

    /** ISO 5725-2 repeatability limit r = 2.8·s_r. */
    public double repeatabilityLimit() {
        return LIMIT_FACTOR * repeatabilitySd();
    }

    /**
     * ISO 5725-2 limit R = 2.8·s_I: the reproducibility limit when the groups are laboratories, the
     * intermediate-precision limit when they are days, runs or analysts within one laboratory.
     */
    public double reproducibilityLimit() {
        return LIMIT_FACTOR * intermediateSd();
    }

    /** 100·s_r / |x̄|. */
    public double repeatabilityCvPercent() {
        return 100 * repeatabilitySd() / nonZeroMean();
    }

    /** 100·s_I / |x̄|. */
    public double intermediateCvPercent() {
        return 100 * intermediateSd() / nonZeroMean();
    }

    private double nonZeroMean() {
        if (grandMean == 0) {
            throw new UnusableDataException(UnusableDataException.Reason.ZERO_MEAN,
                    "a relative standard deviation needs a non-zero mean, but the grand mean is 0");
        }
        return Math.abs(grandMean);
    }
}
