/**
 * Pure statistics on plain {@code double[]} data, organised by family: {@code stats.regression}
 * (straight-line and quadratic least squares, weighted and unweighted, and the linearity tests that
 * belong to a fit: lack of fit, Mandel), {@code stats.tests} (tests of a sample: normality,
 * outliers), and, as the figures of merit grow, ANOVA and variance components, detection limits,
 * descriptive statistics and distributions in their own sub-packages. Shared here: {@link
 * org.meritbook.stats.Interval}. Distributions come from Apache Commons Math.
 *
 * <p>These packages know nothing of workbooks, cells, trails or text formatting: callers convert
 * at their edge, and they report unusable data with {@link IllegalArgumentException} before any
 * result exists, so no NaN leaves them. Each formula is documented, with its reference and
 * preconditions, where it is computed.
 */
package org.meritbook.stats;
