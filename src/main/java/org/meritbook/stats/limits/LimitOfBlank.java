package org.meritbook.stats.limits;

import java.util.Arrays;
import java.util.Objects;
import java.util.OptionalDouble;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.descriptive.SampleSummary;

/**
 * The limit of blank, LoB: the highest result a blank is expected to give with 95 % probability
 * (the CLSI EP17 approach; EP17-A2, 2012, from memory).
 *
 * <p>Formulas, for B blank results:
 * <pre>
 *   parametric:       LoB = mean_B + 1.645·SD_B
 *   non-parametric:   rank r = 0.5 + 0.95·B among the results sorted ascending (rank 1 = lowest);
 *                     LoB = x₍⌊r⌋₎ + (r − ⌊r⌋)·(x₍⌊r⌋+1₎ − x₍⌊r⌋₎)
 * </pre>
 * 1.645 is the guideline's rounded z₀.₉₅ (1.64485); the printed constant is used so that a
 * reviewer's hand calculation agrees. The rank needs r ≤ B, so the non-parametric estimate needs
 * B ≥ 10; the guideline asks for many more (60 per reagent lot when establishing a LoB, from
 * memory: {@link #RECOMMENDED_BLANKS}), which a caller should check. Blank results below zero are
 * kept as reported (an instrument's negative readings are information, not errors). Which method
 * suits the data (e.g. by a normality test) is the caller's choice, recorded in {@link #method()}.
 *
 * @param method       parametric or non-parametric
 * @param blanks       the blank results' n, mean and SD (reported for both methods)
 * @param rankPosition r, for the non-parametric estimate only
 * @param lob          the limit of blank
 */
public record LimitOfBlank(LobMethod method, SampleSummary blanks, OptionalDouble rankPosition, double lob) {
    /** The one-sided 95 % normal quantile as the guideline prints it. */
    public static final double Z_95 = 1.645;
    /** The blank results EP17 recommends per reagent lot for establishing a LoB (from memory). */
    public static final int RECOMMENDED_BLANKS = 60;
    /** The fewest blanks for which the rank 0.5 + 0.95·B lies within the data. */
    public static final int NON_PARAMETRIC_MINIMUM = 10;

    public LimitOfBlank {
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(blanks, "blanks");
        Objects.requireNonNull(rankPosition, "rankPosition");
        SampleChecks.finite("the LoB", lob);
        if (rankPosition.isPresent() != (method == LobMethod.NON_PARAMETRIC)) {
            throw new IllegalArgumentException("a rank position belongs to the non-parametric LoB only");
        }
        if (method == LobMethod.PARAMETRIC && lob != blanks.mean() + Z_95 * blanks.sd()) {
            throw new IllegalArgumentException("the parametric LoB must be mean + 1.645·SD");
        }
        if (method == LobMethod.NON_PARAMETRIC && !(lob >= blanks.min() && lob <= blanks.max())) {
            throw new IllegalArgumentException("a non-parametric LoB must lie among the blank results");
        }
    }

    /**
     * LoB = mean_B + 1.645·SD_B.
     *
     * @throws org.meritbook.stats.UnusableDataException {@code TOO_FEW_VALUES} (B &lt; 2), {@code NOT_FINITE}
     */
    public static LimitOfBlank parametric(double[] blankResults) {
        SampleSummary s = SampleSummary.of(blankResults);
        return new LimitOfBlank(LobMethod.PARAMETRIC, s, OptionalDouble.empty(), s.mean() + Z_95 * s.sd());
    }

    /**
     * The 95th percentile of the blank results by rank 0.5 + 0.95·B, interpolated.
     *
     * @throws org.meritbook.stats.UnusableDataException {@code TOO_FEW_VALUES} (B &lt; 10), {@code NOT_FINITE}
     */
    public static LimitOfBlank nonParametric(double[] blankResults) {
        double[] sorted = SampleChecks.finiteCopy("the blank results", blankResults, NON_PARAMETRIC_MINIMUM);
        Arrays.sort(sorted);
        int b = sorted.length;
        double r = 0.5 + 0.95 * b;
        int lower = (int) Math.floor(r);
        double fraction = r - lower;
        double value = sorted[lower - 1];
        if (fraction > 0) {
            value += fraction * (sorted[lower] - sorted[lower - 1]);
        }
        return new LimitOfBlank(LobMethod.NON_PARAMETRIC, SampleSummary.of(sorted), OptionalDouble.of(r), value);
    }
}
