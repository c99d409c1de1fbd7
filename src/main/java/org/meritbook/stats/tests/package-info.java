/**
 * Tests on a sample of values: normality ({@link org.meritbook.stats.tests.ShapiroWilk}, Royston's
 * AS R94) and the one-sample t test of a mean against a target ({@link
 * org.meritbook.stats.tests.OneSampleTTest}, the bias test of an accuracy study). Outlier tests are a
 * family of their own, in {@code stats.outliers}.
 */
package org.meritbook.stats.tests;
