package org.meritbook.stats.limits;

import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.distributions.StudentT;

/**
 * The US EPA method detection limit from method blanks, MDL_b, by the rule the blanks allow.
 *
 * <p>Rules (40 CFR Part 136 Appendix B, Revision 2, 2017, the method-blank part of the initial MDL;
 * our reading, from memory), for n ≥ 7 method blanks:
 * <ul>
 *   <li>No blank gives a numerical result: MDL_b does not apply ({@link #of} returns empty).</li>
 *   <li>Some, not all, give numbers, n &lt; 100: MDL_b is the highest blank result. With n ≥ 100:
 *       the blanks are ranked (those without a number lowest) and MDL_b is the result of rank
 *       n·0.99 rounded to the nearest whole number (e.g. rank 162 of 164). When that rank falls on a
 *       blank without a number, the 99th percentile of the blanks gives no number, and MDL_b does not
 *       apply either ({@link FromRankedResult}).</li>
 *   <li>All give numbers: MDL_b = X̄ + t(n − 1, 0.99)·S_b, with X̄ taken as zero when the mean is
 *       negative ({@link FromMeanAndSd}). (The procedure also allows the 99th percentile here; this
 *       class uses the formula.)</li>
 * </ul>
 * A blank "giving no numerical result" is one reported as not detected or below a reporting level;
 * such entries are never turned into numbers: the caller passes the numeric results and the count
 * of the others.
 */
public sealed interface BlankMdl permits BlankMdl.FromMeanAndSd, BlankMdl.FromRankedResult {
    /** The fewest method blanks the procedure accepts. */
    int MINIMUM = 7;
    /** From this many blanks on, a ranked result replaces the highest one. */
    int RANKED_FROM = 100;

    /** MDL_b. */
    double mdl();

    /** n, all method blanks, with or without a numerical result. */
    int blankCount();

    /**
     * Every blank gave a number: MDL_b = max(X̄, 0) + t(n − 1, 0.99)·S_b.
     *
     * @param blanks   the blank results' n, mean and SD
     * @param meanUsed max(X̄, 0)
     * @param t        t(n − 1, 0.99)
     * @param mdl      meanUsed + t·S_b
     */
    record FromMeanAndSd(SampleSummary blanks, double meanUsed, double t, double mdl) implements BlankMdl {
        public FromMeanAndSd {
            Objects.requireNonNull(blanks, "blanks");
            if (blanks.n() < MINIMUM || meanUsed != Math.max(0, blanks.mean())
                    || t != new StudentT(blanks.degreesOfFreedom()).quantile(SpikedMdl.LEVEL)
                    || mdl != meanUsed + t * blanks.sd()) {
                throw new IllegalArgumentException("MDL_b must be max(X̄, 0) + t(n − 1, 0.99)·S_b over at least 7 blanks");
            }
        }

        @Override
        public int blankCount() {
            return blanks.n();
        }
    }

    /**
     * Some blanks gave no number: MDL_b is the blank result of a rank.
     *
     * @param blankCount   n, all blanks
     * @param numericCount those with a numerical result (fewer than n)
     * @param rank         the rank used (1 = lowest): n below 100 blanks, else round(0.99·n)
     * @param mdl          the result of that rank
     */
    record FromRankedResult(int blankCount, int numericCount, int rank, double mdl) implements BlankMdl {
        public FromRankedResult {
            if (blankCount < MINIMUM || numericCount < 1 || numericCount >= blankCount
                    || rank != rankFor(blankCount) || rank <= blankCount - numericCount) {
                throw new IllegalArgumentException("a ranked MDL_b needs at least 7 blanks, some but not all numeric, and "
                        + "a rank that falls on a numeric result");
            }
            SampleChecks.finite("MDL_b", mdl);
        }
    }

    /**
     * MDL_b by the rule the blanks allow.
     *
     * @param numericResults   the blanks that gave a numerical result (finite)
     * @param nonNumericCount  how many gave none
     * @return MDL_b, or empty when the procedure gives none (no numerical blank result, or the ranked
     *         result has none)
     * @throws UnusableDataException {@code TOO_FEW_VALUES} below 7 blanks in all, {@code NOT_FINITE}
     */
    static Optional<BlankMdl> of(double[] numericResults, int nonNumericCount) {
        Objects.requireNonNull(numericResults, "numericResults");
        if (nonNumericCount < 0) {
            throw new IllegalArgumentException("a count of blanks cannot be negative: " + nonNumericCount);
        }
        double[] numeric = SampleChecks.finiteCopy("the method-blank results", numericResults, 0);
        int n = numeric.length + nonNumericCount;
        if (n < MINIMUM) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "MDL_b needs at least " + MINIMUM + " method blanks, but there are " + n);
        }
        if (numeric.length == 0) {
            return Optional.empty();
        }
        if (nonNumericCount == 0) {
            SampleSummary s = SampleSummary.of(numeric);
            double t = new StudentT(s.degreesOfFreedom()).quantile(SpikedMdl.LEVEL);
            double mean = Math.max(0, s.mean());
            return Optional.of(new FromMeanAndSd(s, mean, t, mean + t * s.sd()));
        }
        int rank = rankFor(n);
        int indexAmongNumeric = rank - nonNumericCount - 1;
        if (indexAmongNumeric < 0) {
            return Optional.empty();
        }
        Arrays.sort(numeric);
        return Optional.of(new FromRankedResult(n, numeric.length, rank, numeric[indexAmongNumeric]));
    }

    /** The rank of MDL_b among n blanks with some non-numeric: n below 100, else round(0.99·n). */
    private static int rankFor(int n) {
        return n < RANKED_FROM ? n : (int) Math.round(0.99 * n);
    }
}
