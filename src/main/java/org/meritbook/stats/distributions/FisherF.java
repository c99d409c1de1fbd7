package org.meritbook.stats.distributions;

import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.special.Beta;

/**
 * Fisher's F distribution with numerator and denominator degrees of freedom.
 *
 * <p>{@link #quantile(double) quantile(p)} is the lower-tail quantile; the upper α critical value
 * a table prints as F(α; ν₁, ν₂) is {@link #upperQuantile(double) upperQuantile(α)} =
 * {@code quantile(1 − α)}. The upper tail P(F ≥ f) is I_{ν₂/(ν₂+ν₁f)}(ν₂/2, ν₁/2), the regularized
 * incomplete beta (Abramowitz &amp; Stegun 26.6.2), accurate for small p.
 *
 * @param numeratorDf   ν₁, positive
 * @param denominatorDf ν₂, positive
 */
public record FisherF(double numeratorDf, double denominatorDf) {
    public FisherF {
        Accuracy.degreesOfFreedom("the numerator degrees of freedom of F", numeratorDf);
        Accuracy.degreesOfFreedom("the denominator degrees of freedom of F", denominatorDf);
    }

    /** The lower-tail quantile f with P(F ≤ f) = p. */
    public double quantile(double p) {
        Accuracy.probability(p);
        return new FDistribution(null, numeratorDf, denominatorDf, Accuracy.QUANTILE).inverseCumulativeProbability(p);
    }

    /** The upper α critical value, P(F ≥ f) = α. */
    public double upperQuantile(double alpha) {
        return quantile(1 - Accuracy.probability(alpha));
    }

    /** The upper tail P(F ≥ f), the p-value of an F test. */
    public double upperTail(double f) {
        Accuracy.point(f);
        if (f <= 0) {
            return 1;
        }
        if (Double.isInfinite(f)) {
            return 0;
        }
        return Beta.regularizedBeta(denominatorDf / (denominatorDf + numeratorDf * f), denominatorDf / 2, numeratorDf / 2);
    }
}
