package org.meritbook.stats.outliers;

import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.distributions.StudentT;

/**
 * Grubbs' test for a single outlier, two-sided: is the value farthest from the mean too far?
 *
 * <p>Statistic and critical value (Grubbs, Technometrics 11, 1–21, 1969; ISO 5725-2:2019 §7.3.4;
 * NIST/SEMATECH e-Handbook of Statistical Methods §1.3.5.17):
 * <pre>
 *   G = max |xᵢ − x̄| / s                                          (s with divisor n − 1)
 *   G_crit(α) = ((n − 1)/√n) · √( t² / (n − 2 + t²) ),  t = t(1 − α/(2n); n − 2)
 * </pre>
 * the upper α/(2n) quantile of Student's t making the test two-sided (either end may be tested).
 * The formula is the Bonferroni bound of the exact distribution, from which the published tables are
 * computed; it reproduces the printed ISO 5725-2 table within one unit of its third decimal (tests). G
 * can never exceed (n − 1)/√n. When two values are equally far from the mean, the first one given is
 * the suspect. Preconditions: n ≥ 3, the values not all equal; the test assumes the other values
 * are a normal sample, and is meant for one suspect at a time.
 *
 * @param n            number of values
 * @param mean         x̄
 * @param sd           s
 * @param suspectIndex position (0-based, in the order given) of the value farthest from x̄
 * @param suspect      that value
 * @param statistic    G
 * @param critical5    G_crit at α = 0.05
 * @param critical1    G_crit at α = 0.01
 * @param judgement    consistent, straggler or outlier
 */
public record GrubbsTest(int n, double mean, double sd, int suspectIndex, double suspect, double statistic,
        double critical5, double critical1, OutlierClass judgement) {

    /** Fewest values the test is defined for. */
    public static final int MINIMUM = 3;

    public GrubbsTest {
        if (n < MINIMUM || suspectIndex < 0 || suspectIndex >= n) {
            throw new IllegalArgumentException("Grubbs' test needs n ≥ 3 and a suspect among the values, but n = " + n
                    + ", suspect at " + suspectIndex);
        }
        SampleChecks.finite("the mean", mean);
        SampleChecks.finite("the suspect value", suspect);
        if (!(sd > 0) || Double.isInfinite(sd)) {
            throw new IllegalArgumentException("the SD must be positive, but is " + sd);
        }
        if (!(statistic >= 0) || statistic > (n - 1) / Math.sqrt(n) * (1 + 1e-12)) {
            throw new IllegalArgumentException("G must lie in [0, (n − 1)/√n], but is " + statistic);
        }
        if (judgement != OutlierClass.of(statistic, critical5, critical1)) {
            throw new IllegalArgumentException("the judgement must follow from G and its critical values");
        }
    }

    /**
     * Tests the value farthest from the mean.
     *
     * @throws UnusableDataException {@code TOO_FEW_VALUES} below 3 values, {@code NOT_FINITE}, or
     *                               {@code NO_VARIATION} when all values are equal (G undefined)
     */
    public static GrubbsTest of(double[] values) {
        SampleSummary s = SampleSummary.of(SampleChecks.finiteCopy("Grubbs' test", values, MINIMUM));
        if (s.sd() == 0) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "Grubbs' test needs values that differ, but all " + s.n() + " are equal");
        }
        int suspect = 0;
        for (int i = 1; i < values.length; i++) {
            if (Math.abs(values[i] - s.mean()) > Math.abs(values[suspect] - s.mean())) {
                suspect = i;
            }
        }
        double g = Math.abs(values[suspect] - s.mean()) / s.sd();
        double c5 = criticalValue(s.n(), 0.05);
        double c1 = criticalValue(s.n(), 0.01);
        return new GrubbsTest(s.n(), s.mean(), s.sd(), suspect, values[suspect], g, c5, c1, OutlierClass.of(g, c5, c1));
    }

    /**
     * The two-sided critical value G_crit(α) for n values.
     *
     * @throws IllegalArgumentException when n &lt; 3 or α is not in (0, 1)
     */
    public static double criticalValue(int n, double alpha) {
        if (n < MINIMUM) {
            throw new IllegalArgumentException("Grubbs' critical value needs n ≥ 3, but n = " + n);
        }
        SampleChecks.openUnit("the significance level", alpha);
        double t = new StudentT(n - 2).quantile(1 - alpha / (2.0 * n));
        return (n - 1) / Math.sqrt(n) * Math.sqrt(t * t / (n - 2 + t * t));
    }
}
