/**
 * Calibration fits by ordinary and weighted least squares ({@link
 * org.meritbook.stats.regression.LeastSquares}): the straight line with or without intercept
 * ({@link org.meritbook.stats.regression.LineFit}), the quadratic by QR on centred, scaled x ({@link
 * org.meritbook.stats.regression.QuadraticFit}); the statistical choices as types ({@link
 * org.meritbook.stats.regression.Weighting}, {@link org.meritbook.stats.regression.LineModel}); and the
 * linearity tests of a fit ({@link org.meritbook.stats.regression.LackOfFit}, {@link
 * org.meritbook.stats.regression.MandelTest}); and reading unknowns back through a line, with the
 * standard error of the concentration ({@link org.meritbook.stats.regression.InversePrediction}).
 */
package org.meritbook.stats.regression;
