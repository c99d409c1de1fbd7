package org.meritbook.stats.anova;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.Moments;
import org.meritbook.stats.distributions.FisherF;

/**
 * One-way analysis of variance of k groups (runs, days, analysts, laboratories) of unequal size.
 *
 * <p>Formulas (group i has nᵢ values xᵢⱼ and mean x̄ᵢ; N = Σnᵢ; grand mean x̄ = Σnᵢx̄ᵢ / N):
 * <pre>
 *   SS_between = Σ nᵢ (x̄ᵢ − x̄)²      df_between = k − 1     MS_between = SS_between / df_between
 *   SS_within  = Σᵢ Σⱼ (xᵢⱼ − x̄ᵢ)²    df_within  = N − k     MS_within  = SS_within / df_within
 *   F = MS_between / MS_within,  p = P(F(k − 1, N − k) ≥ F)
 *   R² = SS_between / (SS_between + SS_within),  residual SD = √MS_within
 * </pre>
 * Reference: Montgomery, <i>Design and Analysis of Experiments</i>, ch. 3; ISO 5725-2:2019, §7.4;
 * NIST StRD ANOVA (Simon &amp; Lesage 1989).
 *
 * <p>Numerics: all values are first centred on their two-pass grand mean (an exact subtraction
 * when a value lies within a factor 2 of it), group means and within-group sums of squares are
 * then formed by {@link Moments} (corrected two-pass, compensated sums), and SS_between from the
 * centred group means, so constant leading digits never enter a square. Measured (tests, log
 * relative error): on NIST's eleven ANOVA sets centred exactly in decimal before conversion to
 * doubles, every certified figure (SS, MS, F, R², residual SD) to at least 14.5 digits, SmLs07–09
 * with their 13 constant leading digits included. On the doubles nearest the printed data the
 * exact sums of squares of those doubles are reproduced to 15.7 digits or more, but the doubles
 * themselves have lost digits: against the certificate SmLs07–09 then reach only 3.9 to 4.4
 * digits, AtmWtAg and SmLs04–06 9.9 to 10.9. A workbook holding such data has the same limit.
 *
 * @param groupSizes nᵢ, in the order the groups were given
 * @param groupMeans x̄ᵢ
 * @param grandMean  x̄, the mean of all N values
 * @param dfBetween  k − 1
 * @param dfWithin   N − k
 * @param ssBetween  between-group sum of squares
 * @param ssWithin   within-group sum of squares (positive)
 * @param msBetween  SS_between / df_between
 * @param msWithin   SS_within / df_within
 * @param f          MS_between / MS_within
 * @param p          upper-tail probability of f
 * @param rSquared   SS_between / SS_total
 * @param residualSd √MS_within
 */
