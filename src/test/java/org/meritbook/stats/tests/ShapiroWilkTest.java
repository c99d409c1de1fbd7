package org.meritbook.stats.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/** Shapiro–Wilk W and Royston's p-value against published and general-purpose-library values. */
class ShapiroWilkTest {

    /** Weights (lb) of 11 men, Shapiro &amp; Wilk (1965), as printed in SciPy's Shapiro–Wilk tutorial. */
    private static final double[] WEIGHTS = {148, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236};

    /**
     * The 100 values of SciPy's documented example (scipy.stats.shapiro, SciPy 1.0–1.5 reference guide):
     * {@code np.random.seed(12345678); x = stats.norm.rvs(loc=5, scale=3, size=100)}, regenerated with
     * NumPy 2.4.6 (legacy seeding is reproducible across versions) and printed with 17 significant digits.
     */
    private static final double[] SCIPY_SEEDED = {
        6.6611245673907185, 0.6211040208198781, 1.116244581866999, 0.4709781645282636, 9.715624704472454,
        2.0729114267410167, 6.442096362864801, 6.876842921073138, 7.1670590527926565, 7.730979327458678,
        5.157402414285178, 0.79962718058494, 4.506980546896023, 2.991745206763932, 7.135937902734279,
        7.565963241386078, 5.529390144491201, 8.20725877349739, 6.519698387673004, 7.140613248546799,
        7.014665448596132, 8.1464688294571, 4.888377504864274, 5.167110025110268, 10.76238383212238,
        8.215441656552438, 7.5729457696780225, 7.034710597500004, 1.450277000860242, 2.2132032348629127,
        4.2963535661038685, 2.056058539519827, 8.835557452755431, 8.357051412727103, 8.19047090271037,
        8.194774726987546, 8.938325152420491, 7.084306175665259, 10.152860399480305, 6.134522599810833,
        3.397823534921721, 5.62714178883084, 7.536244639797198, 9.309458387399312, 7.278555265762625,
        8.135025571799511, 10.383162443233548, 3.803972471007536, 6.97555238126175, 3.8325319271901037,
        9.78948565309333, 5.402693258856749, 2.3056847596616463, 4.906659494299399, 8.472158261745776,
        3.7480057836454987, 3.7657735351389396, 4.321900399915539, 5.909297552792044, -0.8738464155253176,
        4.585311314606, 6.508064480187332, 5.607762612189097, 4.5796361032147095, 7.002377422453191,
        2.2279007962321433, 3.5367909079060365, 1.186954491348613, 0.5049414225175592, 7.126927459812217,
        2.648166899173314, 2.3994939393735644, 8.228696189197553, 8.174514666891005, 3.1346668744291275,
        1.4588162299303358, 5.405980127357105, 8.48854613631783, 9.800696221731553, 8.88392021747881,
        10.051273762986227, 7.700802232276085, 3.8636105323164314, 5.80693278350417, 10.31383677810785,
        7.512274759320906, 7.466983307093374, 1.5514253880640654, 5.815001122176856, 6.29098161159528,
        5.428385697881127, 9.736704340091832, 11.36036307673737, 5.235038269305912, 9.77664787788472,
        2.6507888102769455, 5.225182703338849, 4.0554606836778575, 2.339283037164515, 3.544510726352878};

    // Source: SciPy tutorial "Shapiro-Wilk test for normality" (scipy.github.io devdocs, tutorial/stats/
    // hypothesis_shapiro), data of Shapiro & Wilk (1965): printed statistic 0.7888146948631716. The p-value
    // 0.006703814061898823 is SciPy 1.17.1's scipy.stats.shapiro on the same data (AS R94, n ≤ 11 branch).
    @Test
    void shapiroWilkWeightsOfMen() {
        ShapiroWilk test = ShapiroWilk.test(WEIGHTS);
        assertEquals(11, test.n());
        assertRelative(0.7888146948631716, test.w(), 1e-9);
        assertRelative(0.006703814061898823, test.p(), 1e-7);
    }

    // Source: SciPy reference guide 1.0–1.5, scipy.stats.shapiro example, printed (0.9772805571556091,
    // 0.08144091814756393); SciPy then computed in single precision (AS R94 in Fortran REAL), so only about
    // 6 digits of W and 4 of p are meaningful. SciPy 1.17.1 (double precision) gives 0.9772802703336818 and
    // 0.08143656214213908 on the same data, checked more tightly (n ≥ 12 branch).
    @Test
    void scipyDocumentedSeededSample() {
        ShapiroWilk test = ShapiroWilk.test(SCIPY_SEEDED);
        assertEquals(100, test.n());
        assertEquals(0.9772805571556091, test.w(), 5e-7);
        assertEquals(0.08144091814756393, test.p(), 2e-5);
        assertRelative(0.9772802703336818, test.w(), 1e-9);
        assertRelative(0.08143656214213908, test.p(), 1e-7);
    }

