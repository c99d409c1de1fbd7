/**
 * Tests on a sample of values: normality ({@link org.meritbook.stats.tests.ShapiroWilk}, Royston's
 * AS R94), and the outlier tests the precision and accuracy analyses screen with.
 */
package org.meritbook.stats.tests;
