/**
 * Pure statistics on plain {@code double[]} data: straight-line and quadratic calibration by
 * ordinary and weighted least squares ({@link org.meritbook.stats.LeastSquares},
 * {@link org.meritbook.stats.LineFit}, {@link org.meritbook.stats.QuadraticFit}), the linearity
 * tests ({@link org.meritbook.stats.LackOfFit}, {@link org.meritbook.stats.MandelTest}), normality of
 * residuals ({@link org.meritbook.stats.ShapiroWilk}), the statistical choices as types
 * ({@link org.meritbook.stats.Weighting}, {@link org.meritbook.stats.LineModel}), and intervals
 * ({@link org.meritbook.stats.Interval}).
 * Distributions come from Apache Commons Math.
 *
 * <p>This package knows nothing of workbooks, cells, trails or text formatting: callers convert
 * at its edge, and it reports unusable data with {@link IllegalArgumentException} before any
 * result exists, so no NaN leaves it. Each formula is documented, with its reference and
 * preconditions, where it is computed.
 */
package org.meritbook.stats;
