package org.meritbook.stats.tests;

import java.util.Objects;
import org.meritbook.stats.Interval;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.distributions.StudentT;

/**
 * The one-sample t test: does the mean of n results differ from a target (a certified value, 100 %
 * recovery)? Two-sided.
 *
 * <p>Formulas (Student 1908; Miller &amp; Miller, ch. 3; ISO 5725-4 for trueness):
 * <pre>
 *   t = (x̄ − μ₀) / (s / √n)       df = n − 1       p = P(|T_df| ≥ |t|)
 *   confidence interval of the mean:  x̄ ± t(1 − α/2; n − 1)·s/√n
 * </pre>
 * Preconditions: n ≥ 2 finite results that are not all equal (s &gt; 0), independent and normal.
 *
 * @param summary the sample's mean, SD and n
 * @param target  μ₀
 * @param t       the statistic
 * @param p       the two-sided p-value
 */
public record OneSampleTTest(SampleSummary summary, double target, double t, double p) {
    public OneSampleTTest {
        Objects.requireNonNull(summary, "summary");
        SampleChecks.finite("the target", target);
        SampleChecks.finite("t", t);
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("p must lie in [0, 1], but is " + p);
        }
        if (!(summary.sd() > 0)) {
            throw new IllegalArgumentException("a t test needs a positive SD, but it is " + summary.sd());
        }
    }

    /**
     * Tests the mean of {@code values} against {@code target}.
     *
     * @throws UnusableDataException {@code TOO_FEW_VALUES} (n &lt; 2), {@code NOT_FINITE}, or
     *                               {@code NO_VARIATION} when all results are equal (s = 0, t undefined)
     */
    public static OneSampleTTest of(double[] values, double target) {
        SampleSummary s = SampleSummary.of(values);
        SampleChecks.finite("the target", target);
        if (s.sd() == 0) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "a t test needs results that differ, but all " + s.n() + " are equal");
        }
        double t = (s.mean() - target) / s.standardError();
        return new OneSampleTTest(s, target, t, new StudentT(s.degreesOfFreedom()).twoSidedP(t));
    }

    /** n − 1. */
    public int degreesOfFreedom() {
        return summary.degreesOfFreedom();
    }

    /** The t confidence interval of the mean. */
    public Interval meanInterval(double level) {
        return summary.meanInterval(level);
    }
}
