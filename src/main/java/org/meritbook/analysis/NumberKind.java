package org.meritbook.analysis;

/**
 * What kind of number a quantity is. It is set where the quantity is made, by the analysis that
 * knows what it computed, and the dossier rounds by it (docs/dossier.md); results.json does not carry it.
 */
public enum NumberKind {
    /** A number of things or degrees of freedom: shown as an integer. */
    COUNT,
    /** A probability from a test: 3 decimals, below 0.001 as "< 0.001". */
    P_VALUE,
    /** r, r² and the like, bounded by 1: 4 decimals, more while 4 would round a value below 1 to 1. */
    CORRELATION,
    /** A percentage (recovery, %CV, % deviation): 1 decimal, more for 2 significant figures. */
    PERCENT,
    /** A measured or fitted value in its unit (a concentration, a slope, an SD, a sum of squares). */
    MEASURE,
    /** A test statistic (F, t, G, C, W, a studentized residual). */
    STATISTIC,
    /** A dimensionless ratio of two like values (the Horwitz ratio). */
    RATIO;

    /** The kind a value has when its maker says no more than its unit: a percentage or a measure. */
    public static NumberKind ofUnit(String unit) {
        return "%".equals(unit) ? PERCENT : MEASURE;
    }

    /** Whether an interval sets the rounding of the value (it does not for counts, p-values and correlations). */
    public boolean roundedByInterval() {
        return this != COUNT && this != P_VALUE && this != CORRELATION;
    }
}