public record OneWayAnova(List<Integer> groupSizes, List<Double> groupMeans, double grandMean, int dfBetween,
        int dfWithin, double ssBetween, double ssWithin, double msBetween, double msWithin, double f, double p,
        double rSquared, double residualSd) {

    public OneWayAnova {
        groupSizes = List.copyOf(groupSizes);
        groupMeans = List.copyOf(groupMeans);
        int k = groupSizes.size();
        if (k < 2 || groupMeans.size() != k) {
            throw new IllegalArgumentException("an ANOVA needs at least 2 groups with one mean each, but has "
                    + k + " sizes and " + groupMeans.size() + " means");
        }
        int total = 0;
        for (int size : groupSizes) {
            if (size < 1) {
                throw new IllegalArgumentException("every group must have a value, but one has " + size);
            }
            total += size;
        }
        for (double m : groupMeans) {
            SampleChecks.finite("a group mean", m);
        }
        if (dfBetween != k - 1 || dfWithin != total - k) {
            throw new IllegalArgumentException("degrees of freedom must be " + (k - 1) + " and " + (total - k)
                    + ", but are " + dfBetween + " and " + dfWithin);
        }
        SampleChecks.finite("the grand mean", grandMean);
        requireNonNegative("SS between", ssBetween);
        requireNonNegative("MS between", msBetween);
        requireNonNegative("F", f);
        if (!(ssWithin > 0) || !(msWithin > 0) || Double.isInfinite(ssWithin) || Double.isInfinite(msWithin)) {
            throw new IllegalArgumentException("SS and MS within must be positive and finite, but are " + ssWithin
                    + " and " + msWithin);
        }
        if (!(p >= 0 && p <= 1) || !(rSquared >= 0 && rSquared <= 1)) {
            throw new IllegalArgumentException("p and R² must lie in [0, 1], but are " + p + " and " + rSquared);
        }
        requireNonNegative("residual SD", residualSd);
    }

    /**
     * The ANOVA of the given groups.
     *
     * @param groups the values of each group; at least 2 groups, each with at least 1 finite value,
     *               and at least one group with 2 or more (so that N − k ≥ 1)
     * @throws UnusableDataException {@code TOO_FEW_VALUES} for fewer groups or within-group degrees of
     *                               freedom, {@code NOT_FINITE}, or {@code NO_VARIATION} when every
     *                               group's replicates are identical (MS_within = 0, so F is undefined)
     */
    public static OneWayAnova of(List<double[]> groups) {
        Objects.requireNonNull(groups, "groups");
        if (groups.size() < 2) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "an analysis of variance needs at least 2 groups, but there are " + groups.size());
        }
        List<double[]> checked = new ArrayList<>();
        int total = 0;
        for (int i = 0; i < groups.size(); i++) {
            double[] g = SampleChecks.finiteCopy("group " + (i + 1), groups.get(i), 1);
            checked.add(g);
            total += g.length;
        }
        int k = checked.size();
        if (total - k < 1) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "the within-group variance needs a group with at least 2 values, but every one of the " + k
                            + " groups has 1");
        }
        double[] all = new double[total];
        int at = 0;
        for (double[] g : checked) {
            System.arraycopy(g, 0, all, at, g.length);
            at += g.length;
        }
        double centre = Moments.mean(all);

        List<Integer> sizes = new ArrayList<>();
        double[] centredMeans = new double[k];
        double ssWithin = 0;
        double weightedSum = 0;
        for (int i = 0; i < k; i++) {
            double[] d = checked.get(i).clone();
            for (int j = 0; j < d.length; j++) {
                d[j] -= centre;
            }
            centredMeans[i] = Moments.mean(d);
            ssWithin += Moments.sumOfSquares(d, centredMeans[i]);
            weightedSum += d.length * centredMeans[i];
            sizes.add(d.length);
        }
        double centredGrand = weightedSum / total;
        double ssBetween = 0;
        List<Double> means = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            double dev = centredMeans[i] - centredGrand;
            ssBetween += sizes.get(i) * dev * dev;
            means.add(centre + centredMeans[i]);
        }
        if (!(ssWithin > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "the replicates within every group are identical, so the within-group variance is 0 and F is undefined");
        }
        int dfBetween = k - 1;
        int dfWithin = total - k;
        double msBetween = ssBetween / dfBetween;
        double msWithin = ssWithin / dfWithin;
        double f = msBetween / msWithin;
        double p = new FisherF(dfBetween, dfWithin).upperTail(f);
        double rSquared = ssBetween / (ssBetween + ssWithin);
        return new OneWayAnova(sizes, means, centre + centredGrand, dfBetween, dfWithin, ssBetween, ssWithin,
                msBetween, msWithin, f, p, rSquared, Math.sqrt(msWithin));
    }

    /** k, the number of groups. */
    public int groupCount() {
        return groupSizes.size();
    }

    /** N, the number of values. */
    public int totalCount() {
        return dfWithin + groupSizes.size();
    }

    /** SS_between + SS_within. */
    public double ssTotal() {
        return ssBetween + ssWithin;
    }

    private static void requireNonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and not negative, but is " + value);
        }
    }
}
