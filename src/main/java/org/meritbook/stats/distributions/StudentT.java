package org.meritbook.stats.distributions;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Beta;

/**
 * Student's t distribution with {@code df} degrees of freedom (df may be fractional, as a
 * Satterthwaite approximation gives).
 *
 * <p>Conventions: {@link #quantile(double) quantile(p)} is the lower-tail quantile, so the
 * one-sided 99 % value the US EPA MDL procedure writes t(n−1, 0.99) is {@code quantile(0.99)},
 * and the two-sided 95 % value of a confidence interval is {@link #twoSidedQuantile(double)
 * twoSidedQuantile(0.95)} = {@code quantile(0.975)}. Upper quantiles are taken as −t(1 − p) from
 * the accurate lower tail; the two-sided p-value is I_{df/(df+t²)}(df/2, 1/2), the regularized
 * incomplete beta (Abramowitz &amp; Stegun 26.7.1), with no 1 − cdf cancellation.
 *
 * @param df degrees of freedom, positive
 */
public record StudentT(double df) {
    public StudentT {
        Accuracy.degreesOfFreedom("the degrees of freedom of t", df);
    }

    /** The lower-tail quantile t with P(T ≤ t) = p. */
    public double quantile(double p) {
        Accuracy.probability(p);
        if (p == 0.5) {
            return 0;
        }
        if (p > 0.5) {
            return -lowerQuantile(1 - p);
        }
        return lowerQuantile(p);
    }

    /** The two-sided quantile for a confidence level: t(1 − (1 − level)/2), e.g. 2.262 for 0.95 and 9 df. */
    public double twoSidedQuantile(double level) {
        Accuracy.probability(level);
        return -lowerQuantile((1 - level) / 2);
    }

    /** P(T ≤ t). */
    public double cdf(double t) {
        Accuracy.point(t);
        double tail = 0.5 * Beta.regularizedBeta(df / (df + t * t), df / 2, 0.5);
        return t <= 0 ? tail : 1 - tail;
    }

    /** The two-sided p-value P(|T| ≥ |t|). */
    public double twoSidedP(double t) {
        Accuracy.point(t);
        if (Double.isInfinite(t)) {
            return 0;
        }
        return Math.min(1, Beta.regularizedBeta(df / (df + t * t), df / 2, 0.5));
    }

    private double lowerQuantile(double p) {
        return new TDistribution(null, df, Accuracy.QUANTILE).inverseCumulativeProbability(p);
    }
}
