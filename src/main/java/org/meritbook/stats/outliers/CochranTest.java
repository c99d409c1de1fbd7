package org.meritbook.stats.outliers;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.distributions.FisherF;

/**
 * Cochran's test for one group variance too large compared with the others (runs, days or
 * laboratories, each with replicates).
 *
 * <p>Statistic and critical value (Cochran, Ann. Eugenics 11, 47–52, 1941; ISO 5725-2:2019 §7.3.3):
 * <pre>
 *   C = s²_max / Σ sᵢ²                                         over the k groups
 *   C_crit(α) = 1 / (1 + (k − 1) / F),   F = F(1 − α/k; n − 1, (k − 1)(n − 1))
 * </pre>
 * F the upper α/k point of Fisher's F: C &gt; c exactly when the largest variance over the mean of
 * the others exceeds (k − 1)(1/c − 1)⁻¹, an F(n − 1, (k − 1)(n − 1)) ratio for equal groups, and the
 * Bonferroni factor k makes it a test of the largest of k. The formula reproduces the printed
 * ISO 5725-2 table within one unit of its third decimal (tests).
 *
 * <p>Unequal group sizes: the distribution is derived for groups of one size n. Following ISO
 * 5725-2 §7.3.3 (from memory: the criterion is applied "using for n the number of test results
 * occurring in the majority of cells"), n is then the most frequent group size; when two sizes are
 * equally frequent, the smaller, whose critical value is the larger, so that unequal sizes never make
 * a group easier to flag. {@link #sizeRule()} states which case applied. Preconditions: k ≥ 2
 * groups, each with at least 2 values, not every group constant; normal data within groups.
 *
 * @param groupCount   k
 * @param groupSize    the n used for the critical values
 * @param sizeRule     whether the groups were equal or n is the most frequent size
 * @param variances    sᵢ², in the order given
 * @param suspectIndex position (0-based) of the largest variance (the first, on a tie)
 * @param statistic    C
 * @param critical5    C_crit at α = 0.05
 * @param critical1    C_crit at α = 0.01
 * @param judgement    consistent, straggler or outlier
 */
public record CochranTest(int groupCount, int groupSize, GroupSizeRule sizeRule, List<Double> variances,
        int suspectIndex, double statistic, double critical5, double critical1, OutlierClass judgement) {

    /** How the group size of the critical value was chosen. */
    public enum GroupSizeRule {
        /** Every group has the same number of values. */
        EQUAL,
        /** Sizes differ; n is the size most groups have (the smaller of equally frequent sizes). */
        MOST_FREQUENT
    }

    public CochranTest {
        Objects.requireNonNull(sizeRule, "sizeRule");
        variances = List.copyOf(variances);
        if (groupCount < 2 || variances.size() != groupCount || groupSize < 2) {
            throw new IllegalArgumentException("Cochran's test needs k ≥ 2 variances and n ≥ 2, but k = " + groupCount
                    + " with " + variances.size() + " variances, n = " + groupSize);
        }
        if (suspectIndex < 0 || suspectIndex >= groupCount) {
            throw new IllegalArgumentException("the suspect must be one of the groups, but is " + suspectIndex);
        }
        if (!(statistic >= 1.0 / groupCount * (1 - 1e-12) && statistic <= 1)) {
            throw new IllegalArgumentException("C must lie in [1/k, 1], but is " + statistic);
        }
        if (judgement != OutlierClass.of(statistic, critical5, critical1)) {
            throw new IllegalArgumentException("the judgement must follow from C and its critical values");
        }
    }

    /**
     * Tests the largest group variance.
     *
     * @param groups the replicates of each group; at least 2 groups, each with at least 2 finite values
     * @throws UnusableDataException {@code TOO_FEW_VALUES}, {@code NOT_FINITE}, or {@code NO_VARIATION}
     *                               when every group is constant (Σs² = 0)
     */
    public static CochranTest of(List<double[]> groups) {
        Objects.requireNonNull(groups, "groups");
        if (groups.size() < 2) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "Cochran's test needs at least 2 groups, but there are " + groups.size());
        }
        List<Double> variances = new ArrayList<>();
        Map<Integer, Integer> frequency = new HashMap<>();
        double sum = 0;
        int suspect = 0;
        for (int i = 0; i < groups.size(); i++) {
            double[] g = SampleChecks.finiteCopy("group " + (i + 1), groups.get(i), 2);
            double v = SampleSummary.of(g).variance();
            variances.add(v);
            sum += v;
            if (v > variances.get(suspect)) {
                suspect = i;
            }
            frequency.merge(g.length, 1, Integer::sum);
        }
        if (!(sum > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "Cochran's test needs some spread within the groups, but every group's replicates are identical");
        }
        int n = 0;
        int most = 0;
        for (Map.Entry<Integer, Integer> e : frequency.entrySet()) {
            if (e.getValue() > most || e.getValue() == most && e.getKey() < n) {
                n = e.getKey();
                most = e.getValue();
            }
        }
        int k = groups.size();
        double c = Math.min(1, variances.get(suspect) / sum);
        double c5 = criticalValue(k, n, 0.05);
        double c1 = criticalValue(k, n, 0.01);
        GroupSizeRule rule = frequency.size() == 1 ? GroupSizeRule.EQUAL : GroupSizeRule.MOST_FREQUENT;
        return new CochranTest(k, n, rule, variances, suspect, c, c5, c1, OutlierClass.of(c, c5, c1));
    }

    /**
     * The critical value C_crit(α) for k groups of n values.
     *
     * @throws IllegalArgumentException when k &lt; 2, n &lt; 2 or α is not in (0, 1)
     */
    public static double criticalValue(int k, int n, double alpha) {
        if (k < 2 || n < 2) {
            throw new IllegalArgumentException("Cochran's critical value needs k ≥ 2 groups of n ≥ 2, but k = " + k
                    + ", n = " + n);
        }
        SampleChecks.openUnit("the significance level", alpha);
        double f = new FisherF(n - 1, (double) (k - 1) * (n - 1)).upperQuantile(alpha / k);
        return 1 / (1 + (k - 1) / f);
    }
}
