package org.meritbook.stats.distributions;

/** The accuracies the distribution types share. */
final class Accuracy {
    /** Absolute accuracy of every quantile: far below any digit a dossier prints. */
    static final double QUANTILE = 1e-13;

    private Accuracy() {
    }

    static double probability(double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("a probability for a quantile must lie strictly between 0 and 1, but is " + p);
        }
        return p;
    }

    static double degreesOfFreedom(String name, double df) {
        if (!(df > 0) || Double.isInfinite(df)) {
            throw new IllegalArgumentException(name + " must be positive and finite, but is " + df);
        }
        return df;
    }

    static double point(double x) {
        if (Double.isNaN(x)) {
            throw new IllegalArgumentException("a distribution cannot be evaluated at NaN");
        }
        return x;
    }
}
