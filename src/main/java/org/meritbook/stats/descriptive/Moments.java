package org.meritbook.stats.descriptive;

/**
 * The mean and the sum of squared deviations, computed so that data with many constant leading
 * digits (NIST's NumAcc sets: 10000000.1, 10000000.3, …) keep their varying digits.
 *
 * <p>Method (Chan, Golub &amp; LeVeque, "Algorithms for computing the sample variance", The
 * American Statistician 37, 1983, the "corrected two-pass algorithm"):
 * <pre>
 *   m₁ = Σx / n                          first pass
 *   x̄  = m₁ + Σ(x − m₁) / n              the mean deviation from m₁ added back
 *   d  = x − x̄,  SS = Σd² − (Σd)² / n     the second term removes the residual error of x̄
 * </pre>
 * Every sum is compensated (Neumaier's improvement of Kahan summation, Neumaier 1974), so the
 * error does not grow with n. Σx² − n·x̄² is never formed: it cancels catastrophically when the
 * data sit far from zero. Precondition: finite values (callers check; see {@code SampleChecks}).
 */
public final class Moments {
    private Moments() {
    }

    /** The corrected two-pass mean of a non-empty array. */
    public static double mean(double[] values) {
        requireValues(values);
        int n = values.length;
        double first = sum(values, 0) / n;
        return first + sum(values, first) / n;
    }

    /**
     * Σ(x − x̄)² for the given mean (normally {@link #mean(double[])} of the same values), with the
     * correction term −(Σd)²/n, which makes the result exact to rounding even when {@code mean}
     * carries a small error. 0 for a single value; never negative.
     */
    public static double sumOfSquares(double[] values, double mean) {
        requireValues(values);
        double s = 0;
        double c = 0;
        for (double v : values) {
            double d = v - mean;
            double sq = d * d;
            double t = s + sq;
            c += Math.abs(s) >= sq ? (s - t) + sq : (sq - t) + s;
            s = t;
        }
        double deviations = sum(values, mean);
        return Math.max(0, (s + c) - deviations * deviations / values.length);
    }

    /** Compensated Σ(x − centre) (Neumaier 1974). */
    static double sum(double[] values, double centre) {
        double s = 0;
        double c = 0;
        for (double v : values) {
            double d = v - centre;
            double t = s + d;
            c += Math.abs(s) >= Math.abs(d) ? (s - t) + d : (d - t) + s;
            s = t;
        }
        return s + c;
    }

    private static void requireValues(double[] values) {
        if (values.length == 0) {
            throw new IllegalArgumentException("a mean needs at least one value");
        }
    }
}
