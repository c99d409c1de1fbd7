package org.meritbook.stats.distributions;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.special.Gamma;

/**
 * The chi-square distribution with {@code df} degrees of freedom (fractional df allowed, as the
 * Satterthwaite approximation gives). {@link #quantile(double) quantile(p)} is the lower-tail
 * quantile, e.g. χ²(0.025; 9) = 2.700; the upper tail P(X ≥ x) is the regularized upper incomplete
 * gamma Q(df/2, x/2).
 *
 * @param df degrees of freedom, positive
 */
public record ChiSquared(double df) {
    public ChiSquared {
        Accuracy.degreesOfFreedom("the degrees of freedom of chi-square", df);
    }

    /** The lower-tail quantile x with P(X ≤ x) = p. */
    public double quantile(double p) {
        Accuracy.probability(p);
        return new ChiSquaredDistribution(null, df, Accuracy.QUANTILE).inverseCumulativeProbability(p);
    }

    /** P(X ≥ x). */
    public double upperTail(double x) {
        Accuracy.point(x);
        if (x <= 0) {
            return 1;
        }
        return Double.isInfinite(x) ? 0 : Gamma.regularizedGammaQ(df / 2, x / 2);
    }
}
