/**
 * Pure statistics on plain {@code double[]} data, organised by family: {@code stats.regression}
 * (straight-line and quadratic least squares, weighted and unweighted, the linearity tests that
 * belong to a fit: lack of fit, Mandel, and inverse prediction of unknowns), {@code stats.tests}
 * (tests of a sample: normality, the one-sample t test), {@code stats.outliers} (Grubbs, Cochran),
 * {@code stats.descriptive} (mean, SD, their intervals), {@code stats.anova} (one-way ANOVA,
 * variance components, ISO 5725-2 limits, Horwitz), {@code stats.limits} (detection and
 * quantitation limits by each published procedure) and {@code stats.distributions} (t, F,
 * chi-square, normal over Apache Commons Math). Shared here: {@link org.meritbook.stats.Interval},
 * the precondition checks {@link org.meritbook.stats.SampleChecks} and {@link
 * org.meritbook.stats.UnusableDataException}.
 *
 * <p>These packages know nothing of workbooks, cells, trails or text formatting: callers convert
 * at their edge, and they report unusable data with {@link IllegalArgumentException} before any
 * result exists, so no NaN leaves them; where the data (not the caller) are at fault the exception
 * is an {@link org.meritbook.stats.UnusableDataException} carrying a reason key. Each formula is
 * documented, with its reference and preconditions, where it is computed.
 */
package org.meritbook.stats;
