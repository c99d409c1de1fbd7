package org.meritbook.stats.tests;

import java.util.Arrays;
import java.util.Objects;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.special.Erf;
import org.meritbook.stats.UnusableDataException;

/**
 * The Shapiro–Wilk test of normality, with Royston's approximations for the coefficients and
 * the p-value (3 ≤ n ≤ 5000); here used on calibration residuals.
 *
 * <p>Statistic, for the ordered sample x₍₁₎ ≤ … ≤ x₍ₙ₎ (Shapiro &amp; Wilk 1965):
 * <pre>
 *   W = (Σ aᵢ·x₍ᵢ₎)² / Σ(xᵢ − x̄)²
 * </pre>
 * with antisymmetric coefficients aₙ₊₁₋ᵢ = −aᵢ, Σa² = 1, approximated after Royston (1992):
 * mᵢ = Φ⁻¹((i − 3/8)/(n + 1/4)), u = 1/√n, and, with the polynomials
 * <pre>
 *   aₙ   = mₙ/√Σm² + 0.221157u − 0.147981u² − 2.071190u³ + 4.434685u⁴ − 2.706056u⁵
 *   aₙ₋₁ = mₙ₋₁/√Σm² + 0.042981u − 0.293762u² − 1.752461u³ + 5.682633u⁴ − 3.582633u⁵   (n ≥ 6)
 * </pre>
 * and the other aᵢ = mᵢ/√ε, ε = (Σm² − 2mₙ² [− 2mₙ₋₁²]) / (1 − 2aₙ² [− 2aₙ₋₁²]) (the bracketed terms
 * when n ≥ 6); for n = 3, a = (−√½, 0, √½). W is computed as the squared correlation of a and the
 * ordered sample, its complement 1 − W without cancellation.
 *
 * <p>p-value (Royston 1992; AS R94, 1995): n = 3 exactly, p = (6/π)(arcsin √W − arcsin √¾);
 * otherwise log(1 − W) is normalised, and p is the upper normal tail P(Z ≥ (t − μ)/σ) with
 * <pre>
 *   4 ≤ n ≤ 11:  γ = −2.273 + 0.459n,  t = −log(γ − log(1 − W)),
 *                μ = 0.5440 − 0.39978n + 0.025054n² − 0.0006714n³,
 *                σ = exp(1.3822 − 0.77857n + 0.062767n² − 0.0020322n³)
 *   n ≥ 12:      t = log(1 − W),  ν = log n,
 *                μ = −1.5861 − 0.31082ν − 0.083751ν² + 0.0038915ν³,
 *                σ = exp(−0.4803 − 0.082676ν + 0.0030302ν²)
 * </pre>
 * For n ≤ 11 a W so small that log(1 − W) ≥ γ lies beyond the approximation's range, far in the
 * lower tail; p is then reported as 0. Royston states the p-value adequate for p &lt; 0.1, which is
 * where a decision is made. References: Shapiro, S. S. &amp; Wilk, M. B. (1965), Biometrika 52,
 * 591–611; Royston, P. (1992), "Approximating the Shapiro–Wilk W-test for non-normality",
 * Statistics and Computing 2, 117–119; Royston, P. (1995), "Remark AS R94", Applied Statistics 44,
 * 547–551.
 *
 * @param n the sample size
 * @param w the statistic W, in (0, 1]
 * @param p its p-value (small p: evidence against normality)
 */
public record ShapiroWilk(int n, double w, double p) {

    /** Smallest sample the test is defined for. */
    public static final int MIN_N = 3;
    /** Largest sample for which Royston's approximation is validated. */
    public static final int MAX_N = 5000;

