/**
 * One-way analysis of variance and the precision estimates built on it: {@link
 * org.meritbook.stats.anova.OneWayAnova} (the ANOVA table for unbalanced groups, accurate on NIST's
 * hardest sets), {@link org.meritbook.stats.anova.VarianceComponents} (repeatability, between-group
 * and intermediate-precision SDs, n₀ for unequal groups, a negative between-group estimate set to
 * zero and flagged, the Satterthwaite interval, ISO 5725-2 limits r and R) and {@link
 * org.meritbook.stats.anova.HorwitzRatio} (the reproducibility RSD Horwitz's function predicts, and
 * HorRat).
 */
package org.meritbook.stats.anova;
