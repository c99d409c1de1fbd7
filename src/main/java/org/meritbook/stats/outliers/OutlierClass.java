package org.meritbook.stats.outliers;

/**
 * How an outlier test judges the item it tested, in ISO 5725-2's terms (§7.3.2, from memory): at
 * or below the 5 % critical value the item is accepted as correct; above it and at or below the 1 %
 * critical value it is a straggler (ISO marks it with one asterisk); above the 1 % critical value
 * a statistical outlier (two asterisks).
 */
public enum OutlierClass {
    /** Statistic ≤ 5 % critical value. */
    CONSISTENT,
    /** 5 % critical value &lt; statistic ≤ 1 % critical value. */
    STRAGGLER,
    /** Statistic &gt; 1 % critical value. */
    OUTLIER;

    /** The class of a statistic against its 5 % and 1 % critical values. */
    public static OutlierClass of(double statistic, double critical5, double critical1) {
        if (!(critical5 <= critical1)) {
            throw new IllegalArgumentException("the 5 % critical value must not exceed the 1 % one, but "
                    + critical5 + " > " + critical1);
        }
        if (statistic > critical1) {
            return OUTLIER;
        }
        return statistic > critical5 ? STRAGGLER : CONSISTENT;
    }
}