    private static final double[] C1 = {0, 0.221157, -0.147981, -2.071190, 4.434685, -2.706056};
    private static final double[] C2 = {0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633};
    private static final double[] GAMMA = {-2.273, 0.459};
    private static final double[] MEAN_SMALL = {0.5440, -0.39978, 0.025054, -6.714e-4};
    private static final double[] SD_SMALL = {1.3822, -0.77857, 0.062767, -0.0020322};
    private static final double[] MEAN_LARGE = {-1.5861, -0.31082, -0.083751, 0.0038915};
    private static final double[] SD_LARGE = {-0.4803, -0.082676, 0.0030302};
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1,
            NormalDistribution.DEFAULT_INVERSE_ABSOLUTE_ACCURACY);

    public ShapiroWilk {
        if (n < MIN_N || n > MAX_N) {
            throw new IllegalArgumentException("the Shapiro–Wilk test needs " + MIN_N + " to " + MAX_N + " values, but n = " + n);
        }
        if (!(w > 0 && w <= 1)) {
            throw new IllegalArgumentException("W must lie in (0, 1] but was " + w);
        }
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("p must lie in [0, 1] but was " + p);
        }
    }

    /**
     * Tests a sample (for example the standardized residuals of a calibration) for normality.
     *
     * @param values the sample; finite, 3 to 5000 values, not all equal (order does not matter)
     * @throws IllegalArgumentException when the sample is out of that range, has a non-finite value,
     *                                  or all its values are equal
     */
    public static ShapiroWilk test(double[] values) {
        Objects.requireNonNull(values, "values");
        int n = values.length;
        if (n < MIN_N || n > MAX_N) {
            throw new UnusableDataException(n < MIN_N ? UnusableDataException.Reason.TOO_FEW_VALUES
                    : UnusableDataException.Reason.TOO_MANY_VALUES, "the Shapiro–Wilk test needs " + MIN_N + " to "
                    + MAX_N + " values (Royston's coefficients cover no more), but has " + n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(values[i])) {
                throw new UnusableDataException(UnusableDataException.Reason.NOT_FINITE,
                        "every value must be finite, but value " + i + " is " + values[i]);
            }
        }
        double[] x = values.clone();
        Arrays.sort(x);
        double range = x[n - 1] - x[0];
        if (!(range > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "the Shapiro–Wilk test needs values that vary, but all " + n + " equal " + x[0]);
        }

        double[] a = coefficients(n);
        // Squared correlation of a (mean 0) with the sample, x centred and scaled by its range.
        double mean = 0;
        for (double v : x) {
            mean += v / range;
        }
        mean /= n;
        double ssa = 0;
        double ssx = 0;
        double sax = 0;
        for (int i = 0; i < n; i++) {
            double d = x[i] / range - mean;
            ssa += a[i] * a[i];
            ssx += d * d;
            sax += a[i] * d;
        }
        double root = Math.sqrt(ssa * ssx);
        double complement = Math.max(0, (root - sax) * (root + sax) / (ssa * ssx));
        double w = 1 - complement;
        return new ShapiroWilk(n, w, pValue(n, w, complement));
    }

    /** The full coefficient vector a₁ … aₙ (a₁ &lt; 0 &lt; aₙ, antisymmetric, Σa² = 1). */
    static double[] coefficients(int n) {
        double[] a = new double[n];
        if (n == MIN_N) {
            a[0] = -Math.sqrt(0.5);
            a[2] = Math.sqrt(0.5);
            return a;
        }
        int half = n / 2;
        double[] m = new double[half];
        double summ2 = 0;
        for (int i = 0; i < half; i++) {
            // mᵢ for the upper half, by symmetry −Φ⁻¹((i + 1 − 3/8)/(n + 1/4)).
            m[i] = -STANDARD_NORMAL.inverseCumulativeProbability((i + 1 - 0.375) / (n + 0.25));
            summ2 += m[i] * m[i];
        }
        summ2 *= 2;
        double root = Math.sqrt(summ2);
        double u = 1 / Math.sqrt(n);
        double[] upper = new double[half];
        upper[0] = m[0] / root + polynomial(C1, u);
        int first;
        double epsilon;
        if (n > 5) {
            upper[1] = m[1] / root + polynomial(C2, u);
            epsilon = (summ2 - 2 * m[0] * m[0] - 2 * m[1] * m[1]) / (1 - 2 * upper[0] * upper[0] - 2 * upper[1] * upper[1]);
            first = 2;
        } else {
            epsilon = (summ2 - 2 * m[0] * m[0]) / (1 - 2 * upper[0] * upper[0]);
            first = 1;
        }
        double scale = Math.sqrt(epsilon);
        for (int i = first; i < half; i++) {
            upper[i] = m[i] / scale;
        }
        for (int i = 0; i < half; i++) {
            a[n - 1 - i] = upper[i];
            a[i] = -upper[i];
        }
        return a;
    }

    private static double pValue(int n, double w, double complement) {
        if (n == MIN_N) {
            double p = 6 / Math.PI * (Math.asin(Math.sqrt(w)) - Math.PI / 3);
            return Math.max(0, Math.min(1, p));
        }
        if (complement == 0) {
            return 1;
        }
        double t = Math.log(complement);
        double mu;
        double sigma;
        if (n <= 11) {
            double gamma = polynomial(GAMMA, n);
            if (t >= gamma) {
                return 0;
            }
            t = -Math.log(gamma - t);
            mu = polynomial(MEAN_SMALL, n);
            sigma = Math.exp(polynomial(SD_SMALL, n));
        } else {
            double logN = Math.log(n);
            mu = polynomial(MEAN_LARGE, logN);
            sigma = Math.exp(polynomial(SD_LARGE, logN));
        }
        return 0.5 * Erf.erfc((t - mu) / (sigma * Math.sqrt(2)));
    }

    /** c₀ + c₁·v + c₂·v² + … by Horner's rule. */
    private static double polynomial(double[] c, double v) {
        double result = c[c.length - 1];
        for (int i = c.length - 2; i >= 0; i--) {
            result = result * v + c[i];
        }
        return result;
    }
}
