package org.meritbook.stats.distributions;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The standard normal distribution N(0, 1). {@link #quantile(double) quantile(0.95)} = z₀.₉₅ =
 * 1.6449 (the "1.645" of one-sided 95 % limits); upper quantiles are taken as −z(1 − p).
 */
public final class StandardNormal {
    private static final NormalDistribution N = new NormalDistribution(null, 0, 1, Accuracy.QUANTILE);

    private StandardNormal() {
    }

    /** The lower-tail quantile z with Φ(z) = p. */
    public static double quantile(double p) {
        Accuracy.probability(p);
        return p > 0.5 ? -N.inverseCumulativeProbability(1 - p) : N.inverseCumulativeProbability(p);
    }

    /** Φ(z). */
    public static double cdf(double z) {
        return N.cumulativeProbability(Accuracy.point(z));
    }
}
