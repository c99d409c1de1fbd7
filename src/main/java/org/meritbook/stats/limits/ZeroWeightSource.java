package org.meritbook.stats.limits;

/**
 * Which weight the variance of a blank measurement takes in a weighted calibration's prediction
 * band at zero. Weights 1/x or 1/x² give a blank infinite weight (zero variance), which no blank
 * has; so when the weighting defines no finite weight at x = 0 the weight of the lowest
 * calibration standard stands in, which overstates rather than understates a blank's variance when
 * the variance falls towards zero (a conservative, larger critical value).
 */
public enum ZeroWeightSource {
    /** An unweighted fit: every weight is 1. */
    UNWEIGHTED,
    /** The weighting gives a finite weight at x = 0 (e.g. 1/y with a positive intercept). */
    AT_ZERO,
    /** The weighting gives none at x = 0; the weight at the lowest standard is used. */
    AT_LOWEST_STANDARD
}