    // Source: hand arithmetic for n = 3 (a = (−√½, 0, √½)): for 1, 2, 4 the mean is 7/3, Σ(x − x̄)² = 42/9,
    // (a·x)² = 3²/2, so W = 4.5/(42/9) = 27/28; the exact p = (6/π)(arcsin √W − arcsin √¾) (Royston 1995).
    // SciPy 1.17.1 prints 0.9642857142857142 and 0.6368868450289689.
    @Test
    void threeValuesExactly() {
        ShapiroWilk test = ShapiroWilk.test(new double[] {4, 1, 2});
        assertEquals(27.0 / 28, test.w(), 1e-15);
        assertEquals(6 / Math.PI * (Math.asin(Math.sqrt(27.0 / 28)) - Math.asin(Math.sqrt(0.75))), test.p(), 1e-14);
        assertEquals(0.6368868450289689, test.p(), 1e-13);
    }

    // Source: SciPy 1.17.1 scipy.stats.shapiro on these data (covering n = 4, 5 with one polynomial
    // coefficient, n = 6 with two, and n = 12, the first of the large-sample branch).
    @Test
    void smallSamplesAgreeWithScipy() {
        assertAgrees(new double[] {2.1, 3.3, 3.4, 7.9}, 0.8196515993999044, 0.14238821845931127);
        assertAgrees(new double[] {1, 2, 3, 5, 11}, 0.8595548540075811, 0.226654529300439);
        assertAgrees(new double[] {10.2, 9.8, 10.5, 10.1, 9.9, 12.6}, 0.7099773196551167, 0.00786143108531255);
        assertAgrees(new double[] {3.1, 2.7, 3.3, 2.9, 3.0, 3.6, 2.8, 3.2, 3.4, 2.6, 3.1, 3.9},
                0.9715548449677659, 0.9263900199975519);
    }

    // Source: property of the test (Shapiro & Wilk 1965) — expected normal order statistics (Blom scores
    // Φ⁻¹((i − 3/8)/(n + 1/4)), from Commons Math) are as normal as a sample can look: W near 1, p large.
    @Test
    void normalScoresLookNormal() {
        for (int n : new int[] {8, 20, 50, 500}) {
            ShapiroWilk test = ShapiroWilk.test(blomScores(n));
            assertTrue(test.w() > 0.98 && test.w() <= 1, () -> "n = " + n + ": W = " + test.w());
            assertTrue(test.p() > 0.5, () -> "n = " + n + ": p = " + test.p());
        }
    }

    // Source: property of the test — quantiles of the exponential distribution, −ln(1 − (i − 3/8)/(n + 1/4)),
    // are strongly right-skewed: W well below 1 and p < 0.001 for a sample of 40 or more.
    @Test
    void skewedDataAreRejected() {
        for (int n : new int[] {40, 200}) {
            double[] values = new double[n];
            for (int i = 0; i < n; i++) {
                values[i] = -Math.log(1 - (i + 1 - 0.375) / (n + 0.25));
            }
            ShapiroWilk test = ShapiroWilk.test(values);
            assertTrue(test.w() > 0 && test.w() < 0.9, () -> "n = " + n + ": W = " + test.w());
            assertTrue(test.p() < 0.001, () -> "n = " + n + ": p = " + test.p());
        }
    }

    // Source: definition — W is a correlation, unchanged by a change of location and positive scale and by
    // the order the values come in.
    @Test
    void invariantUnderLocationScaleAndOrder() {
        ShapiroWilk reference = ShapiroWilk.test(WEIGHTS);
        double[] changed = new double[WEIGHTS.length];
        for (int i = 0; i < WEIGHTS.length; i++) {
            changed[WEIGHTS.length - 1 - i] = 1e4 + 0.0254 * WEIGHTS[i];
        }
        ShapiroWilk moved = ShapiroWilk.test(changed);
        assertEquals(reference.w(), moved.w(), 1e-12);
        assertEquals(reference.p(), moved.p(), 1e-10);
    }

    @Test
    void preconditions() {
        assertThrows(IllegalArgumentException.class, () -> ShapiroWilk.test(new double[] {1, 2}));
        assertThrows(IllegalArgumentException.class, () -> ShapiroWilk.test(new double[5001]));
        assertThrows(IllegalArgumentException.class, () -> ShapiroWilk.test(new double[] {3, 3, 3, 3}));
        assertThrows(IllegalArgumentException.class, () -> ShapiroWilk.test(new double[] {1, 2, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> new ShapiroWilk(10, 0, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new ShapiroWilk(10, 0.9, -0.1));
        assertThrows(IllegalArgumentException.class, () -> new ShapiroWilk(2, 0.9, 0.5));
        // The limits themselves are allowed.
        assertEquals(5000, ShapiroWilk.test(blomScores(5000)).n());
    }

    private static double[] blomScores(int n) {
        NormalDistribution normal = new NormalDistribution(null, 0, 1, 1e-12);
        double[] scores = new double[n];
        for (int i = 0; i < n; i++) {
            scores[i] = normal.inverseCumulativeProbability((i + 1 - 0.375) / (n + 0.25));
        }
        return scores;
    }

    private static void assertAgrees(double[] values, double w, double p) {
        ShapiroWilk test = ShapiroWilk.test(values);
        assertRelative(w, test.w(), 1e-9);
        assertRelative(p, test.p(), 1e-7);
    }

    private static void assertRelative(double expected, double actual, double tolerance) {
        assertEquals(expected, actual, tolerance * Math.abs(expected), () -> "expected " + expected + " but was " + actual);
    }
}
