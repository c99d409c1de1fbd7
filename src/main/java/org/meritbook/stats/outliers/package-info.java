/**
 * Outlier screening as ISO 5725-2 §7.3 describes it: Grubbs' test for one extreme value ({@link
 * org.meritbook.stats.outliers.GrubbsTest}, single, two-sided) and Cochran's test for one extreme
 * group variance ({@link org.meritbook.stats.outliers.CochranTest}), each judged at the 5 % and 1 %
 * levels into an {@link org.meritbook.stats.outliers.OutlierClass} (consistent, straggler, outlier).
 * The critical values come from closed formulas over the t and F distributions, not from tables.
 *
 * <p>These tests flag; they never remove. Removal is the analyst's recorded decision. (Outlier tests
 * live here rather than in {@code stats.tests} because they come as a family with their own
 * classification and critical values, and the analyses that screen with them look for them by
 * that name.)
 */
package org.meritbook.stats.outliers;
